import { char, decimal, index, int, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { id, ref, timestamps, version } from "./columns";

// Places of making: cities from the offline gazetteer (loaded once at set-up) and historical areas
// that editors define with a representative point.
export const places = mysqlTable(
  "places",
  {
    id: id(),
    kind: mysqlEnum("kind", ["city", "area"]).notNull(),
    name: varchar("name", { length: 200 }).notNull(),
    // Lower case, accents folded (see lib/places/fold.ts): what the type-ahead matches on.
    foldedName: varchar("folded_name", { length: 200 }).notNull(),
    altName: varchar("alt_name", { length: 200 }),
    // ISO 3166-1 alpha-2 of today's country; historical areas may span several, this is the main one.
    countryCode: char("country_code", { length: 2 }),
    // The gazetteer's first-level subdivision code (GeoNames admin1), e.g. "07" for North Rhine-Westphalia.
    subdivisionCode: varchar("subdivision_code", { length: 20 }),
    latitude: decimal("latitude", { precision: 8, scale: 5, mode: "number" }).notNull(),
    longitude: decimal("longitude", { precision: 8, scale: 5, mode: "number" }).notNull(),
    population: int("population", { unsigned: true }).notNull().default(0),
    gazetteerId: int("gazetteer_id", { unsigned: true }),
    description: text("description"),
    createdBy: ref("created_by"),
    version: version(),
    ...timestamps,
  },
  (t) => [
    index("places_folded").on(t.foldedName, t.population),
    index("places_kind_folded").on(t.kind, t.foldedName),
    index("places_gazetteer").on(t.gazetteerId),
  ],
);

export type Place = typeof places.$inferSelect;
