// The pure half of the CSV import: reading the file (RFC 4180 quoting), naming the columns, turning
// labels into stored values, parsing bibliography cells, and renaming schema issues to columns.
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { readImportCsv, type CsvReading } from "@/lib/sources/import-csv";
import { attributionOf, issuesByColumn, mapCells, objectTypeOf, parseBibliography, rightsOf, stateOf, unitOf } from "@/lib/sources/import-fields";
import { importTemplateCsv } from "@/lib/sources/import-template";
import { IMPORT_COLUMNS } from "@/lib/sources/import-types";
import { sourceFieldsSchema } from "@/lib/sources/schemas";

const ok = (r: CsvReading) => {
  if (!r.ok) throw new Error(r.message);
  return r;
};
const refused = (r: CsvReading) => {
  if (r.ok) throw new Error("expected a refusal");
  return r;
};

describe("reading the file", () => {
  // RFC 4180 §2 rules 5–7: fields with commas, line breaks or quotes are quoted; quotes are doubled.
  it("follows RFC 4180 quoting and reports the line each row starts on", () => {
    const csv = 'title,object_type,description\r\n"Lute, with a bird",painting,"one\r\ntwo"\r\n"The ""Cittern"" Player",print,\r\n';
    const { rows } = ok(readImportCsv(csv));
    expect(rows.map((r) => r.line)).toEqual([2, 4]);
    expect(rows[0].cells).toMatchObject({ title: "Lute, with a bird", description: "one\r\ntwo" });
    expect(rows[1].cells.title).toBe('The "Cittern" Player');
  });

  it("skips empty lines and rows of empty cells, counting them in line numbers", () => {
    const { rows } = ok(readImportCsv("title,object_type\n\nA,painting\n,\n   \nB,print\n"));
    expect(rows.map((r) => [r.line, r.cells.title])).toEqual([[3, "A"], [6, "B"]]);
  });

  it("drops a UTF-8 byte order mark and accepts header names in other spellings", () => {
    const { columns } = ok(readImportCsv("\uFEFFTitle,Object Type,accession-number\nA,painting,1\n"));
    expect(columns).toEqual(["title", "object_type", "accession_number"]);
  });

  it("reads semicolon-separated files, as some spreadsheets write them", () => {
    const { rows } = ok(readImportCsv("title;object_type;bibliography\nA;painting;\"X | Y; Z | W\"\n"));
    expect(rows[0].cells).toEqual({ title: "A", object_type: "painting", bibliography: "X | Y; Z | W" });
  });

  it("refuses an unclosed quote with the line it opens on (papaparse's MissingQuotes)", () => {
    const r = refused(readImportCsv('title,object_type\nA,painting\nB,"print\nC,painting\n'));
    expect(r.message).toMatch(/malformed\. Line 3: a quoted field is never closed/);
  });

  it("refuses text after a closing quote (papaparse's InvalidQuotes)", () => {
    const r = refused(readImportCsv('title,object_type\n"A"x,painting\n'));
    expect(r.fields.csv[0]).toMatch(/^Line 2: /);
  });

  it("names unknown columns, duplicated columns and missing required ones", () => {
    expect(refused(readImportCsv("title,object_type,painter,Year\nA,painting,x,1\n")).message).toMatch(/columns Cordarium does not know: "painter", "Year"/);
    expect(refused(readImportCsv("title,object_type,title\nA,painting,B\n")).message).toMatch(/names title more than once/);
    expect(refused(readImportCsv("title,artist\nA,B\n")).message).toMatch(/lacks the required column object_type/);
    expect(refused(readImportCsv("artist\nA\n")).message).toMatch(/columns title and object_type/);
  });

  it("refuses an empty file, a header alone, and text that is not UTF-8", () => {
    expect(refused(readImportCsv("  \n")).message).toMatch(/empty/);
    expect(refused(readImportCsv("title,object_type\n")).message).toMatch(/no sources below/);
    expect(refused(readImportCsv("title,object_type\nA\uFFFD,painting\n")).message).toMatch(/Line 2 has characters that could not be read/);
  });

  it("tolerates padded and short rows but reports values outside the named columns", () => {
    const { rows } = ok(readImportCsv("title,object_type,artist\nA,painting,,,\nB,print\nC,print,x,stray\n"));
    expect(rows[0].problems).toEqual([]);
    expect(rows[1].cells).toEqual({ title: "B", object_type: "print" });
    expect(rows[2].problems[0]).toMatch(/a value outside the named columns/);
  });

  it("limits the file to 5,000 rows and 2 MB", () => {
    const many = "title,object_type\n" + "A,painting\n".repeat(5001);
    expect(refused(readImportCsv(many)).message).toMatch(/more than 5,000 rows/);
    expect(ok(readImportCsv("title,object_type\n" + "A,painting\n".repeat(5000))).rows).toHaveLength(5000);
    const big = "title,object_type,description\n" + `A,painting,${"x".repeat(1000)}\n`.repeat(2100);
    expect(refused(readImportCsv(big)).message).toMatch(/at most 2 MB/);
  });
});

describe("labels and values", () => {
  it("object types and attributions by value or label, whatever the case", () => {
    expect(["Painting", "painting", "PAINTING"].map(objectTypeOf)).toEqual(["painting", "painting", "painting"]);
    expect(["Book illustration", "book_illustration", "book-illustration"].map(objectTypeOf)).toEqual(Array(3).fill("book_illustration"));
    expect(["workshop of", "workshop_of", "Workshop Of"].map(attributionOf)).toEqual(Array(3).fill("workshop_of"));
    expect(objectTypeOf("fresco")).toBeUndefined();
    expect([stateOf("Published"), unitOf("MM"), unitOf("inches")]).toEqual(["published", "mm", "in"]);
  });

  // rightsstatements.org/page/1.0 gives the URIs with http and a trailing slash; Creative Commons with https.
  it("rights by URI or by the exact label, forgiving the scheme, the trailing slash and the dash", () => {
    const noc = "http://rightsstatements.org/vocab/NKC/1.0/";
    expect(rightsOf(noc)).toBe(noc);
    expect(rightsOf("https://rightsstatements.org/vocab/NKC/1.0")).toBe(noc);
    expect(rightsOf("no known copyright")).toBe(noc);
    expect(rightsOf("In Copyright - EU Orphan Work")).toBe("http://rightsstatements.org/vocab/InC-OW-EU/1.0/");
    expect(rightsOf("CC BY 4.0")).toBe("https://creativecommons.org/licenses/by/4.0/");
    expect(rightsOf("free to use")).toBeUndefined();
  });

  it("bibliography: entries by ';', parts by '|', empty parts and entries allowed", () => {
    const { entries, problems } = parseBibliography(" Orsetti, M. | Citterns | 1998 | 41 | ; Pellweg | Strings||| https://example.org ;");
    expect(problems).toEqual([]);
    expect(entries).toEqual([
      { author: "Orsetti, M.", title: "Citterns", year: "1998", pages: "41", link: "" },
      { author: "Pellweg", title: "Strings", year: "", pages: "", link: "https://example.org" },
    ]);
    expect(parseBibliography("a|b|c|d|e|f").problems[0]).toMatch(/Reference 1 has 6 parts/);
    expect(parseBibliography("").entries).toEqual([]);
  });
});

describe("mapping a row and naming the columns", () => {
  it("maps cells to sourceFieldsSchema's fields, which then validate", () => {
    const { input, errors } = mapCells({ title: "A Lute Player", object_type: "Painting", attribution: "circle of", height: "64,5", unit: "cm", dating: "1650~", rights: "CC0 1.0 Universal (public domain dedication)", state: "" });
    expect(errors).toEqual({});
    const parsed = sourceFieldsSchema.parse(input);
    expect(parsed).toMatchObject({ objectType: "painting", attributionQualifier: "circle_of", height: 64.5, datingEdtf: "1650~", state: "draft", rightsUri: "https://creativecommons.org/publicdomain/zero/1.0/" });
  });

  it("errors name the CSV column, not the field, and keep our message over the schema's", () => {
    const { input, errors } = mapCells({ title: "x".repeat(301), object_type: "fresco", dating: "1650-13", bibliography: "Author only" });
    const result = sourceFieldsSchema.safeParse(input);
    expect(result.success).toBe(false);
    const byColumn = issuesByColumn(result.error!, errors);
    expect(Object.keys(byColumn).sort()).toEqual(["bibliography", "dating", "object_type", "title"]);
    expect(byColumn.object_type).toEqual([expect.stringMatching(/^Unknown object type "fresco"\. Use one of: Painting, Drawing/)]);
    expect(byColumn.title).toEqual(["Use at most 300 characters."]);
    expect(byColumn.bibliography[0]).toMatch(/^Reference 1 \(title\): Give the title\./);
  });

  it("an empty object type is named as required, with the values to choose from", () => {
    expect(mapCells({ title: "A" }).errors.object_type).toEqual([expect.stringMatching(/^The object type is required\. Use one of: Painting, /)]);
  });
});

describe("the template", () => {
  it("has every column in order and two example rows that map without errors", () => {
    const [header, ...rows] = Papa.parse<string[]>(importTemplateCsv(), { skipEmptyLines: true }).data;
    expect(header).toEqual([...IMPORT_COLUMNS]);
    expect(rows).toHaveLength(2);
    const reading = ok(readImportCsv(importTemplateCsv()));
    for (const row of reading.rows) {
      const { input, errors } = mapCells(row.cells);
      expect(errors).toEqual({});
      expect(sourceFieldsSchema.safeParse(input).success).toBe(true);
    }
  });
});
