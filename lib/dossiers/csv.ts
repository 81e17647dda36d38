// A dossier as CSV (RFC 4180: CRLF line breaks, fields with commas, quotes or line breaks quoted, quotes
// doubled), one row per item the reader may see, with its suggested citation. Pure.
import Papa from "papaparse";
import { observationSentence } from "@/lib/regions/types";
import { OBJECT_TYPE_LABELS } from "@/lib/sources/vocab";
import { citeItem } from "./citation";
import type { DossierView } from "./types";

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
  "note",
  "permalink",
  "citation",
  "accessed",
] as const;

export function dossierCsv(dossier: Pick<DossierView, "items">, opts: { baseUrl: string; accessed: Date | string }): string {
  const rows = dossier.items.map((item, n) => {
    const citation = citeItem(item.kind === "region" ? { kind: "region", source: item.source, region: item.region } : item, opts);
    const s = item.source;
    const region = item.kind === "region" ? item.region : null;
    return [
      n + 1,
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
      item.note ?? "",
      citation.url,
      citation.text,
      citation.accessed,
    ];
  });
  // escapeFormulae: a cell starting with = + - @ (or a tab or carriage return) gets a leading apostrophe,
  // so that a spreadsheet never runs a note as a formula (OWASP, "CSV Injection").
  return Papa.unparse({ fields: [...CSV_COLUMNS], data: rows }, { newline: "\r\n", quotes: false, escapeFormulae: true });
}

/** "lute-hands-in-lombardy.csv": the title as a file name, plain ASCII. */
export function csvFileName(title: string, id: number): string {
  const slug = title
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  return `${slug || `dossier-${id}`}.csv`;
}
