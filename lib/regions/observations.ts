import "server-only";
import { asc, eq, inArray, sql } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { aspects, aspectTerms, observations } from "@/db/schema";
import { ValidationError, type FieldErrors } from "@/lib/errors";
import type { ObservationInput, ObservationView } from "./types";

type Checked = { aspectId: number; termId: number | null; countValue: number | null; textValue: string | null; confidence: ObservationInput["confidence"]; note: string | null };

/**
 * Checks each observation against its aspect: a term of that aspect's list, a count, or text, as the
 * aspect's kind says. New values may not use a deprecated aspect or term; values already stored on the
 * region (`kept`) may, so that a later edit of something else does not fail.
 */
export async function checkObservations(tx: Executor, input: ObservationInput[], kept: Set<string> = new Set()): Promise<Checked[]> {
  if (input.length === 0) return [];
  const aspectIds = [...new Set(input.map((o) => o.aspectId))];
  const termIds = [...new Set(input.map((o) => o.termId).filter((t): t is number => typeof t === "number"))];
  // Locking reads in share mode (MariaDB has LOCK IN SHARE MODE, not FOR SHARE): they read the latest
  // committed rows, and a term an editor merges or deprecates at this moment waits for this save (or
  // this save waits for the merge and sees it), so a value never lands on a term just merged away.
  const ids = (list: number[]) => sql.join(list.map((n) => sql`${n}`), sql`, `);
  const [aspectRows] = (await tx.execute(
    sql`SELECT id, label, kind, deprecated_at AS deprecatedAt FROM aspects WHERE id IN (${ids(aspectIds)}) LOCK IN SHARE MODE`,
  )) as unknown as [{ id: number; label: string; kind: "terms" | "count" | "text"; deprecatedAt: Date | null }[]];
  const [termRows] = termIds.length
    ? ((await tx.execute(
        sql`SELECT id, aspect_id AS aspectId, label, deprecated_at AS deprecatedAt FROM aspect_terms WHERE id IN (${ids(termIds)}) LOCK IN SHARE MODE`,
      )) as unknown as [{ id: number; aspectId: number; label: string; deprecatedAt: Date | null }[]])
    : [[]];
  const aspectById = new Map(aspectRows.map((a) => [a.id, a]));
  const termById = new Map(termRows.map((t) => [t.id, t]));
  const fields: FieldErrors = {};
  const fail = (i: number, key: string, message: string) => (fields[`observations.${i}.${key}`] ??= []).push(message);

  const checked = input.map((o, i): Checked => {
    const aspect = aspectById.get(o.aspectId);
    const base = { aspectId: o.aspectId, termId: null, countValue: null, textValue: null, confidence: o.confidence, note: o.note ?? null };
    if (!aspect) {
      fail(i, "aspectId", "No such aspect in the vocabulary.");
      return base;
    }
    const signature = `${o.aspectId}:${o.termId ?? ""}:${o.count ?? ""}:${o.text ?? ""}`;
    if (aspect.deprecatedAt && !kept.has(signature)) fail(i, "aspectId", `“${aspect.label}” is deprecated; choose another aspect.`);
    if (aspect.kind === "terms") {
      const term = o.termId ? termById.get(o.termId) : undefined;
      if (!o.termId) fail(i, "termId", `Choose a term for “${aspect.label}”.`);
      else if (!term || term.aspectId !== aspect.id) fail(i, "termId", `That term is not in the list of “${aspect.label}”.`);
      else if (term.deprecatedAt && !kept.has(signature)) fail(i, "termId", `“${term.label}” is deprecated; choose another term.`);
      return { ...base, termId: o.termId ?? null };
    }
    if (aspect.kind === "count") {
      if (o.count === null || o.count === undefined) fail(i, "count", `Give a number for “${aspect.label}”.`);
      return { ...base, countValue: o.count ?? null };
    }
    if (!o.text) fail(i, "text", `Write what you see for “${aspect.label}”.`);
    return { ...base, textValue: o.text ?? null };
  });
  if (Object.keys(fields).length) {
    const first = Object.values(fields)[0][0];
    throw new ValidationError(`Please correct the observations. ${first}`, fields);
  }
  return checked;
}

export const observationSignature = (o: { aspectId: number; termId: number | null; countValue: number | null; textValue: string | null }) =>
  `${o.aspectId}:${o.termId ?? ""}:${o.countValue ?? ""}:${o.textValue ?? ""}`;

export async function writeObservations(tx: Executor, regionVersionId: number, checked: Checked[]): Promise<void> {
  await tx.delete(observations).where(eq(observations.regionVersionId, regionVersionId));
  if (checked.length) await tx.insert(observations).values(checked.map((o, position) => ({ ...o, regionVersionId, position })));
}

export async function copyObservations(tx: Executor, fromVersionId: number, toVersionId: number): Promise<void> {
  const rows = await tx.select().from(observations).where(eq(observations.regionVersionId, fromVersionId)).orderBy(asc(observations.position));
  if (rows.length) {
    await tx.insert(observations).values(
      rows.map(({ aspectId, termId, countValue, textValue, confidence, note, position }) => ({ regionVersionId: toVersionId, aspectId, termId, countValue, textValue, confidence, note, position })),
    );
  }
}

/** The observations of many versions at once, in their order, with aspect and term words. */
export async function observationsOf(tx: Executor, versionIds: number[]): Promise<Map<number, ObservationView[]>> {
  const out = new Map<number, ObservationView[]>();
  if (versionIds.length === 0) return out;
  const rows = await tx
    .select({
      id: observations.id,
      versionId: observations.regionVersionId,
      aspectId: observations.aspectId,
      aspectKey: aspects.key,
      aspectLabel: aspects.label,
      kind: aspects.kind,
      termId: observations.termId,
      termKey: aspectTerms.key,
      termLabel: aspectTerms.label,
      count: observations.countValue,
      text: observations.textValue,
      confidence: observations.confidence,
      note: observations.note,
    })
    .from(observations)
    .innerJoin(aspects, eq(aspects.id, observations.aspectId))
    .leftJoin(aspectTerms, eq(aspectTerms.id, observations.termId))
    .where(inArray(observations.regionVersionId, versionIds))
    .orderBy(asc(observations.regionVersionId), asc(observations.position), asc(observations.id));
  for (const { versionId, ...o } of rows) {
    const list = out.get(versionId) ?? [];
    list.push(o);
    out.set(versionId, list);
  }
  return out;
}
