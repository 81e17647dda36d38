// Facet distribution/stats over the matched documents, and hit formatting
// (attributesToRetrieve, `_formatted` with highlight/crop, `_matchesPosition`).

import { bad } from "./errors.js";
import { fieldPaths, isPlainObject, leafValuesAt, patternMatches, pickFields, type Doc } from "./fields.js";
import { foldFacet } from "./filter.js";
import type { IndexSettings } from "./settings.js";
import { filterablePatterns } from "./settings.js";
import { cropText, highlightText, wordSpans, type WordMatcher } from "./text.js";

export interface FacetResult {
  facetDistribution: Record<string, Record<string, number>>;
  facetStats: Record<string, { min: number; max: number }>;
}

/** Field paths of documents in first-seen order: what "*" picks facets from. */
export function documentPaths(docs: Iterable<Doc>): Set<string> {
  const paths = new Set<string>();
  for (const d of docs) fieldPaths(d, paths);
  return paths;
}

/**
 * Resolves requested facets ("*" = every filterable path of the matched documents,
 * `paths` as documentPaths gives them) and rejects non-filterable ones.
 */
export function resolveFacets(uid: string, settings: IndexSettings, facets: string[], paths: Iterable<string>): string[] {
  const patterns = filterablePatterns(settings);
  const out: string[] = [];
  for (const facet of facets) {
    if (facet === "*") {
      for (const p of paths) if (patterns.some((pt) => patternMatches(pt, p)) && !out.includes(p)) out.push(p);
      continue;
    }
    if (!patterns.some((p) => patternMatches(p, facet))) {
      const available = patterns.length
        ? `Available filterable attributes patterns are: ${patterns.map((p) => `\`${p}\``).join(", ")}.`
        : "This index does not have configured filterable attributes.";
      throw bad("invalid_search_facets", `Index \`${uid}\`: Invalid facet distribution: Attribute \`${facet}\` is not filterable. ${available}`);
    }
    if (!out.includes(facet)) out.push(facet);
  }
  return out;
}

/** A facet value: label, count, and the number for numeric values. */
export type FacetEntry = [label: string, count: number, num: number | null];

/**
 * Facet values in answer order: by count first when asked, then numbers by value
 * before strings by folded label. Distinct values never compare equal, so any
 * sort (or a partial one) gives the same order.
 */
export function facetOrder(order: "alpha" | "count"): (a: FacetEntry, b: FacetEntry) => number {
  return (a, b) => {
    if (order === "count" && a[1] !== b[1]) return b[1] - a[1];
    if (a[2] !== null || b[2] !== null) return a[2] === null ? 1 : b[2] === null ? -1 : a[2] - b[2];
    const fa = foldFacet(a[0]);
    const fb = foldFacet(b[0]);
    return fa < fb ? -1 : fa > fb ? 1 : 0;
  };
}

/**
 * Facets by reading every matched document: the reference for facet-count.ts,
 * which answers searches from the columns.
 */
export function computeFacets(settings: IndexSettings, facets: string[], docs: Doc[], dropEmpty: boolean): FacetResult {
  const facetDistribution: FacetResult["facetDistribution"] = {};
  const facetStats: FacetResult["facetStats"] = {};
  const { maxValuesPerFacet, sortFacetValuesBy } = settings.faceting;
  for (const facet of facets) {
    // key → [label, count, numeric value]; labels keep the first-seen original casing.
    const counts = new Map<string, FacetEntry>();
    let min = Infinity;
    let max = -Infinity;
    for (const doc of docs) {
      const seen = new Set<string>();
      for (const v of leafValuesAt(doc, facet)) {
        const key = typeof v === "number" ? `n:${v}` : `s:${foldFacet(String(v))}`;
        if (typeof v === "number") (min = Math.min(min, v)), (max = Math.max(max, v));
        if (seen.has(key)) continue;
        seen.add(key);
        const entry = counts.get(key);
        if (entry) entry[1]++;
        else counts.set(key, [typeof v === "string" ? v.trim() : String(v), 1, typeof v === "number" ? v : null]);
      }
    }
    if (dropEmpty && counts.size === 0) continue;
    const entries = [...counts.values()].sort(facetOrder(sortFacetValuesBy[facet] ?? sortFacetValuesBy["*"] ?? "alpha"));
    facetDistribution[facet] = Object.fromEntries(entries.slice(0, maxValuesPerFacet).map(([label, count]) => [label, count]));
    if (min !== Infinity) facetStats[facet] = { min, max };
  }
  return { facetDistribution, facetStats };
}

export interface FormatOptions {
  retrieve: string[];
  highlight: string[];
  crop: { attr: string; length: number }[];
  cropMarker: string;
  pre: string;
  post: string;
  matcher: WordMatcher | null;
  showMatchesPosition: boolean;
}

/** Builds the hit object from a stored document. */
export function formatHit(settings: IndexSettings, doc: Doc, opts: FormatOptions): Doc {
  const visible = pickFields(doc, settings.displayedAttributes);
  const out = pickFields(visible, opts.retrieve);
  if (opts.highlight.length || opts.crop.length) {
    out._formatted = formatValue(out, "", opts);
  }
  if (opts.showMatchesPosition && opts.matcher) out._matchesPosition = matchesPosition(visible, opts.matcher);
  return out;
}

function formatValue(value: unknown, path: string, opts: FormatOptions): unknown {
  if (Array.isArray(value)) return value.map((v) => formatValue(v, path, opts));
  if (isPlainObject(value)) {
    const res: Doc = {};
    for (const [k, v] of Object.entries(value)) res[k] = formatValue(v, path ? `${path}.${k}` : k, opts);
    return res;
  }
  const highlighted = opts.highlight.some((h) => patternMatches(h, path));
  const crop = opts.crop.find((c) => patternMatches(c.attr, path));
  if (!highlighted && !crop) return value;
  if (value === null || typeof value === "boolean") return value;
  let text = String(value);
  const matcher = opts.matcher ?? (() => null);
  if (crop) text = cropText(text, matcher, crop.length, opts.cropMarker);
  if (highlighted && opts.matcher) text = highlightText(text, matcher, opts.pre, opts.post);
  return text;
}

function matchesPosition(doc: Doc, matcher: WordMatcher): Record<string, { start: number; length: number }[]> {
  const out: Record<string, { start: number; length: number }[]> = {};
  const walk = (v: unknown, path: string): void => {
    if (Array.isArray(v)) v.forEach((x) => walk(x, path));
    else if (isPlainObject(v)) for (const [k, x] of Object.entries(v)) walk(x, path ? `${path}.${k}` : k);
    else if (typeof v === "string" || typeof v === "number") {
      const text = String(v);
      for (const span of wordSpans(text)) {
        const m = matcher(span.term);
        if (!m) continue;
        const start = Buffer.byteLength(text.slice(0, span.start));
        const word = text.slice(span.start, span.end);
        const length = Buffer.byteLength(m.kind === "full" ? word : word.slice(0, m.length));
        (out[path] ??= []).push({ start, length });
      }
    }
  };
  walk(doc, "");
  return out;
}
