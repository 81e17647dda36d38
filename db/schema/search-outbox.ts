import { sql } from "drizzle-orm";
import { index, int, mysqlEnum, mysqlTable, text, timestamp, tinyint, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { id, ref } from "./columns";

export const OUTBOX_ENTITIES = ["region", "source"] as const;
export type OutboxEntity = (typeof OUTBOX_ENTITIES)[number];

// The transactional outbox of the search index: a row is written in the transaction of every change
// that alters an entity's search documents, and a worker delivers it (rebuilds the documents from the
// database and sends them) until the search service acknowledges the task. The database stays the
// source of truth; the index can always be rebuilt from it.
export const searchOutbox = mysqlTable(
  "search_outbox",
  {
    id: id(),
    entityType: mysqlEnum("entity_type", OUTBOX_ENTITIES).notNull(),
    entityId: ref("entity_id").notNull(),
    // Bumped by every change that finds the row still pending: a delivery marks the row delivered
    // only if no change arrived while it was building and sending the documents.
    revision: int("revision", { unsigned: true }).notNull().default(1),
    attempts: int("attempts", { unsigned: true }).notNull().default(0),
    nextAttemptAt: timestamp("next_attempt_at", { fsp: 3 }).notNull().defaultNow(),
    // A worker's lease while it delivers, outside any transaction; expired leases are claimed again.
    lockedBy: varchar("locked_by", { length: 100 }),
    lockedUntil: timestamp("locked_until", { fsp: 3 }),
    lastError: text("last_error"),
    deliveredAt: timestamp("delivered_at", { fsp: 3 }),
    // 1 while pending, NULL once delivered: the unique index below then allows one pending row per
    // entity (NULLs never collide), so a burst of edits makes one delivery, not one each.
    pending: tinyint("pending").generatedAlwaysAs(sql`IF(delivered_at IS NULL, 1, NULL)`, { mode: "stored" }),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("search_outbox_pending").on(t.entityType, t.entityId, t.pending),
    index("search_outbox_due").on(t.deliveredAt, t.nextAttemptAt),
  ],
);

export type SearchOutboxRow = typeof searchOutbox.$inferSelect;
