import "server-only";
import { createHash, randomUUID } from "node:crypto";
import { and, eq, isNull, ne, sql } from "drizzle-orm";
import { fileTypeFromBuffer } from "file-type";
import sharp from "sharp";
import { db } from "@/db/client";
import { images, sources } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { config } from "@/lib/config";
import { AppError, ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { enqueue } from "@/lib/jobs/queue";
import { abortMultipart, completeMultipart, deletePrefix, getObject, objectSize, presignPart, presignPut, readRange, startMultipart } from "@/lib/storage/objects";
import { imagePrefix, originalKey } from "./keys";
import { ACCEPTED_LABEL, ACCEPTED_TYPES, type StartUpload } from "./schemas";

// Files up to this size go up in one PUT; larger ones in parts of PART_SIZE (S3's minimum part is 5 MiB).
export const SINGLE_PUT_LIMIT = 16 * 1024 * 1024;
export const PART_SIZE = 8 * 1024 * 1024;

// The storage key never leaves the server: object storage may serve objects to whoever names them.
const publicImage = ({ storageKey: _k, multipartUploadId: _m, sha256: _s, ...rest }: typeof images.$inferSelect) => rest;

const mb = (n: number) => `${(n / 1024 / 1024).toFixed(n < 10 * 1024 * 1024 ? 1 : 0)} MB`;

async function editableSource(actor: Actor | null, sourceId: number) {
  const [source] = await db().select().from(sources).where(eq(sources.id, sourceId));
  if (!source || source.deletedAt) throw new NotFoundError("source");
  authorize(actor, "image.upload", { ownerId: source.createdBy });
  return source;
}

export async function startUpload(actor: Actor | null, sourceId: number, input: StartUpload) {
  authorize(actor, "image.upload");
  await editableSource(actor, sourceId);
  if (input.size === 0) throw new ValidationError(`“${input.filename}” is empty (0 bytes).`, { file: ["The file is empty."] });
  if (input.size > config().IMAGE_MAX_BYTES) {
    throw new ValidationError(`“${input.filename}” is ${mb(input.size)}; the limit is ${mb(config().IMAGE_MAX_BYTES)}.`, { file: ["The file is too large."] });
  }
  const storageKey = randomUUID();
  const key = originalKey(storageKey);
  const multipart = input.size > SINGLE_PUT_LIMIT;
  const uploadId = multipart ? await startMultipart(key, input.contentType) : null;
  const image = await db().transaction(async (tx) => {
    const [{ id }] = await tx
      .insert(images)
      .values({
        sourceId,
        storageKey,
        kind: input.kind,
        caption: input.caption,
        photoCredit: input.photoCredit,
        rightsUri: input.rightsUri,
        originalFilename: input.filename,
        declaredType: input.contentType,
        byteSize: input.size,
        multipartUploadId: uploadId,
        uploadedBy: actor!.id,
      })
      .$returningId();
    const [row] = await tx.select().from(images).where(eq(images.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "image.upload_started", entityType: "image", entityId: id, after: row });
    return row;
  });
  if (!multipart) {
    return { image: { id: image.id }, upload: { kind: "single" as const, url: await presignPut(key, input.contentType), headers: { "content-type": input.contentType } } };
  }
  const count = Math.ceil(input.size / PART_SIZE);
  const parts = await Promise.all(Array.from({ length: count }, async (_, i) => ({ partNumber: i + 1, url: await presignPart(key, uploadId!, i + 1) })));
  return { image: { id: image.id }, upload: { kind: "multipart" as const, partSize: PART_SIZE, parts } };
}

async function uploadingImage(actor: Actor | null, imageId: number) {
  const [image] = await db().select().from(images).where(eq(images.id, imageId));
  if (!image || image.deletedAt) throw new NotFoundError("image");
  await editableSource(actor, image.sourceId);
  if (image.uploadedBy !== actor!.id && actor!.role !== "editor" && actor!.role !== "admin") throw new NotFoundError("image");
  return image;
}

/** Removes a refused or cancelled upload entirely: its objects, then its row, with the reason audited. */
async function discard(actor: Actor, image: typeof images.$inferSelect, reason: string, action = "image.refused") {
  if (image.multipartUploadId) await abortMultipart(originalKey(image.storageKey), image.multipartUploadId);
  await deletePrefix(imagePrefix(image.storageKey));
  await db().transaction(async (tx) => {
    await tx.delete(images).where(eq(images.id, image.id));
    await recordAudit(tx, { actorId: actor.id, action, entityType: "image", entityId: image.id, before: image, after: { reason } });
  });
}

async function sha256Of(key: string): Promise<string> {
  const object = await getObject(key);
  if (!object) throw new ValidationError("The upload did not arrive; try again.");
  const hash = createHash("sha256");
  for await (const chunk of object.body) hash.update(chunk as Buffer);
  return hash.digest("hex");
}

/** After the browser's upload: check what actually arrived, then queue it for processing. */
export async function completeUpload(actor: Actor | null, imageId: number, parts?: { partNumber: number; etag: string }[]) {
  authorize(actor, "image.upload");
  const image = await uploadingImage(actor, imageId);
  if (image.state !== "uploading") throw new ValidationError("This upload is complete already.");
  const key = originalKey(image.storageKey);
  const refuse = async (reason: string, extra: Record<string, unknown> = {}): Promise<never> => {
    await discard(actor!, image, reason);
    throw new AppError(400, "invalid_input", reason, { fields: { file: [reason] }, ...extra });
  };

  if (image.multipartUploadId) {
    if (!parts?.length) throw new ValidationError("The list of uploaded parts is missing.");
    await completeMultipart(key, image.multipartUploadId, parts).catch(() => refuse("The upload's parts could not be joined; try again."));
  }
  const size = await objectSize(key);
  if (size === null) throw new ValidationError("The file has not arrived in storage yet; wait for the upload to finish, or try again.");
  if (size === 0) await refuse(`“${image.originalFilename}” is empty (0 bytes).`);
  if (size! > config().IMAGE_MAX_BYTES) await refuse(`“${image.originalFilename}” is ${mb(size!)}; the limit is ${mb(config().IMAGE_MAX_BYTES)}.`);

  // The real type comes from the file's first bytes, never from its name or the browser's claim.
  const head = await readRange(key, 0, 4100);
  const type = await fileTypeFromBuffer(head);
  if (!type || !(ACCEPTED_TYPES as readonly string[]).includes(type.mime)) {
    const what = type ? `a ${type.ext.toUpperCase()} file (${type.mime})` : "not a file type Cordarium can read as an image";
    await refuse(`“${image.originalFilename}” is ${what}, whatever its name says. Upload a ${ACCEPTED_LABEL} photograph.`);
  }

  // A decompression bomb is a small file whose header promises gigapixels: refuse it before decoding.
  const header = await sharp(await readRange(key, 0, 256 * 1024), { limitInputPixels: false })
    .metadata()
    .catch(() => null);
  const limit = config().IMAGE_MAX_PIXELS;
  if (header?.width && header.height && header.width * header.height > limit) {
    await refuse(
      `“${image.originalFilename}” would decode to ${header.width} × ${header.height} pixels (${Math.round((header.width * header.height) / 1e6)} megapixels); the limit is ${Math.round(limit / 1e6)} megapixels.`,
    );
  }

  const sha256 = await sha256Of(key);
  const [twin] = await db()
    .select({ id: images.id, sourceId: images.sourceId, title: sources.title })
    .from(images)
    .innerJoin(sources, eq(sources.id, images.sourceId))
    .where(and(eq(images.sha256, sha256), isNull(images.deletedAt), ne(images.id, image.id)))
    .limit(1);
  if (twin) {
    await refuse(`This exact file is already in the archive: image ${twin.id} of “${twin.title}”.`, {
      duplicateOf: { imageId: twin.id, sourceId: twin.sourceId, url: `/sources/${twin.sourceId}/images/${twin.id}` },
    });
  }

  return db().transaction(async (tx) => {
    await tx
      .update(images)
      .set({ state: "waiting", mimeType: type!.mime, byteSize: size, sha256, multipartUploadId: null, version: sql`${images.version} + 1` })
      .where(eq(images.id, image.id));
    await enqueue(tx, "image.process", { imageId: image.id });
    const [after] = await tx.select().from(images).where(eq(images.id, image.id));
    await recordAudit(tx, { actorId: actor!.id, action: "image.uploaded", entityType: "image", entityId: image.id, before: image, after });
    return publicImage(after);
  });
}

/** Cancelling an unfinished upload leaves nothing behind. */
export async function cancelUpload(actor: Actor | null, imageId: number) {
  authorize(actor, "image.upload");
  const image = await uploadingImage(actor, imageId);
  if (image.state !== "uploading") throw new ValidationError("Only an unfinished upload can be cancelled.");
  await discard(actor!, image, "cancelled by the uploader", "image.upload_cancelled");
}

/** Editors re-run the processing of a failed image whose original is still stored. */
export async function reprocessImage(actor: Actor | null, imageId: number) {
  authorize(actor, "image.reprocess");
  const [image] = await db().select().from(images).where(eq(images.id, imageId));
  if (!image || image.deletedAt) throw new NotFoundError("image");
  if (image.state !== "failed") throw new ValidationError("Only a failed image can be processed again.");
  if ((await objectSize(originalKey(image.storageKey))) === null) {
    throw new ValidationError("The original was removed because it could not be read; upload the file again.");
  }
  return db().transaction(async (tx) => {
    await tx.update(images).set({ state: "waiting", failureReason: null, version: sql`${images.version} + 1` }).where(eq(images.id, imageId));
    await enqueue(tx, "image.process", { imageId });
    const [after] = await tx.select().from(images).where(eq(images.id, imageId));
    await recordAudit(tx, { actorId: actor!.id, action: "image.reprocess_requested", entityType: "image", entityId: imageId, before: image, after });
    return publicImage(after);
  });
}

export async function updateImageMetadata(actor: Actor | null, imageId: number, change: { version: number; kind: "whole" | "detail"; caption: string | null; photoCredit: string | null; rightsUri: string | null }) {
  authorize(actor, "image.upload");
  const { version, ...fields } = change;
  return db().transaction(async (tx) => {
    const [before] = await tx.select().from(images).where(eq(images.id, imageId)).for("update");
    if (!before || before.deletedAt) throw new NotFoundError("image");
    const [source] = await tx.select({ createdBy: sources.createdBy }).from(sources).where(eq(sources.id, before.sourceId));
    authorize(actor, "image.upload", { ownerId: source?.createdBy });
    if (before.version !== version) throw new ConflictError("Someone changed this image's details after you opened them.", before);
    await tx.update(images).set({ ...fields, version: sql`${images.version} + 1` }).where(eq(images.id, imageId));
    const [after] = await tx.select().from(images).where(eq(images.id, imageId));
    await recordAudit(tx, { actorId: actor!.id, action: "image.updated", entityType: "image", entityId: imageId, before, after });
    return publicImage(after);
  });
}
