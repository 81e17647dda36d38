// Contract sections for search (matching, filters, facets, sort, pagination,
// formatting, errors), tasks, authentication and persistence.

import { beforeAll, describe, expect, it } from "vitest";
import type { SearchParams } from "meilisearch";
import { apiError, clientFor, expectSucceeded, hitIds, paintings, uniqueUid, type ContractTarget } from "./contract-support";

export function searchContract(getTarget: () => ContractTarget): void {
  const client = () => clientFor(getTarget());

  describe("search", () => {
    const uid = uniqueUid("paintings");
    const index = () => client().index(uid);
    const ids = async (q: string | null, params: SearchParams = {}, sorted = true) => hitIds((await index().search(q, params)).hits, sorted);
    const searchError = async (params: SearchParams, q = "") => {
      const err = await apiError(() => index().search(q, params));
      expect(err.response.status).toBe(400);
      return err;
    };

    beforeAll(async () => {
      expectSucceeded(
        await index()
          .updateSettings({
            searchableAttributes: ["title", "city", "technique", "description", "observations.term"],
            filterableAttributes: ["city", "year", "courses", "observations.term", "framed", "curator", "note", "price", "title"],
            sortableAttributes: ["city", "price", "year"],
          })
          .waitTask(),
      );
      expectSucceeded(await index().addDocuments(paintings, { primaryKey: "id" }).waitTask());
    });

    it("returns every document for an empty or null query", async () => {
      expect(await ids("")).toEqual([1, 2, 3, 4, 6, "p-5"]);
      expect(await ids(null)).toEqual([1, 2, 3, 4, 6, "p-5"]);
    });

    it("folds case and accents", async () => {
      expect(await ids("Sevilla")).toEqual([1, 4]);
      expect(await ids("sevilla")).toEqual([1, 4]);
      expect(await ids("Köln")).toEqual([2]);
      expect(await ids("koln")).toEqual([2]);
      expect(await ids("KOLN")).toEqual([2]);
      expect(await ids("oleo")).toEqual([1]);
      expect(await ids("laud")).toEqual(["p-5"]);
    });

    it("tolerates typos by word length and matches prefixes of the last word", async () => {
      const oneTypo = await ids("gutarra");
      expect(oneTypo).toEqual(expect.arrayContaining([3, "p-5"]));
      expect(oneTypo).not.toContain(1);
      expect(await ids("contrapntio")).toEqual([6]); // 12-letter word, two typos
      expect(await ids("sevila")).toEqual([1, 4]);
      expect(await ids("guit")).toEqual([1, 3, "p-5"]);
      // The last word is a prefix that may carry a typo too ("gutar" → "guitar…", "gitar…").
      expect(await ids("gutar")).toEqual([1, 2, 3, "p-5"]);
      expect(await ids("gutarra callada", {}, false)).toEqual([3, "p-5"]);
      // Under five letters no typo is allowed, even on a prefix.
      expect(await ids("sevi")).toEqual([1, 4]);
      expect(await ids("sebi")).toEqual([]);
      expect(await ids("guitarra callada", {}, false)).toEqual([3, "p-5"]);
    });

    it("searches nested attributes", async () => {
      expect(await ids("verde")).toEqual([3]);
    });

    it("filters with every operator", async () => {
      const cases: [string | (string | string[])[], unknown[]][] = [
        ["city = sevilla", [1, 4]],
        ["city != Sevilla", [2, 3, 6, "p-5"]],
        ["year > 1921", [2, 4, 6]],
        ["year >= 1921", [1, 2, 4, 6]],
        ["year < 1905", ["p-5"]],
        ["year <= 1905", [3, "p-5"]],
        ["year 1900 TO 1930", [1, 2, 3]],
        ["city IN [Sevilla, Granada]", [1, 3, 4]],
        ["city NOT IN [Sevilla, 'Granada']", [2, 6, "p-5"]],
        ["curator EXISTS", [2, "p-5"]],
        ["curator NOT EXISTS", [1, 3, 4, 6]],
        ["curator IS NULL", [2]],
        ["curator IS NOT NULL", [1, 3, 4, 6, "p-5"]],
        ["courses IS EMPTY", [3]],
        ["note IS EMPTY", [4]],
        ["courses IS NOT EMPTY", [1, 2, 4, 6, "p-5"]],
        ["courses = retrato", [1, 4]],
        ["observations.term = azul", [1, 3]],
        ["framed = true", [1, 3, "p-5"]],
        ["city = 'Köln'", [2]],
        ['title = "La guitarra callada"', [3]],
        ["(city = Sevilla OR city = Granada) AND NOT year < 1920", [1, 4]],
        ["city = Sevilla OR city = Granada AND year > 1950", [1, 4]],
        ["NOT (price > 1000 OR framed = false)", [3]],
        [[["city = Lisboa", "city = Porto"], "year > 1900"], [6]],
        [["price < 1000", "framed = true"], [3]],
      ];
      for (const [filter, expected] of cases) expect(await ids("", { filter }), JSON.stringify(filter)).toEqual(expected);
      expect(await ids("guitarra", { filter: "year > 1900" })).toEqual([1, 3]); // prefix "guitarri…" is one typo away
    });

    it("rejects filters on non-filterable attributes and bad syntax", async () => {
      const notFilterable = await searchError({ filter: "technique = tempera" });
      expect(notFilterable.cause?.code).toBe("invalid_search_filter");
      expect(notFilterable.message).toContain("technique");
      for (const filter of ["year >", "city = Sevilla AND", "(city = Sevilla", "city Sevilla"]) {
        expect((await searchError({ filter })).cause?.code, filter).toBe("invalid_search_filter");
      }
      const facets = await searchError({ facets: ["technique"] });
      expect(facets.cause?.code).toBe("invalid_search_facets");
      expect(facets.message).toContain("technique");
    });

    it("computes facet distributions and stats", async () => {
      const res = await index().search("", { facets: ["city", "courses", "year", "framed"] });
      expect(res.facetDistribution?.city).toEqual({ Granada: 1, Köln: 1, Lisboa: 1, Porto: 1, Sevilla: 2 });
      expect(res.facetDistribution?.courses).toEqual({ acuarela: 2, dibujo: 2, grabado: 1, retrato: 2 });
      expect(res.facetDistribution?.framed).toEqual({ false: 3, true: 3 });
      expect(res.facetStats?.year).toEqual({ min: 1888, max: 1975 });
      const narrowed = await index().search("sevilla", { facets: ["city", "price"] });
      expect(narrowed.facetDistribution?.city).toEqual({ Sevilla: 2 });
      expect(narrowed.facetStats?.price).toEqual({ min: 300, max: 1200 });
    });

    it("sorts on sortable attributes only", async () => {
      expect(await ids("", { sort: ["year:asc"] }, false)).toEqual(["p-5", 3, 1, 2, 4, 6]);
      expect(await ids("", { sort: ["year:desc"] }, false)).toEqual([6, 4, 2, 1, 3, "p-5"]);
      expect(await ids("", { sort: ["city:asc", "year:desc"] }, false)).toEqual([3, 2, "p-5", 6, 4, 1]);
      expect(await ids("", { sort: ["price:asc"], filter: "framed = true" }, false)).toEqual([3, 1, "p-5"]);
      expect((await searchError({ sort: ["title:asc"] })).cause?.code).toBe("invalid_search_sort");
    });

    it("paginates with limit/offset and with page/hitsPerPage", async () => {
      const offset = await index().search("", { sort: ["year:asc"], limit: 2, offset: 1 });
      expect(hitIds(offset.hits)).toEqual([3, 1]);
      expect(offset).toMatchObject({ limit: 2, offset: 1, estimatedTotalHits: 6, query: "" });
      expect((offset as Record<string, unknown>).totalHits).toBeUndefined();
      expect(typeof offset.processingTimeMs).toBe("number");
      const page = await index().search("", { sort: ["year:asc"], page: 2, hitsPerPage: 4 });
      expect(hitIds(page.hits)).toEqual([4, 6]);
      expect(page).toMatchObject({ page: 2, hitsPerPage: 4, totalPages: 2, totalHits: 6 });
      expect((page as Record<string, unknown>).estimatedTotalHits).toBeUndefined();
      expect((await index().search("")).limit).toBe(20);
    });

    it("retrieves and highlights attributes", async () => {
      const { hits } = await index().search("sevilla", { attributesToRetrieve: ["title", "year"], filter: "year = 1921" });
      expect(hits).toEqual([{ title: "El guitarrista de Sevilla", year: 1921 }]);
      const formatted = await index().search("sevilla", { attributesToHighlight: ["title"], filter: "year = 1921" });
      expect(formatted.hits[0]?._formatted?.title).toBe("El guitarrista de <em>Sevilla</em>");
      const tags = await index().search("koln", { attributesToHighlight: ["city"], highlightPreTag: "<mark>", highlightPostTag: "</mark>" });
      expect(tags.hits[0]?._formatted?.city).toBe("<mark>Köln</mark>");
      const scored = await index().search("guitarra", { showRankingScore: true });
      for (const hit of scored.hits) expect(hit._rankingScore).toBeGreaterThan(0);
    });

    it("supports GET search and multi-search", async () => {
      const get = await index().searchGet("sevilla", { filter: "year > 1930" });
      expect(hitIds(get.hits)).toEqual([4]);
      const multi = await client().multiSearch({
        queries: [
          { indexUid: uid, q: "koln" },
          { indexUid: uid, q: "", filter: "city = Porto", limit: 1 },
        ],
      });
      expect(multi.results.map((r) => r.indexUid)).toEqual([uid, uid]);
      expect(hitIds(multi.results[0]!.hits)).toEqual([2]);
      expect(hitIds(multi.results[1]!.hits)).toEqual([6]);
    });

    it("lists tasks with filters and answers task_not_found", async () => {
      const tasks = await client().tasks.getTasks({ indexUids: [uid], types: ["documentAdditionOrUpdate"], statuses: ["succeeded"] });
      expect(tasks.results.length).toBe(1);
      expect(tasks).toMatchObject({ total: 1, from: tasks.results[0]!.uid, next: null });
      expect(tasks.results[0]).toMatchObject({ indexUid: uid, details: { receivedDocuments: 6, indexedDocuments: 6 } });
      const one = await client().tasks.getTask(tasks.results[0]!.uid);
      expect(one.uid).toBe(tasks.results[0]!.uid);
      const err = await apiError(() => client().tasks.getTask(987_654_321));
      expect(err.response.status).toBe(404);
      expect(err.cause?.code).toBe("task_not_found");
    });

    it("rejects a wrong or missing API key", async ({ skip }) => {
      const target = getTarget();
      if (!target.apiKey) skip();
      const wrong = await apiError(() => clientFor(target, "not-the-key").getIndexes());
      expect(wrong.response.status).toBe(403);
      expect(wrong.cause).toMatchObject({ code: "invalid_api_key", type: "auth" });
      const missing = await apiError(() => clientFor(target, "").getIndexes());
      expect(missing.response.status).toBe(401);
      expect(missing.cause?.code).toBe("missing_authorization_header");
    });

    it("keeps indexes and documents across a restart", async ({ skip }) => {
      const { restart } = getTarget();
      if (!restart) skip();
      await restart!();
      expect((await client().getRawIndex(uid)).primaryKey).toBe("id");
      expect(await index().getDocument("p-5")).toMatchObject({ title: "Laúd y guitarra" });
      expect(await index().getFilterableAttributes()).toContain("observations.term");
      expect(await ids("koln")).toEqual([2]);
      expect(await ids("", { filter: "curator IS NULL" })).toEqual([2]);
    });
  });
}
