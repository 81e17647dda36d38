// Demo historical areas: two states of the period that many works can be placed in but not in one
// city, each with a representative point (its capital). Idempotent: an area already there is left alone.
import { and, eq } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import { foldName } from "../../lib/places/fold";
import * as schema from "../schema";

type SeedDatabase = MySql2Database<typeof schema>;

export const DEMO_AREAS = [
  {
    name: "Kingdom of Naples",
    countryCode: "IT",
    latitude: 40.8518,
    longitude: 14.2681,
    description: "Southern Italy under Spanish viceroys, 1504–1707; the point is Naples, its capital.",
  },
  {
    name: "Spanish Netherlands",
    countryCode: "BE",
    latitude: 50.8503,
    longitude: 4.3517,
    description: "The Habsburg Low Countries loyal to Spain, 1581–1714; the point is Brussels, the seat of government.",
  },
];

export async function seedAreas(db: SeedDatabase, adminId: number | null): Promise<void> {
  for (const area of DEMO_AREAS) {
    const foldedName = foldName(area.name);
    const [existing] = await db
      .select({ id: schema.places.id })
      .from(schema.places)
      .where(
        and(
          eq(schema.places.kind, "area"),
          eq(schema.places.foldedName, foldedName),
          eq(schema.places.countryCode, area.countryCode),
        ),
      );
    if (existing) continue;
    await db.transaction(async (tx) => {
      const values = { kind: "area" as const, ...area, foldedName, createdBy: adminId };
      const [{ id }] = await tx.insert(schema.places).values(values).$returningId();
      await tx.insert(schema.auditEvents).values({
        actorId: adminId,
        action: "place.seeded",
        entityType: "place",
        entityId: String(id),
        after: { id, ...values },
      });
    });
    console.log(`  historical area ${area.name}`);
  }
}
