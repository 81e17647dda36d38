// Turning one CSV row's cells into the input of sourceFieldsSchema: controlled values by value or by
// label, rights by URI or label, bibliography entries, and the schema's issues renamed to the columns
// the user knows. Pure; the collection and place cells are matched against the database elsewhere.
import type { ZodError } from "zod";
import { RIGHTS } from "@/lib/catalogue/rights";
import { COLUMN_OF_FIELD, type ImportColumn } from "./import-types";
import type { SourceFieldsInput } from "./schemas";
import {
  ATTRIBUTION_LABELS,
  ATTRIBUTION_QUALIFIERS,
  DIMENSION_UNITS,
  OBJECT_TYPE_LABELS,
  OBJECT_TYPES,
  SOURCE_STATE_LABELS,
  SOURCE_STATES,
} from "./vocab";

export type FieldErrors = Record<string, string[]>;
export const addError = (errors: FieldErrors, key: string, message: string) => void (errors[key] ??= []).push(message);

/** "Book illustration", "book_illustration" and "BOOK-ILLUSTRATION" are one value. */
const squash = (s: string) => s.trim().toLowerCase().replace(/[\s_-]+/g, " ");

function byValueOrLabel<T extends string>(values: readonly T[], labels: Record<T, string>) {
  const index = new Map<string, T>();
  for (const v of values) {
    index.set(squash(v), v);
    index.set(squash(labels[v]), v);
  }
  return (raw: string): T | undefined => index.get(squash(raw));
}

export const objectTypeOf = byValueOrLabel(OBJECT_TYPES, OBJECT_TYPE_LABELS);
export const attributionOf = byValueOrLabel(ATTRIBUTION_QUALIFIERS, ATTRIBUTION_LABELS);
export const stateOf = byValueOrLabel(SOURCE_STATES, SOURCE_STATE_LABELS);
export const unitOf = byValueOrLabel(DIMENSION_UNITS, { cm: "cm", mm: "mm", in: "inches" });

// URIs without scheme or trailing slash, labels with any dash: spreadsheets turn "–" into "-".
const uriKey = (s: string) => s.trim().replace(/^https?:\/\//i, "").replace(/\/+$/, "").toLowerCase();
const labelKey = (s: string) => s.trim().toLowerCase().replace(/[\u2010-\u2015-]/g, "-").replace(/\s+/g, " ");
const rightsIndex = new Map<string, string>(RIGHTS.flatMap((r) => [[`uri:${uriKey(r.uri)}`, r.uri], [`label:${labelKey(r.label)}`, r.uri]]));

export function rightsOf(raw: string): string | undefined {
  return rightsIndex.get(`uri:${uriKey(raw)}`) ?? rightsIndex.get(`label:${labelKey(raw)}`);
}

export type BibliographyCell = { author: string; title: string; year: string; pages: string; link: string };

/** "author | title | year | pages | link" entries separated by ";"; empty entries are skipped. */
export function parseBibliography(raw: string): { entries: BibliographyCell[]; problems: string[] } {
  const entries: BibliographyCell[] = [];
  const problems: string[] = [];
  raw.split(";").map((e) => e.trim()).filter(Boolean).forEach((entry) => {
    const parts = entry.split("|").map((p) => p.trim());
    if (parts.length > 5) {
      problems.push(`Reference ${entries.length + 1} has ${parts.length} parts; give at most five: author | title | year | pages | link.`);
    }
    const [author = "", title = "", year = "", pages = "", link = ""] = parts;
    entries.push({ author, title, year, pages, link });
  });
  return { entries, problems };
}

const listOf = (labels: string[]) => labels.join(", ");

/** The cells as schema input; errors for values no list knows. Collection and place stay unresolved. */
export function mapCells(cells: Partial<Record<ImportColumn, string>>): { input: SourceFieldsInput; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const cell = (c: ImportColumn) => (cells[c] ?? "").trim();
  const pick = <T>(column: ImportColumn, lookup: (raw: string) => T | undefined, unknown: (raw: string) => string): T | string | undefined => {
    const raw = cell(column);
    if (!raw) return undefined;
    const found = lookup(raw);
    if (found === undefined) addError(errors, column, unknown(raw));
    return found ?? raw;
  };
  const oneOf = (what: string, allowed: string[]) => (raw: string) => `Unknown ${what} "${raw}". Use one of: ${listOf(allowed)}.`;
  const types = OBJECT_TYPES.map((t) => OBJECT_TYPE_LABELS[t]);
  if (!cell("object_type")) addError(errors, "object_type", `The object type is required. Use one of: ${listOf(types)}.`);
  const bibliography = parseBibliography(cell("bibliography"));
  bibliography.problems.forEach((p) => addError(errors, "bibliography", p));
  const input: Record<string, unknown> = {
    title: cells.title ?? "",
    objectType: pick("object_type", objectTypeOf, oneOf("object type", types)) ?? "",
    attributionQualifier: pick("attribution", attributionOf, oneOf("attribution", ATTRIBUTION_QUALIFIERS.map((q) => ATTRIBUTION_LABELS[q]))),
    artist: cell("artist"),
    medium: cell("medium"),
    height: cell("height"),
    width: cell("width"),
    dimensionUnit: pick("unit", unitOf, oneOf("unit", [...DIMENSION_UNITS])),
    accessionNumber: cell("accession_number"),
    datingEdtf: cell("dating"),
    rightsUri: pick("rights", rightsOf, (raw) => `Unknown rights "${raw}". Give the URI of a RightsStatements.org statement or Creative Commons licence, or its exact label, e.g. "No Known Copyright" or "CC BY 4.0".`),
    creditLine: cell("credit_line"),
    description: cell("description"),
    reliabilityNote: cell("reliability_note"),
    bibliography: bibliography.entries,
    state: pick("state", stateOf, oneOf("state", SOURCE_STATES.map((s) => SOURCE_STATE_LABELS[s]))),
  };
  for (const key of Object.keys(input)) if (input[key] === undefined) delete input[key];
  return { input: input as SourceFieldsInput, errors };
}

/** The schema's issues keyed by column; a column that already has our own message keeps only that. */
export function issuesByColumn(error: ZodError, errors: FieldErrors): FieldErrors {
  const ours = new Set(Object.keys(errors));
  for (const issue of error.issues) {
    const [field, index, part] = issue.path;
    const column = COLUMN_OF_FIELD[field as keyof typeof COLUMN_OF_FIELD] ?? String(field ?? "row");
    if (ours.has(column)) continue;
    const where = field === "bibliography" && typeof index === "number" ? `Reference ${index + 1}${part ? ` (${String(part)})` : ""}: ` : "";
    addError(errors, column, `${where}${issue.message}`);
  }
  return errors;
}
