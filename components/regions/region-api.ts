// The regions API as the browser calls it (one function per route), and the query keys it is cached under.
import { api, ApiError } from "@/lib/client/api";
import type { ObservationInput, RegionShape, RegionView } from "@/lib/regions/types";

/** What a PATCH may change; observations, when given, replace the whole list. */
export type RegionChange = { shape?: RegionShape; label?: string | null; observations?: ObservationInput[] };

export const regionsKey = (imageId: number, proposed: boolean) => ["regions", imageId, proposed ? "with-proposed" : "shown"] as const;

export const listRegions = (imageId: number, proposed: boolean) =>
  api<{ regions: RegionView[] }>(`/api/images/${imageId}/regions${proposed ? "?proposed=1" : ""}`).then((r) => r.regions);

export const createRegion = (imageId: number, shape: RegionShape) => api<RegionView>(`/api/images/${imageId}/regions`, { body: { shape } });

export const updateRegion = (id: number, version: number, change: RegionChange) =>
  api<RegionView>(`/api/regions/${id}`, { method: "PATCH", body: { version, ...change } });

/** Answers the region's version after the deletion: restoring it names that version. */
export const deleteRegion = (id: number, version: number) => api<{ ok: true; version: number }>(`/api/regions/${id}`, { method: "DELETE", body: { version } });

export const restoreRegion = (id: number, version: number) => api<RegionView>(`/api/regions/${id}/restore`, { body: { version } });

export const proposeRegion = (id: number, version: number) => api<RegionView>(`/api/regions/${id}/propose`, { body: { version } });

export const withdrawRegion = (id: number, version: number) => api<RegionView>(`/api/regions/${id}/withdraw`, { body: { version } });

export const proposeAllRegions = (imageId: number) =>
  api<{ proposed: number[]; skipped: { id: number; reason: string }[] }>(`/api/images/${imageId}/regions/propose`, { body: {} });

/** The region stored now, when the server refused a change because someone saved first (409). */
export function conflictCurrent(error: unknown): RegionView | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const current = (error.body as { current?: RegionView }).current;
  return current && typeof current.id === "number" ? current : null;
}

/** The observations of a view, as a PATCH sends them back. */
export const observationInputs = (r: Pick<RegionView, "observations">): ObservationInput[] =>
  r.observations.map(({ aspectId, termId, count, text, confidence, note }) => ({ aspectId, termId, count, text, confidence, note }));

/** A view's fields that a change can name, to undo to or to save again over another's. */
export const fieldsOf = (r: RegionView): Required<RegionChange> => ({ shape: r.shape, label: r.label, observations: observationInputs(r) });
