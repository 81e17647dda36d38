// The caller's own search filters as Meilisearch filter expressions (pure). Keys and values were
// checked by searchQuerySchema, so they can be quoted as they are.
import { requestedDateRange } from "@/lib/catalogue/date-range";
import { dayNumber } from "./documents";
import { geoRadiusFilter, type NearOrigin } from "./near";
import type { SearchQuery } from "./schemas";

const quoted = (v: string | number) => (typeof v === "number" ? String(v) : `"${v}"`);
const anyOf = (field: string, values: (string | number)[]) => (values.length ? [`${field} IN [${values.map(quoted).join(", ")}]`] : []);

/**
 * The filters a search asks for, ANDed after the visibility filter. `near` is the place the query names
 * by `near`, with its coordinates as the server read them from the gazetteer.
 */
export function requestFilters(q: SearchQuery, near: NearOrigin | null = null): string[] {
  const out = [
    ...anyOf("objectType", q.type),
    ...anyOf("country", q.country),
    ...anyOf("collectionId", q.collection),
    ...anyOf("placeId", q.place),
    ...anyOf("decade", q.decade),
    ...anyOf("century", q.century),
  ];
  if (q.scope === "regions") {
    for (const [aspect, terms] of Object.entries(q.terms)) out.push(...anyOf(`t_${aspect}`, terms));
    for (const [aspect, counts] of Object.entries(q.counts)) out.push(...anyOf(`n_${aspect}`, counts));
    out.push(...anyOf("confidence", q.confidence), ...anyOf("state", q.state));
  }
  if (q.near !== undefined) {
    // Never dropped quietly: a search for "near X" without X's coordinates would answer everything.
    if (!near || near.place.id !== q.near) throw new Error(`the coordinates of place ${q.near} were not read before filtering`);
    out.push(geoRadiusFilter(near));
  }
  if (q.from || q.to) {
    const days = requestedDateRange(q);
    // As in the source list: undated sources never match a date range; an open end matches its side.
    out.push("dated = true");
    if (days.toDay) out.push(`(dateFrom NOT EXISTS OR dateFrom <= ${dayNumber(days.toDay)})`);
    if (days.fromDay) out.push(`(dateTo NOT EXISTS OR dateTo >= ${dayNumber(days.fromDay)})`);
  }
  return out;
}

