// Evidence as CSV (RFC 4180: CRLF line breaks, fields with commas, quotes or line breaks quoted, quotes
// doubled), one record per item with its suggested citation. A dossier and a search export write the
// same columns through the same record builder, so a spreadsheet can put the two side by side. Pure.
import Papa from "papaparse";
import { observationSentence } from "@/lib/regions/types";
import { OBJECT_TYPE_LABELS } from "@/lib/sources/vocab";
import { citeItem } from "./citation";
import type { CitedItem } from "./cited-items";

export const CSV_COLUMNS = [
  "position",
  "kind",
  "source_id",
  "region_id",
  "title",
  "attribution",
  "object_type",
  "date",
  "date_edtf",
  "place",
  "collection",
  "accession_number",
  "region_label",
  "observations",
  "review_state",
  "note",
  "permalink",
  "citation",
  "accessed",
] as const;

export type CsvOptions = { baseUrl: string; accessed: Date | string };

/** One record, in the order of CSV_COLUMNS; `position` counts from 1. */
export function csvRecord(item: CitedItem, position: number, opts: CsvOptions): (string | number)[] {
  const citation = citeItem(item, opts);
  const s = item.source;
  const region = item.kind === "region" ? item.region : null;
  return [
    position,
    item.kind,
    s.id,
    region?.id ?? "",
    s.title,
    citation.attribution ?? "",
    OBJECT_TYPE_LABELS[s.objectType],
    citation.dateInWords ?? "",
    s.datingEdtf ?? "",
    s.place ?? "",
    [s.collectionName, s.collectionCity].filter(Boolean).join(", "),
    s.accessionNumber ?? "",
    region?.label ?? "",
    // One observation per line inside the cell: spreadsheets show them stacked.
    region ? region.observations.map((o) => observationSentence(o) + (o.note ? ` — ${o.note}` : "")).join("\n") : "",
    // Which review state the exported version is in, so that unvetted work never passes for vetted.
    region?.state ?? "",
    item.note ?? "",
    citation.url,
    citation.text,
    citation.accessed,
  ];
}

export function evidenceCsv(items: readonly CitedItem[], opts: CsvOptions): string {
  const rows = items.map((item, n) => csvRecord(item, n + 1, opts));
  // escapeFormulae: a cell starting with = + - @ (or a tab or carriage return) gets a leading apostrophe,
  // so that a spreadsheet never runs a note as a formula (OWASP, "CSV Injection").
  return Papa.unparse({ fields: [...CSV_COLUMNS], data: rows }, { newline: "\r\n", quotes: false, escapeFormulae: true });
}

/** "Lauten-Hände in Köln" → "lauten-hande-in-koln": plain ASCII for a file name, at most 60 characters. */
export function fileSlug(text: string): string {
  return text
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .slice(0, 60)
    .replace(/^-+|-+$/g, "");
}

/** "lute-hands-in-lombardy.csv": a dossier's title as a file name. */
export function csvFileName(title: string, id: number): string {
  return `${fileSlug(title) || `dossier-${id}`}.csv`;
}
