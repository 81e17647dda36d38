// What the browser knows of an image (GET /api/sources/:id/images), and the addresses built from it.
// Shared by the uploader, the source's image section and the viewer; no server imports.

export type ImageState = "uploading" | "waiting" | "processing" | "ready" | "failed";
export type ImageKind = "whole" | "detail";

export type SourceImage = {
  id: number;
  sourceId: number;
  kind: ImageKind;
  caption: string | null;
  photoCredit: string | null;
  rightsUri: string | null;
  originalFilename: string;
  mimeType: string | null;
  byteSize: number | null;
  width: number | null;
  height: number | null;
  state: ImageState;
  failureReason: string | null;
  nearDuplicateOf: number | null;
  nearDuplicateDistance: number | null;
  nearDuplicate?: { imageId: number; sourceId: number; sourceTitle: string } | null;
  version: number;
  createdAt: string;
  readyAt: string | null;
};

export const KIND_LABELS: Record<ImageKind, string> = { whole: "Whole work", detail: "Detail" };

/** States still moving on the server: the list is polled while any image is in one of them. */
export const UNFINISHED: readonly ImageState[] = ["waiting", "processing"];

export const SERVER_STATE_TEXT: Record<ImageState, string> = {
  uploading: "upload not finished",
  waiting: "waiting for processing",
  processing: "processing",
  ready: "ready",
  failed: "failed",
};

export const iiifBase = (imageId: number) => `/iiif/3/${imageId}`;
export const infoJsonUrl = (imageId: number) => `${iiifBase(imageId)}/info.json`;
/** The IIIF size `!400,400`, the whole picture within 400×400: one size everywhere, made once and kept. */
export const thumbnailUrl = (imageId: number) => `${iiifBase(imageId)}/full/!400,400/0/default.jpg`;
export const viewerPath = (sourceId: number, imageId: number) => `/sources/${sourceId}/images/${imageId}`;

/** "2.4 MB", "812 KB": decimal units, as file managers show them. */
export function formatBytes(bytes: number | null | undefined): string {
  if (bytes === null || bytes === undefined) return "size unknown";
  if (bytes < 1000) return `${bytes} B`;
  if (bytes < 1_000_000) return `${Math.round(bytes / 1000)} KB`;
  if (bytes < 1_000_000_000) return `${(bytes / 1_000_000).toFixed(bytes < 10_000_000 ? 1 : 0)} MB`;
  return `${(bytes / 1_000_000_000).toFixed(2)} GB`;
}

export function formatPixels(width: number | null, height: number | null): string | null {
  return width && height ? `${width.toLocaleString("en")} × ${height.toLocaleString("en")} px` : null;
}

/** How an image is named in lists: its caption, else its file name. */
export const imageName = (image: Pick<SourceImage, "caption" | "originalFilename">) => image.caption || image.originalFilename;
