import "server-only";
import { inArray } from "drizzle-orm";
import { MeilisearchApiError, MeilisearchRequestError, MeilisearchRequestTimeOutError } from "meilisearch";
import { db } from "@/db/client";
import { collections, places } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { AppError, ValidationError } from "@/lib/errors";
import { getPlace } from "@/lib/places/queries";
import { search } from "./client";
import type { RegionDocument, SourceDocument } from "./documents";
import { requestFilters } from "./filters";
import { liveIndex } from "./indexes";
import { geoSort, nearKm, withDistances, type NearOrigin } from "./near";
import type { SearchQuery, SearchSort } from "./schemas";
import { regionVisibilityFilter, sourceVisibilityFilter } from "./visibility";

export type FacetCounts = Record<string, Record<string, number>>;
export type SearchAnswer<H> = {
  /** With `near`, each hit carries `distanceKm` from the place (null when its source has no place). */
  hits: H[];
  facetDistribution: FacetCounts;
  /** Names of the collections and places that facets and filters name by id. */
  labels: { collectionId: Record<string, string>; placeId: Record<string, string> };
  /** The place and distance of the `near` filter, as the gazetteer holds the place; null without one. */
  near: NearOrigin | null;
  total: number;
  page: number;
  perPage: number;
  totalPages: number;
};

/** A region or source document; with `near`, its distance from the place in km (null: no place). */
export type SearchHit = (RegionDocument | SourceDocument) & { distanceKm?: number | null };

export class SearchUnavailableError extends AppError {
  constructor() {
    super(503, "search_unavailable", "Search is not available at the moment; browsing the archive still works. Try again shortly.");
  }
}

/** A missing index or an unreachable service is the one 503 every search shares; anything else is a bug. */
function unavailable(error: unknown): unknown {
  const missing = error instanceof MeilisearchApiError && error.cause?.code === "index_not_found";
  return missing || error instanceof MeilisearchRequestError || error instanceof MeilisearchRequestTimeOutError ? new SearchUnavailableError() : error;
}

// Facets a caller may see counted; the rest (author, flags the visibility filter reads) stay internal.
const SHARED_FACETS = ["objectType", "country", "collectionId", "placeId", "decade", "century"];
const REGION_FACETS = new Set([...SHARED_FACETS, "confidence", "state", "aspects"]);
const isPublicFacet = (scope: SearchQuery["scope"], name: string) =>
  scope === "regions" ? REGION_FACETS.has(name) || /^[tn]_[a-z0-9_]+$/.test(name) : SHARED_FACETS.includes(name);

const SORTS: Record<Exclude<SearchSort, "distance">, string[]> = { relevance: [], date: ["dateFrom:asc"], date_desc: ["dateTo:desc"], recent: ["updatedAt:desc"] };
const sortFor = (sort: SearchSort, near: NearOrigin | null) => (sort === "distance" ? (near ? [geoSort(near)] : []) : SORTS[sort]);

/** The place `near` names, read from the gazetteer: its coordinates are ours, not the caller's. */
export async function resolveNear(q: Pick<SearchQuery, "near" | "km">): Promise<NearOrigin | null> {
  if (q.near === undefined) return null;
  const place = await getPlace(q.near);
  if (!place) {
    throw new ValidationError(`No place with id ${q.near} in the gazetteer: choose the place from the list.`, { near: ["No such place in the gazetteer."] });
  }
  const { id, kind, name, countryCode, country, subdivisionCode, latitude, longitude } = place;
  return { place: { id, kind, name, countryCode, country, subdivisionCode, latitude, longitude }, km: nearKm(q) };
}

/** Names of the collections and places the facets count and the query filters on, by id. */
export async function labelsFor(facets: FacetCounts, q: SearchQuery): Promise<SearchAnswer<unknown>["labels"]> {
  const ids = (field: string, chosen: number[]) => [...new Set([...Object.keys(facets[field] ?? {}).map(Number), ...chosen])].filter((n) => n > 0);
  const collectionIds = ids("collectionId", q.collection);
  const placeIds = ids("placeId", q.place);
  const [cs, ps] = await Promise.all([
    collectionIds.length ? db().select({ id: collections.id, name: collections.name, city: collections.city }).from(collections).where(inArray(collections.id, collectionIds)) : [],
    placeIds.length ? db().select({ id: places.id, name: places.name }).from(places).where(inArray(places.id, placeIds)) : [],
  ]);
  return {
    collectionId: Object.fromEntries(cs.map((c) => [String(c.id), c.city ? `${c.name}, ${c.city}` : c.name])),
    placeId: Object.fromEntries(ps.map((p) => [String(p.id), p.name])),
  };
}

/**
 * Searches the evidence (regions) or the catalogue (sources). What the caller may see is added here,
 * from the caller, to every query: a reader gets vetted regions of published sources, and proposed
 * work only when asking for it.
 */
export async function searchArchive(actor: Actor | null, q: SearchQuery): Promise<SearchAnswer<SearchHit>> {
  authorize(actor, "archive.read");
  if (q.proposed) authorize(actor, "archive.read_proposed");
  const visibility = q.scope === "regions" ? regionVisibilityFilter(actor, { proposed: q.proposed }) : sourceVisibilityFilter(actor);
  const near = await resolveNear(q);
  const filter = [...visibility, ...requestFilters(q, near)];
  let answer;
  try {
    answer = await search()
      .index(liveIndex(q.scope))
      .search(q.q || null, { filter, facets: ["*"], sort: sortFor(q.sort, near), page: q.page, hitsPerPage: q.perPage });
  } catch (error) {
    throw unavailable(error);
  }
  const facetDistribution = Object.fromEntries(Object.entries(answer.facetDistribution ?? {}).filter(([name]) => isPublicFacet(q.scope, name)));
  const hits = answer.hits as (RegionDocument | SourceDocument)[];
  return {
    hits: near ? withDistances(hits, near) : hits,
    facetDistribution,
    labels: await labelsFor(facetDistribution, q),
    near,
    total: answer.totalHits ?? 0,
    page: answer.page ?? q.page,
    perPage: answer.hitsPerPage ?? q.perPage,
    totalPages: answer.totalPages ?? 0,
  };
}

/** What the charts need of one hit: its widened dating, its place and the values of one aspect. */
export type ChartHit = {
  regionId: number;
  dateFrom?: number;
  dateTo?: number;
  dated: boolean;
  placeId: number | null;
  place: string | null;
  country: string | null;
  _geo?: { lat: number; lng: number };
  [facet: `t_${string}`]: string[] | undefined;
};

/**
 * Up to `limit` hits of the same search (same visibility filter), with only the fields the decade chart
 * and the place map read, so that charts summarise the whole result rather than one page of it.
 */
export async function searchChartHits(actor: Actor | null, q: SearchQuery, options: { limit?: number; stackAspect?: string | null } = {}): Promise<{ hits: ChartHit[]; total: number }> {
  authorize(actor, "archive.read");
  if (q.proposed) authorize(actor, "archive.read_proposed");
  const visibility = q.scope === "regions" ? regionVisibilityFilter(actor, { proposed: q.proposed }) : sourceVisibilityFilter(actor);
  const fields = ["regionId", "dateFrom", "dateTo", "dated", "placeId", "place", "country", "_geo"];
  if (options.stackAspect && /^[a-z0-9_]{1,60}$/.test(options.stackAspect)) fields.push(`t_${options.stackAspect}`);
  const near = await resolveNear(q);
  try {
    const answer = await search()
      .index(liveIndex(q.scope))
      .search(q.q || null, { filter: [...visibility, ...requestFilters(q, near)], limit: options.limit ?? 5_000, offset: 0, attributesToRetrieve: fields });
    return { hits: answer.hits as unknown as ChartHit[], total: answer.estimatedTotalHits ?? answer.hits.length };
  } catch (error) {
    throw unavailable(error);
  }
}

/**
 * The region ids of the first `limit` hits of a search, in the search's own order (its sort, or
 * relevance), under the same visibility filter, and how many regions it matches in all; for exports,
 * which read the regions themselves from the database.
 */
export async function searchRegionIds(actor: Actor | null, q: SearchQuery, limit: number): Promise<{ ids: number[]; total: number }> {
  authorize(actor, "archive.read");
  if (q.proposed) authorize(actor, "archive.read_proposed");
  const near = await resolveNear(q);
  const filter = [...regionVisibilityFilter(actor, { proposed: q.proposed }), ...requestFilters(q, near)];
  try {
    // page/hitsPerPage rather than limit/offset: the service then counts the matches exactly.
    const answer = await search()
      .index(liveIndex("regions"))
      .search(q.q || null, { filter, sort: sortFor(q.sort, near), page: 1, hitsPerPage: limit, attributesToRetrieve: ["regionId"] });
    return { ids: (answer.hits as { regionId: number }[]).map((h) => h.regionId), total: answer.totalHits ?? answer.hits.length };
  } catch (error) {
    throw unavailable(error);
  }
}
