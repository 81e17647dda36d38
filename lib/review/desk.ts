import "server-only";
import { and, asc, count, eq, inArray, like, ne, or, sql, type SQL } from "drizzle-orm";
import { db } from "@/db/client";
import { aspects, images, observations, regionReviews, regions, regionVersions, sources, users } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { escapeLike } from "@/lib/db-like";
import { observationsOf } from "@/lib/regions/observations";
import { afterCursor, decodeCursor, encodeCursor } from "@/lib/sources/keyset";
import { visibleSources } from "@/lib/sources/visibility";
import type { DeskEntry, DeskPage, DeskQuery } from "./desk-schema";

/** Proposed regions under the desk's filters; the caller's visibility is part of the condition. */
function deskWhere(actor: Actor, q: Pick<DeskQuery, "aspect" | "source" | "contributor">): SQL {
  const where: SQL[] = [
    eq(regions.state, "proposed"),
    sql`${regions.deletedAt} IS NULL`,
    sql`${images.deletedAt} IS NULL`,
    visibleSources(actor),
  ];
  if (q.aspect) {
    where.push(
      sql`EXISTS (SELECT 1 FROM ${observations} INNER JOIN ${aspects} ON ${aspects.id} = ${observations.aspectId}
        WHERE ${observations.regionVersionId} = ${regions.workingVersionId} AND ${aspects.key} = ${q.aspect})`,
    );
  }
  if (q.source) {
    const words = like(sources.title, `%${escapeLike(q.source)}%`);
    const number = /^\d{1,12}$/.test(q.source) ? Number(q.source) : null;
    where.push(number ? or(eq(sources.id, number), words)! : words);
  }
  if (q.contributor) where.push(eq(regions.authorId, q.contributor));
  return and(...where)!;
}

const from = () =>
  db()
    .select({
      regionId: regions.id,
      version: regions.version,
      proposedAt: regions.proposedAt,
      imageId: regions.imageId,
      authorId: regions.authorId,
      authorName: users.name,
      sourceId: sources.id,
      sourceTitle: sources.title,
      versionId: regionVersions.id,
      versionNumber: regionVersions.number,
      label: regionVersions.label,
      shape: regionVersions.shape,
      boxX: regionVersions.boxX,
      boxY: regionVersions.boxY,
      boxW: regionVersions.boxW,
      boxH: regionVersions.boxH,
      reviewedBefore: sql<number>`EXISTS (SELECT 1 FROM ${regionReviews} WHERE ${regionReviews.regionId} = ${regions.id})`,
    })
    .from(regions)
    .innerJoin(regionVersions, eq(regionVersions.id, regions.workingVersionId))
    .innerJoin(images, eq(images.id, regions.imageId))
    .innerJoin(sources, eq(sources.id, images.sourceId))
    .innerJoin(users, eq(users.id, regions.authorId));

/**
 * The review desk: proposed regions, the longest waiting first, in pages of `limit` (keyset on
 * proposed_at and id, so that a page link stays right while others decide).
 */
export async function listDesk(actor: Actor | null, q: DeskQuery): Promise<DeskPage> {
  authorize(actor, "review.read_desk");
  const where = deskWhere(actor!, q);
  const paged = q.after ? and(where, afterCursor(regions.proposedAt, regions.id, decodeCursor(q.after), true, true))! : where;
  const rows = await from().where(paged).orderBy(asc(regions.proposedAt), asc(regions.id)).limit(q.limit + 1);
  const [{ total }] = await db()
    .select({ total: count() })
    .from(regions)
    .innerJoin(images, eq(images.id, regions.imageId))
    .innerJoin(sources, eq(sources.id, images.sourceId))
    .where(where);
  const shown = rows.slice(0, q.limit);
  const obs = await observationsOf(db(), shown.map((r) => r.versionId));
  const entries: DeskEntry[] = shown.map((r) => ({
    regionId: r.regionId,
    version: r.version,
    versionNumber: r.versionNumber,
    imageId: r.imageId,
    sourceId: r.sourceId,
    sourceTitle: r.sourceTitle,
    authorId: r.authorId,
    authorName: r.authorName,
    own: r.authorId === actor!.id,
    proposedAt: (r.proposedAt ?? new Date(0)).toISOString(),
    label: r.label,
    box: { x: r.boxX, y: r.boxY, w: r.boxW, h: r.boxH },
    shape: r.shape,
    observations: obs.get(r.versionId) ?? [],
    reviewedBefore: Boolean(Number(r.reviewedBefore)),
  }));
  const last = shown.at(-1);
  return { entries, total: Number(total), next: rows.length > q.limit && last ? encodeCursor(last.proposedAt, last.regionId) : null };
}

/** The region an editor should look at next: the longest waiting one under the filters that is not theirs. */
export async function nextOnDesk(actor: Actor | null, q: Pick<DeskQuery, "aspect" | "source" | "contributor">): Promise<number | null> {
  authorize(actor, "review.read_desk");
  const [row] = await from().where(and(deskWhere(actor!, q), ne(regions.authorId, actor!.id))).orderBy(asc(regions.proposedAt), asc(regions.id)).limit(1);
  return row?.regionId ?? null;
}

/** What the desk's filters offer: the aspects of the vocabulary and the people with regions waiting. */
export async function deskFilterOptions(actor: Actor | null) {
  authorize(actor, "review.read_desk");
  const aspectRows = await db()
    .select({ key: aspects.key, label: aspects.label, section: aspects.section })
    .from(aspects)
    .orderBy(asc(aspects.section), asc(aspects.position), asc(aspects.id));
  const waiting = db().select({ id: regions.authorId }).from(regions).where(and(eq(regions.state, "proposed"), sql`${regions.deletedAt} IS NULL`));
  const contributors = await db().select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, waiting)).orderBy(asc(users.name));
  return { aspects: aspectRows, contributors };
}
