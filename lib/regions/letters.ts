import "server-only";
import { eq, inArray } from "drizzle-orm";
import type { Transaction } from "@/db/client";
import { images, regions, sources } from "@/db/schema";
import type { Actor } from "@/lib/auth/policy";
import { appUrl } from "@/lib/config";
import { notify, reviewerIds } from "@/lib/notifications/notify";

export const regionLink = (r: { id: number; imageId: number; sourceId: number }) =>
  `${appUrl()}/sources/${r.sourceId}/images/${r.imageId}?region=${r.id}`;

async function describe(tx: Transaction, ids: number[]) {
  if (ids.length === 0) return [];
  return tx
    .select({ id: regions.id, imageId: regions.imageId, authorId: regions.authorId, sourceId: images.sourceId, sourceTitle: sources.title })
    .from(regions)
    .innerJoin(images, eq(images.id, regions.imageId))
    .innerJoin(sources, eq(sources.id, images.sourceId))
    .where(inArray(regions.id, ids));
}

/** Tells the editors that regions await review (one message for a batch). */
export async function notifyProposals(tx: Transaction, actor: Actor, ids: number[]): Promise<void> {
  const described = await describe(tx, ids);
  if (described.length === 0) return;
  const titles = [...new Set(described.map((d) => `“${d.sourceTitle}”`))].join(", ");
  const lines = described.map((d) => `- region ${d.id} on ${d.sourceTitle}: ${regionLink(d)}`).join("\n");
  const desk = `${appUrl()}/review`;
  await notify(tx, await reviewerIds(tx, actor.id), {
    kind: "review.proposed",
    subject: described.length === 1 ? `A region on ${titles} awaits review` : `${described.length} regions on ${titles} await review`,
    body: `${actor.name} proposed ${described.length === 1 ? "a region" : `${described.length} regions`} for review:\n\n${lines}\n\nThe review desk: ${desk}`,
    link: desk,
    payload: { regionIds: ids, authorId: actor.id },
  });
}

/** Tells the author what the editor decided, with the comment. */
export async function notifyDecision(tx: Transaction, actor: Actor, regionId: number, decision: "vetted" | "returned", comment: string | null): Promise<void> {
  const [d] = await describe(tx, [regionId]);
  if (!d || d.authorId === actor.id) return;
  const said = comment ? `\n\n${actor.name} wrote:\n\n${comment}` : "";
  await notify(tx, [d.authorId], {
    kind: `review.${decision}`,
    subject: decision === "vetted" ? `Your region on “${d.sourceTitle}” was vetted` : `Your region on “${d.sourceTitle}” was returned to you`,
    body:
      (decision === "vetted"
        ? `${actor.name} vetted your region ${d.id} on “${d.sourceTitle}”. Readers now see it.`
        : `${actor.name} returned your region ${d.id} on “${d.sourceTitle}” for another look.`) +
      `${said}\n\nThe region: ${regionLink(d)}`,
    link: regionLink(d),
    payload: { regionId, decision },
  });
}
