// Places on the map: grouping, country codes, projection and the haversine distance.
import { describe, expect, it } from "vitest";
import { alpha2FromNumeric } from "@/lib/charts/country-codes";
import { haversineKm } from "@/lib/charts/distance";
import { aggregatePlaces, choroplethClasses, type PlacedEvidence } from "@/lib/charts/places";
import { boxAround, circleRadius, fitProjection, makeProjection, projectPoint } from "@/lib/charts/projection";
import { worldMap } from "@/lib/charts/world-map";

describe("haversine distance — Rosetta Code, 'Haversine formula'", () => {
  const nashville = { latitude: 36.12, longitude: -86.67 };
  const losAngeles = { latitude: 33.94, longitude: -118.4 };

  it("gives 2886.4444 km with R = 6371.0 km (IUGG mean radius, the default)", () => {
    expect(haversineKm(nashville, losAngeles)).toBeCloseTo(2886.4444, 4);
  });

  it("gives 2887.2600 km with R = 6372.8 km", () => {
    expect(haversineKm(nashville, losAngeles, 6372.8)).toBeCloseTo(2887.26, 4);
  });

  it("is zero for one point and refuses a latitude beyond the pole", () => {
    expect(haversineKm(nashville, nashville)).toBe(0);
    expect(() => haversineKm({ latitude: 91, longitude: 0 }, nashville)).toThrow(RangeError);
  });
});

describe("ISO 3166-1 numeric → alpha-2 (ISO 3166-1 code tables)", () => {
  it("maps Spain, Italy and the Netherlands", () => {
    expect(alpha2FromNumeric("724")).toBe("ES");
    expect(alpha2FromNumeric("380")).toBe("IT");
    expect(alpha2FromNumeric(528)).toBe("NL");
  });

  it("accepts codes without their leading zero and refuses unassigned ones", () => {
    expect(alpha2FromNumeric("036")).toBe("AU");
    expect(alpha2FromNumeric(36)).toBe("AU");
    expect(alpha2FromNumeric("999")).toBeNull();
    expect(alpha2FromNumeric(undefined)).toBeNull();
  });
});

describe("aggregatePlaces", () => {
  const sevilla = { id: 7, name: "Sevilla", countryCode: "es", latitude: 37.38283, longitude: -5.97317 };
  const items: PlacedEvidence[] = [
    { place: sevilla },
    { place: sevilla, weight: 2 },
    { place: { name: "Napoli", countryCode: "IT", latitude: 40.85216, longitude: 14.26811 } },
    { place: { name: "Naples", countryCode: "IT", latitude: 40.8542, longitude: 14.2681 } },
    { place: { name: "Roma", countryCode: "IT", latitude: 41.89193, longitude: 12.51133 } },
    { place: { name: "Kingdom of Naples", countryCode: "IT", latitude: null, longitude: null } },
    { place: null },
    {},
  ];
  const s = aggregatePlaces(items);

  it("groups by gazetteer id, else by coordinates rounded to two decimals", () => {
    expect(s.places.map((p) => [p.name, p.count])).toEqual([
      ["Sevilla", 3],
      ["Napoli", 2],
      ["Roma", 1],
    ]);
    expect(s.places[0]).toMatchObject({ key: "id:7", id: 7, countryCode: "ES", latitude: 37.38283 });
    expect(s.places[1]).toMatchObject({ key: "at:40.85,14.27", latitude: 40.85, longitude: 14.27 });
  });

  it("counts countries for every item with a code, placed or not", () => {
    expect(s.countries).toEqual([
      { code: "IT", count: 4 },
      { code: "ES", count: 3 },
    ]);
    expect(s.withoutCoordinates).toBe(1);
    expect(s.unplaced).toBe(2);
  });
});

describe("choropleth classes", () => {
  it("are geometric from 1 to the largest count, with whole-number bounds", () => {
    const c = choroplethClasses(100, 4);
    expect(c.breaks).toEqual([1, 3, 10, 32]);
    expect(c.labels).toEqual(["1–2", "3–9", "10–31", "32+"]);
    expect([0, 1, 2, 3, 9, 10, 31, 32, 100].map(c.classOf)).toEqual([0, 1, 1, 2, 2, 3, 3, 4, 4]);
  });

  it("shrink to fewer classes for small counts", () => {
    expect(choroplethClasses(1).breaks).toEqual([1]);
    expect(choroplethClasses(3).labels).toEqual(["1", "2+"]);
    expect(choroplethClasses(0).breaks).toEqual([]);
  });
});

describe("projection", () => {
  it("puts longitude 0, latitude 0 in the middle of a fitted Natural Earth map", () => {
    const spec = fitProjection("naturalEarth1", 960, 500, 4);
    const [x, y] = projectPoint(makeProjection(spec), 0, 0)!;
    expect(x).toBeCloseTo(480, 6);
    expect(y).toBeCloseTo(250, 6);
  });

  it("does the same for Equal Earth, and keeps the globe inside the box", () => {
    const projection = makeProjection(fitProjection("equalEarth", 800, 400));
    expect(projectPoint(projection, 0, 0)).toEqual([400, 200]);
    for (const [lon, lat] of [[-180, 0], [180, 0], [0, 90], [0, -90]]) {
      const [x, y] = projectPoint(projection, lon, lat)!;
      expect(x).toBeGreaterThanOrEqual(-1e-6);
      expect(x).toBeLessThanOrEqual(800 + 1e-6);
      expect(y).toBeGreaterThanOrEqual(-1e-6);
      expect(y).toBeLessThanOrEqual(400 + 1e-6);
    }
  });

  it("sizes circles by the square root of the count, so area follows the count", () => {
    expect(circleRadius(100, 100, 16)).toBe(16);
    expect(circleRadius(25, 100, 16)).toBe(8);
    expect(circleRadius(0, 100, 16)).toBe(0);
    expect(circleRadius(1, 10_000, 16)).toBe(2.5);
  });
});

describe("worldMap (Natural Earth 1:110m from world-atlas)", () => {
  const map = worldMap({ width: 960, height: 500 });

  it("draws the countries with their alpha-2 codes", () => {
    expect(map.countries.length).toBeGreaterThan(170);
    const codes = new Set(map.countries.map((c) => c.code));
    for (const code of ["ES", "IT", "NL", "PT", "FR", "DE", "GB"]) expect(codes.has(code)).toBe(true);
    expect(map.sphere.startsWith("M")).toBe(true);
  });

  it("places Madrid inside Spain's outline", () => {
    const spain = map.countries.find((c) => c.code === "ES")!;
    const numbers = spain.d.match(/-?\d+(\.\d+)?/g)!.map(Number);
    const xs = numbers.filter((_, i) => i % 2 === 0);
    const ys = numbers.filter((_, i) => i % 2 === 1);
    const [x, y] = projectPoint(makeProjection(map.projection), -3.70379, 40.41678)!;
    expect(x).toBeGreaterThan(Math.min(...xs));
    expect(x).toBeLessThan(Math.max(...xs));
    expect(y).toBeGreaterThan(Math.min(...ys));
    expect(y).toBeLessThan(Math.max(...ys));
  });
});

describe("focused maps", () => {
  const places = [
    { latitude: 37.38, longitude: -5.97 },
    { latitude: 52.37, longitude: 4.89 },
    { latitude: 40.85, longitude: 14.27 },
  ];

  it("boxAround widens the points' box by a margin, and to a minimum span", () => {
    // Longitudes span 20.24° (> 20): 3° margin each side; latitudes span 15°: 3° (> (20 − 15) / 2).
    const box = boxAround(places, 3, 20)!;
    [box.west, box.south, box.east, box.north].forEach((v, i) => expect(v).toBeCloseTo([-8.97, 34.38, 17.27, 55.37][i], 9));
    expect(boxAround([{ latitude: 50, longitude: 10 }], 3, 20)).toEqual({ west: 0, south: 40, east: 20, north: 60 });
    expect(boxAround([])).toBeUndefined();
  });

  it("fits the box inside the map and leaves out countries beyond it", () => {
    const focus = boxAround(places)!;
    const map = worldMap({ width: 600, height: 400, focus });
    const projection = makeProjection(map.projection);
    for (const p of places) {
      const [x, y] = projectPoint(projection, p.longitude, p.latitude)!;
      expect(x).toBeGreaterThan(0);
      expect(x).toBeLessThan(600);
      expect(y).toBeGreaterThan(0);
      expect(y).toBeLessThan(400);
    }
    const codes = map.countries.map((c) => c.code);
    expect(codes).toContain("ES");
    expect(codes).toContain("NL");
    expect(codes).not.toContain("AU");
    expect(codes).not.toContain("BR");
  });
});
