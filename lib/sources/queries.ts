import "server-only";
import { and, asc, count, desc, eq, isNotNull, like, lte, gte, or, isNull, type SQL } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db/client";
import { auditEvents, collections, places, sources, users } from "@/db/schema";
import { changedFields } from "@/lib/audit/diff";
import { authorize, type Actor } from "@/lib/auth/policy";
import { escapeLike } from "@/lib/db-like";
import { suggestionColumns } from "@/lib/places/queries";
import { requestedDateRange } from "@/lib/catalogue/date-range";
import { readDating } from "@/lib/dating";
import { NotFoundError } from "@/lib/errors";
import { afterCursor, decodeCursor, encodeCursor } from "./keyset";
import type { SourceListQuery } from "./schemas";
import { canSeeSource, visibleSources } from "./visibility";

/** What every list and caption of sources names first: title, kind, attribution and date. */
export const sourceCaptionColumns = {
  id: sources.id,
  title: sources.title,
  objectType: sources.objectType,
  artist: sources.artist,
  attributionQualifier: sources.attributionQualifier,
  datingEdtf: sources.datingEdtf,
};


const SORT_COLUMNS = { title: sources.title, dating: sources.datingSearchEarliest, created: sources.createdAt } as const;

function filters(actor: Actor | null, q: SourceListQuery): SQL[] {
  const where: SQL[] = [visibleSources(actor, { deleted: q.deleted })];
  if (q.q) {
    const pattern = `%${escapeLike(q.q)}%`;
    where.push(or(like(sources.title, pattern), like(sources.artist, pattern), like(sources.accessionNumber, pattern))!);
  }
  if (q.objectType) where.push(eq(sources.objectType, q.objectType));
  if (q.collection) where.push(eq(sources.collectionId, q.collection));
  if (q.country) where.push(eq(sources.countryCode, q.country));
  if (q.creator) where.push(eq(sources.createdBy, q.creator));
  if (q.state) where.push(eq(sources.state, q.state));
  if (q.from || q.to) {
    const days = requestedDateRange(q);
    // Undated sources never match a date filter; open ends match everything on their open side.
    where.push(isNotNull(sources.datingEdtf));
    if (days.toDay) where.push(or(isNull(sources.datingSearchEarliest), lte(sources.datingSearchEarliest, days.toDay))!);
    if (days.fromDay) where.push(or(isNull(sources.datingSearchLatest), gte(sources.datingSearchLatest, days.fromDay))!);
  }
  return where;
}

export async function listSources(actor: Actor | null, q: SourceListQuery) {
  authorize(actor, "archive.read");
  const where = filters(actor, q);
  const column = SORT_COLUMNS[q.sort];
  const asDate = q.sort === "created";
  const backwards = Boolean(q.before);
  const ascending = (q.dir === "asc") !== backwards;
  const cursor = q.before ?? q.after;
  const paged = cursor ? [...where, afterCursor(column, sources.id, decodeCursor(cursor), ascending, asDate)] : where;
  const order = ascending ? [asc(column), asc(sources.id)] : [desc(column), desc(sources.id)];

  const [rows, [{ total }]] = await Promise.all([
    db()
      .select({
        ...sourceCaptionColumns,
        datingEarliest: sources.datingEarliest,
        datingLatest: sources.datingLatest,
        datingSearchEarliest: sources.datingSearchEarliest,
        collectionId: sources.collectionId,
        collectionName: collections.name,
        accessionNumber: sources.accessionNumber,
        placeName: places.name,
        countryCode: sources.countryCode,
        state: sources.state,
        createdAt: sources.createdAt,
      })
      .from(sources)
      .leftJoin(collections, eq(collections.id, sources.collectionId))
      .leftJoin(places, eq(places.id, sources.placeId))
      .where(and(...paged))
      .orderBy(...order)
      .limit(q.limit + 1),
    db().select({ total: count() }).from(sources).where(and(...where)),
  ]);

  const more = rows.length > q.limit;
  const page = rows.slice(0, q.limit);
  if (backwards) page.reverse();
  const key = (r: (typeof page)[number]) =>
    encodeCursor(q.sort === "title" ? r.title : q.sort === "dating" ? r.datingSearchEarliest : r.createdAt, r.id);
  const first = page[0];
  const last = page[page.length - 1];
  return {
    sources: page.map(({ datingSearchEarliest: _, ...r }) => ({ ...r, datingWords: r.datingEdtf ? wordsFor(r.datingEdtf) : null })),
    total,
    next: last && (backwards ? true : more) ? key(last) : null,
    previous: first && (backwards ? more : Boolean(q.after)) ? key(first) : null,
  };
}

function wordsFor(edtf: string): string | null {
  const reading = readDating(edtf);
  return reading.ok ? reading.words : null;
}

const creators = alias(users, "creators");

export async function getSource(actor: Actor | null, id: number) {
  authorize(actor, "archive.read");
  const [row] = await db()
    .select({
      source: sources,
      collection: { id: collections.id, name: collections.name, city: collections.city, countryCode: collections.countryCode },
      place: suggestionColumns,
      creatorName: creators.name,
    })
    .from(sources)
    .leftJoin(collections, eq(collections.id, sources.collectionId))
    .leftJoin(places, eq(places.id, sources.placeId))
    .leftJoin(creators, eq(creators.id, sources.createdBy))
    .where(eq(sources.id, id))
    .limit(1);
  if (!row || !canSeeSource(actor, row.source)) throw new NotFoundError("source");
  return { ...row.source, collection: row.collection?.id ? row.collection : null, place: row.place?.id ? row.place : null, creatorName: row.creatorName };
}

export type SourceDetail = Awaited<ReturnType<typeof getSource>>;

/** Who changed the source, when, and which fields: for its page. */
export async function getSourceHistory(actor: Actor | null, id: number) {
  await getSource(actor, id);
  const rows = await db()
    .select({ id: auditEvents.id, action: auditEvents.action, before: auditEvents.before, after: auditEvents.after, createdAt: auditEvents.createdAt, actorName: users.name })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(and(eq(auditEvents.entityType, "source"), eq(auditEvents.entityId, String(id))))
    .orderBy(desc(auditEvents.id))
    .limit(200);
  return rows.map((r) => ({ id: r.id, action: r.action, createdAt: r.createdAt, actorName: r.actorName, fields: changedFields(r.before, r.after) }));
}
