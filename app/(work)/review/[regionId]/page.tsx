import type { Metadata } from "next";
import Link from "next/link";
import { notFound, redirect } from "next/navigation";
import { DecisionPanel } from "@/components/review/decision-panel";
import { ObservationTable } from "@/components/review/observation-table";
import { cropAround, RegionCrop } from "@/components/review/region-crop";
import { RegionThread } from "@/components/review/region-thread";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { NotFoundError } from "@/lib/errors";
import { STATE_WORDS } from "@/lib/regions/types";
import { getReviewCase } from "@/lib/review/case";
import { deskFilterParams } from "@/lib/review/desk-schema";
import { readDeskParams, type SearchParams } from "../search-params";

type Props = { params: Promise<{ regionId: string }>; searchParams: SearchParams };

export const metadata: Metadata = { title: "Review a region" };

const day = (iso: string) => iso.slice(0, 10);

export default async function ReviewRegionPage({ params, searchParams }: Props) {
  const { regionId } = await params;
  const id = /^\d{1,12}$/.test(regionId) ? Number(regionId) : null;
  if (!id) notFound();
  const actor = await currentActor();
  if (!actor) redirect(`/sign-in?callbackUrl=/review/${id}`);
  if (!can(actor, "review.read_desk")) {
    return <Notice tone="warn">Reviewing is for editors. Your role ({actor.role}) does not include it.</Notice>;
  }
  const { query } = await readDeskParams(searchParams);
  const filters = deskFilterParams(query).toString();
  const review = await getReviewCase(actor, id).catch((error) => {
    if (error instanceof NotFoundError) notFound();
    throw error;
  });
  const { region, source, current, previous, changes, image } = review;
  const own = region.authorId === actor.id;
  const area = cropAround(previous ? [previous.box, current.box] : [current.box], image);
  const nowHeading = `Proposed now (version ${current.number})`;
  const beforeHeading = previous ? `${previous.decision === "vetted" ? "Vetted" : "Returned"} ${day(previous.decidedAt)} (version ${previous.number})` : undefined;

  return (
    <article className="flex flex-col gap-6">
      <p className="text-sm">
        <Link href={`/review${filters ? `?${filters}` : ""}`}>← Back to the review desk</Link>
      </p>
      <header className="border-b border-rule pb-3">
        <p className="text-sm uppercase tracking-wider text-ink-faint">
          Region {region.id} · {STATE_WORDS[region.state]} · by {region.authorName}
        </p>
        <h1 className="text-3xl">{region.label ?? `Region ${region.id}`}</h1>
        <p className="mt-1 text-lg">
          on <Link href={`/sources/${source.id}`} className="font-serif">“{source.title}”</Link>
        </p>
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 text-sm text-ink-soft">
          <dt className="font-semibold">Dating</dt>
          <dd>
            {source.datingWords ?? "not dated"} {source.datingEdtf && <span className="font-mono text-ink-faint">{source.datingEdtf}</span>}
          </dd>
          <dt className="font-semibold">Collection</dt>
          <dd>
            {source.collection ?? "not recorded"}
            {source.accessionNumber && <span className="ml-2 font-mono">{source.accessionNumber}</span>}
          </dd>
          <dt className="font-semibold">Photograph</dt>
          <dd>
            <Link href={`/sources/${source.id}/images/${region.imageId}?region=${region.id}`}>open in the viewer</Link>
          </dd>
        </dl>
      </header>

      <section aria-labelledby="changes-heading" className="flex flex-col gap-4">
        <h2 id="changes-heading" className="text-2xl">
          {previous ? "What changed since the last review" : "First review"}
        </h2>
        {previous ? (
          <>
            <p className="text-ink-soft">
              {previous.reviewerName} {previous.decision === "vetted" ? "vetted" : "returned"} version {previous.number} on {day(previous.decidedAt)}
              {previous.comment ? ":" : "."}
            </p>
            {previous.comment && <blockquote className="border-l-4 border-rule pl-3 whitespace-pre-wrap">{previous.comment}</blockquote>}
            <p>
              <span className="font-semibold">Shape:</span> {changes!.shape.words}. <span className="font-semibold">Label:</span>{" "}
              {changes!.label.changed ? `“${changes!.label.before ?? "none"}” → “${changes!.label.after ?? "none"}”` : "unchanged"}.{" "}
              <span className="font-semibold">Observations:</span> {changes!.observationsChanged === 0 ? "unchanged" : `${changes!.observationsChanged} changed`}.
            </p>
            <div className="grid gap-4 md:grid-cols-2">
              <figure>
                <RegionCrop imageId={image.id} area={area} shape={previous.shape} alt={`The region as it was in version ${previous.number}`} />
                <figcaption className="mt-1 text-sm text-ink-soft">{beforeHeading}</figcaption>
              </figure>
              <figure>
                <RegionCrop imageId={image.id} area={area} shape={current.shape} alt={`The region as proposed now, version ${current.number}`} />
                <figcaption className="mt-1 text-sm text-ink-soft">{nowHeading}</figcaption>
              </figure>
            </div>
          </>
        ) : (
          <>
            <p className="text-ink-soft">No editor has decided on an earlier version of this region.</p>
            <figure>
              <RegionCrop imageId={image.id} area={area} shape={current.shape} alt={`The region, version ${current.number}`} />
              <figcaption className="mt-1 text-sm text-ink-soft">{nowHeading}</figcaption>
            </figure>
          </>
        )}
        <ObservationTable current={current.observations} changes={changes?.observations ?? null} beforeHeading={beforeHeading} nowHeading={nowHeading} />
      </section>

      <section aria-labelledby="decision-heading" className="flex flex-col gap-3">
        <h2 id="decision-heading" className="text-2xl">
          Decision
        </h2>
        {own ? (
          <Notice>This is your own region. Nobody reviews their own work: another editor decides on it.</Notice>
        ) : region.can.decide ? (
          <DecisionPanel regionId={region.id} version={region.version} nextHref={`/review/next${filters ? `?${filters}` : ""}`} />
        ) : (
          <Notice>This region is {STATE_WORDS[region.state]}; there is nothing to decide on now.</Notice>
        )}
      </section>

      <RegionThread regionId={region.id} canWrite={region.can.discuss} />
    </article>
  );
}
