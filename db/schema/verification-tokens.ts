import { mysqlTable, primaryKey, timestamp, varchar } from "drizzle-orm/mysql-core";

// next-auth's e-mail sign-in links. next-auth stores a hash of the token, never the token itself.
export const verificationTokens = mysqlTable(
  "verification_tokens",
  {
    identifier: varchar("identifier", { length: 254 }).notNull(),
    token: varchar("token", { length: 128 }).notNull(),
    expires: timestamp("expires", { fsp: 3 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.identifier, t.token] })],
);
