// The CSV import against the running app and the real database: a whole file is saved in one
// transaction or not at all, every refusal names the line and the column, duplicates are flagged.
// Every title, artist and accession number here is invented.
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import type { ImportReport, ImportResult } from "@/lib/sources/import-types";
import { call, DEMO, sessionOf, signedIn, unique, type Jar } from "../support/app";

type Refusal = { error: { code: string; message: string; fields: Record<string, string[]> } & Partial<ImportReport> };
type Listed = { sources: { id: number; title: string; collectionName: string | null; placeName: string | null; countryCode: string | null }[]; total: number };

let contributor: Jar;
let me: number;
beforeAll(async () => {
  contributor = await signedIn(DEMO.contributor);
  me = Number((await sessionOf(contributor)).user!.id);
});

const csvOf = (rows: Record<string, string>[]) => Papa.unparse(rows, { newline: "\r\n" });

/** Twenty invented sources, each with its own accession number in one demo collection. */
function twenty(tag: string): Record<string, string>[] {
  const types = ["Painting", "drawing", "PRINT", "book illustration", "Tile"];
  return Array.from({ length: 20 }, (_, i) => ({
    title: `${tag} Lute Player ${i + 1}`,
    object_type: types[i % types.length],
    attribution: i % 2 ? "workshop of" : "attributed_to",
    artist: "Aldo Vessanti",
    collection: "galleria vellastri",
    accession_number: `${tag}-${i + 1}`,
    dating: i % 3 ? `16${10 + i}~` : "165X",
    place: "Köln",
    country: "de",
    rights: "No Known Copyright",
    bibliography: "Orsetti, Marta | Citterns in Veronese Interiors | 1998 | 41 |",
    state: "draft",
  }));
}

const preview = async (csv: string, jar = contributor) => call("/api/sources/import/preview", { jar, json: { csv } });
const commit = async (csv: string, allowDuplicates?: boolean, jar = contributor) => call("/api/sources/import/commit", { jar, json: { csv, allowDuplicates } });
async function mine(q: string): Promise<Listed> {
  const res = await call(`/api/sources?creator=${me}&q=${encodeURIComponent(q)}&limit=100`, { jar: contributor });
  return res.json();
}

describe("a clean file", () => {
  it("imports 20 rows whole, each findable and with its own source.imported audit event", async () => {
    const tag = unique("imp");
    const csv = csvOf(twenty(tag));
    const report = (await (await preview(csv)).json()) as ImportReport;
    expect(report.summary).toEqual({ total: 20, ok: 20, errors: 0, duplicates: 0 });
    expect(report.rows[0]).toMatchObject({ line: 2, status: "ok", matched: { collection: "Galleria Vellastri", place: "Köln (DE)" } });
    // 165X is the decade 1650–1659 (EDTF level 1, unspecified digit).
    expect(report.rows[0].dating).toEqual({ words: "the 1650s", earliest: "1650-01-01", latest: "1659-12-31" });
    expect((await mine(tag)).total).toBe(0);

    const res = await commit(csv);
    expect(res.status).toBe(200);
    const { imported, ids } = (await res.json()) as ImportResult;
    expect(imported).toBe(20);
    const listed = await mine(tag);
    expect(listed.total).toBe(20);
    expect(listed.sources.map((s) => s.id).sort()).toEqual([...ids].sort());
    expect(listed.sources[0]).toMatchObject({ collectionName: "Galleria Vellastri", placeName: "Köln", countryCode: "DE" });

    const one = (await (await call(`/api/sources/${ids[1]}`, { jar: contributor })).json()).source;
    expect(one).toMatchObject({ objectType: "drawing", attributionQualifier: "workshop_of", datingEdtf: "1611~", rightsUri: "http://rightsstatements.org/vocab/NKC/1.0/" });
    expect(one.bibliography).toEqual([{ author: "Orsetti, Marta", title: "Citterns in Veronese Interiors", year: "1998", pages: "41", link: null }]);
    for (const id of ids) {
      const { history } = (await (await call(`/api/sources/${id}/history`, { jar: contributor })).json()) as { history: { action: string }[] };
      expect(history.map((h) => h.action)).toEqual(["source.imported"]);
    }
  });

  it("previews the downloadable template without errors", async () => {
    const template = await call("/api/sources/import/template");
    expect(template.headers.get("content-type")).toMatch(/^text\/csv/);
    const report = (await (await preview(await template.text())).json()) as ImportReport;
    expect(report.summary.total).toBe(2);
    expect(report.summary.errors).toBe(0);
  });
});

describe("a file with bad rows", () => {
  it("refuses 20 rows with 3 bad ones whole, naming line and column, and saves nothing", async () => {
    const tag = unique("bad");
    const rows = twenty(tag);
    rows[3].dating = "1650-13";
    rows[8].object_type = "Fresco";
    rows[14].title = `${tag} ${"very long ".repeat(40)}`;
    const csv = csvOf(rows);
    const report = (await (await preview(csv)).json()) as ImportReport;
    expect(report.summary).toEqual({ total: 20, ok: 17, errors: 3, duplicates: 0 });
    const bad = report.rows.filter((r) => r.status === "error").map((r) => ({ line: r.line, columns: Object.keys(r.errors) }));
    expect(bad).toEqual([
      { line: 5, columns: ["dating"] },
      { line: 10, columns: ["object_type"] },
      { line: 16, columns: ["title"] },
    ]);
    expect(report.rows[8].errors.object_type[0]).toMatch(/Unknown object type "Fresco"/);
    expect(report.rows[14].errors.title).toEqual(["Use at most 300 characters."]);

    const before = (await mine(tag)).total;
    const res = await commit(csv);
    expect(res.status).toBe(400);
    const body = (await res.json()) as Refusal;
    expect(body.error.message).toMatch(/^Nothing was imported: 3 rows have errors\. The first is line 5, dating: /);
    expect(body.error.summary).toEqual(report.summary);
    expect(body.error.rows).toHaveLength(20);
    expect((await mine(tag)).total).toBe(before);
    expect(before).toBe(0);
  });

  it("answers a thousand bad rows quickly with a full report", async () => {
    const tag = unique("many");
    const rows = Array.from({ length: 1000 }, (_, i) => ({ title: `${tag} ${i}`, object_type: "painting", dating: "1650-13", place: "Atlantis", country: "ZZ" }));
    const started = Date.now();
    const res = await preview(csvOf(rows));
    expect(res.status).toBe(200);
    const report = (await res.json()) as ImportReport;
    expect(Date.now() - started).toBeLessThan(5000);
    expect(report.summary).toEqual({ total: 1000, ok: 0, errors: 1000, duplicates: 0 });
    expect(Object.keys(report.rows[999].errors).sort()).toEqual(["country", "dating"]);
    expect((await commit(csvOf(rows))).status).toBe(400);
    expect((await mine(tag)).total).toBe(0);
  });

  it("names unknown collections and places, and warns of an ambiguous place", async () => {
    const tag = unique("where");
    const csv = csvOf([
      { title: `${tag} a`, object_type: "painting", collection: "Museo Inesistente", place: "Nowhereburg", country: "IT" },
      { title: `${tag} b`, object_type: "painting", place: "Sevilla", country: "" },
    ]);
    const { rows } = (await (await preview(csv)).json()) as ImportReport;
    expect(rows[0].errors.collection[0]).toMatch(/No collection is called "Museo Inesistente"/);
    expect(rows[0].errors.place[0]).toMatch(/no place called "Nowhereburg" in IT/);
    // GeoNames has a Sevilla in Spain and one in Colombia; the Spanish city is the more populous.
    expect(rows[1]).toMatchObject({ status: "ok", matched: { place: "Sevilla (ES)" } });
    expect(rows[1].warnings[0]).toMatch(/places are called "Sevilla"; chose the most populous/);
  });
});

describe("duplicates", () => {
  it("flags a collection + accession number given twice in the file or catalogued already", async () => {
    const tag = unique("dup");
    const first = csvOf([{ title: `${tag} stored`, object_type: "print", collection: "Galleria Vellastri", accession_number: `${tag}-1` }]);
    const { ids } = (await (await commit(first)).json()) as ImportResult;
    const csv = csvOf([
      { title: `${tag} again`, object_type: "print", collection: "Galleria Vellastri", accession_number: `${tag.toUpperCase()}-1` },
      { title: `${tag} twin a`, object_type: "print", collection: "Galleria Vellastri", accession_number: `${tag}-2` },
      { title: `${tag} twin b`, object_type: "print", collection: "Galleria Vellastri", accession_number: `${tag}-2` },
    ]);
    const report = (await (await preview(csv)).json()) as ImportReport;
    expect(report.summary).toEqual({ total: 3, ok: 0, errors: 0, duplicates: 3 });
    expect(report.rows[0].duplicateOf).toEqual({ sourceId: ids[0], title: `${tag} stored` });
    expect(report.rows[0].warnings[0]).toContain(`source #${ids[0]}, "${tag} stored"`);
    expect(report.rows[1].warnings[0]).toMatch(/as line 4\.$/);
    expect(report.rows[2].duplicateOf).toEqual({ line: 3 });

    const refused = await commit(csv);
    expect(refused.status).toBe(400);
    expect(((await refused.json()) as Refusal).error.message).toMatch(/3 rows are possible duplicates, the first on line 2/);
    expect((await mine(tag)).total).toBe(1);
    const allowed = await commit(csv, true);
    expect(allowed.status).toBe(200);
    expect((await mine(tag)).total).toBe(4);
  });
});

describe("files that cannot be read", () => {
  it("a malformed CSV gets a clear message with the line", async () => {
    const res = await preview('title,object_type\r\nA,painting\r\n"B,print\r\nC,painting\r\n');
    expect(res.status).toBe(400);
    const body = (await res.json()) as Refusal;
    expect(body.error.message).toMatch(/malformed\. Line 3: a quoted field is never closed/);
    expect(body.error.fields.csv).toBeTruthy();
  });

  it("unknown and missing columns are errors for the whole file, naming them", async () => {
    const unknown = (await (await preview("title,object_type,painter\r\nA,painting,B\r\n")).json()) as Refusal;
    expect(unknown.error.message).toMatch(/a column Cordarium does not know: "painter"/);
    expect(unknown.error.fields.columns).toBeTruthy();
    const missing = (await (await commit("title,artist\r\nA,B\r\n")).json()) as Refusal;
    expect(missing.error.message).toMatch(/lacks the required column object_type/);
  });

  it("refuses a file over 2 MB, and a body that is not the expected JSON", async () => {
    const big = "title,object_type,description\r\n" + `A,painting,${"x".repeat(1000)}\r\n`.repeat(2200);
    const res = await preview(big);
    expect(res.status).toBe(400);
    expect(((await res.json()) as Refusal).error.message).toMatch(/at most 2 MB/);
    const wrong = await call("/api/sources/import/preview", { jar: contributor, json: { file: "x" } });
    expect(wrong.status).toBe(400);
    expect(((await wrong.json()) as Refusal).error.fields.csv).toBeTruthy();
  });
});

describe("who may import", () => {
  it("a reader gets 403 and a visitor 401; the template is public", async () => {
    const reader = await signedIn(DEMO.reader);
    const csv = csvOf(twenty(unique("nope")).slice(0, 1));
    for (const path of ["/api/sources/import/preview", "/api/sources/import/commit"]) {
      expect((await call(path, { jar: reader, json: { csv } })).status).toBe(403);
      expect((await call(path, { json: { csv } })).status).toBe(401);
    }
    expect((await call("/api/sources/import/template")).status).toBe(200);
  });
});
