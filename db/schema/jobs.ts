import { index, int, json, mysqlEnum, mysqlTable, text, timestamp, varchar } from "drizzle-orm/mysql-core";
import { id, timestamps } from "./columns";

export const JOB_STATES = ["queued", "running", "done", "failed"] as const;

// The database-backed work queue: any app instance claims the next due job with
// SELECT … FOR UPDATE SKIP LOCKED, so several instances share the work without a coordinator.
export const jobs = mysqlTable(
  "jobs",
  {
    id: id(),
    kind: varchar("kind", { length: 40 }).notNull(),
    payload: json("payload").$type<Record<string, unknown>>().notNull(),
    state: mysqlEnum("state", JOB_STATES).notNull().default("queued"),
    runAt: timestamp("run_at", { fsp: 3 }).notNull().defaultNow(),
    attempts: int("attempts", { unsigned: true }).notNull().default(0),
    maxAttempts: int("max_attempts", { unsigned: true }).notNull().default(4),
    lockedBy: varchar("locked_by", { length: 100 }),
    lockedAt: timestamp("locked_at", { fsp: 3 }),
    lastError: text("last_error"),
    finishedAt: timestamp("finished_at", { fsp: 3 }),
    ...timestamps,
  },
  (t) => [index("jobs_due").on(t.state, t.runAt), index("jobs_kind").on(t.kind, t.state)],
);

export type Job = typeof jobs.$inferSelect;
