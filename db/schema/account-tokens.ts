import { index, mysqlEnum, mysqlTable, timestamp, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { id, ref } from "./columns";
import { ROLES } from "./users";

// One-use tokens sent by e-mail: password resets and invitations. Only a SHA-256 of the token is stored.
export const accountTokens = mysqlTable(
  "account_tokens",
  {
    id: id(),
    purpose: mysqlEnum("purpose", ["password_reset", "invitation"]).notNull(),
    tokenHash: varchar("token_hash", { length: 64 }).notNull(),
    email: varchar("email", { length: 254 }).notNull(),
    // Invitations carry the role the invitee will get.
    role: mysqlEnum("role", ROLES),
    userId: ref("user_id"),
    createdBy: ref("created_by"),
    expiresAt: timestamp("expires_at", { fsp: 3 }).notNull(),
    usedAt: timestamp("used_at", { fsp: 3 }),
    revokedAt: timestamp("revoked_at", { fsp: 3 }),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("account_tokens_hash_unique").on(t.tokenHash), index("account_tokens_email").on(t.email)],
);

export type AccountToken = typeof accountTokens.$inferSelect;
