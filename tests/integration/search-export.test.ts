// A search exported as CSV (GET /api/search/export.csv) and as a printable list (/search/print): every
// region the search matches in the search's own order, under the caller's visibility, with citations
// whose catalogue facts come from the database; the file read back with papaparse against RFC 4180 §2
// (header record, CRLF line breaks, quoted fields); the cap said when the search matches more; bad
// parameters refused by name; and the search service's 503 when it is down.
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { APP, call, service, unique, type Jar } from "../support/app";
import { photographedSource } from "../support/evidence";
import { eventually, searchAs, searchBench, token, type SearchBench } from "../support/search";

type Row = Record<string, string>;
type Csv = { res: Response; text: string; rows: Row[] };

async function exportAs(jar: Jar | undefined, query: string): Promise<Csv> {
  const res = await call(`/api/search/export.csv?${query}`, { jar });
  const text = await res.text();
  expect(res.status, text).toBe(200);
  const parsed = Papa.parse<Row>(text, { header: true, newline: "\r\n", skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  return { res, text, rows: parsed.data };
}

const regionIds = (csv: Csv) => csv.rows.map((r) => Number(r.region_id));
const today = () => new Date().toISOString().slice(0, 10);

let bench: SearchBench;
const word = token();
const artist = unique("Inés Inventada");
const accession = `INV ${token()}`;
let early: { sourceId: number; imageId: number };
let laterA: RegionView, laterB: RegionView, earlier: RegionView, proposed: RegionView, draft: RegionView;

async function mark(jar: Jar, imageId: number, label: string, observations: unknown[]): Promise<RegionView> {
  const res = await call(`/api/images/${imageId}/regions`, { jar, json: { shape: { kind: "rectangle", x: 20, y: 30, w: 240, h: 180 }, label, observations } });
  expect(res.status, await res.clone().text()).toBe(201);
  return (await res.json()) as RegionView;
}

// Two sources in the bench's collection (Sevilla): the bench's own, dated 1650~, and an earlier one dated
// 1620 with an artist "workshop of" and an accession number, which the region documents of the index do
// not hold: a citation that names them read them from the database.
beforeAll(async () => {
  bench = await searchBench();
  const { contributor, collectionId, observe, region, propose, decide, vetted } = bench;
  early = await photographedSource(contributor, 900, 700, { datingEdtf: "1620", artist, attributionQualifier: "workshop_of", accessionNumber: accession, collectionId });
  laterA = await vetted(`later a ${word}`, [observe("right_hand_technique", "strumming")]);
  laterB = await vetted(`later b ${word}`, [observe("right_hand_technique", "plucking", "possible")]);
  const e = await mark(contributor, early.imageId, `earlier ${word}`, [observe("right_hand_technique", "strumming")]);
  earlier = await decide(await propose(e), "vetted");
  proposed = await propose(await region(`proposed ${word}`, [observe("posture", "seated")]));
  draft = await region(`draft ${word}`, [observe("posture", "standing")]);
  await eventually(() => searchAs(bench.reader, `q=${word}&proposed=1`), (a) => expect(a.total).toBe(4));
  await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(a.total).toBe(5));
}, 180_000);

describe("a search as CSV", () => {
  it("holds every matching region in the search's order, whatever page the search shows", async () => {
    const { reader } = bench;
    const shown = await searchAs(reader, `q=${word}&sort=date&perPage=2`);
    expect(shown.hits).toHaveLength(2);
    const csv = await exportAs(reader, `q=${word}&sort=date&page=2&perPage=2&view=table`);
    // Earliest first: 1620 before 1650~ (widened to 1645); the search's own order decides the tie.
    const searchOrder = (await searchAs(reader, `q=${word}&sort=date&perPage=50`)).hits.map((h) => h.regionId);
    expect(regionIds(csv)).toEqual(searchOrder);
    expect(regionIds(csv)[0]).toBe(earlier.id);
    expect(new Set(regionIds(csv))).toEqual(new Set([laterA.id, laterB.id, earlier.id]));
    expect(csv.rows.map((r) => r.position)).toEqual(["1", "2", "3"]);
    const latest = await exportAs(reader, `q=${word}&sort=date_desc`);
    expect(regionIds(latest).at(-1)).toBe(earlier.id);
    // Narrowed as the search is: only strumming.
    expect(new Set(regionIds(await exportAs(reader, `q=${word}&t_right_hand_technique=strumming`)))).toEqual(new Set([laterA.id, earlier.id]));
  });

  it("is RFC 4180 text/csv with a header record, CRLF breaks and a file name of the words and the day", async () => {
    const { res, text } = await exportAs(undefined, `q=${word}`);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toBe(`attachment; filename="search-${word}-${today()}.csv"`);
    expect(text.split("\r\n")[0]).toMatch(/^position,kind,source_id,region_id,title,/);
    // Line breaks outside quoted fields are all CRLF (§2.1); the observations' own breaks sit inside quotes (§2.6).
    const outside = text.replace(/"(?:[^"]|"")*"/g, "");
    expect(outside.match(/\n/g)?.length).toBe(outside.match(/\r\n/g)?.length);
    expect((await exportAs(undefined, "")).res.headers.get("content-disposition")).toBe(`attachment; filename="search-all-${today()}.csv"`);
  });

  it("cites each region with the source's facts from the database, the permalink and today's date", async () => {
    const { rows } = await exportAs(bench.reader, `q=${word}&sort=date`);
    const row = rows.find((r) => Number(r.region_id) === earlier.id)!;
    const permalink = `${APP.replace(/\/+$/, "")}/sources/${early.sourceId}/images/${early.imageId}?region=${earlier.id}`;
    expect(row).toMatchObject({
      kind: "region",
      source_id: String(early.sourceId),
      attribution: `Workshop of ${artist}`,
      date: "1620",
      date_edtf: "1620",
      accession_number: accession,
      region_label: `earlier ${word}`,
      observations: "Right-hand technique: strumming (certain)",
      review_state: "vetted",
      note: "",
      accessed: today(),
    });
    expect(row.collection).toMatch(/^Search test collection-.+, Sevilla$/);
    // The permalink ends the citation; the app's own base address may differ from the one the test calls.
    expect(row.permalink.endsWith(permalink.slice(permalink.indexOf("/sources/")))).toBe(true);
    expect(row.citation).toMatch(new RegExp(`^Workshop of ${artist}, .+, 1620, ${row.collection}, accession no\\. ${accession}, detail, region ${earlier.id} \\(“earlier ${word}”\\), Cordarium, accessed ${today()}, `));
    expect(row.citation.endsWith(`${row.permalink}.`)).toBe(true);
  });

  it("gives a reader only vetted regions of published sources, proposed work only when asked, and a contributor their own unvetted work", async () => {
    const { reader, contributor, editor } = bench;
    const plain = await exportAs(reader, `q=${word}`);
    expect(regionIds(plain)).not.toContain(proposed.id);
    expect(regionIds(plain)).not.toContain(draft.id);
    expect(plain.rows.every((r) => r.review_state === "vetted")).toBe(true);
    const asked = await exportAs(reader, `q=${word}&proposed=1`);
    expect(new Set(regionIds(asked))).toEqual(new Set([laterA.id, laterB.id, earlier.id, proposed.id]));
    expect(asked.rows.find((r) => Number(r.region_id) === proposed.id)!.review_state).toBe("proposed");
    const own = await exportAs(contributor, `q=${word}&proposed=1`);
    expect(new Set(regionIds(own))).toEqual(new Set([laterA.id, laterB.id, earlier.id, proposed.id, draft.id]));
    expect(own.rows.find((r) => Number(r.region_id) === draft.id)!.review_state).toBe("draft");
    // Editors see work in review, not others' drafts; visitors may not ask for proposed work at all.
    expect(regionIds(await exportAs(editor, `q=${word}`))).not.toContain(draft.id);
    expect((await call(`/api/search/export.csv?q=${word}&proposed=1`)).status).toBe(401);
  });

  it("says when the search matches more than it holds: the first N in order and X-Result-Truncated", async () => {
    const { reader } = bench;
    const all = await exportAs(reader, `q=${word}&sort=date`);
    expect(all.res.headers.get("x-result-truncated")).toBe("false");
    expect(all.res.headers.get("x-result-total")).toBe("3");
    const first = await exportAs(reader, `q=${word}&sort=date&limit=2`);
    expect(regionIds(first)).toEqual(regionIds(all).slice(0, 2));
    expect(first.res.headers.get("x-result-truncated")).toBe("true");
    expect(first.res.headers.get("x-result-total")).toBe("3");
    expect(first.res.headers.get("x-result-count")).toBe("2");
    expect((await exportAs(reader, `q=${word}&limit=3`)).res.headers.get("x-result-truncated")).toBe("false");
  });

  it("refuses bad parameters with 400 naming them", async () => {
    for (const [query, field] of [
      ["limit=0", "limit"],
      ["limit=5001", "limit"],
      ["limit=many", "limit"],
      ["country=Spain", "country.0"],
      ["sort=cheapest", "sort"],
      ["from=about+1620", "from"],
      ["decade=1645", "decade.0"],
    ] as const) {
      const res = await call(`/api/search/export.csv?${query}`);
      expect(res.status, query).toBe(400);
      const body = (await res.json()) as { error: { code: string; message: string; fields: Record<string, string[]> } };
      expect(body.error.code).toBe("invalid_input");
      expect(Object.keys(body.error.fields), query).toContain(field);
      expect(body.error.message).toContain(`${field}: `);
    }
  });
});

describe("a search as a printable list", () => {
  it("names the search in words and lists what the caller may see, with citations", async () => {
    const res = await call(`/search/print?q=${word}&t_right_hand_technique=strumming&from=1600&to=1700&sort=date`, { jar: bench.reader });
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain(`Regions matching “${word}”`);
    expect(html).toContain("Right-hand technique: strumming; Made between 1600 and 1700");
    expect(html).toContain(`earlier ${word}`);
    expect(html).toContain(`later a ${word}`);
    expect(html).not.toContain(`later b ${word}`);
    expect(html).toContain(`accession no. ${accession}`);
    expect(html).toContain(`accessed ${today()}`);
    // React separates adjacent pieces of text with empty comments.
    const first = (await (await call(`/search/print?q=${word}&sort=date&limit=2`, { jar: bench.reader })).text()).replaceAll("<!-- -->", "");
    expect(first).toContain("The search matches 3 regions; this list holds the first 2, in the search’s order.");
    expect(first.match(/data-testid="printed-region"/g)).toHaveLength(2);
    const unvetted = await (await call(`/search/print?q=${word}`, { jar: bench.reader })).text();
    expect(unvetted).not.toContain(`proposed ${word}`);
    expect(unvetted).not.toContain(`draft ${word}`);
  });
});

describe("with the search service down", () => {
  afterAll(() => service("start", "search"));

  it("answers 503 with the search's own message", async () => {
    service("stop", "search");
    try {
      const res = await call(`/api/search/export.csv?q=${word}`);
      expect(res.status).toBe(503);
      expect(await res.json()).toMatchObject({ error: { code: "search_unavailable", message: expect.stringMatching(/^Search is not available at the moment/) } });
    } finally {
      service("start", "search");
    }
  });
});
