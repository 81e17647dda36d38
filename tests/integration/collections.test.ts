// Holding collections through the API: ISO 3166-1 countries, duplicates, ownership, versions, audit.
import { beforeAll, describe, expect, it } from "vitest";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";

type Collection = { id: number; version: number; name: string; countryCode: string | null };
let contributor: Jar, editor: Jar, admin: Jar, reader: Jar;
beforeAll(async () => {
  [contributor, editor, admin, reader] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.admin), signedIn(DEMO.reader)]);
});

const create = async (jar: Jar, json: Record<string, unknown>) => call("/api/collections", { jar, json });

describe("collections", () => {
  it("a contributor adds one; the country code is checked against ISO 3166-1", async () => {
    const name = unique("Fondazione Tessitori");
    const res = await create(contributor, { name, city: "Bergamo", countryCode: "it", url: "https://tessitori.example" });
    expect(res.status).toBe(200);
    const { collection } = (await res.json()) as { collection: Collection };
    expect(collection.countryCode).toBe("IT");
    // "XK" is user-assigned and "UK" exceptionally reserved, not official alpha-2 codes (ISO 3166-1).
    for (const countryCode of ["ZZ", "UK", "Italy"]) {
      const bad = await create(contributor, { name: unique("Bad country"), countryCode });
      expect(bad.status, countryCode).toBe(400);
      expect((await bad.json()).error.fields.countryCode[0]).toMatch(/ISO 3166-1/);
    }
    const dup = await create(editor, { name, city: "Bergamo" });
    expect(dup.status).toBe(400);
    expect((await dup.json()).error.fields.name).toBeTruthy();
  });

  it("refuses a reader, and edits follow ownership and versions", async () => {
    expect((await create(reader, { name: unique("Reader's") })).status).toBe(403);
    const { collection } = (await (await create(editor, { name: unique("Editor's") })).json()) as { collection: Collection };
    const patch = (jar: Jar, body: Record<string, unknown>) => call(`/api/collections/${collection.id}`, { jar, method: "PATCH", json: { name: collection.name, ...body } });
    expect((await patch(contributor, { city: "Leiden", version: collection.version })).status).toBe(403);
    expect((await patch(editor, { city: "Leiden", version: collection.version })).status).toBe(200);
    const stale = await patch(admin, { city: "Delft", version: collection.version });
    expect(stale.status).toBe(409);
    expect((await stale.json()).error.current.city).toBe("Leiden");
    const audit = (await (await call(`/api/admin/audit?entityType=collection&entityId=${collection.id}`, { jar: admin })).json()) as { events: { action: string }[] };
    expect(audit.events.map((e) => e.action)).toEqual(["collection.updated", "collection.created"]);
  });
});
