import "server-only";
import { and, eq, isNull, sql } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { collections, places, sources } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { datingMargins } from "@/lib/config";
import { readDating } from "@/lib/dating";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { outbox } from "@/lib/search/outbox";
import type { SourceFields, SourceUpdate } from "./schemas";

type Row = typeof sources.$inferSelect;

/** The stored columns for a set of fields: dating bounds computed, the place's country copied. */
async function toColumns(tx: Executor, fields: SourceFields) {
  let countryCode: string | null = null;
  if (fields.collectionId) {
    const [c] = await tx.select({ id: collections.id }).from(collections).where(eq(collections.id, fields.collectionId));
    if (!c) throw new ValidationError("That collection does not exist.", { collectionId: ["Choose a collection from the list."] });
  }
  if (fields.placeId) {
    const [p] = await tx.select({ countryCode: places.countryCode }).from(places).where(eq(places.id, fields.placeId));
    if (!p) throw new ValidationError("That place does not exist.", { placeId: ["Choose a place from the suggestions."] });
    countryCode = p.countryCode;
  }
  const dating = fields.datingEdtf ? readDating(fields.datingEdtf, datingMargins()) : null;
  if (dating && !dating.ok) throw new ValidationError(dating.error, { datingEdtf: [dating.error] });
  return {
    ...fields,
    datingEdtf: dating?.edtf ?? null,
    datingEarliest: dating?.earliest ?? null,
    datingLatest: dating?.latest ?? null,
    datingSearchEarliest: dating?.widenedEarliest ?? null,
    datingSearchLatest: dating?.widenedLatest ?? null,
    datingApproximate: dating?.approximate ?? false,
    datingUncertain: dating?.uncertain ?? false,
    countryCode,
  };
}

/** Inserts inside the caller's transaction (the CSV import adds many in one). */
export async function insertSource(tx: Executor, actor: Actor, fields: SourceFields, action = "source.created"): Promise<Row> {
  const values = await toColumns(tx, fields);
  const [{ id }] = await tx.insert(sources).values({ ...values, createdBy: actor.id }).$returningId();
  const [row] = await tx.select().from(sources).where(eq(sources.id, id));
  await recordAudit(tx, { actorId: actor.id, action, entityType: "source", entityId: id, after: row });
  await outbox(tx, "source", id);
  return row;
}

export async function createSource(actor: Actor | null, fields: SourceFields): Promise<Row> {
  authorize(actor, "source.create");
  return db().transaction((tx) => insertSource(tx, actor!, fields));
}

async function lockForChange(tx: Executor, id: number) {
  const [row] = await tx.select().from(sources).where(eq(sources.id, id)).for("update");
  if (!row) throw new NotFoundError("source");
  return row;
}

function checkVersion(row: Row, version: number) {
  if (row.version !== version) {
    throw new ConflictError("Someone saved this source after you opened it. Compare their version with yours before saving again.", row);
  }
}

export async function updateSource(actor: Actor | null, id: number, change: SourceUpdate): Promise<Row> {
  // The role first; ownership once the row is read.
  authorize(actor, "source.edit");
  const { version, ...fields } = change;
  return db().transaction(async (tx) => {
    const before = await lockForChange(tx, id);
    if (before.deletedAt) throw new NotFoundError("source");
    authorize(actor, "source.edit", { ownerId: before.createdBy });
    checkVersion(before, version);
    const values = await toColumns(tx, fields);
    await tx
      .update(sources)
      .set({ ...values, version: sql`${sources.version} + 1` })
      .where(and(eq(sources.id, id), eq(sources.version, version)));
    const [after] = await tx.select().from(sources).where(eq(sources.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "source.updated", entityType: "source", entityId: id, before, after });
    await outbox(tx, "source", id);
    return after;
  });
}

export async function deleteSource(actor: Actor | null, id: number, version: number): Promise<Row> {
  authorize(actor, "source.delete");
  return db().transaction(async (tx) => {
    const before = await lockForChange(tx, id);
    if (before.deletedAt) throw new ValidationError("This source is deleted already.");
    checkVersion(before, version);
    await tx.update(sources).set({ deletedAt: new Date(), version: sql`${sources.version} + 1` }).where(and(eq(sources.id, id), isNull(sources.deletedAt)));
    const [after] = await tx.select().from(sources).where(eq(sources.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "source.deleted", entityType: "source", entityId: id, before, after });
    await outbox(tx, "source", id);
    return after;
  });
}

export async function restoreSource(actor: Actor | null, id: number, version: number): Promise<Row> {
  authorize(actor, "source.restore");
  return db().transaction(async (tx) => {
    const before = await lockForChange(tx, id);
    if (!before.deletedAt) throw new ValidationError("This source is not deleted.");
    checkVersion(before, version);
    await tx.update(sources).set({ deletedAt: null, version: sql`${sources.version} + 1` }).where(eq(sources.id, id));
    const [after] = await tx.select().from(sources).where(eq(sources.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "source.restored", entityType: "source", entityId: id, before, after });
    await outbox(tx, "source", id);
    return after;
  });
}
