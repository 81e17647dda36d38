// Evidence near a place: how `near` and `km` are read, the `_geoRadius` filter and `_geoPoint` sort the
// server sends, and the distances shown beside the hits. The filter is evaluated on documents with the
// search fake's evaluator (the same grammar and semantics as Meilisearch's filters).
//
// Outside references:
// - Rosetta Code, "Haversine formula": (36.12, −86.67) to (33.94, −118.40) is 2886.4444 km on a sphere of
//   radius 6371.0 km (2887.2600 km with 6372.8 km).
// - One degree of latitude along a meridian is πR/180 = 111.1949 km for R = 6371.0 km (common practice:
//   "a degree of latitude is about 111 km").
import { geoCircle } from "d3-geo";
import { describe, expect, it } from "vitest";
import { matchesFilter, parseFilter } from "../../fakes/search/filter";
import { requestFilters } from "@/lib/search/filters";
import { haversineKm, kmToDegrees } from "@/lib/charts/distance";
import { formatKm, geoRadiusFilter, geoSort, nearKm, originName, withDistances, type NearOrigin } from "@/lib/search/near";
import { searchParamsToQuery, searchQuerySchema } from "@/lib/search/schemas";

const read = (query: string) => searchQuerySchema.safeParse(searchParamsToQuery(new URLSearchParams(query)));
const parse = (query: string) => searchQuerySchema.parse(searchParamsToQuery(new URLSearchParams(query)));
const messages = (query: string) => {
  const result = read(query);
  expect(result.success, query).toBe(false);
  return result.error!.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
};

// Nashville International Airport as Rosetta Code gives it, as if it were a gazetteer place.
const bna = (km: number, id = 7): NearOrigin => ({
  place: { id, kind: "area", name: "Nashville", countryCode: "US", country: "United States of America", subdivisionCode: null, latitude: 36.12, longitude: -86.67 },
  km,
});
type Doc = { sourceState: string; _geo?: { lat: number; lng: number } };
const at = (lat: number, lng: number): Doc => ({ sourceState: "published", _geo: { lat, lng } });

describe("reading near and km", () => {
  it("takes a place id and a distance in whole kilometres, 100 km when only the place is given", () => {
    expect(parse("near=7&km=250")).toMatchObject({ near: 7, km: 250 });
    const placeOnly = parse("near=7");
    expect(placeOnly.km).toBeUndefined();
    expect(nearKm(placeOnly)).toBe(100);
    expect(parse("q=lute").near).toBeUndefined();
    expect(parse("near=7&km=1").km).toBe(1);
    expect(parse("near=7&km=2000").km).toBe(2000);
    expect(parse("near=7&sort=distance").sort).toBe("distance");
  });

  it("refuses distances outside 1–2000 km or not whole, and place ids that are not ids", () => {
    for (const km of ["0", "2001", "12.5", "-5", "far"]) {
      expect(messages(`near=7&km=${km}`)).toEqual(["km: Give the distance in whole kilometres, from 1 to 2000."]);
    }
    for (const near of ["0", "-3", "Sevilla", "1.5"]) expect(messages(`near=${near}`)).toEqual(["near: Name the place by its id in the gazetteer."]);
  });

  it("refuses a distance or a sort by distance without a place", () => {
    expect(messages("km=100")).toEqual(["km: Choose a place (near) to measure the distance from."]);
    expect(messages("sort=distance")).toEqual(["sort: Sorting by distance needs a place (near)."]);
  });
});

describe("the filter and sort sent to the search service", () => {
  it("adds _geoRadius in metres from the place the server read", () => {
    expect(requestFilters(parse("near=7&km=100&country=US"), bna(100))).toEqual([`country IN ["US"]`, "_geoRadius(36.12, -86.67, 100000)"]);
    expect(geoRadiusFilter({ ...bna(25), place: { ...bna(25).place, latitude: 0.00001, longitude: -0.5 } })).toBe("_geoRadius(0.00001, -0.5, 25000)");
    expect(geoSort(bna(100))).toBe("_geoPoint(36.12, -86.67):asc");
  });

  it("never sends a search near a place whose coordinates it did not read", () => {
    expect(() => requestFilters(parse("near=7&km=100"))).toThrow(/coordinates of place 7/);
    expect(() => requestFilters(parse("near=7&km=100"), bna(100, 8))).toThrow(/coordinates of place 7/);
    expect(requestFilters(parse("q=lute"), null)).toEqual([]);
  });

  it("keeps documents within the distance: one degree of latitude north is 111.19 km", () => {
    const within = (km: number, doc: object) => matchesFilter(parseFilter(requestFilters(parse(`near=7&km=${km}`), bna(km))), doc);
    const oneDegreeNorth = at(37.12, -86.67);
    expect(within(111, oneDegreeNorth)).toBe(false);
    expect(within(112, oneDegreeNorth)).toBe(true);
    expect(within(222, at(38.12, -86.67))).toBe(false);
    expect(within(223, at(38.12, -86.67))).toBe(true);
    expect(within(1, at(36.12, -86.67))).toBe(true);
    // Los Angeles (LAX) is 2886 km away: beyond the largest distance one may ask for.
    expect(within(2000, at(33.94, -118.4))).toBe(false);
    // A source without a place is never near anything.
    expect(within(2000, { sourceState: "published" })).toBe(false);
  });
});

describe("the distance beside each hit", () => {
  it("matches Rosetta Code's haversine example and one degree of latitude", () => {
    const [lax, north, here, nowhere] = withDistances<Doc>([at(33.94, -118.4), at(37.12, -86.67), at(36.12, -86.67), { sourceState: "draft" }], bna(2000));
    expect(lax.distanceKm).toBeCloseTo(2886.4444, 3);
    expect(north.distanceKm).toBeCloseTo(111.1949, 3);
    expect(here.distanceKm).toBe(0);
    expect(nowhere.distanceKm).toBeNull();
    expect(lax).toMatchObject({ sourceState: "published", _geo: { lat: 33.94, lng: -118.4 } });
  });

  it("reads as whole kilometres from 10 km on, to a tenth below", () => {
    expect(formatKm(2886.4444)).toBe("2,886 km");
    expect(formatKm(111.1949)).toBe("111 km");
    expect(formatKm(3.44)).toBe("3.4 km");
    expect(formatKm(0)).toBe("less than 0.1 km");
    expect(originName(bna(1).place)).toBe("Nashville, United States of America");
    expect(originName({ name: "Kingdom of Naples", country: null })).toBe("Kingdom of Naples");
  });
});

describe("the ring the map draws around the place", () => {
  it("spans one degree for 111.1949 km (πR/180, R = 6371.0 km, common practice)", () => {
    expect(kmToDegrees(111.1949)).toBeCloseTo(1, 5);
  });

  it("has every point at the filter's distance from the place, by the haversine formula", () => {
    const rome = { latitude: 41.89, longitude: 12.48 };
    for (const km of [25, 250, 2000]) {
      const ring = geoCircle().center([rome.longitude, rome.latitude]).radius(kmToDegrees(km))();
      for (const [longitude, latitude] of ring.coordinates[0]) expect(haversineKm(rome, { latitude, longitude })).toBeCloseTo(km, 6);
    }
  });
});
