import "server-only";
import { inArray } from "drizzle-orm";
import { db } from "@/db/client";
import { regions } from "@/db/schema";
import type { Actor } from "@/lib/auth/policy";
import type { CitedItem } from "@/lib/exports/cited-items";
import { selectRegionViews } from "@/lib/regions/queries";
import { sourceSummaries } from "@/lib/sources/summaries";
import { searchRegionIds } from "./query";
import type { SearchQuery } from "./schemas";

export type SearchExport = {
  /** The regions, in the search's order, as the caller may see them. */
  items: Extract<CitedItem, { kind: "region" }>[];
  /** How many regions the search matches in all. */
  total: number;
  /** The search matches more than the export holds. */
  truncated: boolean;
  /** The most regions this export may hold. */
  limit: number;
};

/**
 * Every region a search matches, up to `limit`, in the search's order. The index decides which regions
 * and in what order (under the caller's visibility filter); what is written about them, the region's
 * version and its source's catalogue facts for the citation, is read from the database under the same
 * rules (selectRegionViews, visibleSources), in two batched queries. A region the index still lists but
 * the database no longer shows this caller (a change not yet delivered to the index) is left out.
 */
export async function exportSearch(actor: Actor | null, q: SearchQuery, limit: number): Promise<SearchExport> {
  const { ids, total } = await searchRegionIds(actor, q, limit);
  const tx = db();
  const views = ids.length ? await selectRegionViews(tx, actor, inArray(regions.id, ids), { proposed: q.proposed }) : [];
  const sources = await sourceSummaries(tx, actor, [...new Set(views.map((v) => v.sourceId))]);
  const byId = new Map(views.map((v) => [v.id, v]));
  const items: SearchExport["items"] = [];
  for (const id of ids) {
    const region = byId.get(id);
    const source = region && sources.get(region.sourceId);
    if (region && source) items.push({ kind: "region", source, region });
  }
  return { items, total, truncated: total > ids.length, limit };
}
