// One search request end to end: parameter validation (POST body or GET query),
// matching, filtering, ranking, distinct, facets, pagination and formatting.

import { bad, invalidType } from "./errors.js";
import { countFacets } from "./facet-count.js";
import { leafValuesAt, patternMatches, type Doc } from "./fields.js";
import { filterSlots } from "./filter-index.js";
import { formatHit, resolveFacets, type FacetResult } from "./format.js";
import { expandLastWord, matchQuery, planQuery, wordMatcher } from "./matching.js";
import { hitSlots, keepsInsertionOrder, rankHits, rankingScore, type RankedHit, type SortSpec } from "./ranking.js";
import { filterablePatterns } from "./settings.js";
import type { SearchIndex } from "./engine.js";

export interface SearchParams {
  q?: string | null;
  offset?: number;
  limit?: number;
  page?: number;
  hitsPerPage?: number;
  filter?: string | unknown[] | null;
  facets?: string[] | null;
  sort?: string[] | null;
  distinct?: string | null;
  attributesToRetrieve?: string[] | null;
  attributesToHighlight?: string[] | null;
  highlightPreTag?: string;
  highlightPostTag?: string;
  attributesToCrop?: string[] | null;
  cropLength?: number;
  cropMarker?: string;
  showMatchesPosition?: boolean;
  showRankingScore?: boolean;
  showRankingScoreDetails?: boolean;
  rankingScoreThreshold?: number | null;
  matchingStrategy?: "last" | "all" | "frequency";
  attributesToSearchOn?: string[] | null;
}

export type SearchResult = Record<string, unknown>;

const INT_KEYS = ["offset", "limit", "page", "hitsPerPage", "cropLength"] as const;
const LIST_KEYS = ["facets", "sort", "attributesToRetrieve", "attributesToHighlight", "attributesToCrop", "attributesToSearchOn"] as const;
const BOOL_KEYS = ["showMatchesPosition", "showRankingScore", "showRankingScoreDetails", "retrieveVectors", "showPerformanceDetails"] as const;
const STRING_KEYS = ["highlightPreTag", "highlightPostTag", "cropMarker", "distinct"] as const;
// Accepted but ignored (vector / hybrid / locale features the fake does not implement).
const IGNORED_KEYS = ["vector", "hybrid", "locales", "media", "personalize"];
const KNOWN = new Set<string>(["q", "filter", "matchingStrategy", "rankingScoreThreshold", ...INT_KEYS, ...LIST_KEYS, ...BOOL_KEYS, ...STRING_KEYS, ...IGNORED_KEYS]);

const snake = (k: string) => k.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
const errCode = (k: string) => `invalid_search_${snake(k)}`;

/** Validates a POST /search body (or one multi-search query). */
export function parseSearchBody(body: unknown, path = ""): SearchParams {
  if (body === undefined || body === null) return {};
  if (typeof body !== "object" || Array.isArray(body)) throw invalidType("bad_request", path || ".", "an object", body);
  const p = body as Record<string, unknown>;
  for (const key of Object.keys(p)) {
    if (!KNOWN.has(key)) throw bad("bad_request", `Unknown field \`${key}\`${path ? ` inside \`${path}\`` : ""}: expected one of ${[...KNOWN].map((k) => `\`${k}\``).join(", ")}`);
  }
  const at = (k: string) => `${path}.${k}`;
  if (p.q !== undefined && p.q !== null && typeof p.q !== "string") throw invalidType("invalid_search_q", at("q"), "a string", p.q);
  for (const k of INT_KEYS)
    if (p[k] !== undefined && p[k] !== null && (typeof p[k] !== "number" || !Number.isInteger(p[k]) || (p[k] as number) < 0))
      throw invalidType(errCode(k), at(k), "a positive integer", p[k]);
  for (const k of LIST_KEYS) {
    const v = p[k];
    if (v === undefined || v === null) continue;
    if (!Array.isArray(v)) throw invalidType(errCode(k), at(k), "an array", v);
    v.forEach((s, i) => {
      if (typeof s !== "string") throw invalidType(errCode(k), `${at(k)}[${i}]`, "a string", s);
    });
  }
  for (const k of BOOL_KEYS) if (p[k] !== undefined && typeof p[k] !== "boolean") throw invalidType(errCode(k), at(k), "a boolean", p[k]);
  for (const k of STRING_KEYS) if (p[k] !== undefined && p[k] !== null && typeof p[k] !== "string") throw invalidType(errCode(k), at(k), "a string", p[k]);
  if (p.filter !== undefined && p.filter !== null && typeof p.filter !== "string" && !Array.isArray(p.filter))
    throw bad("invalid_search_filter", `Invalid syntax for the filter parameter: \`expected String, Array, found: ${JSON.stringify(p.filter)}\`.`);
  if (p.matchingStrategy !== undefined && !["last", "all", "frequency"].includes(p.matchingStrategy as string))
    throw bad("invalid_search_matching_strategy", `Unknown value \`${String(p.matchingStrategy)}\` at \`${at("matchingStrategy")}\`: expected one of \`last\`, \`all\`, \`frequency\``);
  const t = p.rankingScoreThreshold;
  if (t !== undefined && t !== null && (typeof t !== "number" || t < 0 || t > 1))
    throw bad("invalid_search_ranking_score_threshold", `Invalid value at \`${at("rankingScoreThreshold")}\`: the value of \`rankingScoreThreshold\` is invalid, expected a float between \`0.0\` and \`1.0\`.`);
  return p as SearchParams;
}

/** Converts GET /search query parameters (comma-separated lists) to the POST form. */
export function parseSearchQuery(query: URLSearchParams): SearchParams {
  const body: Record<string, unknown> = {};
  for (const [key, value] of query) {
    if ((INT_KEYS as readonly string[]).includes(key)) {
      if (!/^\d+$/.test(value)) throw bad(errCode(key), `Invalid value in parameter \`${key}\`: could not parse \`${value}\` as a positive integer`);
      body[key] = Number(value);
    } else if ((LIST_KEYS as readonly string[]).includes(key)) body[key] = value.split(",").map((s) => s.trim()).filter(Boolean);
    else if ((BOOL_KEYS as readonly string[]).includes(key)) {
      if (value !== "true" && value !== "false") throw bad(errCode(key), `Invalid value in parameter \`${key}\`: could not parse \`${value}\` as a boolean, expected either \`true\` or \`false\``);
      body[key] = value === "true";
    } else if (key === "rankingScoreThreshold") body[key] = Number(value);
    else body[key] = value;
  }
  return parseSearchBody(body);
}

function parseSort(index: SearchIndex, sort: string[]): SortSpec[] {
  if (sort.length && !index.settings.rankingRules.includes("sort"))
    throw bad("invalid_search_sort", `Index \`${index.uid}\`: The sort ranking rule must be specified in the ranking rules settings to use the sort parameter at search time.`);
  const sortable = index.settings.sortableAttributes;
  return sort.map((expr) => {
    const m = /^(.+):(asc|desc)$/.exec(expr.trim());
    if (!m) throw bad("invalid_search_sort", `Invalid syntax for the sort parameter: expected expression ending by \`:asc\` or \`:desc\`, found \`${expr}\`.`);
    const geo = /^_geoPoint\(\s*([-+.\d]+)\s*,\s*([-+.\d]+)\s*\)$/.exec(m[1]!);
    const field = geo ? "_geo" : m[1]!;
    if (!sortable.some((p) => patternMatches(p, field))) {
      const available = sortable.length
        ? `Available sortable attributes are: \`${sortable.join(", ")}\`.`
        : "This index does not have configured sortable attributes.";
      throw bad("invalid_search_sort", `Index \`${index.uid}\`: Attribute \`${field}\` is not sortable. ${available}`);
    }
    return { field, asc: m[2] === "asc", ...(geo ? { geo: [Number(geo[1]), Number(geo[2])] as [number, number] } : {}) };
  });
}

export function runSearch(index: SearchIndex, params: SearchParams): SearchResult {
  const started = performance.now();
  const { settings } = index;
  const q = params.q ?? "";
  const filter = index.compileFilter(params.filter ?? undefined, "invalid_search_filter");
  const sort = parseSort(index, params.sort ?? []);
  const distinct = params.distinct ?? settings.distinctAttribute;
  if (params.distinct && !filterablePatterns(settings).some((p) => patternMatches(p, params.distinct!)))
    throw bad("invalid_search_distinct", `Index \`${index.uid}\`: Attribute \`${params.distinct}\` is not filterable and thus, cannot be used as distinct attribute.`);

  // Documents the filter lets through, from the columns (null: no filter).
  const allowed = filter.type === "all" ? null : filterSlots(filter, index.columns);
  const { slots } = index.columns;

  const plan = planQuery(q, settings, params.matchingStrategy ?? "last");
  const hasQuery = plan.positions.length > 0;
  let hits: RankedHit[] = [];
  // A placeholder search's matches: every slot the filter lets through, in insertion order.
  let placeholder: Int32Array | null = null;
  const fields = index.searchFields();
  if (hasQuery) {
    const restrict = params.attributesToSearchOn ?? null;
    for (const attr of restrict ?? []) {
      if (!fields.some((f) => patternMatches(f, attr)) && !settings.searchableAttributes.includes("*"))
        throw bad("invalid_search_attributes_to_search_on", `Index \`${index.uid}\`: Attribute \`${attr}\` is not searchable. Available searchable attributes are: \`${fields.join(", ")}\`.`);
    }
    const ms = index.fullText();
    const restrictTo = restrict ? fields.filter((f) => restrict.some((a) => patternMatches(a, f) || patternMatches(f, a))) : null;
    const last = plan.positions[plan.positions.length - 1]!;
    const expansions = index.text.memo(`${plan.prefixLast}:${JSON.stringify(last.alternatives)}`, () => expandLastWord(plan, index.text.vocabulary));
    hits = matchQuery(
      ms,
      plan,
      fields,
      restrictTo,
      (id) => {
        const slot = slots.slot(id);
        return slot === undefined ? undefined : { doc: slots.doc(slot)!, ordinal: slots.ordinal(slot), slot };
      },
      expansions,
    );
    if (allowed) hits = hits.filter((h) => allowed.has(h.slot));
  } else placeholder = slots.ordered(allowed);
  const maxTotalHits = settings.pagination.maxTotalHits;
  const pageMode = params.page != null || params.hitsPerPage != null;
  const hitsPerPage = params.hitsPerPage ?? 20;
  const page = params.page ?? 1;
  const offset = pageMode ? Math.max(0, page - 1) * hitsPerPage : (params.offset ?? 0);
  const limit = pageMode ? (page === 0 ? 0 : hitsPerPage) : (params.limit ?? 20);

  const scoreOf = (h: RankedHit) => rankingScore(h, hasQuery ? plan : null, fields.length, settings.rankingRules);
  const threshold = params.rankingScoreThreshold;
  // distinct and the score threshold drop hits, so they need every hit ranked; otherwise only the page window.
  const needAll = Boolean(distinct) || typeof threshold === "number";
  const window = needAll ? Infinity : Math.min(offset + limit, maxTotalHits);
  if (placeholder) {
    // Placeholder hits carry no scores: unless a sort rule reorders them, the window is all there is to rank.
    const count = keepsInsertionOrder(settings.rankingRules, sort) ? Math.min(placeholder.length, window) : placeholder.length;
    hits = new Array<RankedHit>(count);
    for (let i = 0; i < count; i++) {
      const slot = placeholder[i]!;
      hits[i] = { id: slots.id(slot)!, doc: slots.doc(slot)!, words: 0, typos: 0, attribute: 0, exact: 0, bm25: 0, ordinal: slots.ordinal(slot), slot };
    }
  }
  let ranked = rankHits(hits, settings.rankingRules, sort, hasQuery, window);
  if (distinct) {
    const seen = new Set<string>();
    ranked = ranked.filter((h) => {
      const v = leafValuesAt(h.doc, distinct)[0];
      if (v === undefined) return true;
      const key = `${typeof v}:${String(v).toLowerCase()}`;
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
  }
  if (typeof threshold === "number") ranked = ranked.filter((h) => scoreOf(h) >= threshold);
  // What the total and the facets count: every hit, or those distinct and the threshold kept.
  const matchedCount = needAll ? ranked.length : (placeholder?.length ?? hits.length);

  let facets: FacetResult | null = null;
  if (params.facets) {
    const matchedSlots = needAll ? hitSlots(ranked) : (placeholder ?? hitSlots(hits));
    const wanted = resolveFacets(index.uid, settings, params.facets, params.facets.includes("*") ? index.columns.fieldPaths(matchedSlots) : []);
    facets = countFacets(settings, wanted, matchedSlots, index.columns, params.facets.includes("*"));
  }

  const total = Math.min(matchedCount, maxTotalHits);
  const pageHits = ranked.slice(Math.min(offset, maxTotalHits), Math.min(offset + limit, maxTotalHits));

  const matcher = hasQuery ? wordMatcher(plan) : null;
  const highlight = params.attributesToHighlight ?? [];
  const crop = (params.attributesToCrop ?? []).map((a) => {
    const m = /^(.*):(\d+)$/.exec(a);
    return m ? { attr: m[1]!, length: Number(m[2]) } : { attr: a, length: params.cropLength ?? 10 };
  });
  const formatted = pageHits.map((h) => {
    const doc = formatHit(settings, h.doc, {
      retrieve: params.attributesToRetrieve ?? ["*"],
      highlight,
      crop,
      cropMarker: params.cropMarker ?? "…",
      pre: params.highlightPreTag ?? "<em>",
      post: params.highlightPostTag ?? "</em>",
      matcher,
      showMatchesPosition: params.showMatchesPosition === true,
    });
    if (params.showRankingScore) doc._rankingScore = scoreOf(h);
    if (params.showRankingScoreDetails) doc._rankingScoreDetails = rankingDetails(h, plan, hasQuery);
    return doc;
  });

  const result: SearchResult = { hits: formatted, query: q, processingTimeMs: Math.round(performance.now() - started) };
  if (pageMode) Object.assign(result, { hitsPerPage, page, totalPages: hitsPerPage ? Math.ceil(total / hitsPerPage) : 0, totalHits: total });
  else Object.assign(result, { limit, offset, estimatedTotalHits: total });
  if (facets) Object.assign(result, facets);
  return result;
}

function rankingDetails(h: RankedHit, plan: ReturnType<typeof planQuery>, hasQuery: boolean): Doc {
  if (!hasQuery) return {};
  const n = plan.positions.length;
  return {
    words: { order: 0, matchingWords: h.words, maxMatchingWords: n, score: n ? h.words / n : 1 },
    typo: { order: 1, typoCount: h.typos, maxTypoCount: plan.positions.reduce((s, p) => s + (p.alternatives[0]?.budget ?? 0), 0) },
    exactness: { order: 5, matchType: h.exact === n ? "exactMatch" : "noExactMatch" },
  };
}
