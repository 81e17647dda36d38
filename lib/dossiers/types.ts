// What the dossier API answers, shared by the server and the client components. Pure types.
import type { DossierItemKind, DossierVisibility } from "./vocab";
import type { RegionView } from "@/lib/regions/types";
import type { SourceSummary } from "@/lib/exports/cited-items";

export type { DossierItemKind, DossierVisibility };

type ItemBase = { id: number; position: number; note: string | null; version: number; source: SourceSummary };
export type DossierRegionItem = ItemBase & { kind: "region"; region: RegionView };
export type DossierSourceItem = ItemBase & { kind: "source" };
export type DossierItemView = DossierRegionItem | DossierSourceItem;

/** An item the owner put in but may no longer see (a region deleted or withdrawn, a source unpublished). */
export type WithheldItem = { id: number; kind: DossierItemKind; position: number; version: number };

export type DossierShare = { userId: number; email: string; name: string };

export type DossierView = {
  id: number;
  ownerId: number;
  ownerName: string;
  title: string;
  description: string | null;
  visibility: DossierVisibility;
  version: number;
  deletedAt: string | null;
  createdAt: string;
  updatedAt: string;
  /** Only what this viewer may see, in the dossier's order. */
  items: DossierItemView[];
  /** How many items are left out for this viewer. */
  withheld: number;
  /** For the owner only: the withheld items, so that they can be removed or kept in the order. */
  withheldItems: WithheldItem[];
  /** For the owner only: the people it is shared with. */
  shares: DossierShare[];
  /** Whether this viewer owns it (and so may change it). */
  mine: boolean;
};

export type DossierSummary = {
  id: number;
  title: string;
  description: string | null;
  visibility: DossierVisibility;
  ownerName: string;
  itemCount: number;
  version: number;
  updatedAt: string;
  deletedAt: string | null;
};

export const VISIBILITY_WORDS: Record<DossierVisibility, string> = {
  private: "Private: only you",
  shared: "Shared with the people named below, to read",
  public: "Public: anyone, signed in or not",
};

export const VISIBILITY_LABELS: Record<DossierVisibility, string> = { private: "Private", shared: "Shared", public: "Public" };

export const dossierPath = (id: number) => `/dossiers/${id}`;
export const dossierCsvPath = (id: number) => `/api/dossiers/${id}/export.csv`;
export const dossierPrintPath = (id: number) => `/dossiers/${id}/print`;
