import { index, json, mysqlTable, text, timestamp, varchar } from "drizzle-orm/mysql-core";
import { id, ref } from "./columns";

// One thing a person is to be told by e-mail (a decision on their region, a new proposal to review).
// Written in the transaction of the change; sent at once or gathered into the daily digest, as the
// person chose. `sentAt` is set when the letter that carries it has gone.
export const notifications = mysqlTable(
  "notifications",
  {
    id: id(),
    userId: ref("user_id").notNull(),
    kind: varchar("kind", { length: 40 }).notNull(),
    subject: varchar("subject", { length: 300 }).notNull(),
    body: text("body").notNull(),
    link: varchar("link", { length: 500 }),
    payload: json("payload").$type<Record<string, unknown>>(),
    createdAt: timestamp("created_at", { fsp: 3 }).notNull().defaultNow(),
    sentAt: timestamp("sent_at", { fsp: 3 }),
  },
  (t) => [index("notifications_pending").on(t.userId, t.sentAt, t.createdAt)],
);

export type Notification = typeof notifications.$inferSelect;
