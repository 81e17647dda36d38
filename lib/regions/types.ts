// What the regions API answers, shared by the server and the client components. Pure types.
import type { AspectKind } from "@/db/schema/vocabulary";
import type { Confidence, RegionShape, RegionState } from "@/db/schema/regions";

export type { Confidence, RegionShape, RegionState };

export type Box = { x: number; y: number; w: number; h: number };

export type ObservationInput = {
  aspectId: number;
  termId?: number | null;
  count?: number | null;
  text?: string | null;
  confidence: Confidence;
  note?: string | null;
};

export type ObservationView = {
  id: number;
  aspectId: number;
  aspectKey: string;
  aspectLabel: string;
  kind: AspectKind;
  termId: number | null;
  termKey: string | null;
  termLabel: string | null;
  count: number | null;
  text: string | null;
  confidence: Confidence;
  note: string | null;
};

export type RegionPermissions = { edit: boolean; propose: boolean; withdraw: boolean; delete: boolean; decide: boolean; discuss: boolean };

export type RegionView = {
  id: number;
  imageId: number;
  sourceId: number;
  authorId: number;
  authorName: string;
  /** Optimistic lock of the region: every change names it. */
  version: number;
  /** The review state of the version shown. */
  state: RegionState;
  /** Which version this view shows: the last vetted one, or a working copy not (yet) vetted. */
  shown: "working" | "vetted";
  versionNumber: number;
  shape: RegionShape;
  box: Box;
  label: string | null;
  observations: ObservationView[];
  hasVetted: boolean;
  /** A version newer than the vetted one is in progress (readers still see the vetted one). */
  pendingRevision: boolean;
  createdAt: string;
  updatedAt: string;
  can: RegionPermissions;
};

export const STATE_WORDS: Record<RegionState, string> = {
  draft: "draft",
  proposed: "proposed",
  vetted: "vetted",
  returned: "returned",
  withdrawn: "withdrawn",
};

export const CONFIDENCE_WORDS: Record<Confidence, string> = { certain: "certain", probable: "probable", possible: "possible" };

/** An observation's value in words: "strumming", "10", or the text given. */
export function observationValue(o: Pick<ObservationView, "kind" | "termLabel" | "count" | "text">): string {
  if (o.kind === "terms") return o.termLabel ?? "—";
  if (o.kind === "count") return o.count === null ? "—" : String(o.count);
  return o.text ?? "—";
}

/** "Right-hand technique: strumming (probable)". */
export function observationSentence(o: Pick<ObservationView, "aspectLabel" | "kind" | "termLabel" | "count" | "text" | "confidence">): string {
  return `${o.aspectLabel}: ${observationValue(o)} (${CONFIDENCE_WORDS[o.confidence]})`;
}
