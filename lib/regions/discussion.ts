import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { images, regionComments, regionReviews, regions, regionVersions, sources, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { appUrl } from "@/lib/config";
import { notify } from "@/lib/notifications/notify";
import type { CommentInput, ThreadEntry } from "./discussion-schema";
import { regionLink } from "./letters";
import { getRegion } from "./queries";

/** The thread in time order: comments and decisions together, as they happened. */
async function threadOf(tx: Executor, regionId: number): Promise<ThreadEntry[]> {
  const comments = await tx
    .select({ id: regionComments.id, authorId: regionComments.authorId, authorName: users.name, body: regionComments.body, createdAt: regionComments.createdAt })
    .from(regionComments)
    .innerJoin(users, eq(users.id, regionComments.authorId))
    .where(eq(regionComments.regionId, regionId));
  const reviews = await tx
    .select({
      id: regionReviews.id,
      authorId: regionReviews.reviewerId,
      authorName: users.name,
      decision: regionReviews.decision,
      body: regionReviews.comment,
      versionNumber: regionVersions.number,
      createdAt: regionReviews.createdAt,
    })
    .from(regionReviews)
    .innerJoin(users, eq(users.id, regionReviews.reviewerId))
    .innerJoin(regionVersions, eq(regionVersions.id, regionReviews.regionVersionId))
    .where(eq(regionReviews.regionId, regionId));
  const entries: (ThreadEntry & { at: number })[] = [
    ...comments.map((c) => ({ kind: "comment" as const, ...c, at: c.createdAt.getTime(), createdAt: c.createdAt.toISOString() })),
    ...reviews.map((r) => ({ kind: "review" as const, ...r, at: r.createdAt.getTime(), createdAt: r.createdAt.toISOString() })),
  ];
  // Same millisecond: a decision before a comment (the comment answers it), then by id.
  entries.sort((a, b) => a.at - b.at || (a.kind === b.kind ? a.id - b.id : a.kind === "review" ? -1 : 1));
  return entries.map(({ at: _at, ...entry }) => entry);
}

/** The discussion of a region the caller may see (with work in review, as readers may ask to). */
export async function listDiscussion(actor: Actor | null, regionId: number): Promise<ThreadEntry[]> {
  authorize(actor, "archive.read_proposed");
  await getRegion(actor, regionId, { proposed: true });
  return threadOf(db(), regionId);
}

/** Everyone who took part before: the author, earlier writers and reviewers; never the writer. */
async function participants(tx: Executor, regionId: number, authorId: number, writerId: number) {
  const writers = await tx.select({ id: regionComments.authorId }).from(regionComments).where(eq(regionComments.regionId, regionId));
  const reviewers = await tx.select({ id: regionReviews.reviewerId }).from(regionReviews).where(eq(regionReviews.regionId, regionId));
  const ids = [...new Set([authorId, ...writers.map((w) => w.id), ...reviewers.map((r) => r.id)])].filter((id) => id !== writerId);
  if (ids.length === 0) return [];
  return tx.select({ id: users.id, role: users.role }).from(users).where(and(inArray(users.id, ids), isNull(users.disabledAt)));
}

export async function addComment(actor: Actor | null, regionId: number, input: CommentInput): Promise<ThreadEntry> {
  authorize(actor, "region.discuss");
  return db().transaction(async (tx) => {
    const region = await getRegion(actor, regionId, { proposed: true }, tx);
    const people = await participants(tx, regionId, region.authorId, actor!.id);
    const [{ id }] = await tx.insert(regionComments).values({ regionId, authorId: actor!.id, body: input.body }).$returningId();
    const [row] = await tx.select().from(regionComments).where(eq(regionComments.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "region.commented", entityType: "region", entityId: regionId, after: { commentId: id, body: input.body } });

    const [{ title }] = await tx
      .select({ title: sources.title })
      .from(regions)
      .innerJoin(images, eq(images.id, regions.imageId))
      .innerJoin(sources, eq(sources.id, images.sourceId))
      .where(eq(regions.id, regionId));
    const viewer = regionLink(region);
    const desk = `${appUrl()}/review/${regionId}`;
    const draft = (link: string) => ({
      kind: "region.comment",
      subject: `${actor!.name} wrote about region ${regionId} on “${title}”`,
      body: `${actor!.name} wrote in the discussion of region ${regionId} on “${title}”:\n\n${input.body}\n\nThe region: ${link}`,
      link,
      payload: { regionId, commentId: id },
    });
    // Editors answer from the review page; everyone else from the photograph.
    const reviewers = people.filter((p) => p.role === "editor" || p.role === "admin").map((p) => p.id);
    const others = people.filter((p) => !reviewers.includes(p.id)).map((p) => p.id);
    await notify(tx, reviewers, draft(desk));
    await notify(tx, others, draft(viewer));

    return { kind: "comment", id, authorId: actor!.id, authorName: actor!.name, body: row.body, createdAt: row.createdAt.toISOString() };
  });
}
