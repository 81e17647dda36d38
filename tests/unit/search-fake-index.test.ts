// The search fake's filter and facet index (fakes/search/columns.ts and friends) against the plain
// per-document code it replaces on the search path: matchesFilter, computeFacets and fieldPaths stay
// as the reference. Property-style: seeded random documents (mixed types, case and accents, arrays,
// nested objects, nulls, empties, dotted keys, geo points) and random filters, through adds,
// replacements and deletions, must give exactly the reference's ids, counts, labels and path order.
import { describe, expect, it } from "vitest";
import { Bitset } from "../../fakes/search/bitset";
import { DocColumns } from "../../fakes/search/doc-columns";
import { countFacets } from "../../fakes/search/facet-count";
import type { Doc } from "../../fakes/search/fields";
import { filterSlots } from "../../fakes/search/filter-index";
import { matchesFilter, parseFilter } from "../../fakes/search/filter";
import { computeFacets, documentPaths } from "../../fakes/search/format";
import { defaultSettings } from "../../fakes/search/settings";

function random(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s ^ (s >>> 15), 2246822519) + 0x6d2b79f5) >>> 0) / 2 ** 32);
}

// Invented values: places and techniques of guitar paintings, in several spellings and types.
const CITIES = ["Sevilla", "sevilla", " Sevilla ", "SEVILLA", "Köln", "koln", "Köln", "Granada", "Lisboa", "1640", "0x10", "", "true"];
const TECHNIQUES = ["strumming", "plucking", "Strumming", "rasgueado", "punteado"];
const YEARS = [1600, 1640, 1640.0, -0, 0, 1700.5, "1640", " 1650 ", "1e3", "abc"];

type R = () => number;
const pick = <T,>(r: R, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;
const maybe = (r: R, p: number) => r() < p;

function randomDoc(r: R, id: number): Doc {
  const doc: Doc = { id };
  if (maybe(r, 0.8)) doc.city = pick(r, CITIES);
  if (maybe(r, 0.1)) doc.city = null;
  if (maybe(r, 0.8)) doc.year = pick(r, YEARS);
  if (maybe(r, 0.6)) doc.tags = Array.from({ length: Math.floor(r() * 4) }, () => (maybe(r, 0.2) ? [pick(r, TECHNIQUES)] : pick(r, TECHNIQUES)));
  if (maybe(r, 0.5)) doc.framed = maybe(r, 0.3) ? pick(r, ["true", "false"]) : maybe(r, 0.5);
  if (maybe(r, 0.5)) doc.obs = Array.from({ length: Math.floor(r() * 3) }, () => ({ term: pick(r, TECHNIQUES), weight: maybe(r, 0.7) ? Math.floor(r() * 4) : null }));
  if (maybe(r, 0.2)) doc["obs.term"] = pick(r, TECHNIQUES);
  if (maybe(r, 0.15)) doc.note = pick(r, ["", {}, [], null, "lute"]);
  if (maybe(r, 0.4)) doc._geo = { lat: 37 + r() * 2, lng: -6 + r() * 2 };
  return doc;
}

const ATTRS = ["city", "year", "tags", "framed", "obs.term", "obs.weight", "note", "missing"];
const VALUES = ["Sevilla", "KOLN", "köln", "1640", "1640.0", "0", "-0", "1e3", "strumming", "true", "false", "''", "abc", "1700.5", "Granada"];

function randomFilter(r: R, depth = 0): string {
  const roll = r();
  if (depth < 3 && roll < 0.25) {
    const parts = Array.from({ length: 2 + Math.floor(r() * 2) }, () => randomFilter(r, depth + 1));
    return `(${parts.join(maybe(r, 0.5) ? " AND " : " OR ")})`;
  }
  if (depth < 3 && roll < 0.32) return `NOT ${randomFilter(r, depth + 1)}`;
  const attr = pick(r, ATTRS);
  const value = pick(r, VALUES);
  switch (Math.floor(r() * 9)) {
    case 0:
      return `${attr} ${pick(r, ["=", "!=", ">", ">=", "<", "<="])} ${value}`;
    case 1:
      return `${attr} ${maybe(r, 0.5) ? "IN" : "NOT IN"} [${Array.from({ length: Math.floor(r() * 3) }, () => pick(r, VALUES)).join(", ")}]`;
    case 2:
      return `${attr} ${pick(r, VALUES)} TO ${pick(r, VALUES)}`;
    case 3:
      return `${attr} ${pick(r, ["EXISTS", "NOT EXISTS", "IS NULL", "IS NOT NULL", "IS EMPTY", "IS NOT EMPTY"])}`;
    case 4:
      return maybe(r, 0.5) ? `_geoRadius(38, -5, ${Math.floor(r() * 200_000)})` : "_geoBoundingBox([38.5, -4.5], [37.5, -5.5])";
    default:
      return `${attr} = ${value}`;
  }
}

/** An index of random documents, and the same documents as the reference sees them (id → doc, insertion order). */
function build(r: R, count: number) {
  const index = new DocColumns();
  const docs = new Map<string, Doc>();
  const put = (doc: Doc) => {
    index.put(String(doc.id), doc);
    docs.set(String(doc.id), doc);
  };
  const remove = (id: string) => {
    index.remove(id);
    docs.delete(id);
  };
  for (let i = 0; i < count; i++) put(randomDoc(r, i));
  return { index, docs, put, remove };
}

const idsOf = (index: DocColumns, set: Bitset) => [...index.slots.ordered()].filter((s) => set.has(s)).map((s) => index.slots.id(s));
const referenceIds = (docs: Map<string, Doc>, filter: string) => {
  const node = parseFilter(filter);
  return [...docs].filter(([, d]) => matchesFilter(node, d)).map(([id]) => id);
};

describe("search fake: filters from the columns", () => {
  it("find the same documents as the per-document evaluator, through adds, replacements and deletions", () => {
    const r = random(11);
    const { index, docs, put, remove } = build(r, 300);
    let next = 300;
    for (let round = 0; round < 12; round++) {
      for (let i = 0; i < 40; i++) {
        const filter = randomFilter(r);
        expect(idsOf(index, filterSlots(parseFilter(filter), index)), filter).toEqual(referenceIds(docs, filter));
      }
      // Small changes patch the columns; the bigger rounds make them start over.
      const changes = round % 4 === 3 ? 150 : 10;
      for (let i = 0; i < changes; i++) {
        const roll = r();
        const ids = [...docs.keys()];
        if (roll < 0.4 && ids.length) put(randomDoc(r, Number(pick(r, ids))));
        else if (roll < 0.7 && ids.length) remove(pick(r, ids));
        else put(randomDoc(r, next++));
      }
    }
  });

  it("answers the empty index and an index emptied by deletions", () => {
    const index = new DocColumns();
    expect(filterSlots(parseFilter("city = Sevilla"), index).count()).toBe(0);
    index.put("1", { id: 1, city: "Sevilla" });
    expect(filterSlots(parseFilter("city = SEVILLA"), index).count()).toBe(1);
    index.remove("1");
    expect(filterSlots(parseFilter("city = Sevilla OR NOT city EXISTS"), index).count()).toBe(0);
  });
});

describe("search fake: facets from the columns", () => {
  it("count, label and order facet values as computeFacets does over the matched documents", () => {
    const r = random(5);
    const { index, docs, put } = build(r, 400);
    for (let round = 0; round < 30; round++) {
      const settings = defaultSettings();
      settings.faceting = { maxValuesPerFacet: pick(r, [1, 2, 100]), sortFacetValuesBy: { "*": pick(r, ["alpha", "count"] as const), year: "alpha" } };
      // A random subset in a random order: labels are the first spelling met in hit order.
      const matched = [...docs.keys()].filter(() => maybe(r, 0.5)).sort(() => r() - 0.5);
      const slots = matched.map((id) => index.slots.slot(id)!);
      const facets = ["city", "year", "tags", "framed", "obs.term", "obs.weight", "note", "_geo", "_geo.lat", "missing"];
      const dropEmpty = maybe(r, 0.5);
      const reference = computeFacets(settings, facets, matched.map((id) => docs.get(id)!), dropEmpty);
      const found = countFacets(settings, facets, slots, index, dropEmpty);
      // Object key order is part of the answer (the facet order and the value order).
      expect(JSON.stringify(found)).toBe(JSON.stringify(reference));
      put(randomDoc(r, Number(pick(r, [...docs.keys()]))));
    }
  });

  it("keep many distinct values in the right order when only the first are shown", () => {
    const index = new DocColumns();
    const docs: Doc[] = [];
    for (let i = 0; i < 3000; i++) {
      const doc = { id: i, regionId: 5000 - i, decade: [1600 + (i % 7) * 10, 1610 + (i % 5) * 10] };
      docs.push(doc);
      index.put(String(i), doc);
    }
    const settings = defaultSettings();
    settings.faceting = { maxValuesPerFacet: 20, sortFacetValuesBy: { "*": "count" } };
    const found = countFacets(settings, ["regionId", "decade"], index.slots.ordered(), index, true);
    expect(JSON.stringify(found)).toBe(JSON.stringify(computeFacets(settings, ["regionId", "decade"], docs, true)));
    expect(Object.keys(found.facetDistribution.regionId!)[0]).toBe("2001");
  });
});

describe("search fake: field paths for facets *", () => {
  it("list every path in first-seen order, as fieldPaths over the documents does", () => {
    const r = random(3);
    const { index, docs, put } = build(r, 200);
    put({ id: 9000, "a.b": 1, a: { b: 2, c: [{ d: 1 }, { e: 2 }] }, "": { x: 1 } });
    for (let round = 0; round < 10; round++) {
      const matched = [...docs.keys()].filter(() => maybe(r, 0.3)).sort(() => r() - 0.5);
      matched.push("9000");
      const found = [...index.fieldPaths(matched.map((id) => index.slots.slot(id)!))];
      expect(found).toEqual([...documentPaths(matched.map((id) => docs.get(id)!))]);
      put(randomDoc(r, Number(pick(r, [...docs.keys()]))));
    }
  });
});

describe("search fake: slot bit sets", () => {
  it("combine and count across word boundaries", () => {
    const a = new Bitset(100);
    const b = new Bitset(100);
    for (const i of [0, 31, 32, 63, 64, 99]) a.add(i);
    for (const i of [31, 32, 50, 99]) b.add(i);
    expect(a.clone().and(b).count()).toBe(3);
    expect(a.clone().or(b).count()).toBe(7);
    expect(a.clone().andNot(b).count()).toBe(3);
    expect(a.has(99) && !a.has(98) && !a.has(150)).toBe(true);
    expect(a.resized(200).count()).toBe(6);
  });
});
