import { index, int, mysqlEnum, mysqlTable, text, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { DOSSIER_ITEM_KINDS, DOSSIER_VISIBILITIES, type DossierItemKind, type DossierVisibility } from "../../lib/dossiers/vocab";
import { id, ref, timestamps, version } from "./columns";

// A person's curated set of regions and sources for a study. "shared" opens it to the people named in
// dossier_shares; "public" to everyone, visitors included. Deleting only sets deleted_at, so the owner
// can restore it.
export const dossiers = mysqlTable(
  "dossiers",
  {
    id: id(),
    ownerId: ref("owner_id").notNull(),
    title: varchar("title", { length: 200 }).notNull(),
    description: text("description"),
    visibility: mysqlEnum("visibility", DOSSIER_VISIBILITIES).notNull().default("private"),
    deletedAt: timestamp("deleted_at", { fsp: 3 }),
    version: version(),
    ...timestamps,
  },
  (t) => [index("dossiers_owner").on(t.ownerId, t.deletedAt, t.updatedAt), index("dossiers_visibility").on(t.visibility, t.deletedAt)],
);

// One entry of a dossier: a region or a whole source (exactly one of the two ids is set), its place in
// the dossier's order and the owner's note. A region or source appears at most once per dossier
// (MariaDB lets NULLs repeat in a unique index, so the two indexes do not collide).
export const dossierItems = mysqlTable(
  "dossier_items",
  {
    id: id(),
    dossierId: ref("dossier_id").notNull(),
    kind: mysqlEnum("kind", DOSSIER_ITEM_KINDS).notNull(),
    regionId: ref("region_id"),
    sourceId: ref("source_id"),
    position: int("position").notNull().default(0),
    note: text("note"),
    version: version(),
    ...timestamps,
  },
  (t) => [
    index("dossier_items_order").on(t.dossierId, t.position, t.id),
    uniqueIndex("dossier_items_region").on(t.dossierId, t.regionId),
    uniqueIndex("dossier_items_source").on(t.dossierId, t.sourceId),
  ],
);

// The people a "shared" dossier is open to, for reading only.
export const dossierShares = mysqlTable(
  "dossier_shares",
  {
    id: id(),
    dossierId: ref("dossier_id").notNull(),
    userId: ref("user_id").notNull(),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("dossier_shares_pair").on(t.dossierId, t.userId), index("dossier_shares_user").on(t.userId)],
);

export type Dossier = typeof dossiers.$inferSelect;
export type DossierItem = typeof dossierItems.$inferSelect;
export type { DossierItemKind, DossierVisibility };
