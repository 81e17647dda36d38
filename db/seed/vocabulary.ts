// Seeds the evidence vocabulary by key. Only what is missing is added: an aspect or term already there
// keeps the editors' wording, order, kind and deprecation, and one an editor deleted (the audit trail
// says so) is not put back. Runs in every profile, since observations cannot be recorded without it.
import { eq, inArray, max } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import { VOCABULARY, type AspectDefinition, type TermDefinition } from "../../lib/vocabulary/definition";
import * as schema from "../schema";

type SeedDatabase = MySql2Database<typeof schema>;
type Tx = Parameters<Parameters<SeedDatabase["transaction"]>[0]>[0];

async function removedByEditors(db: SeedDatabase): Promise<Set<string>> {
  const events = await db
    .select({ action: schema.auditEvents.action, before: schema.auditEvents.before })
    .from(schema.auditEvents)
    .where(inArray(schema.auditEvents.action, ["aspect.deleted", "term.deleted"]));
  const removed = new Set<string>();
  for (const { action, before } of events) {
    // Raw drivers hand JSON back as text; drizzle as an object.
    const record = (typeof before === "string" ? JSON.parse(before) : before) as { key?: string; aspectKey?: string } | null;
    if (!record?.key) continue;
    removed.add(action === "aspect.deleted" ? `aspect:${record.key}` : `term:${record.aspectKey}:${record.key}`);
  }
  return removed;
}

async function insertTerms(tx: Tx, aspectId: number, terms: TermDefinition[], from: number) {
  for (const [i, term] of terms.entries()) {
    await tx.insert(schema.aspectTerms).values({ aspectId, ...term, position: from + i });
  }
}

async function seedAspect(db: SeedDatabase, definition: AspectDefinition) {
  const { terms, ...aspect } = definition;
  await db.transaction(async (tx) => {
    const [{ top }] = await tx.select({ top: max(schema.aspects.position) }).from(schema.aspects).where(eq(schema.aspects.section, aspect.section));
    const [{ id }] = await tx.insert(schema.aspects).values({ ...aspect, position: (top ?? 0) + 1 }).$returningId();
    await insertTerms(tx, id, terms, 1);
    await tx.insert(schema.auditEvents).values({
      actorId: null,
      action: "aspect.seeded",
      entityType: "aspect",
      entityId: String(id),
      after: { id, ...aspect, terms: terms.map((t) => t.key) },
    });
  });
}

// Terms a later release adds to an aspect that exists go last in its list.
async function seedMissingTerms(db: SeedDatabase, aspectId: number, aspectKey: string, terms: TermDefinition[]) {
  await db.transaction(async (tx) => {
    const [{ top }] = await tx.select({ top: max(schema.aspectTerms.position) }).from(schema.aspectTerms).where(eq(schema.aspectTerms.aspectId, aspectId));
    await insertTerms(tx, aspectId, terms, (top ?? 0) + 1);
    await tx.insert(schema.auditEvents).values({
      actorId: null,
      action: "term.seeded",
      entityType: "aspect",
      entityId: String(aspectId),
      after: { aspectKey, terms: terms.map((t) => t.key) },
    });
  });
}

export async function seedVocabulary(db: SeedDatabase): Promise<void> {
  const removed = await removedByEditors(db);
  let added = 0;
  for (const definition of VOCABULARY) {
    const [existing] = await db
      .select({ id: schema.aspects.id, kind: schema.aspects.kind })
      .from(schema.aspects)
      .where(eq(schema.aspects.key, definition.key));
    if (!existing) {
      if (removed.has(`aspect:${definition.key}`)) continue;
      await seedAspect(db, definition);
      added++;
      continue;
    }
    // An editor who made it a count or text aspect meant it to have no list.
    if (existing.kind !== "terms" || definition.terms.length === 0) continue;
    const have = await db
      .select({ key: schema.aspectTerms.key })
      .from(schema.aspectTerms)
      .where(eq(schema.aspectTerms.aspectId, existing.id));
    const keys = new Set(have.map((t) => t.key));
    const missing = definition.terms.filter((t) => !keys.has(t.key) && !removed.has(`term:${definition.key}:${t.key}`));
    if (missing.length > 0) {
      await seedMissingTerms(db, existing.id, definition.key, missing);
      console.log(`  vocabulary: ${missing.length} term(s) added to ${definition.key}`);
    }
  }
  if (added > 0) console.log(`  vocabulary: ${added} aspect(s)`);
}
