import { bigint, int, timestamp } from "drizzle-orm/mysql-core";

// MariaDB refuses the SQL that drizzle's serial() produces; this is the id every table uses.
export const id = () => bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey();

export const ref = (name: string) => bigint(name, { mode: "number", unsigned: true });

export const timestamps = {
  createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  updatedAt: timestamp("updated_at", { fsp: 3 }).notNull().defaultNow().onUpdateNow(),
};

/** Optimistic concurrency: every update says which version it read, and bumps it. */
export const version = () => int("version", { unsigned: true }).notNull().default(1);
