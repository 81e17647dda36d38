// Contract sections for the instance, indexes, settings and documents.

import { describe, expect, it } from "vitest";
import { apiError, clientFor, expectSucceeded, hitIds, paintings, uniqueUid, type ContractTarget } from "./contract-support";

const DEFAULT_RULES = ["words", "typo", "proximity", "attribute", "sort", "exactness"];

export function adminContract(getTarget: () => ContractTarget): void {
  const client = () => clientFor(getTarget());

  it("answers health and version", async () => {
    expect(await client().health()).toEqual({ status: "available" });
    expect(await client().isHealthy()).toBe(true);
    expect(typeof (await client().getVersion()).pkgVersion).toBe("string");
    const res = await fetch(`${getTarget().url}/health`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/application\/json/);
  });

  describe("indexes", () => {
    it("creates, reads, lists, updates and deletes an index", async () => {
      const uid = uniqueUid("lifecycle");
      const created = await client().createIndex(uid, { primaryKey: "id" }).waitTask();
      expectSucceeded(created);
      expect(created).toMatchObject({ type: "indexCreation", indexUid: uid, canceledBy: null });
      expect(created.duration).toMatch(/^PT/);
      for (const at of [created.enqueuedAt, created.startedAt, created.finishedAt]) expect(Number.isNaN(Date.parse(at!))).toBe(false);

      const raw = await client().getRawIndex(uid);
      expect(raw).toMatchObject({ uid, primaryKey: "id" });
      expect(Date.parse(raw.createdAt)).toBeGreaterThan(0);
      expect((await client().getIndex(uid)).primaryKey).toBe("id");
      const list = await client().getRawIndexes({ limit: 1000 });
      expect(list).toMatchObject({ offset: 0, limit: 1000 });
      expect(list.total).toBeGreaterThanOrEqual(1);
      expect(list.results.map((i) => i.uid)).toContain(uid);

      const again = await client().createIndex(uid).waitTask();
      expect(again.status).toBe("failed");
      expect(again.error?.code).toBe("index_already_exists");

      expectSucceeded(await client().updateIndex(uid, { primaryKey: "ref" }).waitTask());
      expect((await client().getRawIndex(uid)).primaryKey).toBe("ref");

      const deleted = await client().deleteIndex(uid).waitTask();
      expectSucceeded(deleted);
      expect(deleted.type).toBe("indexDeletion");
      const err = await apiError(() => client().getRawIndex(uid));
      expect(err.response.status).toBe(404);
      expect(err.cause).toMatchObject({ code: "index_not_found", type: "invalid_request" });
      expect(err.cause?.link).toMatch(/index_not_found/);
      expect(err.message).toContain(uid);
    });

    it("answers 404 index_not_found for reads on a missing index", async () => {
      const index = client().index(uniqueUid("missing"));
      for (const call of [() => index.search("x"), () => index.getSettings(), () => index.getDocuments(), () => index.getStats()]) {
        const err = await apiError(call);
        expect(err.response.status).toBe(404);
        expect(err.cause?.code).toBe("index_not_found");
      }
    });
  });

  describe("settings", () => {
    it("round-trips settings and creates the index implicitly", async () => {
      const index = client().index(uniqueUid("settings"));
      const task = await index
        .updateSettings({
          searchableAttributes: ["title", "technique"],
          filterableAttributes: ["city", "year"],
          sortableAttributes: ["price", "year"],
          rankingRules: [...DEFAULT_RULES, "price:asc"],
          stopWords: ["de", "la"],
          synonyms: { guitarra: ["vihuela"] },
          distinctAttribute: "title",
          typoTolerance: { minWordSizeForTypos: { oneTypo: 4, twoTypos: 8 } },
          faceting: { maxValuesPerFacet: 50 },
          pagination: { maxTotalHits: 500 },
        })
        .waitTask();
      expectSucceeded(task);
      expect(task.type).toBe("settingsUpdate");
      const s = await index.getSettings();
      expect(s).toMatchObject({
        searchableAttributes: ["title", "technique"],
        filterableAttributes: ["city", "year"],
        sortableAttributes: ["price", "year"],
        displayedAttributes: ["*"],
        rankingRules: [...DEFAULT_RULES, "price:asc"],
        stopWords: ["de", "la"],
        synonyms: { guitarra: ["vihuela"] },
        distinctAttribute: "title",
        faceting: { maxValuesPerFacet: 50, sortFacetValuesBy: { "*": "alpha" } },
        pagination: { maxTotalHits: 500 },
      });
      expect(s.typoTolerance).toMatchObject({ enabled: true, minWordSizeForTypos: { oneTypo: 4, twoTypos: 8 } });
    });

    it("updates and resets single settings", async () => {
      const index = client().index(uniqueUid("single"));
      expectSucceeded(await index.updateFilterableAttributes(["city", "courses"]).waitTask());
      expect(await index.getFilterableAttributes()).toEqual(["city", "courses"]);
      expectSucceeded(await index.updateSortableAttributes(["year"]).waitTask());
      expect(await index.getSortableAttributes()).toEqual(["year"]);
      expectSucceeded(await index.updateSearchableAttributes(["title", "city"]).waitTask());
      expect(await index.getSearchableAttributes()).toEqual(["title", "city"]);
      expectSucceeded(await index.updateDisplayedAttributes(["title", "city"]).waitTask());
      expect(await index.getDisplayedAttributes()).toEqual(["title", "city"]);
      expectSucceeded(await index.updateRankingRules(["words", "sort", "year:desc"]).waitTask());
      expect(await index.getRankingRules()).toEqual(["words", "sort", "year:desc"]);
      expectSucceeded(await index.updateStopWords(["el", "los"]).waitTask());
      expect(await index.getStopWords()).toEqual(["el", "los"]);
      expectSucceeded(await index.updateSynonyms({ laud: ["bandurria"] }).waitTask());
      expect(await index.getSynonyms()).toEqual({ laud: ["bandurria"] });
      expectSucceeded(await index.updateDistinctAttribute("city").waitTask());
      expect(await index.getDistinctAttribute()).toBe("city");
      expectSucceeded(await index.updateTypoTolerance({ enabled: false }).waitTask());
      expect((await index.getTypoTolerance())?.enabled).toBe(false);
      expectSucceeded(await index.updateFaceting({ sortFacetValuesBy: { city: "count" } }).waitTask());
      expect(await index.getFaceting()).toEqual({ maxValuesPerFacet: 100, sortFacetValuesBy: { "*": "alpha", city: "count" } });
      expectSucceeded(await index.updatePagination({ maxTotalHits: 50 }).waitTask());
      expect(await index.getPagination()).toEqual({ maxTotalHits: 50 });

      expectSucceeded(await index.resetFilterableAttributes().waitTask());
      expect(await index.getFilterableAttributes()).toEqual([]);
      expectSucceeded(await index.resetSettings().waitTask());
      const s = await index.getSettings();
      expect(s).toMatchObject({
        displayedAttributes: ["*"],
        searchableAttributes: ["*"],
        filterableAttributes: [],
        sortableAttributes: [],
        rankingRules: DEFAULT_RULES,
        stopWords: [],
        synonyms: {},
        distinctAttribute: null,
        faceting: { maxValuesPerFacet: 100, sortFacetValuesBy: { "*": "alpha" } },
        pagination: { maxTotalHits: 1000 },
      });
      expect(s.typoTolerance).toMatchObject({ enabled: true, minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 } });
    });
  });

  describe("documents", () => {
    it("adds, replaces, updates, fetches and deletes documents", async () => {
      const index = client().index(uniqueUid("docs"));
      // Implicit index creation and primary key inference from the `id` field.
      const added = await index.addDocuments(paintings.slice(0, 4)).waitTask();
      expectSucceeded(added);
      expect(added).toMatchObject({ type: "documentAdditionOrUpdate", details: { receivedDocuments: 4, indexedDocuments: 4 } });
      expect((await index.getRawInfo()).primaryKey).toBe("id");
      expect(await index.getDocument(2)).toMatchObject({ id: 2, city: "Köln" });
      expect(await index.getDocument(1, { fields: ["title"] })).toEqual({ title: "El guitarrista de Sevilla" });

      expectSucceeded(await index.addDocuments([{ id: 1, title: "Retrato nuevo" }]).waitTask());
      expect(await index.getDocument(1)).toEqual({ id: 1, title: "Retrato nuevo" });
      expectSucceeded(await index.updateDocuments([{ id: 2, year: 1931 }, { id: "n-7", title: "Bandurria" }]).waitTask());
      expect(await index.getDocument(2)).toMatchObject({ id: 2, city: "Köln", year: 1931 });
      expect(await index.getDocument("n-7")).toEqual({ id: "n-7", title: "Bandurria" });

      const page = await index.getDocuments({ limit: 2, offset: 1, fields: ["id"] });
      expect(page).toEqual({ results: [{ id: 2 }, { id: 3 }], offset: 1, limit: 2, total: 5 });
      expectSucceeded(await index.updateFilterableAttributes(["city", "year"]).waitTask());
      const filtered = await index.getDocuments({ filter: "city = sevilla", fields: ["id"] });
      expect(filtered.results).toEqual([{ id: 4 }]);
      expect((await index.getStats()).numberOfDocuments).toBe(5);

      expectSucceeded(await index.deleteDocument(1).waitTask());
      const missing = await apiError(() => index.getDocument(1));
      expect(missing.response.status).toBe(404);
      expect(missing.cause?.code).toBe("document_not_found");
      const batch = await index.deleteDocuments(["2", "n-7"]).waitTask();
      expectSucceeded(batch);
      expect(batch).toMatchObject({ type: "documentDeletion", details: { deletedDocuments: 2 } });
      expectSucceeded(await index.deleteDocuments({ filter: "year < 1910" }).waitTask());
      expect(hitIds((await index.getDocuments()).results)).toEqual([4]);
      expectSucceeded(await index.deleteAllDocuments().waitTask());
      expect((await index.getDocuments()).total).toBe(0);
    });

    it("fails the task for a document without a valid primary key", async () => {
      const uid = uniqueUid("nopk");
      expectSucceeded(await client().createIndex(uid, { primaryKey: "id" }).waitTask());
      const index = client().index(uid);
      const missing = await index.addDocuments([{ title: "Sin identificador" }]).waitTask();
      expect(missing.status).toBe("failed");
      expect(missing.error).toMatchObject({ code: "missing_document_id", type: "invalid_request" });
      expect(missing.error?.link).toMatch(/missing_document_id/);
      const invalid = await index.addDocuments([{ id: "no válido!", title: "x" }]).waitTask();
      expect(invalid.status).toBe("failed");
      expect(invalid.error?.code).toBe("invalid_document_id");
      expect((await index.getStats()).numberOfDocuments).toBe(0);
    });
  });
}
