// Reading a CSV file of sources into rows of named cells, with the physical line each row starts on.
// Pure (no I/O), so the unit tests run it directly. Quoting follows RFC 4180: a field holding commas,
// quotes or line breaks is enclosed in double quotes, and a quote inside it is doubled.
import Papa from "papaparse";
import { IMPORT_COLUMNS, type ImportColumn } from "./import-types";

export const IMPORT_LIMITS = { bytes: 2 * 1024 * 1024, rows: 5_000 } as const;

export type CsvRow = { line: number; cells: Partial<Record<ImportColumn, string>>; problems: string[] };
/** A header cell left blank is null: its column is ignored as long as no row fills it. */
type Header = (ImportColumn | null)[];
export type CsvReading = { ok: true; columns: ImportColumn[]; rows: CsvRow[] } | { ok: false; message: string; fields: Record<string, string[]> };

const refuse = (message: string, key = "csv", list = [message]): CsvReading => ({ ok: false, message, fields: { [key]: list } });

/** "Object type", "object-type" and "OBJECT_TYPE" all name the column object_type. */
export const headerKey = (name: string) => name.trim().toLowerCase().replace(/[\s-]+/g, "_");

/** Lines are 1-based and count the header; a field with a line break spans several lines. */
function lineCounter(text: string) {
  let at = 0;
  let line = 1;
  return (index: number) => {
    for (; at < index && at < text.length; at++) if (text.charCodeAt(at) === 10) line++;
    return line;
  };
}

// Commas per RFC 4180; spreadsheets set to some European locales write semicolons or tabs instead.
function delimiterOf(firstLine: string): string {
  for (const d of [",", ";", "\t"]) {
    if (firstLine.split(d).some((name, i, all) => all.length > 1 && (IMPORT_COLUMNS as readonly string[]).includes(headerKey(name.replace(/"/g, ""))))) return d;
  }
  return ",";
}

export function readImportCsv(input: string): CsvReading {
  const bytes = new TextEncoder().encode(input).length;
  if (bytes > IMPORT_LIMITS.bytes) {
    return refuse(`The file is ${(bytes / 1024 / 1024).toFixed(1)} MB; one import takes at most 2 MB. Split it into smaller files.`);
  }
  const text = input.replace(/^\uFEFF/, "");
  const lineAt = lineCounter(text);
  const garbled = text.indexOf("\uFFFD");
  if (garbled >= 0) {
    return refuse(`Line ${lineAt(garbled)} has characters that could not be read. Save the file as "CSV UTF-8" and choose it again.`);
  }
  if (!text.trim()) return refuse("The file is empty. Start from the template: a header row, then one row per source.");

  const records: { cells: string[]; line: number }[] = [];
  const quoteErrors: string[] = [];
  let cursor = 0;
  let tooMany = false;
  Papa.parse<string[]>(text, {
    delimiter: delimiterOf(text.slice(0, text.search(/\r?\n|$/))),
    // Empty lines are skipped here rather than by papaparse, so that every row's start is known.
    step: (result, parser) => {
      const start = cursor;
      cursor = result.meta.cursor;
      for (const e of result.errors) quoteErrors.push(`Line ${lineAt(Math.max(start, e.index ?? start))}: ${quoteProblem(e.code)}`);
      if (result.data.every((cell) => cell.trim() === "")) return;
      if (records.length > IMPORT_LIMITS.rows) {
        tooMany = true;
        parser.abort();
        return;
      }
      records.push({ cells: result.data, line: lineAt(start) });
    },
  });
  if (tooMany) return refuse(`The file has more than ${IMPORT_LIMITS.rows.toLocaleString("en")} rows; one import takes at most that many. Split it into smaller files.`);
  if (quoteErrors.length) {
    const unique = [...new Set(quoteErrors)];
    return refuse(`The CSV is malformed. ${unique[0]}`, "csv", unique.slice(0, 20));
  }
  const [header, ...body] = records;
  const columns = readHeader(header.cells);
  if (!Array.isArray(columns)) return columns;
  if (!body.length) return refuse("The file has a header row but no sources below it.");
  return { ok: true, columns: columns.filter((c) => c !== null), rows: body.map((r) => toRow(r, columns)) };
}

function quoteProblem(code: string): string {
  if (code === "MissingQuotes") return "a quoted field is never closed, so everything after it would be read as one value. Close the quote, or double a quote that belongs to the text (\"\").";
  if (code === "InvalidQuotes") return "a quoted field has text after its closing quote. Enclose the whole field in quotes and double any quote inside it (\"\").";
  return "the row could not be read as CSV.";
}

function readHeader(cells: string[]): Header | CsvReading {
  const keys = cells.map(headerKey);
  const unknown = cells.filter((c, i) => keys[i] !== "" && !(IMPORT_COLUMNS as readonly string[]).includes(keys[i]));
  if (unknown.length) {
    return refuse(
      `The file has ${unknown.length === 1 ? "a column" : "columns"} Cordarium does not know: ${unknown.map((c) => `"${c.trim()}"`).join(", ")}. Use the column names of the template: ${IMPORT_COLUMNS.join(", ")}.`,
      "columns",
    );
  }
  const twice = keys.filter((k, i) => k !== "" && keys.indexOf(k) !== i);
  if (twice.length) return refuse(`The header names ${[...new Set(twice)].join(", ")} more than once. Keep one column of each.`, "columns");
  const missing = (["title", "object_type"] as const).filter((c) => !keys.includes(c));
  if (missing.length) {
    return refuse(`The header row lacks the required ${missing.length === 1 ? "column" : "columns"} ${missing.join(" and ")}. The first row must name the columns, as in the template.`, "columns");
  }
  return keys.map((k) => (k === "" ? null : (k as ImportColumn)));
}

function toRow({ cells, line }: { cells: string[]; line: number }, columns: Header): CsvRow {
  const problems: string[] = [];
  const named: CsvRow["cells"] = {};
  // Spreadsheets pad rows with empty cells and leave rows short; only values with no column are a problem.
  let stray = 0;
  cells.forEach((value, i) => {
    const column = columns[i];
    if (column) named[column] = value;
    else if (value.trim() !== "") stray++;
  });
  if (stray) {
    problems.push(`This row has ${stray === 1 ? "a value" : `${stray} values`} outside the named columns (it has ${cells.length} values, the header names ${columns.filter(Boolean).length} columns). Check for an unquoted comma.`);
  }
  return { line, cells: named, problems };
}
