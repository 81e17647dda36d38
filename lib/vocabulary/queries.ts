import "server-only";
import { asc, count, countDistinct, eq, inArray, isNotNull } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { aspects, aspectTerms, observations, type Aspect, type AspectSection, type AspectTerm } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import type { AspectView, TermView } from "./types";

export function termView(row: AspectTerm, usage?: number): TermView {
  return {
    id: row.id,
    aspectId: row.aspectId,
    key: row.key,
    label: row.label,
    description: row.description,
    position: row.position,
    deprecated: row.deprecatedAt !== null,
    mergedIntoId: row.mergedIntoId,
    version: row.version,
    ...(usage === undefined ? {} : { usage }),
  };
}

export function aspectView(row: Aspect, terms: TermView[], usage?: number): AspectView {
  return {
    id: row.id,
    key: row.key,
    label: row.label,
    description: row.description,
    kind: row.kind,
    section: row.section,
    position: row.position,
    deprecated: row.deprecatedAt !== null,
    version: row.version,
    terms,
    ...(usage === undefined ? {} : { usage }),
  };
}

// Counts every observation, in old versions and deleted regions too: a term they name must stay.
async function usageByAspect(ex: Executor, ids?: number[]): Promise<Map<number, number>> {
  const rows = await ex
    .select({ id: observations.aspectId, n: count() })
    .from(observations)
    .where(ids ? inArray(observations.aspectId, ids) : undefined)
    .groupBy(observations.aspectId);
  return new Map(rows.map((r) => [r.id, r.n]));
}

async function usageByTerm(ex: Executor, aspectIds?: number[]): Promise<Map<number, number>> {
  const rows = await ex
    .select({ id: observations.termId, n: count() })
    .from(observations)
    .where(aspectIds ? inArray(observations.aspectId, aspectIds) : isNotNull(observations.termId))
    .groupBy(observations.termId);
  return new Map(rows.filter((r) => r.id !== null).map((r) => [r.id!, r.n]));
}

async function assemble(ex: Executor, rows: Aspect[], withUsage: boolean): Promise<AspectView[]> {
  if (rows.length === 0) return [];
  const ids = rows.map((a) => a.id);
  const terms = await ex
    .select()
    .from(aspectTerms)
    .where(inArray(aspectTerms.aspectId, ids))
    .orderBy(asc(aspectTerms.aspectId), asc(aspectTerms.position), asc(aspectTerms.id));
  const [byAspect, byTerm] = withUsage ? await Promise.all([usageByAspect(ex, ids), usageByTerm(ex, ids)]) : [null, null];
  return rows.map((a) =>
    aspectView(
      a,
      terms.filter((t) => t.aspectId === a.id).map((t) => termView(t, byTerm ? (byTerm.get(t.id) ?? 0) : undefined)),
      byAspect ? (byAspect.get(a.id) ?? 0) : undefined,
    ),
  );
}

/**
 * The whole vocabulary, sections in their fixed order (the enum's), then by position. Anyone may read
 * it, deprecated entries flagged, so that old observations keep their labels; usage counts are for editors.
 */
export async function listVocabulary(actor: Actor | null, options: { withUsage?: boolean } = {}): Promise<AspectView[]> {
  authorize(actor, "archive.read");
  if (options.withUsage) authorize(actor, "vocabulary.edit");
  const rows = await db().select().from(aspects).orderBy(asc(aspects.section), asc(aspects.position), asc(aspects.id));
  return assemble(db(), rows, options.withUsage ?? false);
}

/** One aspect with its terms and usage, as the editors see it (inside a transaction when given one). */
export async function getAspectView(ex: Executor, id: number): Promise<AspectView | null> {
  const rows = await ex.select().from(aspects).where(eq(aspects.id, id));
  return (await assemble(ex, rows, true))[0] ?? null;
}

export async function getSectionViews(ex: Executor, section: AspectSection): Promise<AspectView[]> {
  const rows = await ex.select().from(aspects).where(eq(aspects.section, section)).orderBy(asc(aspects.position), asc(aspects.id));
  return assemble(ex, rows, true);
}

export async function getTermView(ex: Executor, id: number): Promise<TermView | null> {
  const [row] = await ex.select().from(aspectTerms).where(eq(aspectTerms.id, id));
  if (!row) return null;
  return termView(row, await termUsage(ex, id));
}

export async function aspectUsage(ex: Executor, aspectId: number): Promise<number> {
  const [{ n }] = await ex.select({ n: count() }).from(observations).where(eq(observations.aspectId, aspectId));
  return n;
}

export async function termUsage(ex: Executor, termId: number): Promise<number> {
  const [{ n }] = await ex.select({ n: count() }).from(observations).where(eq(observations.termId, termId));
  return n;
}

/** How many observations and region versions name the term: what a merge will rewrite. */
export async function termReach(ex: Executor, termId: number): Promise<{ observations: number; regionVersions: number }> {
  const [row] = await ex
    .select({ observations: count(), regionVersions: countDistinct(observations.regionVersionId) })
    .from(observations)
    .where(eq(observations.termId, termId));
  return row;
}
