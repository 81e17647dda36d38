// Seeds the demo scenario idempotently: anything already present (by e-mail or name) is left alone.
import { eq } from "drizzle-orm";
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { DEMO_PASSWORD, hashPassword } from "../../lib/auth/passwords";
import * as schema from "../schema";
import { seedAreas } from "./areas";
import { seedSources } from "./sources";
import { DEMO_ACCOUNTS, DEMO_COLLECTIONS } from "./scenario";
import { seedVocabulary } from "./vocabulary";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const password = DEMO_PASSWORD;
if (process.env.CORDARIUM_ENV === "production") {
  console.error("Refusing to seed demo accounts with a known password in production.");
  process.exit(1);
}

const connection = await mysql.createConnection({ uri: url, timezone: "Z" });
const db = drizzle(connection, { schema, mode: "default" });

try {
  // Whole seconds: columns filled by DEFAULT now() hold whole seconds too.
  const [[{ seedStart }]] = (await connection.query("SELECT NOW() AS seedStart")) as unknown as [[{ seedStart: Date }]];
  const passwordHash = await hashPassword(password);
  let admin: number | null = null;
  for (const account of DEMO_ACCOUNTS) {
    const [existing] = await db.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, account.email));
    let id = existing?.id;
    if (!id) {
      await db.transaction(async (tx) => {
        [{ id }] = await tx
          .insert(schema.users)
          .values({ ...account, passwordHash, emailVerifiedAt: new Date() })
          .$returningId();
        await tx.insert(schema.auditEvents).values({
          actorId: null,
          action: "user.seeded",
          entityType: "user",
          entityId: String(id),
          after: { id, email: account.email, name: account.name, role: account.role },
        });
      });
      console.log(`  account ${account.email} (${account.role})`);
    }
    if (account.role === "admin") admin = id!;
  }
  await seedVocabulary(db);
  for (const collection of DEMO_COLLECTIONS) {
    const [existing] = await db
      .select({ id: schema.collections.id })
      .from(schema.collections)
      .where(eq(schema.collections.name, collection.name));
    if (existing) continue;
    await db.transaction(async (tx) => {
      const [{ id }] = await tx.insert(schema.collections).values({ ...collection, createdBy: admin }).$returningId();
      await tx.insert(schema.auditEvents).values({
        actorId: admin,
        action: "collection.seeded",
        entityType: "collection",
        entityId: String(id),
        after: { id, ...collection },
      });
    });
    console.log(`  collection ${collection.name}`);
  }
  // Historical areas after the accounts: the admin is their author.
  await seedAreas(db, admin);
  const [contributor] = await db.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, "contributor@cordarium.test"));
  await seedSources(db, contributor.id);
  // The tests make their own images; drawing ten large pictures would only slow every run.
  if (process.env.CORDARIUM_SEED_IMAGES !== "0") {
    // Loaded only when needed: the drawing code is large.
    const { seedDemoImages } = await import("./demo-images");
    await seedDemoImages(db, contributor.id);
    // After the pictures (their rows carry the pixel size) and the vocabulary (observations name it).
    const { seedDemoRegions } = await import("./demo-regions");
    await seedDemoRegions(db);
  }
  // The seed writes rows directly, not through the mutations that queue search updates: queue what it
  // added or changed (a source brings its photographs' regions along), so the index catches up.
  await connection.query(
    `INSERT INTO search_outbox (entity_type, entity_id, next_attempt_at)
     SELECT 'source', touched.id, NOW(3) FROM (
       SELECT id FROM sources WHERE updated_at >= ?
       UNION SELECT source_id FROM images WHERE updated_at >= ?
       UNION SELECT i.source_id FROM regions r JOIN images i ON i.id = r.image_id WHERE r.updated_at >= ?
     ) AS touched
     ON DUPLICATE KEY UPDATE revision = search_outbox.revision + 1, next_attempt_at = NOW(3)`,
    [seedStart, seedStart, seedStart],
  );
  console.log("demo scenario ready");
} finally {
  await connection.end();
}
