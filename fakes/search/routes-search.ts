// Search routes (single, multi/federated, facet search) and the small
// instance-level endpoints (health, version, stats).

import { bad, MeiliError, asMeiliError, invalidType } from "./errors.js";
import { isPlainObject, patternMatches } from "./fields.js";
import { foldFacet } from "./filter.js";
import { jsonBody, ok, type Ctx, type Router } from "./router.js";
import type { Deps } from "./routes-indexes.js";
import { parseSearchBody, parseSearchQuery, type SearchParams, type SearchResult } from "./search.js";
import { filterablePatterns } from "./settings.js";
import { tokenize } from "./text.js";

export const FAKE_VERSION = { commitSha: "0000000000000000000000000000000000000000", commitDate: "2025-01-01T00:00:00Z", pkgVersion: "1.30.0" };

const andList = (f: unknown): unknown[] => (f === undefined || f === null ? [] : Array.isArray(f) ? f : [f]);

export function searchRoutes(r: Router, { engine, queue }: Deps): void {
  /** Applies a tenant token's search rules: the index must be covered, its filter is ANDed in. */
  const withRules = (ctx: Ctx, uid: string, params: SearchParams): SearchParams => {
    if (!ctx.searchRules) return params;
    const rule = [...ctx.searchRules].find(([pattern]) => patternMatches(pattern, uid));
    if (!rule) throw new MeiliError(403, "invalid_api_key", "The provided API key is invalid.", "auth");
    const forced = isPlainObject(rule[1]) ? rule[1].filter : undefined;
    if (forced === undefined || forced === null) return params;
    return { ...params, filter: [...andList(forced), ...andList(params.filter)] as unknown[] };
  };
  const search = (ctx: Ctx, uid: string, params: SearchParams): SearchResult => engine.get(uid).search(withRules(ctx, uid, params));
  /** Waits for a background (re)build of the full-text index instead of doing it synchronously. */
  const ready = async (...uids: unknown[]) => {
    for (const uid of uids) if (typeof uid === "string") await engine.find(uid)?.text.warm();
  };

  r.add("POST", "/indexes/:uid/search", async (ctx) => {
    const params = parseSearchBody(jsonBody(ctx, true));
    await ready(ctx.params.uid);
    return ok(search(ctx, ctx.params.uid!, params));
  }, "search");
  r.add("GET", "/indexes/:uid/search", async (ctx) => {
    const params = parseSearchQuery(ctx.query);
    await ready(ctx.params.uid);
    return ok(search(ctx, ctx.params.uid!, params));
  }, "search");

  r.add(
    "POST",
    "/multi-search",
    async (ctx) => {
      const started = performance.now();
      const body = jsonBody(ctx);
      if (!isPlainObject(body) || !Array.isArray(body.queries)) throw invalidType("bad_request", ".queries", "an array", isPlainObject(body) ? body.queries : body);
      await ready(...body.queries.map((q) => (isPlainObject(q) ? q.indexUid : undefined)));
      const federation = body.federation;
      const runs = body.queries.map((query, i) => {
        const where = `.queries[${i}]`;
        try {
          if (!isPlainObject(query) || typeof query.indexUid !== "string") throw bad("missing_index_uid", `Missing field \`indexUid\` inside \`${where}\``);
          const { indexUid, federationOptions, ...rest } = query;
          const params = parseSearchBody(rest, where);
          if (federation) Object.assign(params, { offset: 0, limit: fedLimit(federation), page: undefined, hitsPerPage: undefined, showRankingScore: true });
          return { indexUid, weight: isPlainObject(federationOptions) && typeof federationOptions.weight === "number" ? federationOptions.weight : 1, wantScore: rest.showRankingScore === true, result: search(ctx, indexUid, params) };
        } catch (err) {
          const e = asMeiliError(err);
          throw new MeiliError(e.status, e.code, `Inside \`${where}\`: ${e.message}`, e.type);
        }
      });
      if (!federation) return ok({ results: runs.map((run) => ({ indexUid: run.indexUid, ...run.result })) });
      const f = isPlainObject(federation) ? federation : {};
      const offset = typeof f.offset === "number" ? f.offset : 0;
      const limit = typeof f.limit === "number" ? f.limit : 20;
      const merged = runs.flatMap((run, queriesPosition) =>
        (run.result.hits as Record<string, unknown>[]).map((hit) => {
          const weighted = (hit._rankingScore as number) * run.weight;
          const { _rankingScore, ...rest } = hit;
          return { ...rest, ...(run.wantScore ? { _rankingScore } : {}), _federation: { indexUid: run.indexUid, queriesPosition, weightedRankingScore: weighted } };
        }),
      );
      merged.sort((a, b) => b._federation.weightedRankingScore - a._federation.weightedRankingScore);
      return ok({
        hits: merged.slice(offset, offset + limit),
        processingTimeMs: Math.round(performance.now() - started),
        limit,
        offset,
        estimatedTotalHits: runs.reduce((s, run) => s + (run.result.estimatedTotalHits as number), 0),
      });
    },
    "search",
  );

  r.add(
    "POST",
    "/indexes/:uid/facet-search",
    async (ctx) => {
      const started = performance.now();
      await ready(ctx.params.uid);
      const index = engine.get(ctx.params.uid!);
      const body = jsonBody(ctx);
      if (!isPlainObject(body)) throw invalidType("bad_request", "", "an object", body);
      const { facetName, facetQuery, exhaustiveFacetCount: _exhaustive, ...rest } = body;
      if (typeof facetName !== "string") throw bad("missing_facet_search_facet_name", "Missing field `facetName`");
      if (!index.settings.facetSearch) throw bad("facet_search_disabled", `Index \`${index.uid}\`: The facet search is disabled for this index.`);
      if (!filterablePatterns(index.settings).some((p) => patternMatches(p, facetName)))
        throw bad("invalid_facet_search_facet_name", `Index \`${index.uid}\`: Attribute \`${facetName}\` is not facet-searchable. Note that attributes are facet-searchable when they are filterable.`);
      const params = parseSearchBody(rest);
      const res = search(ctx, index.uid, { ...params, facets: [facetName], limit: 0, offset: 0 });
      const dist = (res.facetDistribution as Record<string, Record<string, number>>)[facetName] ?? {};
      const wanted = typeof facetQuery === "string" ? tokenize(facetQuery) : [];
      const facetHits = Object.entries(dist)
        .filter(([value]) => {
          const words = tokenize(value);
          return wanted.every((w) => words.some((t) => t.startsWith(w))) || foldFacet(value).startsWith(foldFacet(String(facetQuery ?? "")));
        })
        .map(([value, count]) => ({ value, count }));
      return ok({ facetHits, facetQuery: typeof facetQuery === "string" ? facetQuery : null, processingTimeMs: Math.round(performance.now() - started) });
    },
    "search",
  );

  r.add("GET", "/health", () => ok({ status: "available" }), "public");
  r.add("GET", "/version", () => ok(FAKE_VERSION));
  r.add("GET", "/stats", () => {
    const indexes: Record<string, unknown> = {};
    let size = 0;
    let lastUpdate: string | null = null;
    for (const index of engine.list()) {
      const stats = index.stats(queue.isIndexing(index.uid));
      size += stats.rawDocumentDbSize;
      indexes[index.uid] = stats;
      if (!lastUpdate || index.updatedAt > lastUpdate) lastUpdate = index.updatedAt;
    }
    return ok({ databaseSize: size, usedDatabaseSize: size, lastUpdate, indexes });
  });
}

function fedLimit(federation: unknown): number {
  const f = isPlainObject(federation) ? federation : {};
  return (typeof f.offset === "number" ? f.offset : 0) + (typeof f.limit === "number" ? f.limit : 20);
}
