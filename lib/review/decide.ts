import "server-only";
import { eq, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { regionReviews, regions, regionVersions } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ValidationError } from "@/lib/errors";
import { notifyDecision } from "@/lib/regions/letters";
import { lockRegion, regionSnapshot } from "@/lib/regions/mutations";
import { outbox } from "@/lib/search/outbox";
import { getRegion } from "@/lib/regions/queries";
import type { ReviewDecision } from "@/lib/regions/schemas";
import type { RegionView } from "@/lib/regions/types";

/**
 * An editor vets a proposed region version or returns it to its author with a comment. The version is
 * then frozen: a later edit starts a new one. Vetting makes it the version readers see.
 */
export async function decideRegion(actor: Actor | null, id: number, input: ReviewDecision): Promise<RegionView> {
  authorize(actor, "review.decide");
  return db().transaction(async (tx) => {
    const { region, working } = await lockRegion(tx, actor!, id, input.version);
    authorize(actor, "review.decide", { authorId: region.authorId });
    if (working.state !== "proposed") throw new ValidationError(`Only proposed regions are reviewed; this one is ${working.state}.`);
    const before = await regionSnapshot(tx, id);
    const now = new Date();
    await tx.insert(regionReviews).values({ regionId: id, regionVersionId: working.id, reviewerId: actor!.id, decision: input.decision, comment: input.comment ?? null });
    await tx.update(regionVersions).set({ state: input.decision, decidedAt: now }).where(eq(regionVersions.id, working.id));
    await tx
      .update(regions)
      .set({
        state: input.decision,
        proposedAt: null,
        ...(input.decision === "vetted" ? { vettedVersionId: working.id } : {}),
        version: sql`${regions.version} + 1`,
      })
      .where(eq(regions.id, id));
    await recordAudit(tx, {
      actorId: actor!.id,
      action: `region.${input.decision}`,
      entityType: "region",
      entityId: id,
      before,
      after: { ...(await regionSnapshot(tx, id)), comment: input.comment ?? null },
    });
    await notifyDecision(tx, actor!, id, input.decision, input.comment ?? null);
    await outbox(tx, "region", id);
    return getRegion(actor, id, {}, tx);
  });
}
