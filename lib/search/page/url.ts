// The search page's address: every filter, the sort, the page and the view live in it, so any search
// can be shared. Pure (the server page and the browser's search box both use it).

/** What says how the page shows results rather than which: its exports leave these out. */
export const PRESENTATION_PARAMS = ["scope", "page", "perPage", "view", "stack"] as const;

export type RawParams = Record<string, string | string[] | undefined>;

/** Next's searchParams object → URLSearchParams, repeated keys kept. */
export function toUrlParams(raw: RawParams): URLSearchParams {
  const out = new URLSearchParams();
  for (const [key, value] of Object.entries(raw)) {
    for (const v of Array.isArray(value) ? value : value === undefined ? [] : [value]) out.append(key, v);
  }
  return out;
}

/** The values of a list parameter, whether repeated or comma-separated. */
export function listValues(params: URLSearchParams, key: string): string[] {
  return params.getAll(key).flatMap((v) => v.split(",")).map((v) => v.trim()).filter(Boolean);
}

export function searchHref(params: URLSearchParams): string {
  const qs = params.toString();
  return qs ? `/search?${qs}` : "/search";
}

/** The same search with some parameters replaced (null removes them); back to page 1 unless a page is given. */
export function withParams(params: URLSearchParams, changes: Record<string, string | string[] | null>): string {
  const next = new URLSearchParams(params);
  if (!("page" in changes)) next.delete("page");
  for (const [key, value] of Object.entries(changes)) {
    next.delete(key);
    for (const v of value === null ? [] : Array.isArray(value) ? value : [value]) if (v !== "") next.append(key, v);
  }
  return searchHref(next);
}

/** The same search with one value of a list filter switched on or off. */
export function toggleValue(params: URLSearchParams, key: string, value: string): string {
  const current = listValues(params, key);
  const on = current.includes(value);
  return withParams(params, { [key]: on ? current.filter((v) => v !== value) : [...current, value] });
}

export const isOn = (params: URLSearchParams, key: string, value: string) => listValues(params, key).includes(value);

/** Facet names in the index → the parameter that filters on them. */
export function facetParam(facet: string): string | null {
  const fixed: Record<string, string> = {
    objectType: "type",
    country: "country",
    collectionId: "collection",
    placeId: "place",
    decade: "decade",
    century: "century",
    confidence: "confidence",
    state: "state",
  };
  if (fixed[facet]) return fixed[facet];
  return /^[tn]_[a-z0-9_]+$/.test(facet) ? facet : null;
}

/** What a decade bar sets: the years from and to, in place of decade/century filters. */
export const decadeHref = (params: URLSearchParams, start: number, width: number) =>
  withParams(params, { from: String(start), to: String(start + width - 1), decade: null, century: null });

/** The same search as CSV or as a printable list: every filter, but not the page, the view or the chart. */
export function exportHref(params: URLSearchParams, as: "csv" | "print"): string {
  const kept = new URLSearchParams(params);
  for (const key of [...PRESENTATION_PARAMS, "limit"]) kept.delete(key);
  const qs = kept.toString();
  return `${as === "csv" ? "/api/search/export.csv" : "/search/print"}${qs ? `?${qs}` : ""}`;
}
