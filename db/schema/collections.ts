import { char, index, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { id, ref, timestamps, version } from "./columns";

// A holding institution or private collection.
export const collections = mysqlTable(
  "collections",
  {
    id: id(),
    name: varchar("name", { length: 200 }).notNull(),
    city: varchar("city", { length: 120 }),
    // ISO 3166-1 alpha-2
    countryCode: char("country_code", { length: 2 }),
    url: varchar("url", { length: 500 }),
    notes: text("notes"),
    createdBy: ref("created_by"),
    version: version(),
    ...timestamps,
  },
  (t) => [index("collections_name").on(t.name)],
);

export type Collection = typeof collections.$inferSelect;
