import { index, int, mysqlEnum, mysqlTable, text, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { ASPECT_KINDS, ASPECT_SECTIONS } from "../../lib/vocabulary/kinds";
import { id, ref, timestamps, version } from "./columns";

export { ASPECT_KINDS, ASPECT_SECTIONS };

// One kind of evidence a region can carry ("right-hand technique", "peg count"). Editors manage them;
// `key` is stable (exports and the stringing check name aspects by it), the label may change.
export const aspects = mysqlTable(
  "aspects",
  {
    id: id(),
    key: varchar("key", { length: 60 }).notNull(),
    label: varchar("label", { length: 120 }).notNull(),
    description: text("description"),
    kind: mysqlEnum("kind", ASPECT_KINDS).notNull(),
    section: mysqlEnum("section", ASPECT_SECTIONS).notNull(),
    position: int("position").notNull().default(0),
    deprecatedAt: timestamp("deprecated_at", { fsp: 3 }),
    version: version(),
    ...timestamps,
  },
  (t) => [uniqueIndex("aspects_key").on(t.key), index("aspects_order").on(t.section, t.position)],
);

// A term of an aspect's list. A term in use is never deleted: it is deprecated, or merged into another
// (its observations rewritten to the other term and `mergedIntoId` set).
export const aspectTerms = mysqlTable(
  "aspect_terms",
  {
    id: id(),
    aspectId: ref("aspect_id").notNull(),
    key: varchar("key", { length: 60 }).notNull(),
    label: varchar("label", { length: 120 }).notNull(),
    description: text("description"),
    position: int("position").notNull().default(0),
    deprecatedAt: timestamp("deprecated_at", { fsp: 3 }),
    mergedIntoId: ref("merged_into_id"),
    version: version(),
    ...timestamps,
  },
  (t) => [uniqueIndex("aspect_terms_key").on(t.aspectId, t.key), index("aspect_terms_order").on(t.aspectId, t.position)],
);

export type Aspect = typeof aspects.$inferSelect;
export type AspectTerm = typeof aspectTerms.$inferSelect;
export type { AspectKind, AspectSection } from "../../lib/vocabulary/kinds";
