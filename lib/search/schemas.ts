// What a search asks for, checked with zod: the search form's address and GET /api/search both use it.
// Lists may repeat a parameter (`country=ES&country=IT`) or separate values with commas.
// Aspect facets are named as in the documents: `t_<aspect key>=<term key>`, `n_<aspect key>=<number>`.
// `near=<place id>&km=<n>` keeps evidence whose source's place lies within n km of that gazetteer place;
// the server reads the place's coordinates itself (lib/search/near.ts), never from the caller.
import { z } from "zod";
import { CONFIDENCES, REGION_STATES } from "@/db/schema/regions";
import { OBJECT_TYPES } from "@/lib/sources/vocab";
import { PRESENTATION_PARAMS } from "./page/url";

const KEY = /^[a-z0-9_]{1,60}$/;
const DATE_END = /^\d{1,4}(-\d{2}(-\d{2})?)?$/;
export const SEARCH_SORTS = ["relevance", "date", "date_desc", "recent", "distance"] as const;
export type SearchSort = (typeof SEARCH_SORTS)[number];

/** Bounds of the distance filter, in whole kilometres, and what `near` alone means. */
export const NEAR_KM = { min: 1, max: 2000, default: 100 } as const;
const KM_MESSAGE = `Give the distance in whole kilometres, from ${NEAR_KM.min} to ${NEAR_KM.max}.`;

const list = <T extends z.ZodType>(item: T) => z.array(item).max(50, "At most 50 values.").default([]);
const positiveInt = z.coerce.number().int().positive();

export const searchQuerySchema = z.object({
  scope: z.enum(["regions", "sources"]).default("regions"),
  q: z.string().trim().max(200, "At most 200 characters.").default(""),
  terms: z.record(z.string().regex(KEY, "Not an aspect key."), list(z.string().regex(KEY, "Not a term key."))).default({}),
  counts: z.record(z.string().regex(KEY, "Not an aspect key."), list(z.coerce.number().int().min(0).max(10_000))).default({}),
  type: list(z.enum(OBJECT_TYPES, { error: "Not an object type." })),
  country: list(z.string().trim().toUpperCase().regex(/^[A-Z]{2}$/, "Use two-letter country codes.")),
  collection: list(positiveInt),
  place: list(positiveInt),
  decade: list(z.coerce.number().int().multipleOf(10, "A decade is named by its first year, e.g. 1640.")),
  century: list(z.coerce.number().int().multipleOf(100, "A century is named by its first year, e.g. 1600.")),
  confidence: list(z.enum(CONFIDENCES, { error: "Not a confidence." })),
  state: list(z.enum(REGION_STATES, { error: "Not a review state." })),
  from: z.string().regex(DATE_END, "Give a year such as 1620.").optional(),
  to: z.string().regex(DATE_END, "Give a year such as 1700.").optional(),
  near: z.coerce.number({ error: "Name the place by its id in the gazetteer." }).int("Name the place by its id in the gazetteer.").positive("Name the place by its id in the gazetteer.").optional(),
  km: z.coerce.number({ error: KM_MESSAGE }).int(KM_MESSAGE).min(NEAR_KM.min, KM_MESSAGE).max(NEAR_KM.max, KM_MESSAGE).optional(),
  proposed: z.boolean().default(false),
  sort: z.enum(SEARCH_SORTS).default("relevance"),
  page: positiveInt.max(500).default(1),
  perPage: positiveInt.max(100).default(20),
})
  // A distance or a sort by distance without a place would silently mean nothing: say so instead.
  .refine((q) => q.km === undefined || q.near !== undefined, { path: ["km"], message: "Choose a place (near) to measure the distance from." })
  .refine((q) => q.sort !== "distance" || q.near !== undefined, { path: ["sort"], message: "Sorting by distance needs a place (near)." });

export type SearchQuery = z.output<typeof searchQuerySchema>;
export type SearchQueryInput = z.input<typeof searchQuerySchema>;

const LISTS = ["type", "country", "collection", "place", "decade", "century", "confidence", "state"] as const;

/** Address parameters → the object the schema checks (unknown parameters are left out). */
export function searchParamsToQuery(params: URLSearchParams): Record<string, unknown> {
  const values = (key: string) => params.getAll(key).flatMap((v) => v.split(",")).map((v) => v.trim()).filter(Boolean);
  const out: Record<string, unknown> = { terms: {}, counts: {} };
  for (const key of ["scope", "q", "from", "to", "near", "km", "sort", "page", "perPage"]) {
    const value = params.get(key)?.trim();
    if (value) out[key] = value;
  }
  for (const key of LISTS) out[key] = values(key);
  const proposed = params.get("proposed");
  out.proposed = proposed === "1" || proposed === "true";
  for (const key of new Set(params.keys())) {
    if (key.startsWith("t_")) (out.terms as Record<string, string[]>)[key.slice(2)] = values(key);
    if (key.startsWith("n_")) (out.counts as Record<string, string[]>)[key.slice(2)] = values(key);
  }
  return out;
}

// Exports of a search: the CSV holds up to EXPORT_LIMIT regions, the printable list (crops for paper)
// up to PRINT_LIMIT; `limit` asks for fewer. Both hold the first regions in the search's own order.
export const EXPORT_LIMIT = 5_000;
export const PRINT_LIMIT = 250;

export const searchExportSchema = (max: number) =>
  searchQuerySchema.extend({ limit: positiveInt.max(max, `At most ${max.toLocaleString("en")} regions at a time.`).default(max) });
export type SearchExportQuery = z.output<ReturnType<typeof searchExportSchema>>;

/** The search page's parameters → an export's (regions only, every page, an optional `limit`). */
export function exportParamsToQuery(params: URLSearchParams): Record<string, unknown> {
  const search = new URLSearchParams(params);
  for (const key of PRESENTATION_PARAMS) search.delete(key);
  const out = searchParamsToQuery(search);
  const limit = params.get("limit")?.trim();
  if (limit) out.limit = limit;
  return out;
}
