import "server-only";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db, type Transaction } from "@/db/client";
import { dossiers, dossierShares, users, type Dossier } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { getDossier, mayReadDossier } from "./queries";
import type { DossierCreate, DossierShares, DossierUpdate } from "./schemas";
import type { DossierView } from "./types";

/**
 * Locks the dossier for a change by its owner. Anyone else who may read it is refused (403); anyone who
 * may not learns nothing, not even that it exists (404). A deleted dossier can only be restored.
 */
export async function lockOwnDossier(tx: Transaction, actor: Actor, id: number, opts: { deleted?: boolean } = {}): Promise<Dossier> {
  const [row] = await tx.select().from(dossiers).where(eq(dossiers.id, id)).for("update");
  if (!row) throw new NotFoundError("dossier");
  if (row.ownerId !== actor.id) {
    if (await mayReadDossier(tx, actor, id)) throw new ForbiddenError("Only the owner of this dossier can change it; you may read it.");
    throw new NotFoundError("dossier");
  }
  if (Boolean(row.deletedAt) !== Boolean(opts.deleted)) {
    throw new ValidationError(row.deletedAt ? "This dossier is deleted. Restore it first." : "This dossier is not deleted.");
  }
  return row;
}

export async function checkVersion(tx: Transaction, actor: Actor, row: Dossier, version: number): Promise<void> {
  if (row.version === version) return;
  const current = await getDossier(actor, row.id, tx);
  throw new ConflictError("Someone changed this dossier after you opened it (in another window, perhaps). Compare, then try again.", current);
}

const bump = { version: sql`${dossiers.version} + 1` };
const audited = (row: Dossier) => ({ title: row.title, description: row.description, visibility: row.visibility, deletedAt: row.deletedAt, version: row.version });

export async function createDossier(actor: Actor | null, input: DossierCreate): Promise<DossierView> {
  authorize(actor, "dossier.manage");
  return db().transaction(async (tx) => {
    const [{ id }] = await tx.insert(dossiers).values({ ...input, ownerId: actor!.id }).$returningId();
    const [row] = await tx.select().from(dossiers).where(eq(dossiers.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "dossier.created", entityType: "dossier", entityId: id, after: audited(row) });
    return getDossier(actor, id, tx);
  });
}

/** Rename, describe or change the visibility, with the version read. */
export async function updateDossier(actor: Actor | null, id: number, change: DossierUpdate): Promise<DossierView> {
  authorize(actor, "dossier.manage");
  const { version, ...fields } = change;
  return db().transaction(async (tx) => {
    const before = await lockOwnDossier(tx, actor!, id);
    await checkVersion(tx, actor!, before, version);
    await tx.update(dossiers).set({ ...fields, ...bump }).where(eq(dossiers.id, id));
    const [after] = await tx.select().from(dossiers).where(eq(dossiers.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "dossier.updated", entityType: "dossier", entityId: id, before: audited(before), after: audited(after) });
    return getDossier(actor, id, tx);
  });
}

/**
 * Replaces the list of people the dossier is shared with (named by their e-mail); an address no
 * account uses is refused, naming it, and nothing changes.
 */
export async function setShares(actor: Actor | null, id: number, input: DossierShares): Promise<DossierView> {
  authorize(actor, "dossier.manage");
  const emails = [...new Set(input.emails)];
  return db().transaction(async (tx) => {
    const before = await lockOwnDossier(tx, actor!, id);
    await checkVersion(tx, actor!, before, input.version);
    const people = emails.length ? await tx.select({ id: users.id, email: users.email }).from(users).where(inArray(users.email, emails)) : [];
    const known = new Map(people.map((p) => [p.email.toLowerCase(), p.id]));
    const fields: Record<string, string[]> = {};
    input.emails.forEach((e, i) => {
      if (!known.has(e)) fields[`emails.${i}`] = [`No account uses ${e}.`];
      else if (known.get(e) === actor!.id) fields[`emails.${i}`] = ["That is you: the owner always sees the dossier."];
    });
    const unknown = emails.filter((e) => !known.has(e));
    if (unknown.length) {
      throw new ValidationError(`No Cordarium account uses ${unknown.join(", ")}. A dossier can only be shared with people who have an account.`, { emails: [`Unknown: ${unknown.join(", ")}`], ...fields });
    }
    if (Object.keys(fields).length) throw new ValidationError("You own this dossier; leave your own address out.", fields);

    const oldShares = await tx.select({ userId: dossierShares.userId, email: users.email }).from(dossierShares).innerJoin(users, eq(users.id, dossierShares.userId)).where(eq(dossierShares.dossierId, id));
    const wanted = new Set(known.values());
    const gone = oldShares.filter((s) => !wanted.has(s.userId)).map((s) => s.userId);
    const added = [...wanted].filter((u) => !oldShares.some((s) => s.userId === u));
    if (gone.length) await tx.delete(dossierShares).where(and(eq(dossierShares.dossierId, id), inArray(dossierShares.userId, gone)));
    if (added.length) await tx.insert(dossierShares).values(added.map((userId) => ({ dossierId: id, userId })));
    await tx.update(dossiers).set({ ...(input.visibility ? { visibility: input.visibility } : {}), ...bump }).where(eq(dossiers.id, id));
    await recordAudit(tx, {
      actorId: actor!.id,
      action: "dossier.shares_changed",
      entityType: "dossier",
      entityId: id,
      before: { visibility: before.visibility, sharedWith: oldShares.map((s) => s.email).sort() },
      after: { visibility: input.visibility ?? before.visibility, sharedWith: emails.sort() },
    });
    return getDossier(actor, id, tx);
  });
}

async function setDeleted(actor: Actor | null, id: number, version: number, deleted: boolean): Promise<DossierView> {
  authorize(actor, "dossier.manage");
  return db().transaction(async (tx) => {
    const before = await lockOwnDossier(tx, actor!, id, { deleted: !deleted });
    await checkVersion(tx, actor!, before, version);
    await tx.update(dossiers).set({ deletedAt: deleted ? new Date() : null, ...bump }).where(eq(dossiers.id, id));
    const [after] = await tx.select().from(dossiers).where(eq(dossiers.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: deleted ? "dossier.deleted" : "dossier.restored", entityType: "dossier", entityId: id, before: audited(before), after: audited(after) });
    return getDossier(actor, id, tx);
  });
}

/** Soft delete: readers of a shared or public dossier lose it at once; the owner can restore it. */
export const deleteDossier = (actor: Actor | null, id: number, version: number) => setDeleted(actor, id, version, true);
export const restoreDossier = (actor: Actor | null, id: number, version: number) => setDeleted(actor, id, version, false);
