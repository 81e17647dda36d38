import "server-only";
import { mkdtemp, readdir, readFile, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join, relative } from "node:path";
import { and, eq, isNotNull, isNull, ne, sql } from "drizzle-orm";
import sharp, { type Metadata } from "sharp";
import { db } from "@/db/client";
import { images, type Job } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { config } from "@/lib/config";
import { PermanentJobError, type JobHandler } from "@/lib/jobs/worker";
import { outbox } from "@/lib/search/outbox";
import { deleteKeys, deletePrefix, downloadTo, putObject } from "@/lib/storage/objects";
import { imagePrefix, originalKey, previewKey, thumbnailKey, tilesPrefix } from "./keys";
import { dHash, toHex } from "./phash";

export const TILE_SIZE = 512;
const THUMBNAIL = 400;
const PREVIEW = 1600;
const UPLOAD_CONCURRENCY = 8;

const describeDecodeError = (message: string) =>
  /premature end|truncated|corrupt|unexpected end|bad huffman|invalid/i.test(message)
    ? `The file is damaged or incomplete and cannot be decoded (${message.trim()}).`
    : `The image could not be decoded (${message.trim()}).`;

async function uploadDirectory(dir: string, prefix: string): Promise<string[]> {
  const files: string[] = [];
  const walk = async (d: string) => {
    for (const entry of await readdir(d, { withFileTypes: true })) {
      const path = join(d, entry.name);
      if (entry.isDirectory()) await walk(path);
      else if (entry.name !== "info.json" && entry.name !== "vips-properties.xml") files.push(path);
    }
  };
  await walk(dir);
  const keys: string[] = [];
  for (let i = 0; i < files.length; i += UPLOAD_CONCURRENCY) {
    await Promise.all(
      files.slice(i, i + UPLOAD_CONCURRENCY).map(async (file) => {
        const key = `${prefix}${relative(dir, file)}`;
        await putObject(key, await readFile(file), "image/jpeg");
        keys.push(key);
      }),
    );
  }
  return keys;
}

/** The closest earlier image by perceptual hash, computed in SQL (BIT_COUNT of the XOR of 64-bit hashes). */
async function nearestTwin(imageId: number, phash: string) {
  const [row] = await db()
    .select({ id: images.id, distance: sql<number>`BIT_COUNT(CAST(CONV(${images.phash}, 16, 10) AS UNSIGNED) ^ CAST(CONV(${phash}, 16, 10) AS UNSIGNED))` })
    .from(images)
    .where(and(isNotNull(images.phash), ne(images.id, imageId), isNull(images.deletedAt)))
    .orderBy(sql`2`)
    .limit(1);
  return row && Number(row.distance) <= config().IMAGE_NEAR_DUPLICATE_DISTANCE ? { id: row.id, distance: Number(row.distance) } : null;
}

/**
 * The sharp part of processing, without storage: decodes the original once (oriented by its EXIF, in
 * sRGB), then writes the IIIF 3.0 tile pyramid into `work` and makes a thumbnail and a preview.
 * The benchmark times exactly this against libvips' own dzsave.
 */
export async function buildDerivatives(original: string, work: string, limitInputPixels = config().IMAGE_MAX_PIXELS) {
  // failOn "warning" turns a truncated or damaged file into an error instead of a grey half-image.
  const normalised = join(work, "normalised.v");
  try {
    // Decode once into libvips' own format, so the pyramid and derivatives do not decode again.
    await sharp(original, { limitInputPixels, failOn: "warning", sequentialRead: true }).autoOrient().toColourspace("srgb").removeAlpha().toFile(normalised);
  } catch (error) {
    throw new PermanentJobError(describeDecodeError((error as Error).message));
  }
  const { width, height } = await sharp(normalised, { limitInputPixels }).metadata();
  const tilesDir = join(work, "tiles");
  // Without optimised Huffman tables per tile: ~40% faster to write, ~10% larger (tests/bench/results/images.md).
  await sharp(normalised, { limitInputPixels }).jpeg({ quality: 85, optimiseCoding: false }).tile({ layout: "iiif3", size: TILE_SIZE, id: "tiles" }).toFile(tilesDir);
  const thumbnail = await sharp(normalised, { limitInputPixels }).resize(THUMBNAIL, THUMBNAIL, { fit: "inside" }).jpeg({ quality: 82 }).toBuffer();
  const preview = await sharp(normalised, { limitInputPixels }).resize(PREVIEW, PREVIEW, { fit: "inside", withoutEnlargement: true }).jpeg({ quality: 85 }).toBuffer();
  return { width: width!, height: height!, tilesDir, thumbnail, preview };
}

/**
 * Turns an uploaded original into what the viewer and the IIIF endpoint serve: oriented by its EXIF,
 * in sRGB, hashed, with a thumbnail, a preview and a IIIF 3.0 tile pyramid in object storage.
 */
export async function processImage(imageId: number): Promise<void> {
  const [image] = await db().select().from(images).where(eq(images.id, imageId));
  if (!image || image.deletedAt || image.state === "uploading") return;
  await db().update(images).set({ state: "processing", failureReason: null }).where(eq(images.id, imageId));
  const work = await mkdtemp(join(tmpdir(), "cordarium-image-"));
  const written: string[] = [];
  try {
    const original = join(work, "original");
    await downloadTo(originalKey(image.storageKey), original);
    const limitInputPixels = config().IMAGE_MAX_PIXELS;
    let meta: Metadata;
    try {
      meta = await sharp(original, { limitInputPixels: false }).metadata();
    } catch (error) {
      throw new PermanentJobError(describeDecodeError((error as Error).message));
    }
    const pixels = (meta.width ?? 0) * (meta.height ?? 0);
    if (pixels > limitInputPixels) {
      throw new PermanentJobError(
        `The image decodes to ${meta.width} × ${meta.height} pixels (${(pixels / 1e6).toFixed(0)} megapixels), more than the limit of ${(limitInputPixels / 1e6).toFixed(0)} megapixels.`,
      );
    }
    const built = await buildDerivatives(original, work);
    const { width, height, preview } = built;
    written.push(...(await uploadDirectory(built.tilesDir, tilesPrefix(image.storageKey))));
    await putObject(thumbnailKey(image.storageKey), built.thumbnail, "image/jpeg");
    written.push(thumbnailKey(image.storageKey));
    await putObject(previewKey(image.storageKey), preview, "image/jpeg");
    written.push(previewKey(image.storageKey));

    const phash = toHex(await dHash(preview));
    const twin = await nearestTwin(imageId, phash);
    await db().transaction(async (tx) => {
      await tx
        .update(images)
        .set({
          state: "ready",
          width,
          height,
          phash,
          nearDuplicateOf: twin?.id ?? null,
          nearDuplicateDistance: twin?.distance ?? null,
          readyAt: new Date(),
          failureReason: null,
          version: sql`${images.version} + 1`,
        })
        .where(eq(images.id, imageId));
      const [after] = await tx.select().from(images).where(eq(images.id, imageId));
      await recordAudit(tx, { actorId: null, action: "image.processed", entityType: "image", entityId: imageId, before: image, after });
      await outbox(tx, "source", image.sourceId);
    });
  } catch (error) {
    // Nothing half-done: whatever this attempt wrote goes, so a retry starts clean.
    await deleteKeys(written).catch(() => undefined);
    const message = error instanceof Error ? error.message : String(error);
    await db().update(images).set({ state: "waiting", failureReason: `attempt failed: ${message}` }).where(eq(images.id, imageId));
    throw error;
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

export const imageProcessingHandler: JobHandler = {
  async run(job: Job) {
    await processImage(Number(job.payload.imageId));
  },
  async onFinalFailure(job: Job, error: string, permanent: boolean) {
    const imageId = Number(job.payload.imageId);
    const [image] = await db().select().from(images).where(eq(images.id, imageId));
    if (!image) return;
    // A file that can never be decoded is removed; after passing faults the original stays for a re-run.
    if (permanent) await deletePrefix(imagePrefix(image.storageKey));
    else await deletePrefix(tilesPrefix(image.storageKey));
    await db().transaction(async (tx) => {
      await tx.update(images).set({ state: "failed", failureReason: error, version: sql`${images.version} + 1` }).where(eq(images.id, imageId));
      await recordAudit(tx, { actorId: null, action: "image.failed", entityType: "image", entityId: imageId, before: image, after: { state: "failed", failureReason: error, originalKept: !permanent } });
    });
  },
};
