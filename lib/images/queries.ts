import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { images, sources } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { NotFoundError } from "@/lib/errors";
import { canSeeSource } from "@/lib/sources/visibility";

export const imageColumns = {
  id: images.id,
  sourceId: images.sourceId,
  kind: images.kind,
  caption: images.caption,
  photoCredit: images.photoCredit,
  rightsUri: images.rightsUri,
  originalFilename: images.originalFilename,
  mimeType: images.mimeType,
  byteSize: images.byteSize,
  width: images.width,
  height: images.height,
  state: images.state,
  failureReason: images.failureReason,
  nearDuplicateOf: images.nearDuplicateOf,
  nearDuplicateDistance: images.nearDuplicateDistance,
  uploadedBy: images.uploadedBy,
  version: images.version,
  createdAt: images.createdAt,
  readyAt: images.readyAt,
};

export type ImageSummary = { [K in keyof typeof imageColumns]: (typeof images.$inferSelect)[K] };

async function sourceFor(actor: Actor | null, sourceId: number) {
  const [source] = await db()
    .select({ id: sources.id, title: sources.title, state: sources.state, createdBy: sources.createdBy, deletedAt: sources.deletedAt })
    .from(sources)
    .where(eq(sources.id, sourceId));
  if (!source || !canSeeSource(actor, source)) throw new NotFoundError("source");
  return source;
}

/** The images of a source the caller may see, in order. Unfinished uploads are shown only to uploaders. */
export async function listImagesOfSource(actor: Actor | null, sourceId: number) {
  authorize(actor, "archive.read");
  await sourceFor(actor, sourceId);
  const rows = await db()
    .select(imageColumns)
    .from(images)
    .where(and(eq(images.sourceId, sourceId), isNull(images.deletedAt)))
    .orderBy(asc(images.position), asc(images.id));
  const shown = rows.filter((r) => r.state === "ready" || (actor && (r.uploadedBy === actor.id || actor.role === "editor" || actor.role === "admin")));
  const twinIds = [...new Set(shown.map((r) => r.nearDuplicateOf).filter((id): id is number => id !== null))];
  const twins = twinIds.length
    ? await db()
        .select({ imageId: images.id, sourceId: images.sourceId, sourceTitle: sources.title, state: sources.state, createdBy: sources.createdBy, deletedAt: sources.deletedAt })
        .from(images)
        .innerJoin(sources, eq(sources.id, images.sourceId))
        .where(inArray(images.id, twinIds))
    : [];
  // A near duplicate is named only if the caller may see its source.
  const visible = new Map(twins.filter((t) => canSeeSource(actor, t)).map((t) => [t.imageId, { imageId: t.imageId, sourceId: t.sourceId, sourceTitle: t.sourceTitle }]));
  return shown.map((r) => ({ ...r, nearDuplicate: r.nearDuplicateOf ? (visible.get(r.nearDuplicateOf) ?? null) : null }));
}

/** One image with its storage key, for serving: only when the caller may see its source. */
export async function getImageForViewer(actor: Actor | null, imageId: number) {
  authorize(actor, "archive.read");
  const [row] = await db()
    .select({ ...imageColumns, storageKey: images.storageKey, deletedAt: images.deletedAt })
    .from(images)
    .where(eq(images.id, imageId));
  if (!row || row.deletedAt) throw new NotFoundError("image");
  const source = await sourceFor(actor, row.sourceId);
  return { ...row, source };
}
