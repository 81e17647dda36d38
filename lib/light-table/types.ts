// What the light table shows of each region: the crop's coordinates and a caption already in words.
// Shared by the server page and the client table. Pure.
import type { Box, RegionShape, RegionState } from "@/lib/regions/types";

export type LightTableSource = {
  id: number;
  title: string;
  /** "Workshop of Anna Reiter", "Anonymous". */
  attribution: string;
  /** The EDTF dating in words ("about 1650"), or null when undated or unreadable. */
  dating: string | null;
  datingEdtf: string | null;
  /** "Köln — 07, Germany", or null when not known. */
  place: string | null;
  /** "Museum of Strings, Lyon", or null when not recorded. */
  collection: string | null;
  accessionNumber: string | null;
};

export type LightTableItem = {
  regionId: number;
  imageId: number;
  box: Box;
  shape: RegionShape;
  label: string | null;
  authorName: string;
  /** "Right-hand technique: strumming (probable)", one per observation, in the region's order. */
  observations: string[];
  state: RegionState;
  shown: "working" | "vetted";
  versionNumber: number;
  pendingRevision: boolean;
  source: LightTableSource;
};

export type LightTable = {
  items: LightTableItem[];
  /** Ids asked for that are not shown: no such region, deleted, or not visible to this caller. */
  hidden: number;
};

/** The review state of the version shown, said plainly; anything not vetted says so. */
export function reviewWords(item: Pick<LightTableItem, "state" | "pendingRevision" | "versionNumber">): string {
  switch (item.state) {
    case "vetted":
      return item.pendingRevision ? `Vetted (version ${item.versionNumber}); a revision is in progress` : "Vetted";
    case "proposed":
      return "Proposed, not yet reviewed";
    case "draft":
      return "Draft, not yet proposed for review";
    case "returned":
      return "Returned to its author for changes, not vetted";
    case "withdrawn":
      return "Withdrawn by its author, not vetted";
  }
}

/** "2 regions are not shown: they do not exist or you may not see them." */
export function hiddenWords(hidden: number): string | null {
  if (hidden <= 0) return null;
  return hidden === 1
    ? "1 region is not shown: it does not exist or you may not see it."
    : `${hidden} regions are not shown: they do not exist or you may not see them.`;
}
