// The CSV import's columns and the report it answers with, shared by the server and the import page.
import type { SourceFieldsInput } from "./schemas";

// The order of the template. Column names are the spreadsheet's; field names are sourceFieldsSchema's.
export const IMPORT_COLUMNS = [
  "title",
  "object_type",
  "attribution",
  "artist",
  "medium",
  "height",
  "width",
  "unit",
  "collection",
  "accession_number",
  "dating",
  "place",
  "country",
  "rights",
  "credit_line",
  "description",
  "reliability_note",
  "state",
  "bibliography",
] as const;
export type ImportColumn = (typeof IMPORT_COLUMNS)[number];

/** Which column each field of sourceFieldsSchema comes from, so that errors name the column. */
export const COLUMN_OF_FIELD: Record<keyof SourceFieldsInput, ImportColumn> = {
  title: "title",
  objectType: "object_type",
  attributionQualifier: "attribution",
  artist: "artist",
  medium: "medium",
  height: "height",
  width: "width",
  dimensionUnit: "unit",
  collectionId: "collection",
  accessionNumber: "accession_number",
  datingEdtf: "dating",
  placeId: "place",
  rightsUri: "rights",
  creditLine: "credit_line",
  description: "description",
  reliabilityNote: "reliability_note",
  bibliography: "bibliography",
  state: "state",
};

export type RowStatus = "ok" | "error" | "duplicate";

export type ImportRow = {
  /** The line of the file the row starts on; the header is line 1. */
  line: number;
  /** The row as mapped to sourceFieldsSchema's fields (before validation). */
  values: Record<string, unknown>;
  status: RowStatus;
  /** Keyed by CSV column; "row" for problems of the row as a whole. */
  errors: Record<string, string[]>;
  warnings: string[];
  dating: { words: string; earliest: string | null; latest: string | null } | null;
  /** What the collection and place cells were matched to, for the preview table. */
  matched: { collection: string | null; place: string | null };
  duplicateOf: { sourceId: number; title: string | null } | { line: number } | null;
};

export type ImportSummary = { total: number; ok: number; errors: number; duplicates: number };
export type ImportReport = { rows: ImportRow[]; summary: ImportSummary };
export type ImportResult = { imported: number; ids: number[] };

export function summarise(rows: ImportRow[]): ImportSummary {
  const count = (s: RowStatus) => rows.filter((r) => r.status === s).length;
  return { total: rows.length, ok: count("ok"), errors: count("error"), duplicates: count("duplicate") };
}
