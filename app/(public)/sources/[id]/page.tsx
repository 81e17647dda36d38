import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { AddToDossier } from "@/components/dossiers/add-to-dossier";
import { SourceImages } from "@/components/images/source-images";
import { SourceEvidence } from "@/components/regions/source-evidence";
import { SourceAdminActions } from "@/components/sources/source-admin-actions";
import { SourceHistory } from "@/components/sources/source-history";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { countryName } from "@/lib/catalogue/countries";
import { rightsLabel } from "@/lib/catalogue/rights";
import { datingMargins } from "@/lib/config";
import { readDating } from "@/lib/dating";
import { NotFoundError } from "@/lib/errors";
import { listImagesOfSource } from "@/lib/images/queries";
import { listRegionsOfSource } from "@/lib/regions/queries";
import { stringingInput } from "@/lib/regions/stringing";
import { getSource, getSourceHistory } from "@/lib/sources/queries";
import { checkStringing } from "@/lib/stringing";
import { attributionInWords, OBJECT_TYPE_LABELS } from "@/lib/sources/vocab";

type Props = { params: Promise<{ id: string }> };

async function load(id: string) {
  const actor = await currentActor();
  const n = Number(id);
  if (!Number.isInteger(n) || n <= 0) notFound();
  try {
    const source = await getSource(actor, n);
    const [history, regions, images] = await Promise.all([getSourceHistory(actor, n), listRegionsOfSource(actor, n), listImagesOfSource(actor, n)]);
    return { actor, source, history, regions, hasImages: images.some((i) => i.state === "ready") };
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { source } = await load((await params).id);
  return { title: source.title };
}

const coordinate = (value: number, positive: string, negative: string) => `${Math.abs(value).toFixed(4)}° ${value >= 0 ? positive : negative}`;

function Field({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="grid gap-1 border-b border-rule py-2 sm:grid-cols-[12rem_1fr]">
      <dt className="text-sm font-semibold text-ink-soft">{label}</dt>
      <dd>{children}</dd>
    </div>
  );
}

export default async function SourcePage({ params }: Props) {
  const { actor, source, history, regions, hasImages } = await load((await params).id);
  const dating = source.datingEdtf ? readDating(source.datingEdtf, datingMargins()) : null;
  const mayEdit = !source.deletedAt && can(actor, "source.edit", { ownerId: source.createdBy });
  const dims = source.height || source.width ? `${source.height ?? "?"} × ${source.width ?? "?"} ${source.dimensionUnit}` : null;

  return (
    <article>
      <header className="mb-6 border-b border-rule pb-4">
        <p className="text-sm uppercase tracking-wider text-ink-faint">
          {OBJECT_TYPE_LABELS[source.objectType]} · {source.state === "draft" ? "draft, not yet public" : "published"}
        </p>
        <h1 className="mt-1 text-3xl sm:text-4xl">{source.title}</h1>
        <p className="mt-1 text-lg text-ink-soft">{attributionInWords(source.attributionQualifier, source.artist)}</p>
        <div className="mt-4 flex flex-wrap gap-2">
          {mayEdit && (
            <Link href={`/sources/${source.id}/edit`} className="rounded bg-accent px-4 py-2 text-sm font-semibold text-white no-underline hover:bg-accent-deep">
              Edit
            </Link>
          )}
          {can(actor, "dossier.manage") && !source.deletedAt && <AddToDossier kind="source" id={source.id} />}
          {can(actor, "source.delete") && <SourceAdminActions id={source.id} version={source.version} deleted={Boolean(source.deletedAt)} />}
        </div>
      </header>
      {source.deletedAt && <Notice tone="warn">This source was deleted on {source.deletedAt.toISOString().slice(0, 10)}. Only administrators see it; they can restore it.</Notice>}
      <SourceImages sourceId={source.id} canUpload={mayEdit && can(actor, "image.upload", { ownerId: source.createdBy })} canReprocess={can(actor, "image.reprocess")} />
      <SourceEvidence sourceId={source.id} regionCount={regions.length} stringing={checkStringing(stringingInput(regions))} hasImages={hasImages} />
      <dl className="mb-8">
        <Field label="Date">
          {dating?.ok ? (
            <>
              <span>{dating.words}</span> <span className="ml-2 font-mono text-sm text-ink-faint">{dating.edtf}</span>
              <div className="font-mono text-sm text-ink-soft">
                {dating.earliest ?? "open"} – {dating.latest ?? "open"}
                {(dating.approximate || dating.uncertain) && (
                  <span className="ml-2 font-sans text-ink-faint">
                    (searched as {dating.widenedEarliest ?? "open"} – {dating.widenedLatest ?? "open"})
                  </span>
                )}
              </div>
            </>
          ) : (
            <span className="text-ink-faint">Not dated</span>
          )}
        </Field>
        <Field label="Place of making">
          {source.place ? (
            <>
              <span>{source.place.name}</span>
              {source.place.kind === "area" && <span className="ml-2 text-sm text-ink-faint">(historical area)</span>}
              <div className="text-sm text-ink-soft">
                {countryName(source.place.countryCode) ?? "country unknown"} <span className="font-mono">{source.place.countryCode}</span>
                {source.place.subdivisionCode && <span className="font-mono"> · {source.place.subdivisionCode}</span>}
              </div>
              <div className="font-mono text-sm text-ink-soft">
                {coordinate(source.place.latitude, "N", "S")}, {coordinate(source.place.longitude, "E", "W")}
              </div>
            </>
          ) : (
            <span className="text-ink-faint">Not known</span>
          )}
        </Field>
        <Field label="Collection">
          {source.collection ? (
            <>
              <Link href={`/sources?collection=${source.collection.id}`}>{source.collection.name}</Link>
              {source.collection.city && <span className="text-ink-soft">, {source.collection.city}</span>}
              {source.accessionNumber && <div className="font-mono text-sm">{source.accessionNumber}</div>}
            </>
          ) : (
            <span className="text-ink-faint">Not recorded</span>
          )}
        </Field>
        {source.medium && <Field label="Medium">{source.medium}</Field>}
        {dims && <Field label="Height × width">{dims}</Field>}
        <Field label="Rights">
          {source.rightsUri ? <a href={source.rightsUri}>{rightsLabel(source.rightsUri) ?? source.rightsUri}</a> : <span className="text-ink-faint">Not stated; ask the holding collection</span>}
          {source.creditLine && <div className="text-sm text-ink-soft">{source.creditLine}</div>}
        </Field>
        {source.description && <Field label="Description"><p className="whitespace-pre-line">{source.description}</p></Field>}
        {source.reliabilityNote && <Field label="Reliability"><p className="whitespace-pre-line">{source.reliabilityNote}</p></Field>}
        {source.bibliography.length > 0 && (
          <Field label="Bibliography">
            <ol className="list-decimal space-y-1 pl-5">
              {source.bibliography.map((b, i) => (
                <li key={i}>
                  {b.author}, <cite>{b.title}</cite>
                  {b.year && `, ${b.year}`}
                  {b.pages && `, ${b.pages}`}
                  {b.link && (
                    <>
                      {" "}
                      <a href={b.link}>link</a>
                    </>
                  )}
                </li>
              ))}
            </ol>
          </Field>
        )}
        <Field label="Catalogued by">{source.creatorName ?? "—"}</Field>
      </dl>
      <SourceHistory history={history} />
    </article>
  );
}
