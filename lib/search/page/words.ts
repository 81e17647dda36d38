// A search said in words, for the heading of its printable list and the name of its CSV file: the
// words typed, each filter with the names people know (aspects and terms from the vocabulary,
// countries, collections, places), the dates, and the order. Pure: the labels come in from the caller.
import { ordinal } from "@/lib/dating";
import { fileSlug } from "@/lib/exports/csv";
import { OBJECT_TYPE_LABELS, type ObjectType } from "@/lib/sources/vocab";
import type { AspectView } from "@/lib/vocabulary/types";
import { originName, type NearOrigin } from "@/lib/search/near";
import type { SearchQuery, SearchSort } from "@/lib/search/schemas";

export const CONFIDENCE_LABELS: Record<string, string> = { certain: "Certain", probable: "Probable", possible: "Possible" };
export const STATE_LABELS: Record<string, string> = { draft: "Draft", proposed: "Proposed", vetted: "Vetted", returned: "Returned", withdrawn: "Withdrawn" };
export const SORT_LABELS: Record<SearchSort, string> = { relevance: "Relevance", date: "Date, earliest first", date_desc: "Date, latest first", recent: "Recently added", distance: "Distance, nearest first" };

/** 1600 → "17th century" (a century is named by its first year, 1600 = 1600–1699). */
export const centuryLabel = (start: number) => `${ordinal(Math.floor(start / 100) + 1)} century`;

export type WordsContext = {
  vocabulary: AspectView[];
  countryName: (code: string) => string;
  /** Collections and places by id (as string), as labelsFor names them. */
  labels: { collectionId: Record<string, string>; placeId: Record<string, string> };
  /** The place and distance of a `near` filter, as the server read the place from the gazetteer. */
  near?: NearOrigin | null;
};

export type SearchInWords = {
  /** "Regions matching “lute”", "Regions matching these filters" or "All regions". */
  title: string;
  /** One phrase per active filter: "Right-hand technique: strumming or plucking", "Made between 1620 and 1700". */
  filters: string[];
  /** "In order of relevance", "Sorted by date, earliest first". */
  order: string;
};

const either = (values: string[]) => values.join(" or ");

function dates(from: string | undefined, to: string | undefined): string | null {
  if (from && to) return `Made between ${from} and ${to}`;
  if (from) return `Made in ${from} or later`;
  if (to) return `Made in ${to} or earlier`;
  return null;
}

export function searchInWords(q: SearchQuery, ctx: WordsContext): SearchInWords {
  const filters: string[] = [];
  const add = (title: string, values: string[]) => {
    if (values.length) filters.push(`${title}: ${either(values)}`);
  };
  // Aspects in the vocabulary's order; any the vocabulary no longer knows follow, by their keys.
  const known = new Set(ctx.vocabulary.map((a) => a.key));
  for (const a of ctx.vocabulary) {
    const terms = new Map(a.terms.map((t) => [t.key, t.label]));
    add(a.label, (q.terms[a.key] ?? []).map((key) => terms.get(key) ?? key.replaceAll("_", " ")));
    add(a.label, (q.counts[a.key] ?? []).map(String));
  }
  for (const [key, values] of Object.entries(q.terms)) if (!known.has(key)) add(key.replaceAll("_", " "), values.map((v) => v.replaceAll("_", " ")));
  for (const [key, values] of Object.entries(q.counts)) if (!known.has(key)) add(key.replaceAll("_", " "), values.map(String));

  add("Object type", q.type.map((t) => OBJECT_TYPE_LABELS[t as ObjectType] ?? t));
  add("Country", q.country.map(ctx.countryName));
  add("Collection", q.collection.map((id) => ctx.labels.collectionId[String(id)] ?? `collection ${id}`));
  add("Place", q.place.map((id) => ctx.labels.placeId[String(id)] ?? `place ${id}`));
  if (ctx.near) filters.push(`Within ${ctx.near.km} km of ${originName(ctx.near.place)}`);
  const range = dates(q.from, q.to);
  if (range) filters.push(range);
  add("Decade", q.decade.map((d) => `${d}s`));
  add("Century", q.century.map(centuryLabel));
  add("Confidence", q.confidence.map((c) => CONFIDENCE_LABELS[c] ?? c));
  add("Review state", q.state.map((s) => STATE_LABELS[s] ?? s));
  if (q.proposed) filters.push("Including proposed work not yet vetted");

  const title = q.q ? `Regions matching “${q.q}”` : filters.length ? "Regions matching these filters" : "All regions";
  const order = q.sort === "relevance" ? "In order of relevance" : `Sorted by ${SORT_LABELS[q.sort].charAt(0).toLowerCase()}${SORT_LABELS[q.sort].slice(1)}`;
  return { title, filters, order };
}

/** The heading as one line: "Regions matching “lute” — Country: Italy; Made between 1620 and 1700". */
export const searchTitle = (words: SearchInWords) => (words.filters.length ? `${words.title} — ${words.filters.join("; ")}` : words.title);

/** "search-lute-player-2031-02-03.csv", or "search-all-…" when no words were typed. */
export function searchCsvFileName(q: string, accessed: string): string {
  return `search-${fileSlug(q) || "all"}-${accessed}.csv`;
}
