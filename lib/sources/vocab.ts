// The catalogue's controlled lists, shared by the database schema, the forms and the import.
export const OBJECT_TYPES = ["painting", "drawing", "print", "book_illustration", "sculpture", "tile", "textile", "other"] as const;
export type ObjectType = (typeof OBJECT_TYPES)[number];
export const OBJECT_TYPE_LABELS: Record<ObjectType, string> = {
  painting: "Painting",
  drawing: "Drawing",
  print: "Print",
  book_illustration: "Book illustration",
  sculpture: "Sculpture",
  tile: "Tile",
  textile: "Textile",
  other: "Other",
};

// How sure the attribution is, in the terms cataloguers of old master pictures use.
export const ATTRIBUTION_QUALIFIERS = ["by", "attributed_to", "workshop_of", "circle_of", "follower_of", "after", "anonymous"] as const;
export type AttributionQualifier = (typeof ATTRIBUTION_QUALIFIERS)[number];
export const ATTRIBUTION_LABELS: Record<AttributionQualifier, string> = {
  by: "by",
  attributed_to: "attributed to",
  workshop_of: "workshop of",
  circle_of: "circle of",
  follower_of: "follower of",
  after: "after",
  anonymous: "anonymous",
};

export const DIMENSION_UNITS = ["cm", "mm", "in"] as const;
export type DimensionUnit = (typeof DIMENSION_UNITS)[number];

export const SOURCE_STATES = ["draft", "published"] as const;
export type SourceState = (typeof SOURCE_STATES)[number];
export const SOURCE_STATE_LABELS: Record<SourceState, string> = { draft: "Draft", published: "Published" };

export function attributionInWords(qualifier: AttributionQualifier, artist: string | null | undefined): string {
  if (qualifier === "anonymous") return artist ? `Anonymous (${artist})` : "Anonymous";
  if (!artist) return "Artist not recorded";
  return qualifier === "by" ? artist : `${ATTRIBUTION_LABELS[qualifier][0].toUpperCase()}${ATTRIBUTION_LABELS[qualifier].slice(1)} ${artist}`;
}

// Field names as the form labels them, for history lines and conflict tables.
export const SOURCE_FIELD_LABELS: Record<string, string> = {
  title: "title",
  objectType: "object type",
  artist: "artist",
  attributionQualifier: "attribution",
  medium: "medium",
  height: "height",
  width: "width",
  dimensionUnit: "unit",
  collectionId: "collection",
  accessionNumber: "accession number",
  datingEdtf: "date",
  placeId: "place",
  rightsUri: "rights",
  creditLine: "credit line",
  description: "description",
  reliabilityNote: "reliability note",
  bibliography: "bibliography",
  state: "state",
  deletedAt: "deletion",
};
