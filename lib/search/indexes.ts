import "server-only";
import { MeilisearchApiError, type Settings } from "meilisearch";
import { indexName, search } from "./client";

export type IndexKind = "regions" | "sources";
export const INDEX_KINDS: IndexKind[] = ["regions", "sources"];

/** How long one delivery waits for the search service to finish a task. */
export const TASK_WAIT = { timeout: 30_000, interval: 100 };

const shared = {
  // `_geo` makes `_geoPoint(lat, lng):asc` (nearest first) possible.
  sortableAttributes: ["dateFrom", "dateTo", "updatedAt", "sourceTitle", "title", "_geo"],
  faceting: { maxValuesPerFacet: 200, sortFacetValuesBy: { "*": "count" as const } },
  pagination: { maxTotalHits: 10_000 },
};

// Fields the visibility filter and the search form filter on. Aspects come and go with the vocabulary,
// so their facets are patterns: `t_*` (term keys) and `n_*` (counts, compared as numbers).
const sourceFilters = ["sourceId", "sourceState", "sourceCreatorId", "objectType", "collectionId", "placeId", "country", "dated", "dateFrom", "dateTo", "decade", "century", "_geo"];

export const INDEX_SETTINGS: Record<IndexKind, Settings> = {
  regions: {
    ...shared,
    searchableAttributes: ["label", "terms", "notes", "sourceTitle", "artist", "description", "collection", "place", "dating"],
    filterableAttributes: [
      ...sourceFilters,
      "regionId",
      "copy",
      "isVetted",
      "isWorking",
      "state",
      "regionState",
      "hasVetted",
      "authorId",
      "imageId",
      "confidence",
      "aspects",
      { attributePatterns: ["t_*"], features: { facetSearch: true, filter: { equality: true, comparison: false } } },
      { attributePatterns: ["n_*"], features: { facetSearch: false, filter: { equality: true, comparison: true } } },
    ],
  },
  sources: {
    ...shared,
    searchableAttributes: ["title", "artist", "attribution", "description", "collection", "accessionNumber", "place", "dating", "medium", "reliabilityNote"],
    filterableAttributes: [...sourceFilters, "imageCount"],
  },
};

export const liveIndex = (kind: IndexKind) => indexName(kind);

async function exists(uid: string): Promise<boolean> {
  try {
    await search().index(uid).getRawInfo();
    return true;
  } catch (error) {
    if (error instanceof MeilisearchApiError && error.cause?.code === "index_not_found") return false;
    throw error;
  }
}

/** Creates the index if it is missing and applies its settings; returns whether it had to be created. */
export async function ensureIndex(kind: IndexKind, uid = liveIndex(kind)): Promise<boolean> {
  const created = !(await exists(uid));
  if (created) await search().createIndex(uid, { primaryKey: "id" }).waitTask(TASK_WAIT).then(succeeded);
  await search().index(uid).updateSettings(INDEX_SETTINGS[kind]).waitTask(TASK_WAIT).then(succeeded);
  return created;
}

/** Both live indexes with their settings (idempotent: run at every start). True if either was new. */
export async function ensureIndexes(): Promise<boolean> {
  let created = false;
  for (const kind of INDEX_KINDS) created = (await ensureIndex(kind)) || created;
  return created;
}

/** A task the service accepted but then refused is an error like any other. */
export function succeeded<T extends { status: string; uid: number; error: { message: string } | null }>(task: T): T {
  if (task.status !== "succeeded") throw new Error(`search task ${task.uid} ${task.status}: ${task.error?.message ?? "no reason given"}`);
  return task;
}
