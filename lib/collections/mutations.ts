import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { collections } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { outboxSourcesOfCollection } from "@/lib/search/outbox";
import type { CollectionFields } from "./schemas";

async function refuseDuplicateName(tx: Executor, fields: CollectionFields, exceptId?: number) {
  const same = await tx.select({ id: collections.id, city: collections.city }).from(collections).where(eq(collections.name, fields.name));
  if (same.some((c) => c.id !== exceptId && (c.city ?? "") === (fields.city ?? ""))) {
    throw new ValidationError("A collection of that name in that city exists already.", { name: ["Already in the archive."] });
  }
}

export async function createCollection(actor: Actor | null, fields: CollectionFields) {
  authorize(actor, "collection.create");
  return db().transaction(async (tx) => {
    await refuseDuplicateName(tx, fields);
    const [{ id }] = await tx.insert(collections).values({ ...fields, createdBy: actor!.id }).$returningId();
    const [row] = await tx.select().from(collections).where(eq(collections.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "collection.created", entityType: "collection", entityId: id, after: row });
    return row;
  });
}

export async function updateCollection(actor: Actor | null, id: number, change: CollectionFields & { version: number }) {
  // The role first; ownership once the row is read.
  authorize(actor, "collection.edit");
  const { version, ...fields } = change;
  return db().transaction(async (tx) => {
    const [before] = await tx.select().from(collections).where(eq(collections.id, id)).for("update");
    if (!before) throw new NotFoundError("collection");
    authorize(actor, "collection.edit", { ownerId: before.createdBy });
    if (before.version !== version) throw new ConflictError("Someone saved this collection after you opened it.", before);
    await refuseDuplicateName(tx, fields, id);
    await tx.update(collections).set({ ...fields, version: sql`${collections.version} + 1` }).where(and(eq(collections.id, id), eq(collections.version, version)));
    const [after] = await tx.select().from(collections).where(eq(collections.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "collection.updated", entityType: "collection", entityId: id, before, after });
    await outboxSourcesOfCollection(tx, id);
    return after;
  });
}
