// The photographs of a source, for the source page: rendered on the server for the first paint, then
// kept current in the browser (see SourceImagesPanel).
//
// Props:
//   sourceId      the source whose images are shown
//   canUpload     show the uploader (the caller may add images to this source: "image.upload")
//   canReprocess  show "Run processing again" on failed images ("image.reprocess", editors)
import "server-only";
import { currentActor } from "@/lib/auth/session";
import { NotFoundError } from "@/lib/errors";
import { listImagesOfSource } from "@/lib/images/queries";
import type { SourceImage } from "./image-types";
import { SourceImagesPanel } from "./source-images-panel";

type Props = { sourceId: number; canUpload: boolean; canReprocess: boolean };

type ListedImage = Awaited<ReturnType<typeof listImagesOfSource>>[number];

/** The API's JSON shape, so the first paint and the polled list render alike. */
export function toSourceImage(image: ListedImage): SourceImage {
  const { uploadedBy: _uploader, createdAt, readyAt, ...rest } = image;
  void _uploader;
  return { ...rest, createdAt: createdAt.toISOString(), readyAt: readyAt ? readyAt.toISOString() : null };
}

export async function SourceImages({ sourceId, canUpload, canReprocess }: Props) {
  const actor = await currentActor();
  let images: ListedImage[];
  try {
    images = await listImagesOfSource(actor, sourceId);
  } catch (error) {
    if (error instanceof NotFoundError) return null;
    throw error;
  }
  return <SourceImagesPanel sourceId={sourceId} canUpload={canUpload} canReprocess={canReprocess} initialImages={images.map(toSourceImage)} />;
}
