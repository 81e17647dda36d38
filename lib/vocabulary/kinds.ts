// The vocabulary's fixed lists, shared by the database schema, the forms and the pages (no server code).

/** How an aspect's value is given: a term from its list, a whole number, or free text. */
export const ASPECT_KINDS = ["terms", "count", "text"] as const;
/** The headings the vocabulary is grouped under, in the order pages show them. */
export const ASPECT_SECTIONS = ["instrument", "player", "context", "reliability"] as const;

export type AspectKind = (typeof ASPECT_KINDS)[number];
export type AspectSection = (typeof ASPECT_SECTIONS)[number];

export const SECTION_LABELS: Record<AspectSection, string> = {
  instrument: "Instrument",
  player: "Player",
  context: "Context",
  reliability: "Reliability",
};

export const KIND_LABELS: Record<AspectKind, string> = {
  terms: "a term from the list",
  count: "a count",
  text: "free text",
};
