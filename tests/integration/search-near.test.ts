// Evidence near a place through GET /api/search: `near=<place id>&km=<n>` keeps the regions and sources
// whose source's place lies within n km of a place of the gazetteer (the server reads its coordinates),
// counts facets over them only, sorts nearest first and gives each hit's distance; unknown places and
// distances out of bounds are refused.
//
// Outside references for the distances:
// - Rosetta Code, "Haversine formula": (36.12, −86.67) to (33.94, −118.40) is 2886.4444 km on a sphere of
//   radius 6371.0 km, beyond the 2000 km one may ask for.
// - One degree of latitude along a meridian is πR/180 = 111.1949 km for R = 6371.0 km (common practice:
//   "a degree of latitude is about 111 km"), so two degrees are 222.39 km.
// - London to Paris is about 344 km in a straight line (from memory).
import { beforeAll, describe, expect, it } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";
import { photographedSource, vocabulary } from "../support/evidence";
import { eventually, searchAs, token, type Answer } from "../support/search";

type NearHit = Answer["hits"][number] & { sourceId: number; distanceKm: number | null };
type NearAnswer = Omit<Answer, "hits"> & { hits: NearHit[]; near: { place: { id: number; name: string; latitude: number; longitude: number }; km: number } | null };

const WORD = token();
let editor: Jar;
const area: Record<"bna" | "north1" | "north2" | "lax", number> = { bna: 0, north1: 0, north2: 0, lax: 0 };
let london = 0;
let paris = 0;
/** Region id per place of its source ("none": a source without a place). */
const region: Record<"bna" | "north1" | "north2" | "lax" | "paris" | "none", number> = { bna: 0, north1: 0, north2: 0, lax: 0, paris: 0, none: 0 };

async function gazetteerCity(name: string, country: string): Promise<number> {
  const res = await call(`/api/places?q=${encodeURIComponent(name)}&kind=city&country=${country}&limit=1`);
  const [found] = ((await res.json()) as { places: { id: number }[] }).places;
  if (!found) throw new Error(`no ${name} in ${country} in the gazetteer`);
  return found.id;
}

async function defineArea(name: string, latitude: number, longitude: number): Promise<number> {
  const res = await call("/api/places", { jar: editor, json: { name: unique(name), countryCode: "US", latitude, longitude } });
  expect(res.status, await res.clone().text()).toBe(200);
  return ((await res.json()) as { place: { id: number } }).place.id;
}

const near = (query: string) => searchAs(undefined, `q=${WORD}&perPage=50&${query}`) as Promise<NearAnswer>;
const regionsOf = (a: NearAnswer) => a.hits.map((h) => h.regionId).sort((x, y) => x - y);
const sorted = (...ids: number[]) => [...ids].sort((x, y) => x - y);

beforeAll(async () => {
  const contributor = await signedIn(DEMO.contributor);
  editor = await signedIn(DEMO.editor);
  const vocab = await vocabulary(contributor);
  area.bna = await defineArea("Near test BNA", 36.12, -86.67);
  area.north1 = await defineArea("Near test one degree north", 37.12, -86.67);
  area.north2 = await defineArea("Near test two degrees north", 38.12, -86.67);
  area.lax = await defineArea("Near test LAX", 33.94, -118.4);
  [london, paris] = [await gazetteerCity("London", "GB"), await gazetteerCity("Paris", "FR")];
  const places = { bna: area.bna, north1: area.north1, north2: area.north2, lax: area.lax, paris, none: null };
  for (const [key, placeId] of Object.entries(places) as [keyof typeof region, number | null][]) {
    const { imageId } = await photographedSource(contributor, 400, 300, { title: `Invented ${key} ${WORD}`, placeId });
    const step = async (jar: Jar, path: string, json: Record<string, unknown>) => {
      const res = await call(path, { jar, json });
      expect(res.status, await res.clone().text()).toBeLessThan(300);
      return (await res.json()) as RegionView;
    };
    const observations = [{ aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "certain" }];
    const created = await step(contributor, `/api/images/${imageId}/regions`, { shape: { kind: "rectangle", x: 10, y: 10, w: 120, h: 90 }, label: `${key} ${WORD}`, observations });
    const proposed = await step(contributor, `/api/regions/${created.id}/propose`, { version: created.version });
    await step(editor, `/api/regions/${created.id}/review`, { version: proposed.version, decision: "vetted" });
    region[key] = created.id;
  }
  await eventually(() => near(""), (a) => expect(a.total).toBe(6));
}, 180_000);

describe("evidence near a place", () => {
  it("keeps the regions whose source lies within the distance: one degree of latitude is 111.19 km", async () => {
    expect(regionsOf(await near(`near=${area.bna}&km=100`))).toEqual([region.bna]);
    expect(regionsOf(await near(`near=${area.bna}&km=111`))).toEqual([region.bna]);
    expect(regionsOf(await near(`near=${area.bna}&km=112`))).toEqual(sorted(region.bna, region.north1));
    expect(regionsOf(await near(`near=${area.bna}&km=250`))).toEqual(sorted(region.bna, region.north1, region.north2));
    // LAX is 2886 km from BNA (Rosetta Code): out of reach even at the largest distance.
    expect(regionsOf(await near(`near=${area.bna}&km=2000`))).toEqual(sorted(region.bna, region.north1, region.north2));
    expect(regionsOf(await near(`near=${area.lax}&km=2000`))).toEqual([region.lax]);
    // Only the place alone: 100 km.
    const placeOnly = await near(`near=${area.north1}`);
    expect(regionsOf(placeOnly)).toEqual([region.north1]);
    expect(placeOnly.near).toMatchObject({ place: { id: area.north1, latitude: 37.12, longitude: -86.67 }, km: 100 });
  });

  it("gives each hit its distance and sorts nearest first", async () => {
    const answer = await near(`near=${area.north2}&km=250&sort=distance`);
    expect(answer.hits.map((h) => h.regionId)).toEqual([region.north2, region.north1, region.bna]);
    const km = answer.hits.map((h) => h.distanceKm!);
    expect(km[0]).toBe(0);
    expect(km[1]).toBeCloseTo(111.1949, 2);
    expect(km[2]).toBeCloseTo(222.3899, 2);
    // Without `near` no distance is given.
    expect((await near("")).hits[0]).not.toHaveProperty("distanceKm");
  });

  it("counts facets over the evidence within the distance only", async () => {
    const { facetDistribution: f, total, labels } = await near(`near=${area.bna}&km=150`);
    expect(total).toBe(2);
    expect(f.placeId).toEqual({ [area.bna]: 1, [area.north1]: 1 });
    expect(f.country).toEqual({ US: 2 });
    expect(f.t_right_hand_technique).toEqual({ strumming: 2 });
    expect(labels.placeId[area.north1]).toMatch(/^Near test one degree north/);
  });

  it("measures between gazetteer cities: Paris is about 344 km from London (from memory)", async () => {
    expect(regionsOf(await near(`near=${london}&km=250`))).toEqual([]);
    const within = await near(`near=${london}&km=500`);
    expect(regionsOf(within)).toEqual([region.paris]);
    expect(within.hits[0].distanceKm).toBeGreaterThan(340);
    expect(within.hits[0].distanceKm).toBeLessThan(348);
    // The catalogue's own documents narrow the same way.
    const sources = await near(`scope=sources&near=${london}&km=500`);
    expect(sources.hits.map((h) => h.sourceId)).toHaveLength(1);
    expect(sources.hits[0].distanceKm).toBeCloseTo(within.hits[0].distanceKm!, 6);
    expect((await near(`scope=sources&near=${paris}&km=25`)).total).toBe(1);
  });

  it("combines with the other filters and never finds a source without a place", async () => {
    expect(regionsOf(await near(`near=${area.bna}&km=250&country=FR`))).toEqual([]);
    expect(regionsOf(await near(`near=${paris}&km=2000&country=FR`))).toEqual([region.paris]);
    const everywhere = await Promise.all([area.bna, area.lax, paris].map((id) => near(`near=${id}&km=2000`)));
    for (const answer of everywhere) expect(regionsOf(answer)).not.toContain(region.none);
  });

  it("refuses a place the gazetteer does not hold and distances out of bounds, with a clear message", async () => {
    const refused = async (query: string) => {
      const res = await call(`/api/search?q=${WORD}&${query}`);
      expect(res.status, query).toBe(400);
      return ((await res.json()) as { error: { message: string; fields: Record<string, string[]> } }).error;
    };
    const unknown = await refused("near=2147483000&km=100");
    expect(unknown.message).toBe("No place with id 2147483000 in the gazetteer: choose the place from the list.");
    expect(unknown.fields.near).toEqual(["No such place in the gazetteer."]);
    for (const km of ["0", "2001", "99.5"]) expect((await refused(`near=${area.bna}&km=${km}`)).fields.km).toEqual(["Give the distance in whole kilometres, from 1 to 2000."]);
    expect((await refused("km=100")).fields.km).toEqual(["Choose a place (near) to measure the distance from."]);
    expect((await refused("sort=distance")).fields.sort).toEqual(["Sorting by distance needs a place (near)."]);
    expect((await refused("near=Nashville")).fields.near).toEqual(["Name the place by its id in the gazetteer."]);
  });
});
