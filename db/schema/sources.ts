import { boolean, char, date, decimal, index, json, mysqlEnum, mysqlTable, text, timestamp, varchar } from "drizzle-orm/mysql-core";
import { ATTRIBUTION_QUALIFIERS, DIMENSION_UNITS, OBJECT_TYPES, SOURCE_STATES } from "../../lib/sources/vocab";
import { id, ref, timestamps, version } from "./columns";

export type BibliographyEntry = { author: string; title: string; year: string | null; pages: string | null; link: string | null };

// One artwork or printed image. Dating keeps the EDTF string with its strict bounds (what the string
// says) and the widened bounds that date-overlap queries use (approximate and uncertain dates widened).
export const sources = mysqlTable(
  "sources",
  {
    id: id(),
    title: varchar("title", { length: 300 }).notNull(),
    objectType: mysqlEnum("object_type", OBJECT_TYPES).notNull(),
    artist: varchar("artist", { length: 200 }),
    attributionQualifier: mysqlEnum("attribution_qualifier", ATTRIBUTION_QUALIFIERS).notNull().default("by"),
    medium: varchar("medium", { length: 200 }),
    height: decimal("height", { precision: 8, scale: 2, mode: "number" }),
    width: decimal("width", { precision: 8, scale: 2, mode: "number" }),
    dimensionUnit: mysqlEnum("dimension_unit", DIMENSION_UNITS).notNull().default("cm"),
    collectionId: ref("collection_id"),
    accessionNumber: varchar("accession_number", { length: 100 }),
    datingEdtf: varchar("dating_edtf", { length: 100 }),
    datingEarliest: date("dating_earliest", { mode: "string" }),
    datingLatest: date("dating_latest", { mode: "string" }),
    datingSearchEarliest: date("dating_search_earliest", { mode: "string" }),
    datingSearchLatest: date("dating_search_latest", { mode: "string" }),
    datingApproximate: boolean("dating_approximate").notNull().default(false),
    datingUncertain: boolean("dating_uncertain").notNull().default(false),
    placeId: ref("place_id"),
    // Copied from the place so that the country filter runs on an index of this table.
    countryCode: char("country_code", { length: 2 }),
    rightsUri: varchar("rights_uri", { length: 200 }),
    creditLine: varchar("credit_line", { length: 500 }),
    description: text("description"),
    reliabilityNote: text("reliability_note"),
    bibliography: json("bibliography").$type<BibliographyEntry[]>().notNull().default([]),
    state: mysqlEnum("state", SOURCE_STATES).notNull().default("draft"),
    createdBy: ref("created_by").notNull(),
    deletedAt: timestamp("deleted_at", { fsp: 3 }),
    version: version(),
    ...timestamps,
  },
  // Sort indexes do not start with deleted_at: MariaDB then misjudged "deleted_at IS NULL" as selective
  // and walked them for COUNTs and backward keyset pages (tests/bench/results/sources-list.md).
  (t) => [
    index("sources_title").on(t.title, t.id),
    index("sources_created").on(t.createdAt, t.id),
    index("sources_dating").on(t.datingSearchEarliest, t.id),
    index("sources_collection").on(t.collectionId, t.accessionNumber),
    index("sources_country").on(t.countryCode, t.state, t.deletedAt),
    index("sources_creator").on(t.createdBy, t.id),
    index("sources_type").on(t.objectType, t.state, t.deletedAt),
  ],
);

export type Source = typeof sources.$inferSelect;
