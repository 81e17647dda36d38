import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db, type Executor, type Transaction } from "@/db/client";
import { places } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { outboxSourcesOfPlace } from "@/lib/search/outbox";
import { foldName } from "./fold";
import { findAreaNamed, getPlace } from "./queries";
import type { AreaInput, AreaUpdate, PlaceRecord } from "./schemas";

// The columns hold five decimals (about a metre); round here so the audit shows what is stored.
const toColumn = (degrees: number) => Math.round(degrees * 1e5) / 1e5;

// Two editors creating the same area at once both lock the name's index gap; InnoDB then kills one
// transaction as a deadlock. Running it again lets the duplicate check see the other's row.
function isDeadlock(error: unknown): boolean {
  const e = error as { errno?: number; cause?: { errno?: number } } | null;
  return e?.errno === 1213 || e?.cause?.errno === 1213;
}

async function inTransaction<T>(work: (tx: Transaction) => Promise<T>): Promise<T> {
  try {
    return await db().transaction(work);
  } catch (error) {
    if (!isDeadlock(error)) throw error;
    return db().transaction(work);
  }
}

async function refuseDuplicate(tx: Executor, name: string, countryCode: string | null, exceptId?: number) {
  if (await findAreaNamed(tx, name, countryCode, exceptId)) {
    const where = countryCode ? "in this country" : "without a country";
    throw new ValidationError(`There is already a historical area called "${name}" ${where}.`, {
      name: [`An area with this name already exists ${where}. Choose another name or edit that one.`],
    });
  }
}

/** An editor defines a historical area by a representative point; cities come only from the gazetteer. */
export async function createArea(actor: Actor | null, input: AreaInput): Promise<PlaceRecord> {
  authorize(actor, "place.define_area");
  const countryCode = input.countryCode ?? null;
  return inTransaction(async (tx) => {
    await refuseDuplicate(tx, input.name, countryCode);
    const [{ id }] = await tx
      .insert(places)
      .values({
        kind: "area",
        name: input.name,
        foldedName: foldName(input.name).slice(0, 200),
        countryCode,
        latitude: toColumn(input.latitude),
        longitude: toColumn(input.longitude),
        description: input.description ?? null,
        createdBy: actor!.id,
      })
      .$returningId();
    const after = (await getPlace(id, tx))!;
    await recordAudit(tx, { actorId: actor!.id, action: "place.area_created", entityType: "place", entityId: id, after });
    return after;
  });
}

/** Changes an area, refused when someone saved it since the caller read `version`. */
export async function updateArea(actor: Actor | null, id: number, change: AreaUpdate): Promise<PlaceRecord> {
  authorize(actor, "place.define_area");
  return inTransaction(async (tx) => {
    const [locked] = await tx.select({ id: places.id }).from(places).where(eq(places.id, id)).for("update");
    if (!locked) throw new NotFoundError("place");
    const before = (await getPlace(id, tx))!;
    if (before.kind !== "area") {
      throw new ValidationError(
        "This is a city from the gazetteer (GeoNames), which cannot be edited here. Define a historical area instead.",
      );
    }
    if (before.version !== change.version) {
      throw new ConflictError("Someone changed this area since you opened it. Reload to see the current version.", before);
    }
    const name = change.name ?? before.name;
    const countryCode = change.countryCode === undefined ? before.countryCode : change.countryCode;
    if (name !== before.name || countryCode !== before.countryCode) await refuseDuplicate(tx, name, countryCode, id);

    const values: Partial<typeof places.$inferInsert> = { name, foldedName: foldName(name).slice(0, 200), countryCode };
    if (change.latitude !== undefined) values.latitude = toColumn(change.latitude);
    if (change.longitude !== undefined) values.longitude = toColumn(change.longitude);
    if (change.description !== undefined) values.description = change.description;
    await tx
      .update(places)
      .set({ ...values, version: sql`${places.version} + 1` })
      .where(and(eq(places.id, id), eq(places.version, change.version)));
    const after = (await getPlace(id, tx))!;
    await recordAudit(tx, { actorId: actor!.id, action: "place.area_updated", entityType: "place", entityId: id, before, after });
    await outboxSourcesOfPlace(tx, id);
    return after;
  });
}
