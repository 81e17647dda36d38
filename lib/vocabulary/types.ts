// What the vocabulary API answers, for pages, forms and the region editor alike (no server code here).
import type { AspectKind, AspectSection } from "./kinds";

export type TermView = {
  id: number;
  aspectId: number;
  key: string;
  label: string;
  description: string | null;
  position: number;
  deprecated: boolean;
  /** Set when the term was merged into another: its observations now name that one. */
  mergedIntoId: number | null;
  version: number;
  /** Observations recording this term (editors' listing only). */
  usage?: number;
};

export type AspectView = {
  id: number;
  key: string;
  label: string;
  description: string | null;
  kind: AspectKind;
  section: AspectSection;
  position: number;
  deprecated: boolean;
  version: number;
  terms: TermView[];
  /** Observations recording this aspect, whatever their value (editors' listing only). */
  usage?: number;
};

export type VocabularyList = { aspects: AspectView[] };
