import "server-only";
import { and, asc, count, desc, eq, exists, inArray, isNotNull, isNull, ne, or, sql, type SQL } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { dossierItems, dossiers, dossierShares, regions, users } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { NotFoundError } from "@/lib/errors";
import { selectRegionViews } from "@/lib/regions/queries";
import { sourceSummaries } from "@/lib/sources/summaries";
import type { DossierItemView, DossierShare, DossierSummary, DossierView, WithheldItem } from "./types";

// Who may read which dossiers, as a condition inside every query: the owner, the people it is shared
// with while it is "shared", and anyone once it is public. Deleted dossiers only to their owner, and
// only when asked for (to restore them).
const sharedWith = (userId: number) =>
  exists(db().select({ one: sql`1` }).from(dossierShares).where(and(eq(dossierShares.dossierId, dossiers.id), eq(dossierShares.userId, userId))));

export function readableDossiers(actor: Actor | null, opts: { deleted?: boolean } = {}): SQL {
  const live = isNull(dossiers.deletedAt);
  const open = eq(dossiers.visibility, "public");
  if (!actor) return and(live, open)!;
  const mine = eq(dossiers.ownerId, actor.id);
  const sharedWithMe = and(eq(dossiers.visibility, "shared"), sharedWith(actor.id));
  const readable = and(live, or(open, mine, sharedWithMe));
  return opts.deleted ? or(readable, and(mine, isNotNull(dossiers.deletedAt)))! : readable!;
}

const headColumns = {
  id: dossiers.id,
  ownerId: dossiers.ownerId,
  ownerName: users.name,
  title: dossiers.title,
  description: dossiers.description,
  visibility: dossiers.visibility,
  version: dossiers.version,
  deletedAt: dossiers.deletedAt,
  createdAt: dossiers.createdAt,
  updatedAt: dossiers.updatedAt,
};

/**
 * The items of a dossier as this viewer may see them, in order. Regions are read through
 * selectRegionViews and sources under visibleSources, so a draft, an unvetted version or an
 * unpublished source never reaches a viewer who could not open it elsewhere.
 */
async function itemsFor(tx: Executor, actor: Actor | null, dossierId: number) {
  const rows = await tx.select().from(dossierItems).where(eq(dossierItems.dossierId, dossierId)).orderBy(asc(dossierItems.position), asc(dossierItems.id));
  const regionIds = rows.flatMap((r) => (r.kind === "region" && r.regionId ? [r.regionId] : []));
  const views = regionIds.length ? await selectRegionViews(tx, actor, inArray(regions.id, regionIds)) : [];
  const regionById = new Map(views.map((v) => [v.id, v]));
  const sourceIds = [...new Set([...rows.flatMap((r) => (r.kind === "source" && r.sourceId ? [r.sourceId] : [])), ...views.map((v) => v.sourceId)])];
  const sourceById = await sourceSummaries(tx, actor, sourceIds);
  const items: DossierItemView[] = [];
  const withheld: WithheldItem[] = [];
  for (const r of rows) {
    const base = { id: r.id, position: r.position, note: r.note, version: r.version };
    const region = r.kind === "region" && r.regionId ? regionById.get(r.regionId) : undefined;
    const source = region ? sourceById.get(region.sourceId) : r.kind === "source" && r.sourceId ? sourceById.get(r.sourceId) : undefined;
    if (r.kind === "region" && region && source) items.push({ ...base, kind: "region", region, source });
    else if (r.kind === "source" && source) items.push({ ...base, kind: "source", source });
    else withheld.push({ id: r.id, kind: r.kind, position: r.position, version: r.version });
  }
  return { items, withheld };
}

async function sharesOf(tx: Executor, dossierId: number): Promise<DossierShare[]> {
  return tx
    .select({ userId: users.id, email: users.email, name: users.name })
    .from(dossierShares)
    .innerJoin(users, eq(users.id, dossierShares.userId))
    .where(eq(dossierShares.dossierId, dossierId))
    .orderBy(asc(users.name), asc(users.id));
}

/** One dossier as the caller may read it; 404 for anyone who may not (whether or not it exists). */
export async function getDossier(actor: Actor | null, id: number, tx: Executor = db()): Promise<DossierView> {
  authorize(actor, "archive.read");
  const [head] = await tx
    .select(headColumns)
    .from(dossiers)
    .innerJoin(users, eq(users.id, dossiers.ownerId))
    .where(and(eq(dossiers.id, id), readableDossiers(actor, { deleted: true })))
    .limit(1);
  if (!head) throw new NotFoundError("dossier");
  const mine = actor?.id === head.ownerId;
  const [{ items, withheld }, shares] = await Promise.all([itemsFor(tx, actor, id), mine ? sharesOf(tx, id) : Promise.resolve([])]);
  return {
    ...head,
    deletedAt: head.deletedAt?.toISOString() ?? null,
    createdAt: head.createdAt.toISOString(),
    updatedAt: head.updatedAt.toISOString(),
    items,
    withheld: withheld.length,
    withheldItems: mine ? withheld : [],
    shares,
    mine,
  };
}

/** Whether the caller may read the dossier (used to tell a refusal, 403, from a stranger's 404). */
export async function mayReadDossier(tx: Executor, actor: Actor | null, id: number): Promise<boolean> {
  const [row] = await tx.select({ id: dossiers.id }).from(dossiers).where(and(eq(dossiers.id, id), readableDossiers(actor))).limit(1);
  return Boolean(row);
}

async function summaries(where: SQL): Promise<DossierSummary[]> {
  const rows = await db()
    .select({ ...headColumns, itemCount: count(dossierItems.id) })
    .from(dossiers)
    .innerJoin(users, eq(users.id, dossiers.ownerId))
    .leftJoin(dossierItems, eq(dossierItems.dossierId, dossiers.id))
    .where(where)
    .groupBy(dossiers.id)
    .orderBy(desc(dossiers.updatedAt), desc(dossiers.id))
    .limit(500);
  return rows.map((r) => ({
    id: r.id,
    title: r.title,
    description: r.description,
    visibility: r.visibility,
    ownerName: r.ownerName,
    itemCount: Number(r.itemCount),
    version: r.version,
    updatedAt: r.updatedAt.toISOString(),
    deletedAt: r.deletedAt?.toISOString() ?? null,
  }));
}

/** The caller's own dossiers, those shared with them, and their deleted ones (to restore). */
export async function listMyDossiers(actor: Actor | null) {
  authorize(actor, "dossier.manage");
  const me = actor!.id;
  const [mine, shared, deleted] = await Promise.all([
    summaries(and(eq(dossiers.ownerId, me), isNull(dossiers.deletedAt))!),
    summaries(and(readableDossiers(actor), ne(dossiers.ownerId, me), inArray(dossiers.visibility, ["shared", "public"]), sharedWith(me))!),
    summaries(and(eq(dossiers.ownerId, me), isNotNull(dossiers.deletedAt))!),
  ]);
  return { mine, shared, deleted };
}
