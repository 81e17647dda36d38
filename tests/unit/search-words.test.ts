// A search said in words (the heading of its printable list), and the addresses and parameters of its
// exports: every filter carried, the page and the view left out, the cap checked.
import { describe, expect, it } from "vitest";
import { exportHref, toUrlParams } from "@/lib/search/page/url";
import { searchInWords, searchTitle, type WordsContext } from "@/lib/search/page/words";
import { EXPORT_LIMIT, exportParamsToQuery, PRINT_LIMIT, searchExportSchema, searchParamsToQuery, searchQuerySchema } from "@/lib/search/schemas";
import type { AspectView } from "@/lib/vocabulary/types";

const aspect = (id: number, key: string, label: string, kind: AspectView["kind"], terms: [string, string][] = []): AspectView => ({
  id,
  key,
  label,
  description: null,
  kind,
  section: "instrument",
  position: id,
  deprecated: false,
  version: 1,
  terms: terms.map(([k, l], n) => ({ id: id * 100 + n, aspectId: id, key: k, label: l, description: null, position: n, deprecated: false, mergedIntoId: null, version: 1 })),
});

const ctx: WordsContext = {
  // The vocabulary's order, not the address's, decides the order of the aspects.
  vocabulary: [
    aspect(1, "instrument_type", "Instrument", "terms", [["five_course_guitar", "five-course guitar"], ["lute", "lute"]]),
    aspect(2, "right_hand_technique", "Right-hand technique", "terms", [["strumming", "strumming"], ["plucking", "plucking"]]),
    aspect(3, "course_count", "Courses", "count"),
  ],
  countryName: (code) => ({ ES: "Spain", IT: "Italy" })[code] ?? code,
  labels: { collectionId: { "7": "Museo Immaginario, Bologna" }, placeId: { "3": "Sevilla" } },
};

const query = (address: string) => searchQuerySchema.parse(searchParamsToQuery(new URLSearchParams(address)));

describe("a search in words", () => {
  it("names the words, every filter with the vocabulary's and the gazetteer's names, the dates and the order", () => {
    const words = searchInWords(
      query("q=lute player&t_right_hand_technique=strumming,plucking&t_instrument_type=five_course_guitar&n_course_count=5&country=IT&country=ES&collection=7&place=3&from=1620&to=1700&type=painting&sort=date"),
      ctx,
    );
    expect(words.title).toBe("Regions matching “lute player”");
    expect(words.filters).toEqual([
      "Instrument: five-course guitar",
      "Right-hand technique: strumming or plucking",
      "Courses: 5",
      "Object type: Painting",
      "Country: Italy or Spain",
      "Collection: Museo Immaginario, Bologna",
      "Place: Sevilla",
      "Made between 1620 and 1700",
    ]);
    expect(words.order).toBe("Sorted by date, earliest first");
  });

  it("says open date ranges, decades, centuries (1600 = the 17th century, common usage), confidence, state and proposed work", () => {
    const words = searchInWords(query("from=1620&decade=1640&century=1600&confidence=certain&state=proposed&proposed=1"), ctx);
    expect(words.title).toBe("Regions matching these filters");
    expect(words.filters).toEqual([
      "Made in 1620 or later",
      "Decade: 1640s",
      "Century: 17th century",
      "Confidence: Certain",
      "Review state: Proposed",
      "Including proposed work not yet vetted",
    ]);
    expect(searchInWords(query("to=1700"), ctx).filters).toEqual(["Made in 1700 or earlier"]);
  });

  it("is 'All regions' in order of relevance when nothing narrows it, and keeps unknown keys readable", () => {
    expect(searchInWords(query(""), ctx)).toEqual({ title: "All regions", filters: [], order: "In order of relevance" });
    expect(searchInWords(query("t_hand_position=thumb_under&collection=99"), ctx).filters).toEqual(["hand position: thumb under", "Collection: collection 99"]);
  });

  it("names a distance from a gazetteer place, and the nearest-first order", () => {
    const near = { km: 250, place: { id: 9, kind: "city", name: "Roma", countryCode: "IT", country: "Italy", subdivisionCode: null, latitude: 41.89, longitude: 12.48 } } as WordsContext["near"];
    const words = searchInWords(query("near=9&km=250&sort=distance"), { ...ctx, near });
    expect(words.filters).toEqual(["Within 250 km of Roma, Italy"]);
    expect(words.order).toBe("Sorted by distance, nearest first");
  });

  it("reads as one line for a page title", () => {
    const words = searchInWords(query("q=lute&country=IT&from=1620&to=1700"), ctx);
    expect(searchTitle(words)).toBe("Regions matching “lute” — Country: Italy; Made between 1620 and 1700");
  });
});

describe("the exports of a search", () => {
  const params = toUrlParams({ q: "lute", country: ["ES", "IT"], page: "3", view: "table", stack: "posture", proposed: "1", sort: "date", limit: "9" });

  it("link with every filter and the sort, without the page, the view, the chart's stacking or a limit", () => {
    expect(exportHref(params, "csv")).toBe("/api/search/export.csv?q=lute&country=ES&country=IT&proposed=1&sort=date");
    expect(exportHref(params, "print")).toBe("/search/print?q=lute&country=ES&country=IT&proposed=1&sort=date");
    expect(exportHref(new URLSearchParams(), "csv")).toBe("/api/search/export.csv");
  });

  it("read the search's parameters, regions only, and a limit up to the cap", () => {
    const parsed = searchExportSchema(EXPORT_LIMIT).parse(exportParamsToQuery(new URLSearchParams("scope=sources&q=lute&page=999&limit=9&country=it")));
    expect(parsed).toMatchObject({ scope: "regions", q: "lute", country: ["IT"], limit: 9, page: 1 });
    expect(searchExportSchema(EXPORT_LIMIT).parse(exportParamsToQuery(new URLSearchParams())).limit).toBe(EXPORT_LIMIT);
    expect(searchExportSchema(PRINT_LIMIT).parse(exportParamsToQuery(new URLSearchParams())).limit).toBe(PRINT_LIMIT);
  });

  it("refuse a limit past the cap or not a whole number, and the search's own bad parameters, by name", () => {
    const issues = (address: string, max = EXPORT_LIMIT) => {
      const r = searchExportSchema(max).safeParse(exportParamsToQuery(new URLSearchParams(address)));
      return r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    };
    expect(issues("limit=5001")).toEqual(["limit: At most 5,000 regions at a time."]);
    expect(issues("limit=251", PRINT_LIMIT)).toEqual(["limit: At most 250 regions at a time."]);
    expect(issues("limit=2.5")).toHaveLength(1);
    expect(issues("country=Spain")).toEqual(["country.0: Use two-letter country codes."]);
    expect(issues("sort=cheapest")).toHaveLength(1);
  });
});
