"use client";

// The regions of one photograph, cached by TanStack Query, and the ways the other hooks write a
// server answer into that cache. The list is ordered as the server orders it (top to bottom, then
// left to right), which is also the order of "next" and "previous".
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback } from "react";
import type { RegionView } from "@/lib/regions/types";
import { listRegions, regionsKey } from "./region-api";

const order = (a: RegionView, b: RegionView) => a.box.y - b.box.y || a.box.x - b.box.x || a.id - b.id;

/** A newer answer replaces an older one; an older answer (a slow response) never replaces a newer one. */
function upsert(list: RegionView[], view: RegionView): RegionView[] {
  const old = list.find((r) => r.id === view.id);
  if (old && old.version > view.version) return list;
  return [...list.filter((r) => r.id !== view.id), view].sort(order);
}

export function useRegionList(imageId: number, proposed: boolean) {
  const client = useQueryClient();
  const query = useQuery({
    queryKey: regionsKey(imageId, proposed),
    queryFn: () => listRegions(imageId, proposed),
    // Our own saves keep the cache current; a refetch on focus could bring back a version older than
    // a save in flight, and the next save would then be refused as a conflict with ourselves.
    refetchOnWindowFocus: false,
    staleTime: Infinity,
  });

  // Both lists of the photograph (with and without proposed work) take every answer, and the source's
  // stringing check, which counts what the regions say, is read again.
  const put = useCallback(
    (view: RegionView) => {
      client.setQueriesData<RegionView[]>({ queryKey: ["regions", imageId] }, (old) => (old ? upsert(old, view) : old));
      void client.invalidateQueries({ queryKey: ["stringing"] });
    },
    [client, imageId],
  );
  const drop = useCallback(
    (id: number) => {
      client.setQueriesData<RegionView[]>({ queryKey: ["regions", imageId] }, (old) => old?.filter((r) => r.id !== id));
      void client.invalidateQueries({ queryKey: ["stringing"] });
    },
    [client, imageId],
  );
  const refresh = useCallback(() => Promise.all([client.invalidateQueries({ queryKey: ["regions", imageId] }), client.invalidateQueries({ queryKey: ["stringing"] })]), [client, imageId]);
  /** The region as the cache holds it now (not as of the last render). */
  const current = useCallback(
    (id: number) => client.getQueryData<RegionView[]>(regionsKey(imageId, proposed))?.find((r) => r.id === id),
    [client, imageId, proposed],
  );

  return { regions: query.data ?? [], loading: query.isPending, error: query.error, put, drop, refresh, current };
}

export type RegionList = ReturnType<typeof useRegionList>;
