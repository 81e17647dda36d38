import "server-only";
import { and, count, eq, sql } from "drizzle-orm";
import { aspects, aspectTerms } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, ValidationError } from "@/lib/errors";
import { outboxRegionsUsingTerm } from "@/lib/search/outbox";
import { KIND_LABELS } from "./kinds";
import {
  duplicateTermKey,
  InUseError,
  inTransaction,
  lockAspect,
  lockTerm,
  nextTermPosition,
  observationsPhrase,
  refuseDuplicateTermLabel,
  sameMembers,
} from "./guards";
import { getAspectView, getTermView } from "./queries";
import type { TermCreate, TermOrder, TermUpdate } from "./schemas";
import type { AspectView, TermView } from "./types";

const stale = (current: TermView | null) =>
  new ConflictError("Someone changed this term since you opened it. Compare with the current version.", current);

/** Adds a term to an aspect whose values are terms. */
export async function createTerm(actor: Actor | null, aspectId: number, input: TermCreate): Promise<TermView> {
  authorize(actor, "vocabulary.edit");
  return inTransaction(async (tx) => {
    // Locked so that the aspect's kind cannot change while its term is added.
    const aspect = await lockAspect(tx, aspectId);
    if (aspect.kind !== "terms") {
      throw new ValidationError(`"${aspect.label}" takes ${KIND_LABELS[aspect.kind]}, not terms from a list.`);
    }
    const [same] = await tx.select({ id: aspectTerms.id }).from(aspectTerms).where(and(eq(aspectTerms.aspectId, aspectId), eq(aspectTerms.key, input.key)));
    if (same) throw duplicateTermKey();
    await refuseDuplicateTermLabel(tx, aspectId, input.label);
    const position = input.position ?? (await nextTermPosition(tx, aspectId));
    const [{ id }] = await tx.insert(aspectTerms).values({ ...input, aspectId, position }).$returningId();
    const after = (await getTermView(tx, id))!;
    await recordAudit(tx, { actorId: actor!.id, action: "term.created", entityType: "aspect_term", entityId: id, after: { ...after, aspectKey: aspect.key } });
    return after;
  }, duplicateTermKey);
}

export async function updateTerm(actor: Actor | null, id: number, change: TermUpdate): Promise<TermView> {
  authorize(actor, "vocabulary.edit");
  return inTransaction(async (tx) => {
    const row = await lockTerm(tx, id);
    const before = (await getTermView(tx, id))!;
    if (row.version !== change.version) throw stale(before);
    if (change.deprecated === false && row.mergedIntoId) {
      const [into] = await tx.select({ label: aspectTerms.label }).from(aspectTerms).where(eq(aspectTerms.id, row.mergedIntoId));
      throw new ValidationError(`This term was merged into "${into?.label ?? "another term"}", which its observations now name; it cannot be reinstated.`);
    }
    if (change.label !== undefined) await refuseDuplicateTermLabel(tx, row.aspectId, change.label, id);
    const deprecatedAt = change.deprecated === undefined ? row.deprecatedAt : change.deprecated ? (row.deprecatedAt ?? new Date()) : null;
    await tx
      .update(aspectTerms)
      .set({
        label: change.label ?? row.label,
        description: change.description === undefined ? row.description : change.description,
        position: change.position ?? row.position,
        deprecatedAt,
        version: sql`${aspectTerms.version} + 1`,
      })
      .where(and(eq(aspectTerms.id, id), eq(aspectTerms.version, change.version)));
    const after = (await getTermView(tx, id))!;
    const action = change.deprecated === true && !row.deprecatedAt ? "term.deprecated" : change.deprecated === false && row.deprecatedAt ? "term.reinstated" : "term.updated";
    await recordAudit(tx, { actorId: actor!.id, action, entityType: "aspect_term", entityId: id, before, after });
    if (after.label !== before.label) await outboxRegionsUsingTerm(tx, id);
    return after;
  }, duplicateTermKey);
}

/** Removes a term no observation names and no other term was merged into. */
export async function deleteTerm(actor: Actor | null, id: number, version: number): Promise<void> {
  authorize(actor, "vocabulary.edit");
  await inTransaction(async (tx) => {
    const row = await lockTerm(tx, id);
    const before = (await getTermView(tx, id))!;
    if (row.version !== version) throw stale(before);
    if (before.usage! > 0) {
      throw new InUseError(`"${row.label}" is in use by ${observationsPhrase(before.usage!)}; deprecate or merge it instead.`, before.usage!);
    }
    // The merged terms' pointer is their history: where their observations went.
    const [{ merged }] = await tx.select({ merged: count() }).from(aspectTerms).where(eq(aspectTerms.mergedIntoId, id));
    if (merged > 0) {
      throw new InUseError(`${merged} other term${merged === 1 ? " was" : "s were"} merged into "${row.label}"; deprecate it instead.`, 0);
    }
    const [aspect] = await tx.select({ key: aspects.key }).from(aspects).where(eq(aspects.id, row.aspectId));
    await tx.delete(aspectTerms).where(eq(aspectTerms.id, id));
    // The aspect's key goes with it: the seed recognises a term an editor removed and leaves it out.
    await recordAudit(tx, { actorId: actor!.id, action: "term.deleted", entityType: "aspect_term", entityId: id, before: { ...before, aspectKey: aspect?.key } });
  }, duplicateTermKey);
}

/** Puts an aspect's terms in the order given; the list must be all its terms as the caller read them. */
export async function reorderTerms(actor: Actor | null, aspectId: number, order: TermOrder): Promise<AspectView> {
  authorize(actor, "vocabulary.edit");
  return inTransaction(async (tx) => {
    await lockAspect(tx, aspectId);
    const rows = await tx.select().from(aspectTerms).where(eq(aspectTerms.aspectId, aspectId)).for("update");
    const fresh = sameMembers(rows, order.terms) && order.terms.every((o) => rows.find((r) => r.id === o.id)!.version === o.version);
    if (!fresh) throw new ConflictError("The terms of this aspect changed since you opened them. Reload and try again.", await getAspectView(tx, aspectId));
    const before = rows.sort((a, b) => a.position - b.position || a.id - b.id).map((r) => r.key);
    let moved = 0;
    for (const [i, entry] of order.terms.entries()) {
      if (rows.find((r) => r.id === entry.id)!.position === i + 1) continue;
      await tx.update(aspectTerms).set({ position: i + 1, version: sql`${aspectTerms.version} + 1` }).where(eq(aspectTerms.id, entry.id));
      moved++;
    }
    const after = (await getAspectView(tx, aspectId))!;
    if (moved > 0) {
      await recordAudit(tx, {
        actorId: actor!.id,
        action: "term.reordered",
        entityType: "aspect",
        entityId: aspectId,
        before: { order: before },
        after: { order: after.terms.map((t) => t.key) },
      });
    }
    return after;
  }, duplicateTermKey);
}
