import { mysqlEnum, mysqlTable, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { id, timestamps, version } from "./columns";

export const ROLES = ["reader", "contributor", "editor", "admin"] as const;
/** How a person wants review e-mails: each at once, one digest a day, or none. */
export const NOTIFY_MODES = ["immediate", "daily", "off"] as const;

export const users = mysqlTable(
  "users",
  {
    id: id(),
    email: varchar("email", { length: 254 }).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    role: mysqlEnum("role", ROLES).notNull().default("reader"),
    // argon2id; null until the person sets a password (e.g. link-only accounts).
    passwordHash: varchar("password_hash", { length: 255 }),
    emailVerifiedAt: timestamp("email_verified_at", { fsp: 3 }),
    disabledAt: timestamp("disabled_at", { fsp: 3 }),
    lastSignInAt: timestamp("last_sign_in_at", { fsp: 3 }),
    notify: mysqlEnum("notify", NOTIFY_MODES).notNull().default("immediate"),
    version: version(),
    ...timestamps,
  },
  (t) => [uniqueIndex("users_email_unique").on(t.email)],
);

export type User = typeof users.$inferSelect;
export type Role = (typeof ROLES)[number];
export type NotifyMode = (typeof NOTIFY_MODES)[number];
