// A suggested citation for each item of a dossier or a search export. Pure: the CSV exports, the print
// pages and the tests share it.
//
// Style: in the manner of the Chicago Manual of Style's notes for works of art (from memory, common
// practice): artist, title (in italics), date, medium, holding collection and its city, then how the
// work was consulted online. Chicago itself has no rule for inventory numbers or for a detail of a
// work; "accession no." and "detail, region N" follow common museum and catalogue practice. An undated
// work reads "n.d.", as Chicago abbreviates it; a work without a recorded artist starts with its title.
// The access date is written as YYYY-MM-DD (ISO 8601) so that it reads the same in every language.
import { readDating } from "@/lib/dating";
import { attributionInWords } from "@/lib/sources/vocab";
import type { CitedRegion, SourceSummary } from "./cited-items";

/** What a citation reads of an item (a CitedItem has all of it). */
export type Citable =
  | { kind: "source"; source: SourceSummary }
  | { kind: "region"; source: SourceSummary; region: Pick<CitedRegion, "id" | "imageId" | "label"> };

export type Citation = {
  /** The whole citation as plain text (for CSV and copying). */
  text: string;
  /** The same text in pieces, the title marked for italics. */
  segments: { text: string; italic?: boolean }[];
  url: string;
  accessed: string;
  dateInWords: string | null;
  attribution: string | null;
};

/** The permanent address of an item in Cordarium: a source page, or the viewer opened on the region. */
export function permalink(item: Citable, baseUrl: string): string {
  const base = baseUrl.replace(/\/+$/, "");
  if (item.kind === "source") return `${base}/sources/${item.source.id}`;
  return `${base}/sources/${item.source.id}/images/${item.region.imageId}?region=${item.region.id}`;
}

/** YYYY-MM-DD of the given moment in UTC (the server's clock at the time of the export). */
export function accessedOn(when: Date | string): string {
  if (typeof when === "string") {
    if (!/^\d{4}-\d{2}-\d{2}$/.test(when)) throw new Error(`"${when}" is not a YYYY-MM-DD date`);
    return when;
  }
  return when.toISOString().slice(0, 10);
}

/** The dating in words ("about 1650", "between 1640 and 1660"), or null when undated or unreadable. */
export function dateInWords(edtf: string | null): string | null {
  if (!edtf) return null;
  const reading = readDating(edtf);
  return reading.ok ? reading.words : null;
}

/** "Attributed to Maria Rossi"; null when no artist is recorded (the citation then starts with the title). */
export function attributionOf(source: Pick<SourceSummary, "artist" | "attributionQualifier">): string | null {
  if (!source.artist && source.attributionQualifier !== "anonymous") return null;
  return attributionInWords(source.attributionQualifier, source.artist);
}

const clean = (s: string | null | undefined) => (s ?? "").replace(/\s+/g, " ").trim();

export function citeItem(item: Citable, opts: { baseUrl: string; accessed: Date | string }): Citation {
  const s = item.source;
  const url = permalink(item, opts.baseUrl);
  const accessed = accessedOn(opts.accessed);
  const words = dateInWords(s.datingEdtf);
  const attribution = attributionOf(s);

  const before = attribution ? [clean(attribution)] : [];
  const after = [
    words ?? "n.d.",
    clean(s.medium),
    clean(s.collectionName),
    clean(s.collectionCity),
    s.accessionNumber ? `accession no. ${clean(s.accessionNumber)}` : "",
    item.kind === "region" ? `detail, region ${item.region.id}${item.region.label ? ` (“${clean(item.region.label)}”)` : ""}` : "",
    "Cordarium",
    `accessed ${accessed}`,
    url,
  ].filter((part) => part !== "");

  const segments: Citation["segments"] = [];
  if (before.length) segments.push({ text: `${before.join(", ")}, ` });
  segments.push({ text: clean(s.title), italic: true });
  segments.push({ text: `, ${after.join(", ")}.` });
  return { text: segments.map((p) => p.text).join(""), segments, url, accessed, dateInWords: words, attribution };
}
