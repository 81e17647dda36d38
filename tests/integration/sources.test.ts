// The catalogue's sources through the API: validation with field errors, who sees what, versions and
// 409s, soft delete and restore, history, and filtering with keyset pages over a known set.
import { beforeAll, describe, expect, it } from "vitest";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";

type Source = { id: number; version: number; title: string; state: string; datingEarliest: string | null; datingLatest: string | null; datingSearchEarliest: string | null; datingSearchLatest: string | null; countryCode: string | null; deletedAt: string | null };
type Page = { sources: { id: number; title: string }[]; total: number; next: string | null; previous: string | null };

let contributor: Jar, editor: Jar, admin: Jar, reader: Jar;
beforeAll(async () => {
  [contributor, editor, admin, reader] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.admin), signedIn(DEMO.reader)]);
});

async function create(jar: Jar, fields: Record<string, unknown>): Promise<Source> {
  const res = await call("/api/sources", { jar, json: { objectType: "painting", ...fields } });
  expect(res.status, await res.clone().text()).toBe(200);
  return ((await res.json()) as { source: Source }).source;
}

async function placeId(q: string, country: string): Promise<number> {
  const { places } = (await (await call(`/api/places?q=${encodeURIComponent(q)}&country=${country}`)).json()) as { places: { id: number }[] };
  return places[0].id;
}

describe("creating sources", () => {
  it("stores the EDTF string with strict and widened bounds, and copies the place's country", async () => {
    // Strict bounds: Library of Congress, EDTF Specification (2019), level 1 "uncertain/approximate".
    // The widening by 5 years either side is Cordarium's own default rule (README, DATING_*_MARGIN_YEARS).
    const s = await create(contributor, { title: unique("About 1650"), datingEdtf: "1650~", placeId: await placeId("Sevilla", "ES") });
    expect([s.datingEarliest, s.datingLatest]).toEqual(["1650-01-01", "1650-12-31"]);
    expect([s.datingSearchEarliest, s.datingSearchLatest]).toEqual(["1645-01-01", "1655-12-31"]);
    expect(s.countryCode).toBe("ES");
  });

  it("refuses bad input field by field and saves nothing", async () => {
    const title = unique("Never saved");
    const res = await call("/api/sources", {
      jar: contributor,
      json: { title: `${title}${"x".repeat(300)}`, objectType: "vase", datingEdtf: "1650-02-30", rightsUri: "http://example.org/free", collectionId: 999999 },
    });
    expect(res.status).toBe(400);
    const { error } = (await res.json()) as { error: { fields: Record<string, string[]> } };
    expect(Object.keys(error.fields).sort()).toEqual(["datingEdtf", "objectType", "rightsUri", "title"]);
    expect(error.fields.title[0]).toMatch(/at most 300/);
    const missing = await call("/api/sources", { jar: contributor, json: { objectType: "painting", collectionId: 999999, title: title } });
    expect(missing.status).toBe(400);
    expect((await missing.json()).error.fields.collectionId).toBeTruthy();
    const found = (await (await call(`/api/sources?q=${encodeURIComponent(title)}`, { jar: editor })).json()) as Page;
    expect(found.total).toBe(0);
  });
});

describe("who sees and edits what", () => {
  it("a draft is seen by its author and editors, not by readers or visitors", async () => {
    const s = await create(contributor, { title: unique("Draft only") });
    expect((await call(`/api/sources/${s.id}`, { jar: contributor })).status).toBe(200);
    expect((await call(`/api/sources/${s.id}`, { jar: editor })).status).toBe(200);
    expect((await call(`/api/sources/${s.id}`, { jar: reader })).status).toBe(404);
    expect((await call(`/api/sources/${s.id}`)).status).toBe(404);
    const list = (await (await call(`/api/sources?q=${encodeURIComponent(s.title)}`, { jar: reader })).json()) as Page;
    expect(list.total).toBe(0);
  });

  it("a contributor may not edit someone else's source; an editor may", async () => {
    const s = await create(editor, { title: unique("Editor's"), state: "published" });
    const refused = await call(`/api/sources/${s.id}`, { jar: contributor, method: "PATCH", json: { title: "Mine now", objectType: "painting", version: s.version } });
    expect(refused.status).toBe(403);
    const own = await create(contributor, { title: unique("Contributor's") });
    const ok = await call(`/api/sources/${own.id}`, { jar: editor, method: "PATCH", json: { title: own.title, objectType: "drawing", version: own.version } });
    expect(ok.status).toBe(200);
  });

  it("a stale version is refused with 409, the current record returned, nothing changed", async () => {
    const s = await create(contributor, { title: unique("Contested") });
    const first = await call(`/api/sources/${s.id}`, { jar: contributor, method: "PATCH", json: { title: `${s.title} (rev.)`, objectType: "painting", version: s.version } });
    expect(first.status).toBe(200);
    const stale = await call(`/api/sources/${s.id}`, { jar: editor, method: "PATCH", json: { title: "Overwritten?", objectType: "print", version: s.version } });
    expect(stale.status).toBe(409);
    const body = (await stale.json()) as { error: { current: Source } };
    expect(body.error.current.title).toBe(`${s.title} (rev.)`);
    const now = ((await (await call(`/api/sources/${s.id}`, { jar: editor })).json()) as { source: Source }).source;
    expect(now.title).toBe(`${s.title} (rev.)`);
    expect(now.version).toBe(s.version + 1);
  });

  it("admins soft-delete and restore; deleted sources disappear for everyone else", async () => {
    const s = await create(contributor, { title: unique("Doomed"), state: "published" });
    expect((await call(`/api/sources/${s.id}`, { jar: editor, method: "DELETE", json: { version: s.version } })).status).toBe(403);
    const del = await call(`/api/sources/${s.id}`, { jar: admin, method: "DELETE", json: { version: s.version } });
    expect(del.status).toBe(200);
    const deleted = ((await del.json()) as { source: Source }).source;
    expect((await call(`/api/sources/${s.id}`, { jar: editor })).status).toBe(404);
    expect((await call(`/api/sources/${s.id}`, { jar: admin })).status).toBe(200);
    const bin = (await (await call(`/api/sources?deleted=only&q=${encodeURIComponent(s.title)}`, { jar: admin })).json()) as Page;
    expect(bin.total).toBe(1);
    expect((await call(`/api/sources/${s.id}/restore`, { jar: admin, json: { version: deleted.version } })).status).toBe(200);
    expect((await call(`/api/sources/${s.id}`, { jar: reader })).status).toBe(200);
    const history = (await (await call(`/api/sources/${s.id}/history`, { jar: reader })).json()) as { history: { action: string }[] };
    expect(history.history.map((h) => h.action)).toEqual(["source.restored", "source.deleted", "source.created"]);
  });
});

describe("the sources table", () => {
  const tag = unique("Batch");
  const dates = ["1600", "1620/1640", "1650?", "165X", "../1610", "1700/..", "[1667,1670..1672]", "1720", null];
  beforeAll(async () => {
    for (const [i, datingEdtf] of dates.entries()) {
      await create(contributor, { title: `${tag} ${String.fromCharCode(65 + i)}`, datingEdtf, state: "published", objectType: i % 2 ? "print" : "painting" });
    }
  });

  const titles = async (query: string, jar = reader) =>
    ((await (await call(`/api/sources?q=${encodeURIComponent(tag)}&${query}`, { jar })).json()) as Page).sources.map((s) => s.title.slice(-1));

  it("filters by date overlap, undated sources never matching and open ends matching their open side", async () => {
    // 1620..1660: 1620/1640, 1650? (widened 1645–1655), 165X, and ../1610 does not reach 1620.
    expect((await titles("from=1620&to=1660&sort=title")).join("")).toBe("BCD");
    expect((await titles("from=1600&to=1605&sort=title")).join("")).toBe("AE");
    expect((await titles("from=1710&to=1800&sort=title")).join("")).toBe("FH");
    expect((await titles("from=1671&to=1671&sort=title")).join("")).toBe("G");
  });

  it("filters by object type and sorts both ways", async () => {
    expect((await titles("objectType=print&sort=title&dir=desc")).join("")).toBe("HFDB");
  });

  it("pages with keyset cursors forward and back without gaps or repeats", async () => {
    const seen: string[] = [];
    let page = (await (await call(`/api/sources?q=${encodeURIComponent(tag)}&limit=2&sort=dating`, { jar: reader })).json()) as Page;
    expect(page.total).toBe(9);
    expect(page.previous).toBeNull();
    const pages: Page[] = [page];
    seen.push(...page.sources.map((s) => s.title));
    while (page.next) {
      page = (await (await call(`/api/sources?q=${encodeURIComponent(tag)}&limit=2&sort=dating&after=${page.next}`, { jar: reader })).json()) as Page;
      pages.push(page);
      seen.push(...page.sources.map((s) => s.title));
    }
    expect(seen).toHaveLength(9);
    expect(new Set(seen).size).toBe(9);
    const back = (await (await call(`/api/sources?q=${encodeURIComponent(tag)}&limit=2&sort=dating&before=${pages[2].previous}`, { jar: reader })).json()) as Page;
    expect(back.sources.map((s) => s.title)).toEqual(pages[1].sources.map((s) => s.title));
  });

  it("refuses a damaged cursor and a bad filter with a clear message", async () => {
    const bad = await call("/api/sources?after=not-a-cursor");
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.message).toMatch(/page link is damaged/);
    const year = await call("/api/sources?from=sixteen-fifty");
    expect(year.status).toBe(400);
    expect((await year.json()).error.fields.from).toBeTruthy();
  });
});
