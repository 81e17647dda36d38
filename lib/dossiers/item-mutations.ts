import "server-only";
import { and, asc, count, eq, max, sql } from "drizzle-orm";
import { db, type Transaction } from "@/db/client";
import { dossierItems, dossiers, type DossierItem } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { getRegion } from "@/lib/regions/queries";
import { getSource } from "@/lib/sources/queries";
import { lockOwnDossier } from "./mutations";
import { getDossier } from "./queries";
import type { ItemAdd, ItemNote, ItemOrder } from "./schemas";
import type { DossierView } from "./types";

const MAX_ITEMS = 1000;

// Adding, annotating, removing and reordering a dossier's items. Each locks the dossier row first, so
// two changes to one dossier's items never interleave, and touches its updated_at (not its version:
// renaming in one window while adding in another is no conflict).

const touch = (tx: Transaction, id: number) => tx.update(dossiers).set({ updatedAt: sql`CURRENT_TIMESTAMP(3)` }).where(eq(dossiers.id, id));
const audited = (i: DossierItem) => ({ kind: i.kind, regionId: i.regionId, sourceId: i.sourceId, position: i.position, note: i.note, version: i.version });

async function lockItem(tx: Transaction, actor: Actor, dossierId: number, itemId: number, version: number): Promise<DossierItem> {
  const [item] = await tx.select().from(dossierItems).where(and(eq(dossierItems.id, itemId), eq(dossierItems.dossierId, dossierId))).for("update");
  if (!item) throw new NotFoundError("item in this dossier");
  if (item.version !== version) {
    const current = await getDossier(actor, dossierId, tx);
    throw new ConflictError("Someone changed this item after you opened the dossier. Compare, then try again.", current);
  }
  return item;
}

/** Adds a region or a source the caller may see at the end of the dossier. */
export async function addItem(actor: Actor | null, dossierId: number, input: ItemAdd): Promise<{ dossier: DossierView; itemId: number }> {
  authorize(actor, "dossier.manage");
  // What the caller may see elsewhere is what they may collect: the same reads, the same 404.
  const target =
    input.kind === "region"
      ? { regionId: (await getRegion(actor, input.regionId).catch(refuse("regionId", "region"))).id, sourceId: null }
      : { regionId: null, sourceId: (await getSource(actor, input.sourceId).catch(refuse("sourceId", "source"))).id };
  return db().transaction(async (tx) => {
    await lockOwnDossier(tx, actor!, dossierId);
    const [{ n, last }] = await tx.select({ n: count(), last: max(dossierItems.position) }).from(dossierItems).where(eq(dossierItems.dossierId, dossierId));
    if (n >= MAX_ITEMS) throw new ValidationError(`A dossier holds at most ${MAX_ITEMS} items.`);
    const same = target.regionId ? eq(dossierItems.regionId, target.regionId) : eq(dossierItems.sourceId, target.sourceId!);
    const [already] = await tx.select({ id: dossierItems.id }).from(dossierItems).where(and(eq(dossierItems.dossierId, dossierId), same));
    if (already) throw new ValidationError(`This ${input.kind} is in the dossier already.`, { [input.kind === "region" ? "regionId" : "sourceId"]: ["Already in this dossier."] });
    const [{ id }] = await tx
      .insert(dossierItems)
      .values({ dossierId, kind: input.kind, ...target, note: input.note, position: (last ?? -1) + 1 })
      .$returningId();
    const [item] = await tx.select().from(dossierItems).where(eq(dossierItems.id, id));
    await touch(tx, dossierId);
    await recordAudit(tx, { actorId: actor!.id, action: "dossier.item_added", entityType: "dossier", entityId: dossierId, after: { itemId: id, ...audited(item) } });
    return { dossier: await getDossier(actor, dossierId, tx), itemId: id };
  });
}

/** A region or source the caller may not see is answered as bad input on its field, like one that does not exist. */
function refuse(field: string, what: string) {
  return (error: unknown): never => {
    if (error instanceof NotFoundError) throw new ValidationError(`No such ${what}, or not one you may see.`, { [field]: [`No such ${what}.`] });
    throw error;
  };
}

export async function annotateItem(actor: Actor | null, dossierId: number, itemId: number, input: ItemNote): Promise<DossierView> {
  authorize(actor, "dossier.manage");
  return db().transaction(async (tx) => {
    await lockOwnDossier(tx, actor!, dossierId);
    const before = await lockItem(tx, actor!, dossierId, itemId, input.version);
    await tx.update(dossierItems).set({ note: input.note, version: sql`${dossierItems.version} + 1` }).where(eq(dossierItems.id, itemId));
    const [after] = await tx.select().from(dossierItems).where(eq(dossierItems.id, itemId));
    await touch(tx, dossierId);
    await recordAudit(tx, { actorId: actor!.id, action: "dossier.item_annotated", entityType: "dossier", entityId: dossierId, before: { itemId, ...audited(before) }, after: { itemId, ...audited(after) } });
    return getDossier(actor, dossierId, tx);
  });
}

export async function removeItem(actor: Actor | null, dossierId: number, itemId: number, version: number): Promise<DossierView> {
  authorize(actor, "dossier.manage");
  return db().transaction(async (tx) => {
    await lockOwnDossier(tx, actor!, dossierId);
    const before = await lockItem(tx, actor!, dossierId, itemId, version);
    await tx.delete(dossierItems).where(eq(dossierItems.id, itemId));
    await touch(tx, dossierId);
    await recordAudit(tx, { actorId: actor!.id, action: "dossier.item_removed", entityType: "dossier", entityId: dossierId, before: { itemId, ...audited(before) } });
    return getDossier(actor, dossierId, tx);
  });
}

/**
 * Puts every item in the order given. The order names each item with the version read; an item added,
 * removed, moved or annotated since then makes it a 409 with the dossier as it is now.
 */
export async function reorderItems(actor: Actor | null, dossierId: number, input: ItemOrder): Promise<DossierView> {
  authorize(actor, "dossier.manage");
  return db().transaction(async (tx) => {
    await lockOwnDossier(tx, actor!, dossierId);
    const stored = await tx.select().from(dossierItems).where(eq(dossierItems.dossierId, dossierId)).orderBy(asc(dossierItems.position), asc(dossierItems.id)).for("update");
    const byId = new Map(stored.map((i) => [i.id, i]));
    const stale = input.items.length !== stored.length || input.items.some((e) => byId.get(e.id)?.version !== e.version);
    if (stale) {
      throw new ConflictError("The dossier's items changed after you opened it (in another window, perhaps). Here is its order now; move them again.", await getDossier(actor, dossierId, tx));
    }
    for (const [position, entry] of input.items.entries()) {
      if (byId.get(entry.id)!.position === position) continue;
      await tx.update(dossierItems).set({ position, version: sql`${dossierItems.version} + 1` }).where(eq(dossierItems.id, entry.id));
    }
    await touch(tx, dossierId);
    await recordAudit(tx, {
      actorId: actor!.id,
      action: "dossier.reordered",
      entityType: "dossier",
      entityId: dossierId,
      before: { order: stored.map((i) => i.id) },
      after: { order: input.items.map((e) => e.id) },
    });
    return getDossier(actor, dossierId, tx);
  });
}
