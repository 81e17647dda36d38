import "server-only";
import { and, eq, inArray, lt } from "drizzle-orm";
import { db } from "@/db/client";
import { images, jobs } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import type { JobHandler } from "@/lib/jobs/worker";
import { enqueue } from "@/lib/jobs/queue";
import { abortMultipart, deleteKeys, listKeys } from "@/lib/storage/objects";
import { originalKey } from "./keys";

const GRACE_MS = 60 * 60_000;
const ABANDONED_UPLOAD_MS = 24 * 60 * 60_000;
const EVERY_MS = 60 * 60_000;

/**
 * Removes objects that no image row refers to (an upload whose row was never written, a crash between
 * storage and database) once they are older than the grace period, and uploads abandoned for a day.
 */
export async function sweepStorage(now = Date.now()): Promise<{ objectsDeleted: number; uploadsAbandoned: number }> {
  const stale = await db()
    .select()
    .from(images)
    .where(and(eq(images.state, "uploading"), lt(images.createdAt, new Date(now - ABANDONED_UPLOAD_MS))));
  for (const image of stale) {
    if (image.multipartUploadId) await abortMultipart(originalKey(image.storageKey), image.multipartUploadId);
    await db().transaction(async (tx) => {
      await tx.delete(images).where(eq(images.id, image.id));
      await recordAudit(tx, { actorId: null, action: "image.upload_abandoned", entityType: "image", entityId: image.id, before: image });
    });
  }

  const objects = await listKeys("images/");
  const byKey = new Map<string, { key: string; lastModified: Date }[]>();
  for (const o of objects) {
    const storageKey = o.key.split("/")[1];
    if (!byKey.has(storageKey)) byKey.set(storageKey, []);
    byKey.get(storageKey)!.push(o);
  }
  const known = new Set<string>();
  const keys = [...byKey.keys()];
  for (let i = 0; i < keys.length; i += 500) {
    const rows = await db().select({ storageKey: images.storageKey }).from(images).where(inArray(images.storageKey, keys.slice(i, i + 500)));
    for (const r of rows) known.add(r.storageKey);
  }
  const orphans = [...byKey.entries()]
    .filter(([storageKey]) => !known.has(storageKey))
    .flatMap(([, list]) => list)
    .filter((o) => now - o.lastModified.getTime() > GRACE_MS)
    .map((o) => o.key);
  await deleteKeys(orphans);
  return { objectsDeleted: orphans.length, uploadsAbandoned: stale.length };
}

export const storageSweepHandler: JobHandler = {
  async run() {
    await sweepStorage();
    await enqueue(db(), "storage.sweep", {}, { runAt: new Date(Date.now() + EVERY_MS) });
  },
};

/** Makes sure one sweep is scheduled; two racing instances may both add one, which does no harm. */
export async function scheduleSweep(): Promise<void> {
  const [pending] = await db()
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.kind, "storage.sweep"), inArray(jobs.state, ["queued", "running"])))
    .limit(1);
  if (!pending) await enqueue(db(), "storage.sweep", {}, { runAt: new Date(Date.now() + 60_000) });
}
