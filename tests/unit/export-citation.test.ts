// Suggested citations of dossier items and search results, in the manner of the Chicago Manual of Style's notes for works
// of art (from memory, common practice: artist, italic title, date, medium, collection, city, then the
// online copy with the access date before the URL), and the CSV records both exports share, against
// RFC 4180 §2.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import type { DossierItemView } from "@/lib/dossiers/types";
import { accessedOn, citeItem, permalink } from "@/lib/exports/citation";
import type { SourceSummary } from "@/lib/exports/cited-items";
import { CSV_COLUMNS, csvFileName, csvRecord, evidenceCsv } from "@/lib/exports/csv";
import { searchCsvFileName } from "@/lib/search/page/words";
import type { RegionView } from "@/lib/regions/types";

const BASE = "https://archive.example/";
const source: SourceSummary = {
  id: 12,
  title: "Lute Player by a Window",
  objectType: "painting",
  artist: "Maria Invented",
  attributionQualifier: "attributed_to",
  datingEdtf: "1650~",
  medium: "Oil on panel",
  place: "Bologna — BO, Italy",
  collectionName: "Museo Immaginario",
  collectionCity: "Bologna",
  accessionNumber: "MI 204",
  imageId: 7,
};
const region = { id: 34, imageId: 9, label: "Right hand" };

describe("permalinks", () => {
  it("point at the source page, or the viewer opened on the region", () => {
    expect(permalink({ kind: "source", source }, BASE)).toBe("https://archive.example/sources/12");
    expect(permalink({ kind: "region", source, region }, BASE)).toBe("https://archive.example/sources/12/images/9?region=34");
  });
});

describe("accessed date", () => {
  it("is the UTC day of the export as YYYY-MM-DD (ISO 8601)", () => {
    expect(accessedOn(new Date("2031-02-03T23:59:59Z"))).toBe("2031-02-03");
    expect(accessedOn("2031-02-03")).toBe("2031-02-03");
    expect(() => accessedOn("3 Feb 2031")).toThrow();
  });
});

describe("citation of a source", () => {
  it("names attribution, italic title, date in words, medium, collection, city, accession number, Cordarium, access date and URL", () => {
    const c = citeItem({ kind: "source", source }, { baseUrl: BASE, accessed: "2031-02-03" });
    expect(c.text).toBe(
      "Attributed to Maria Invented, Lute Player by a Window, about 1650, Oil on panel, Museo Immaginario, Bologna, accession no. MI 204, Cordarium, accessed 2031-02-03, https://archive.example/sources/12.",
    );
    expect(c.segments.filter((s) => s.italic).map((s) => s.text)).toEqual(["Lute Player by a Window"]);
    expect(c.dateInWords).toBe("about 1650");
  });

  it("reads an interval in words from the EDTF (lib/dating) and writes n.d. for an undated work (Chicago's abbreviation)", () => {
    expect(citeItem({ kind: "source", source: { ...source, datingEdtf: "1640/1660" } }, { baseUrl: BASE, accessed: "2031-02-03" }).text).toContain(
      ", between 1640 and 1660, ",
    );
    expect(citeItem({ kind: "source", source: { ...source, datingEdtf: null } }, { baseUrl: BASE, accessed: "2031-02-03" }).text).toContain(
      "Lute Player by a Window, n.d., Oil on panel",
    );
  });

  it("starts with the title when no artist is recorded, and leaves out what is not known", () => {
    const bare = { ...source, artist: null, attributionQualifier: "by" as const, medium: null, collectionName: null, collectionCity: null, accessionNumber: null };
    expect(citeItem({ kind: "source", source: bare }, { baseUrl: BASE, accessed: "2031-02-03" }).text).toBe(
      "Lute Player by a Window, about 1650, Cordarium, accessed 2031-02-03, https://archive.example/sources/12.",
    );
    const anonymous = { ...bare, attributionQualifier: "anonymous" as const };
    expect(citeItem({ kind: "source", source: anonymous }, { baseUrl: BASE, accessed: "2031-02-03" }).text).toMatch(/^Anonymous, Lute Player/);
  });
});

describe("citation of a region", () => {
  it("adds the detail with its region number and label, and the viewer's address", () => {
    const c = citeItem({ kind: "region", source, region }, { baseUrl: BASE, accessed: new Date("2031-02-03T10:00:00Z") });
    expect(c.text).toContain("accession no. MI 204, detail, region 34 (“Right hand”), Cordarium, accessed 2031-02-03, https://archive.example/sources/12/images/9?region=34.");
  });
});

const regionView = (over: Partial<RegionView>): RegionView => ({
  id: 34,
  imageId: 9,
  sourceId: 12,
  authorId: 3,
  authorName: "C",
  version: 2,
  state: "vetted",
  shown: "vetted",
  versionNumber: 1,
  shape: { kind: "rectangle", x: 1, y: 2, w: 30, h: 40 },
  box: { x: 1, y: 2, w: 30, h: 40 },
  label: "Right hand",
  observations: [],
  hasVetted: true,
  pendingRevision: false,
  createdAt: "2031-01-01T00:00:00.000Z",
  updatedAt: "2031-01-01T00:00:00.000Z",
  can: { edit: false, propose: false, withdraw: false, delete: false, decide: false, discuss: false },
  ...over,
});

describe("CSV export (RFC 4180 §2)", () => {
  const tricky = 'Hand, "thumb-under";\nsee the second photograph';
  const items: DossierItemView[] = [
    {
      id: 1,
      kind: "region",
      position: 0,
      note: tricky,
      version: 1,
      source,
      region: regionView({
        observations: [
          { id: 1, aspectId: 1, aspectKey: "right_hand_technique", aspectLabel: "Right-hand technique", kind: "terms", termId: 2, termKey: "strumming", termLabel: "strumming", count: null, text: null, confidence: "probable", note: null },
          { id: 2, aspectId: 3, aspectKey: "course_count", aspectLabel: "Courses", kind: "count", termId: null, termKey: null, termLabel: null, count: 5, text: null, confidence: "certain", note: null },
        ],
      }),
    },
    { id: 2, kind: "source", position: 1, note: "=SUM(A1:A2)", version: 1, source: { ...source, id: 13, title: "Plain title" } },
  ];
  const csv = evidenceCsv(items, { baseUrl: BASE, accessed: "2031-02-03" });

  it("ends each record with CRLF and starts with a header naming every column (§2.1, §2.3)", () => {
    expect(csv.split("\r\n")[0]).toBe(CSV_COLUMNS.join(","));
    expect(csv.replace(/"[^"]*"/g, "").match(/\n/g)?.length).toBe(csv.replace(/"[^"]*"/g, "").match(/\r\n/g)?.length);
  });

  it("quotes fields holding commas, double quotes or line breaks and doubles inner quotes (§2.5–§2.7)", () => {
    expect(csv).toContain('"Hand, ""thumb-under"";\nsee the second photograph"');
    expect(csv).toContain('"Right-hand technique: strumming (probable)\nCourses: 5 (certain)"');
  });

  it("parses back with papaparse to the same values, one row per item in order", () => {
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, newline: "\r\n", skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data).toHaveLength(2);
    const [first, second] = parsed.data;
    expect(first).toMatchObject({ position: "1", kind: "region", source_id: "12", region_id: "34", note: tricky, date: "about 1650", date_edtf: "1650~" });
    expect(first.citation).toContain("detail, region 34");
    expect(first.permalink).toBe("https://archive.example/sources/12/images/9?region=34");
    expect(second).toMatchObject({ position: "2", kind: "source", region_id: "", title: "Plain title", accessed: "2031-02-03" });
  });

  it("defuses a note that a spreadsheet would run as a formula (OWASP CSV injection)", () => {
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
    expect(parsed.data[1].note).toBe("'=SUM(A1:A2)");
  });

  it("names the file after the title in plain ASCII", () => {
    expect(csvFileName("Lauten-Hände in Köln, 1650?", 4)).toBe("lauten-hande-in-koln-1650.csv");
    expect(csvFileName("???", 4)).toBe("dossier-4.csv");
  });
});

describe("one record builder for dossiers and searches", () => {
  const strumming = { id: 1, aspectId: 1, aspectKey: "right_hand_technique", aspectLabel: "Right-hand technique", kind: "terms" as const, termId: 2, termKey: "strumming", termLabel: "strumming", count: null, text: null, confidence: "probable" as const, note: "thumb leads" };
  const opts = { baseUrl: BASE, accessed: "2031-02-03" };
  const column = (record: (string | number)[], name: (typeof CSV_COLUMNS)[number]) => record[CSV_COLUMNS.indexOf(name)];

  it("writes a search hit (a region, no note) with the same columns and citation as the same region in a dossier", () => {
    const shown = regionView({ observations: [strumming] });
    const fromSearch = csvRecord({ kind: "region", source, region: shown }, 1, opts);
    const dossierItem: DossierItemView = { id: 5, kind: "region", position: 0, note: "my note", version: 1, source, region: shown };
    const fromDossier = csvRecord(dossierItem, 1, opts);
    expect(fromSearch).toHaveLength(CSV_COLUMNS.length);
    expect(fromDossier).toHaveLength(CSV_COLUMNS.length);
    CSV_COLUMNS.forEach((name, i) => {
      if (name !== "note") expect(fromSearch[i], name).toEqual(fromDossier[i]);
    });
    expect(column(fromSearch, "note")).toBe("");
    expect(column(fromDossier, "note")).toBe("my note");
    expect(column(fromSearch, "observations")).toBe("Right-hand technique: strumming (probable) — thumb leads");
    expect(column(fromSearch, "collection")).toBe("Museo Immaginario, Bologna");
    expect(column(fromSearch, "citation")).toBe(
      "Attributed to Maria Invented, Lute Player by a Window, about 1650, Oil on panel, Museo Immaginario, Bologna, accession no. MI 204, detail, region 34 (“Right hand”), Cordarium, accessed 2031-02-03, https://archive.example/sources/12/images/9?region=34.",
    );
  });

  it("says the review state of the version exported, so proposed work never passes for vetted; a source has none", () => {
    expect(column(csvRecord({ kind: "region", source, region: regionView({ state: "proposed", shown: "working" }) }, 2, opts), "review_state")).toBe("proposed");
    expect(column(csvRecord({ kind: "region", source, region: regionView({}) }, 2, opts), "review_state")).toBe("vetted");
    expect(column(csvRecord({ kind: "source", source }, 2, opts), "review_state")).toBe("");
  });

  it("numbers the records from 1 in the order given (a search's order)", () => {
    const csv = evidenceCsv([regionView({ id: 8 }), regionView({ id: 3 }), regionView({ id: 5 })].map((region) => ({ kind: "region" as const, source, region })), opts);
    const rows = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true }).data;
    expect(rows.map((r) => [r.position, r.region_id])).toEqual([["1", "8"], ["2", "3"], ["3", "5"]]);
  });

  it("names a search's file after its words and the day, or 'all'", () => {
    expect(searchCsvFileName("Laute, Köln", "2031-02-03")).toBe("search-laute-koln-2031-02-03.csv");
    expect(searchCsvFileName("", "2031-02-03")).toBe("search-all-2031-02-03.csv");
    expect(searchCsvFileName("«»", "2031-02-03")).toBe("search-all-2031-02-03.csv");
  });
});
