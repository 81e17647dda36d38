import { index, int, json, mysqlEnum, mysqlTable, smallint, text, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { id, ref, timestamps, version } from "./columns";

export const REGION_STATES = ["draft", "proposed", "vetted", "returned", "withdrawn"] as const;
export const SHAPE_KINDS = ["rectangle", "polygon"] as const;
export const CONFIDENCES = ["certain", "probable", "possible"] as const;

/** A rectangle or a polygon in full-image pixel coordinates, whatever the zoom it was drawn at. */
export type RegionShape = { kind: "rectangle"; x: number; y: number; w: number; h: number } | { kind: "polygon"; points: [number, number][] };

// A region of an image: the unit of evidence. Its content lives in versions; `workingVersionId` is the
// one its author edits, `vettedVersionId` the last one an editor vetted (what readers see). A version
// that has been reviewed is frozen: editing it makes a new working version, so the vetted one stays
// visible until its successor is vetted, and a reviewer can see what changed since the last decision.
export const regions = mysqlTable(
  "regions",
  {
    id: id(),
    imageId: ref("image_id").notNull(),
    authorId: ref("author_id").notNull(),
    workingVersionId: ref("working_version_id"),
    vettedVersionId: ref("vetted_version_id"),
    // Copied from the working version so lists, the desk and filters need no join to know it.
    state: mysqlEnum("state", REGION_STATES).notNull().default("draft"),
    proposedAt: timestamp("proposed_at", { fsp: 3 }),
    deletedAt: timestamp("deleted_at", { fsp: 3 }),
    version: version(),
    ...timestamps,
  },
  (t) => [
    index("regions_image").on(t.imageId, t.id),
    index("regions_state").on(t.state, t.proposedAt),
    index("regions_author").on(t.authorId, t.state),
  ],
);

export const regionVersions = mysqlTable(
  "region_versions",
  {
    id: id(),
    regionId: ref("region_id").notNull(),
    number: int("number", { unsigned: true }).notNull(),
    state: mysqlEnum("state", REGION_STATES).notNull().default("draft"),
    shape: json("shape").$type<RegionShape>().notNull(),
    // The shape's bounding box, for crops and for ordering regions on the image.
    boxX: int("box_x", { unsigned: true }).notNull(),
    boxY: int("box_y", { unsigned: true }).notNull(),
    boxW: int("box_w", { unsigned: true }).notNull(),
    boxH: int("box_h", { unsigned: true }).notNull(),
    label: varchar("label", { length: 200 }),
    createdBy: ref("created_by").notNull(),
    proposedAt: timestamp("proposed_at", { fsp: 3 }),
    decidedAt: timestamp("decided_at", { fsp: 3 }),
    ...timestamps,
  },
  (t) => [uniqueIndex("region_versions_number").on(t.regionId, t.number)],
);

// One statement about a region version: an aspect and a value suited to its kind.
export const observations = mysqlTable(
  "observations",
  {
    id: id(),
    regionVersionId: ref("region_version_id").notNull(),
    aspectId: ref("aspect_id").notNull(),
    termId: ref("term_id"),
    countValue: smallint("count_value", { unsigned: true }),
    textValue: varchar("text_value", { length: 500 }),
    confidence: mysqlEnum("confidence", CONFIDENCES).notNull(),
    note: text("note"),
    position: int("position").notNull().default(0),
    ...timestamps,
  },
  (t) => [
    index("observations_version").on(t.regionVersionId, t.position),
    index("observations_aspect").on(t.aspectId, t.termId),
    index("observations_term").on(t.termId),
  ],
);

export const REVIEW_DECISIONS = ["vetted", "returned"] as const;

// An editor's decision on one region version.
export const regionReviews = mysqlTable(
  "region_reviews",
  {
    id: id(),
    regionId: ref("region_id").notNull(),
    regionVersionId: ref("region_version_id").notNull(),
    reviewerId: ref("reviewer_id").notNull(),
    decision: mysqlEnum("decision", REVIEW_DECISIONS).notNull(),
    comment: text("comment"),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("region_reviews_region").on(t.regionId, t.createdAt)],
);

// The discussion thread of a region: anyone who may see the region's work in progress may write.
export const regionComments = mysqlTable(
  "region_comments",
  {
    id: id(),
    regionId: ref("region_id").notNull(),
    authorId: ref("author_id").notNull(),
    body: text("body").notNull(),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [index("region_comments_region").on(t.regionId, t.createdAt)],
);

export type Region = typeof regions.$inferSelect;
export type RegionVersion = typeof regionVersions.$inferSelect;
export type Observation = typeof observations.$inferSelect;
export type RegionState = (typeof REGION_STATES)[number];
export type Confidence = (typeof CONFIDENCES)[number];
