import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ImageViewer } from "@/components/images/image-viewer";
import { imageName } from "@/components/images/image-types";
import { toSourceImage } from "@/components/images/source-images";
import { Notice } from "@/components/ui/notice";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { NotFoundError } from "@/lib/errors";
import { getImageForViewer, listImagesOfSource } from "@/lib/images/queries";

type Props = { params: Promise<{ id: string; imageId: string }>; searchParams: Promise<{ region?: string | string[] }> };

const positive = (s: string) => (/^\d+$/.test(s) && Number(s) > 0 ? Number(s) : null);

async function load({ id, imageId }: { id: string; imageId: string }) {
  const sourceId = positive(id);
  const wanted = positive(imageId);
  if (!sourceId || !wanted) notFound();
  const actor = await currentActor();
  try {
    const image = await getImageForViewer(actor, wanted);
    if (image.sourceId !== sourceId) notFound();
    // The source's list applies who may see unfinished images; an image not in it is not there for this caller.
    const all = await listImagesOfSource(actor, sourceId);
    const listed = all.find((i) => i.id === wanted);
    if (!listed) notFound();
    return { actor, image: listed, source: image.source, ready: all.filter((i) => i.state === "ready") };
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { image, source } = await load(await params);
  return { title: image.caption ? `${source.title}: ${image.caption}` : `${source.title}: image ${image.id}` };
}

export default async function ImageViewerPage({ params, searchParams }: Props) {
  const { actor, image, source, ready } = await load(await params);
  const { region } = await searchParams;
  const shown = toSourceImage(image);
  const position = ready.findIndex((i) => i.id === image.id);
  const others = ready.map(({ id, sourceId, caption, originalFilename }) => ({ id, sourceId, caption, originalFilename }));

  return (
    <article>
      <p className="mb-2 text-sm">
        <Link href={`/sources/${source.id}`}>← Back to “{source.title}”</Link>
      </p>
      <header className="mb-4 border-b border-rule pb-3">
        <p className="text-sm uppercase tracking-wider text-ink-faint">
          {position >= 0 ? `Photograph ${position + 1} of ${ready.length} of the source` : "A photograph of the source"}
        </p>
        <h1 className="text-3xl">{source.title}</h1>
        <p className="mt-1 text-lg text-ink-soft">{imageName(image)}</p>
      </header>
      {image.state === "ready" ? (
        <ImageViewer
          image={shown}
          sourceTitle={source.title}
          others={others}
          canDraw={can(actor, "region.create")}
          viewerId={actor?.id ?? null}
          canSeeProposed={can(actor, "archive.read_proposed")}
          initialRegionId={typeof region === "string" ? positive(region) : null}
        />
      ) : (
        <Notice tone={image.state === "failed" ? "warn" : "info"}>
          {image.state === "failed"
            ? `This photograph could not be processed: ${(image.failureReason ?? "no reason was given").replace(/[.!]?$/, ".")}`
            : "This photograph is not ready for viewing yet; its tiles are still being made. Reload in a moment."}
        </Notice>
      )}
      <p className="mt-6 max-w-prose text-sm text-ink-faint">
        The rights in this photograph belong to the holding institution and the photographer. Ask them before reproducing it; Cordarium shows it for study.
      </p>
    </article>
  );
}
