import "server-only";
import { and, eq, sql } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { aspects, aspectTerms } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, ValidationError } from "@/lib/errors";
import {
  duplicateAspectKey,
  InUseError,
  inTransaction,
  lockAspect,
  nextAspectPosition,
  observationsPhrase,
  refuseDuplicateAspectKey,
  sameMembers,
} from "./guards";
import { KIND_LABELS } from "./kinds";
import { aspectUsage, getAspectView, getSectionViews } from "./queries";
import type { AspectCreate, AspectOrder, AspectUpdate } from "./schemas";
import type { AspectView } from "./types";

const stale = (current: AspectView | null) =>
  new ConflictError("Someone changed this aspect since you opened it. Compare with the current version.", current);

export async function createAspect(actor: Actor | null, input: AspectCreate): Promise<AspectView> {
  authorize(actor, "vocabulary.edit");
  return inTransaction(async (tx) => {
    await refuseDuplicateAspectKey(tx, input.key);
    const position = input.position ?? (await nextAspectPosition(tx, input.section));
    const [{ id }] = await tx.insert(aspects).values({ ...input, position }).$returningId();
    const after = (await getAspectView(tx, id))!;
    await recordAudit(tx, { actorId: actor!.id, action: "aspect.created", entityType: "aspect", entityId: id, after });
    return after;
  }, duplicateAspectKey);
}

/** Changes an aspect's wording, kind, place or deprecation, refused when someone saved it since `version`. */
export async function updateAspect(actor: Actor | null, id: number, change: AspectUpdate): Promise<AspectView> {
  authorize(actor, "vocabulary.edit");
  return inTransaction(async (tx) => {
    const row = await lockAspect(tx, id);
    const before = (await getAspectView(tx, id))!;
    if (row.version !== change.version) throw stale(before);
    if (change.kind && change.kind !== row.kind) await refuseKindChange(tx, row.id, row.kind, change.kind, before.terms.length);
    const section = change.section ?? row.section;
    // Moved to another section without a place given: it goes last there.
    const position = change.position ?? (section !== row.section ? await nextAspectPosition(tx, section) : row.position);
    const deprecatedAt = change.deprecated === undefined ? row.deprecatedAt : change.deprecated ? (row.deprecatedAt ?? new Date()) : null;
    await tx
      .update(aspects)
      .set({
        label: change.label ?? row.label,
        description: change.description === undefined ? row.description : change.description,
        kind: change.kind ?? row.kind,
        section,
        position,
        deprecatedAt,
        version: sql`${aspects.version} + 1`,
      })
      .where(and(eq(aspects.id, id), eq(aspects.version, change.version)));
    const after = (await getAspectView(tx, id))!;
    const action = change.deprecated === true && !row.deprecatedAt ? "aspect.deprecated" : change.deprecated === false && row.deprecatedAt ? "aspect.reinstated" : "aspect.updated";
    await recordAudit(tx, { actorId: actor!.id, action, entityType: "aspect", entityId: id, before, after });
    return after;
  }, duplicateAspectKey);
}

// Observations store a value of the aspect's kind (a term, a count or text): changing the kind
// under them would leave them unreadable, and terms under a count or text aspect would mean nothing.
async function refuseKindChange(tx: Executor, id: number, from: AspectView["kind"], to: AspectView["kind"], termCount: number) {
  const usage = await aspectUsage(tx, id);
  if (usage > 0) {
    const message = `The kind cannot change: ${observationsPhrase(usage)} record this aspect as ${KIND_LABELS[from]}. Add a new aspect instead.`;
    throw new ValidationError(message, { kind: [message] });
  }
  if (from === "terms" && termCount > 0) {
    const message = `This aspect has ${termCount} term${termCount === 1 ? "" : "s"}, which ${KIND_LABELS[to]} cannot use. Delete them first.`;
    throw new ValidationError(message, { kind: [message] });
  }
}

/** Removes an aspect and its terms, only while no observation names it. */
export async function deleteAspect(actor: Actor | null, id: number, version: number): Promise<void> {
  authorize(actor, "vocabulary.edit");
  await inTransaction(async (tx) => {
    const row = await lockAspect(tx, id);
    const before = (await getAspectView(tx, id))!;
    if (row.version !== version) throw stale(before);
    if (before.usage! > 0) {
      throw new InUseError(`"${row.label}" is in use by ${observationsPhrase(before.usage!)}; deprecate it instead.`, before.usage!);
    }
    await tx.delete(aspectTerms).where(eq(aspectTerms.aspectId, id));
    await tx.delete(aspects).where(eq(aspects.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "aspect.deleted", entityType: "aspect", entityId: id, before });
  }, duplicateAspectKey);
}

/** Puts a section's aspects in the order given; the list must be the whole section as the caller read it. */
export async function reorderAspects(actor: Actor | null, order: AspectOrder): Promise<AspectView[]> {
  authorize(actor, "vocabulary.edit");
  return inTransaction(async (tx) => {
    const rows = await tx.select().from(aspects).where(eq(aspects.section, order.section)).for("update");
    const fresh = rows.length > 0 && sameMembers(rows, order.aspects) && order.aspects.every((o) => rows.find((r) => r.id === o.id)!.version === o.version);
    if (!fresh) {
      throw new ConflictError("The aspects of this section changed since you opened them. Reload and try again.", await getSectionViews(tx, order.section));
    }
    const before = rows.sort((a, b) => a.position - b.position || a.id - b.id).map((r) => r.key);
    let moved = 0;
    for (const [i, entry] of order.aspects.entries()) {
      if (rows.find((r) => r.id === entry.id)!.position === i + 1) continue;
      await tx.update(aspects).set({ position: i + 1, version: sql`${aspects.version} + 1` }).where(eq(aspects.id, entry.id));
      moved++;
    }
    const after = await getSectionViews(tx, order.section);
    if (moved > 0) {
      await recordAudit(tx, {
        actorId: actor!.id,
        action: "aspect.reordered",
        entityType: "aspect_section",
        entityId: order.section,
        before: { order: before },
        after: { order: after.map((a) => a.key) },
      });
    }
    return after;
  }, duplicateAspectKey);
}
