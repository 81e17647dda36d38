import { bigint, int, mysqlTable, varchar } from "drizzle-orm/mysql-core";

// The shape rate-limiter-flexible's MySQL store expects; created here so it is migrated like every other table.
export const signInLimits = mysqlTable("sign_in_limits", {
  key: varchar("key", { length: 255 }).primaryKey(),
  points: int("points").notNull().default(0),
  expire: bigint("expire", { mode: "number", unsigned: true }),
});
