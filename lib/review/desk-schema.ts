// The review desk's filters, as they stand in the page's address and in GET /api/review/desk. Pure.
import { z } from "zod";
import type { Box, ObservationView, RegionShape } from "@/lib/regions/types";

const blankToUndefined = (v: unknown) => (typeof v === "string" && v.trim() === "" ? undefined : v);

export const deskQuerySchema = z.object({
  /** An aspect key: regions whose proposed version records that aspect. */
  aspect: z.preprocess(blankToUndefined, z.string().trim().regex(/^[a-z0-9_]{1,60}$/, "Choose an aspect from the list.").optional()),
  /** Words of the source's title, or its number. */
  source: z.preprocess(blankToUndefined, z.string().trim().max(200, "At most 200 characters.").optional()),
  /** The author's user id. */
  contributor: z.preprocess(blankToUndefined, z.coerce.number().int().positive("Choose a contributor from the list.").optional()),
  after: z.preprocess(blankToUndefined, z.string().max(300).optional()),
  limit: z.preprocess(blankToUndefined, z.coerce.number().int().min(1).max(100).default(25)),
});

export type DeskQuery = z.infer<typeof deskQuerySchema>;

export type DeskEntry = {
  regionId: number;
  /** The region's optimistic lock, for deciding from the desk. */
  version: number;
  versionNumber: number;
  imageId: number;
  sourceId: number;
  sourceTitle: string;
  authorId: number;
  authorName: string;
  /** The caller's own region: somebody else reviews it. */
  own: boolean;
  proposedAt: string;
  label: string | null;
  box: Box;
  shape: RegionShape;
  observations: ObservationView[];
  /** An earlier version was vetted or returned: the review page shows what changed since. */
  reviewedBefore: boolean;
};

export type DeskPage = { entries: DeskEntry[]; total: number; next: string | null };

/** The filters only (no paging), as a query string for links that keep them. */
export function deskFilterParams(q: Pick<DeskQuery, "aspect" | "source" | "contributor">): URLSearchParams {
  const params = new URLSearchParams();
  if (q.aspect) params.set("aspect", q.aspect);
  if (q.source) params.set("source", q.source);
  if (q.contributor) params.set("contributor", String(q.contributor));
  return params;
}
