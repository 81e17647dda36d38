// One piece of evidence as a citation, a CSV record and a printed card need it, whether it comes from a
// dossier or from a search: the source's catalogue facts (read from the database, under the caller's
// visibility) and, for a region, the version the caller may see. Pure types.
import type { RegionView } from "@/lib/regions/types";
import type { AttributionQualifier, ObjectType } from "@/lib/sources/vocab";

/** The catalogue facts a caption and a citation need, of a source the viewer may see. */
export type SourceSummary = {
  id: number;
  title: string;
  objectType: ObjectType;
  artist: string | null;
  attributionQualifier: AttributionQualifier;
  datingEdtf: string | null;
  medium: string | null;
  /** "Köln — 07, Germany", or null when the place of making is not known. */
  place: string | null;
  collectionName: string | null;
  collectionCity: string | null;
  accessionNumber: string | null;
  /** The first processed photograph, for a thumbnail. */
  imageId: number | null;
};

/** What is shown and exported of a region: the version the caller sees. */
export type CitedRegion = Pick<RegionView, "id" | "imageId" | "label" | "box" | "state" | "observations">;

/** A source or one region of it; `note` is the dossier owner's, absent for search results. */
export type CitedItem =
  | { kind: "source"; source: SourceSummary; note?: string | null }
  | { kind: "region"; source: SourceSummary; region: CitedRegion; note?: string | null };
