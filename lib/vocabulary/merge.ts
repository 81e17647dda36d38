import "server-only";
import { asc, eq, inArray, sql } from "drizzle-orm";
import { aspectTerms, observations } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { outboxRegionsUsingTerm } from "@/lib/search/outbox";
import { duplicateTermKey, inTransaction } from "./guards";
import { getTermView, termReach } from "./queries";
import type { MergeInput } from "./schemas";
import type { TermView } from "./types";

export type MergeResult = { term: TermView; into: TermView; observations: number; regionVersions: number };

const refuse = (message: string) => new ValidationError(message, { intoTermId: [message] });

/**
 * Folds term A into term B of the same aspect, for two words that turned out to mean one thing: every
 * observation naming A names B afterwards, A is deprecated and points at B. One transaction, so no
 * observation is left naming a term halfway through.
 */
export async function mergeTerm(actor: Actor | null, id: number, input: MergeInput): Promise<MergeResult> {
  authorize(actor, "vocabulary.edit");
  if (input.intoTermId === id) throw refuse("A term cannot be merged into itself.");
  return inTransaction(async (tx) => {
    // Both rows locked in one scan of the primary key, so that two crossing merges wait instead of deadlocking.
    const rows = await tx.select().from(aspectTerms).where(inArray(aspectTerms.id, [id, input.intoTermId])).orderBy(asc(aspectTerms.id)).for("update");
    const term = rows.find((r) => r.id === id);
    const into = rows.find((r) => r.id === input.intoTermId);
    if (!term) throw new NotFoundError("term");
    const before = (await getTermView(tx, id))!;
    if (term.version !== input.version) {
      throw new ConflictError("Someone changed this term since you opened it. Compare with the current version.", before);
    }
    if (!into) throw refuse("The term to merge into does not exist.");
    if (term.mergedIntoId) throw new ValidationError(`"${term.label}" was merged into another term already.`);
    if (into.aspectId !== term.aspectId) throw refuse("Merge only into a term of the same aspect.");
    if (into.deprecatedAt) throw refuse(`"${into.label}" is deprecated: reinstate it first, or choose a term in use.`);

    const reach = await termReach(tx, id);
    await outboxRegionsUsingTerm(tx, id);
    await tx.update(observations).set({ termId: into.id }).where(eq(observations.termId, id));
    // Terms merged into A earlier now point at B, so that every chain is one step long.
    const [repointed] = (await tx.update(aspectTerms).set({ mergedIntoId: into.id }).where(eq(aspectTerms.mergedIntoId, id))) as unknown as [{ affectedRows: number }];
    await tx
      .update(aspectTerms)
      .set({ mergedIntoId: into.id, deprecatedAt: term.deprecatedAt ?? new Date(), version: sql`${aspectTerms.version} + 1` })
      .where(eq(aspectTerms.id, id));

    const result: MergeResult = { term: (await getTermView(tx, id))!, into: (await getTermView(tx, into.id))!, ...reach };
    await recordAudit(tx, {
      actorId: actor!.id,
      action: "term.merged",
      entityType: "aspect_term",
      entityId: id,
      before,
      after: {
        ...result.term,
        into: { id: into.id, key: into.key, label: into.label },
        observations: reach.observations,
        regionVersions: reach.regionVersions,
        termsRepointed: repointed.affectedRows,
      },
    });
    return result;
  }, duplicateTermKey);
}
