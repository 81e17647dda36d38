// The search page's address helpers and its charts' inputs (pure).
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { NearChip } from "@/components/search/near-chip";
import { isoDay, searchHistogram, searchPlaces } from "@/lib/search/page/charts";
import { decadeHref, facetParam, toggleValue, toUrlParams, withParams } from "@/lib/search/page/url";
import type { ChartHit } from "@/lib/search/query";

describe("the search address", () => {
  const params = toUrlParams({ q: "rasgueado", country: ["ES", "IT"], page: "3", t_right_hand_technique: "strumming" });

  it("switches one value of a list filter on and off and goes back to the first page", () => {
    expect(toggleValue(params, "country", "IT")).toBe("/search?q=rasgueado&t_right_hand_technique=strumming&country=ES");
    expect(toggleValue(params, "country", "PT")).toBe("/search?q=rasgueado&t_right_hand_technique=strumming&country=ES&country=IT&country=PT");
  });

  it("reads comma-separated lists as the API does", () => {
    expect(toggleValue(toUrlParams({ country: "ES,IT" }), "country", "ES")).toBe("/search?country=IT");
  });

  it("keeps the page only when asked, and removes a parameter given null", () => {
    expect(withParams(params, { page: "4" })).toContain("page=4");
    expect(withParams(params, { q: null })).toBe("/search?country=ES&country=IT&t_right_hand_technique=strumming");
  });

  it("turns a decade bar into a date range that replaces decade filters", () => {
    expect(decadeHref(toUrlParams({ decade: "1640" }), 1620, 10)).toBe("/search?from=1620&to=1629");
  });

  it("names the parameter of each facet", () => {
    expect(facetParam("objectType")).toBe("type");
    expect(facetParam("collectionId")).toBe("collection");
    expect(facetParam("t_rose")).toBe("t_rose");
    expect(facetParam("authorId")).toBeNull();
  });
});

describe("the search charts' inputs", () => {
  const hit = (over: Partial<ChartHit>): ChartHit => ({ regionId: 1, dated: true, placeId: null, place: null, country: null, ...over }) as ChartHit;

  it("reads the index's day numbers as ISO days", () => {
    expect(isoDay(16500615)).toBe("1650-06-15");
    expect(isoDay(undefined)).toBeNull();
  });

  // Aoristic weights (docs/charts.md, after Ratcliffe 2002): 1640/1660 read as [1640, 1660) gives half to each decade.
  it("spreads a dating over its decades and stacks by the chosen aspect", () => {
    const h = searchHistogram(
      [
        hit({ dateFrom: 16400101, dateTo: 16601231, t_right_hand_technique: ["strumming"] }),
        hit({ dateFrom: 16500101, dateTo: 16501231, t_right_hand_technique: ["plucking"] }),
        hit({ dated: false }),
      ],
      "right_hand_technique",
    );
    expect(h.bins.map((b) => [b.label, b.total])).toEqual([["1640s", 0.5], ["1650s", 1.5]]);
    const strummed = h.series.findIndex((s) => s.key === "strumming");
    expect(h.bins.map((b) => b.bySeries[strummed])).toEqual([0.5, 0.5]);
    expect(h.totals.undated).toBe(1);
  });

  it("falls back to the evidence's own span when the asked range is out of reach", () => {
    const h = searchHistogram([hit({ dateFrom: 16250101, dateTo: 16251231 })], null, { from: "1900" });
    expect(h.bins.map((b) => b.label)).toEqual(["1620s"]);
  });

  it("counts places by gazetteer id and countries by code", () => {
    const s = searchPlaces([
      hit({ placeId: 7, place: "Sevilla", country: "ES", _geo: { lat: 37.38, lng: -5.97 } }),
      hit({ placeId: 7, place: "Sevilla", country: "ES", _geo: { lat: 37.38, lng: -5.97 } }),
      hit({ country: "IT" }),
      hit({}),
    ]);
    expect(s.places.map((p) => [p.name, p.count])).toEqual([["Sevilla", 2]]);
    expect(s.countries).toEqual([{ code: "ES", count: 2 }, { code: "IT", count: 1 }]);
    expect(s.unplaced).toBe(1);
    expect(s.withoutCoordinates).toBe(1);
  });
});

describe("the chip of a search near a place", () => {
  const near = {
    place: { id: 7, kind: "city" as const, name: "Sevilla", countryCode: "ES", country: "Spain", subdivisionCode: "51", latitude: 37.38, longitude: -5.97 },
    km: 100,
  };
  const chip = (query: Record<string, string>) => renderToStaticMarkup(createElement(NearChip, { near, params: toUrlParams(query) }));

  it("says how far from where, and removes the place, the distance and the sort by distance", () => {
    const html = chip({ q: "lute", near: "7", km: "100", sort: "distance", page: "2" });
    expect(html).toContain("Within 100 km of Sevilla, Spain");
    expect(html).toContain('aria-label="Remove the filter within 100 km of Sevilla, Spain"');
    expect(html).toContain('href="/search?q=lute"');
  });

  it("keeps any other sort", () => {
    expect(chip({ near: "7", km: "100", sort: "date", country: "ES" })).toContain('href="/search?sort=date&amp;country=ES"');
  });
});
