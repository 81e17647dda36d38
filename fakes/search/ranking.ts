// Ranking: orders matched hits following the index's rankingRules like
// Meilisearch's bucket sort (words, typo, attribute, sort, exactness, custom
// `field:asc`), then BM25 score and insertion order; plus the 0..1 ranking score.

import { haversine } from "./filter-eval.js";
import { foldFacet } from "./filter.js";
import { leafValuesAt, rawValuesAt, type Doc } from "./fields.js";
import type { QueryPlan } from "./matching.js";

export interface RankedHit {
  id: string;
  doc: Doc;
  words: number;
  typos: number;
  attribute: number;
  exact: number;
  bm25: number;
  ordinal: number;
  /** The document's slot (slots.ts), for the filter and facet structures. */
  slot: number;
  /** Sort keys, filled by rankHits for the sort rules in use. */
  keys?: SortKey[];
}

export interface SortSpec {
  field: string;
  asc: boolean;
  geo?: [number, number];
}

type SortKey = { num: number | null; str: string | null };

function sortKey(doc: Doc, spec: SortSpec): SortKey {
  if (spec.geo) {
    const geo = rawValuesAt(doc, "_geo")[0] as { lat?: unknown; lng?: unknown } | undefined;
    const lat = Number(geo?.lat);
    const lng = Number(geo?.lng);
    return { num: Number.isFinite(lat) && Number.isFinite(lng) ? haversine([lat, lng], spec.geo) : null, str: null };
  }
  let num = null as number | null;
  let str = null as string | null;
  for (const v of leafValuesAt(doc, spec.field)) {
    if (typeof v === "number") num = num === null ? v : spec.asc ? Math.min(num, v) : Math.max(num, v);
    else {
      const s = foldFacet(String(v));
      const cur: string | null = str;
      str = cur === null || (spec.asc ? s < cur : s > cur) ? s : cur;
    }
  }
  return { num, str };
}

/** Numbers before strings, missing values last, in both directions (as Meilisearch). */
function compareKeys(a: SortKey, b: SortKey, asc: boolean): number {
  const dir = asc ? 1 : -1;
  if (a.num !== null || b.num !== null) {
    if (a.num === null) return 1;
    if (b.num === null) return -1;
    return (a.num - b.num) * dir;
  }
  if (a.str === null || b.str === null) return a.str === b.str ? 0 : a.str === null ? 1 : -1;
  return a.str < b.str ? -dir : a.str > b.str ? dir : 0;
}

type Cmp = (a: RankedHit, b: RankedHit) => number;

/** The comparisons the ranking rules make, in order, and the sort keys they read. */
function rankingOrder(rules: string[], sort: SortSpec[], hasQuery: boolean): { specs: SortSpec[]; cmps: Cmp[] } {
  const specs: SortSpec[] = [];
  const cmps: Cmp[] = [];
  const sortCmp = (spec: SortSpec): Cmp => {
    const idx = specs.push(spec) - 1;
    return (a, b) => compareKeys(a.keys![idx]!, b.keys![idx]!, spec.asc);
  };
  for (const rule of rules) {
    if (hasQuery && rule === "words") cmps.push((a, b) => b.words - a.words);
    else if (hasQuery && rule === "typo") cmps.push((a, b) => a.typos - b.typos);
    else if (hasQuery && (rule === "attribute" || rule === "attributeRank")) cmps.push((a, b) => a.attribute - b.attribute);
    else if (hasQuery && rule === "exactness") cmps.push((a, b) => b.exact - a.exact);
    else if (rule === "sort") sort.forEach((s) => cmps.push(sortCmp(s)));
    else {
      const m = /^(.+):(asc|desc)$/.exec(rule);
      if (m) cmps.push(sortCmp({ field: m[1]!, asc: m[2] === "asc" }));
    }
  }
  if (hasQuery) cmps.push((a, b) => b.bm25 - a.bm25);
  return { specs, cmps };
}

/** The slots of hits, in their order (what facets count). */
export function hitSlots(hits: RankedHit[]): Int32Array {
  const out = new Int32Array(hits.length);
  for (let i = 0; i < hits.length; i++) out[i] = hits[i]!.slot;
  return out;
}

/** Whether a placeholder search keeps insertion order (no sort rule applies), so only its first hits matter. */
export function keepsInsertionOrder(rules: string[], sort: SortSpec[]): boolean {
  return rankingOrder(rules, sort, false).cmps.length === 0;
}

/**
 * Orders hits following the ranking rules (`sort` is the search's sort parameter).
 * Only the best `limit` hits are fully ordered when that is much less than all of them.
 */
export function rankHits(hits: RankedHit[], rules: string[], sort: SortSpec[], hasQuery: boolean, limit = Infinity): RankedHit[] {
  const { specs, cmps } = rankingOrder(rules, sort, hasQuery);
  // Placeholder search without sort: hits already come in insertion order.
  if (cmps.length === 0) return hits.slice(0, limit);
  if (specs.length) for (const h of hits) h.keys = specs.map((s) => sortKey(h.doc, s));
  cmps.push((a, b) => a.ordinal - b.ordinal);
  const cmp: Cmp = (a, b) => {
    for (const c of cmps) {
      const r = c(a, b);
      if (r !== 0) return r;
    }
    return 0;
  };
  return limit * 8 < hits.length ? topK(hits, cmp, limit) : hits.slice().sort(cmp).slice(0, limit);
}

/** The k smallest items by `cmp`, sorted; a bounded max-heap keeps this O(n log k). */
export function topK<T>(items: T[], cmp: (a: T, b: T) => number, k: number): T[] {
  if (k <= 0) return [];
  const heap: T[] = [];
  const down = (i: number) => {
    for (;;) {
      const l = 2 * i + 1;
      const r = l + 1;
      let worst = i;
      if (l < heap.length && cmp(heap[l]!, heap[worst]!) > 0) worst = l;
      if (r < heap.length && cmp(heap[r]!, heap[worst]!) > 0) worst = r;
      if (worst === i) return;
      [heap[i], heap[worst]] = [heap[worst]!, heap[i]!];
      i = worst;
    }
  };
  for (const item of items) {
    if (heap.length < k) {
      heap.push(item);
      for (let i = heap.length - 1; i > 0; ) {
        const parent = (i - 1) >> 1;
        if (cmp(heap[i]!, heap[parent]!) <= 0) break;
        [heap[i], heap[parent]] = [heap[parent]!, heap[i]!];
        i = parent;
      }
    } else if (cmp(item, heap[0]!) < 0) {
      heap[0] = item;
      down(0);
    }
  }
  return heap.sort(cmp);
}

/** A 0..1 score that orders like the relevancy rules (Meilisearch's nested-bucket scheme). */
export function rankingScore(hit: RankedHit, plan: QueryPlan | null, fieldCount: number, rules: string[]): number {
  if (!plan || plan.positions.length === 0) return 1;
  const n = plan.positions.length;
  const maxTypos = plan.positions.reduce((s, p) => s + (p.alternatives[0]?.budget ?? 0), 0);
  let value = 0;
  let width = 1;
  for (const rule of rules) {
    let rank: number;
    let max: number;
    if (rule === "words") (rank = hit.words - 1), (max = n - 1);
    else if (rule === "typo") (rank = Math.max(0, maxTypos - hit.typos)), (max = maxTypos);
    else if (rule === "attribute") (rank = Math.max(0, fieldCount - 1 - hit.attribute)), (max = Math.max(0, fieldCount - 1));
    else if (rule === "exactness") (rank = hit.exact), (max = n);
    else continue;
    if (max <= 0) continue;
    value += (width * rank) / (max + 1);
    width /= max + 1;
  }
  return Math.min(1, value + width);
}
