import { index, json, mysqlTable, timestamp, varchar } from "drizzle-orm/mysql-core";
import { id, ref } from "./columns";

// Who changed what, when, with the record before and after. Written in the same transaction as the change.
export const auditEvents = mysqlTable(
  "audit_events",
  {
    id: id(),
    actorId: ref("actor_id"),
    action: varchar("action", { length: 64 }).notNull(),
    entityType: varchar("entity_type", { length: 40 }).notNull(),
    entityId: varchar("entity_id", { length: 64 }).notNull(),
    before: json("before"),
    after: json("after"),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [
    index("audit_entity").on(t.entityType, t.entityId, t.createdAt),
    index("audit_actor").on(t.actorId, t.createdAt),
    index("audit_created").on(t.createdAt),
  ],
);

export type AuditEvent = typeof auditEvents.$inferSelect;
