import "server-only";
// The import's questions to the database, asked once per file in batches rather than once per row:
// which collection a name means, which gazetteer place a name and country mean, and which
// collection + accession number pairs are catalogued already.
import { and, inArray, isNull } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { collections, places, sources } from "@/db/schema";
import { foldName } from "@/lib/places/fold";

const BATCH = 500;

function batches<T>(items: T[]): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += BATCH) out.push(items.slice(i, i + BATCH));
  return out;
}

// The database's collation ignores accents too; the import matches names exactly except for case.
export const collectionKey = (name: string) => name.normalize("NFC").trim().toLowerCase();

export type CollectionMatch = { id: number; name: string; others: number };

/** Collections by exact name, case aside; several with one name → the oldest, and how many others. */
export async function findCollections(tx: Executor, names: string[]): Promise<Map<string, CollectionMatch>> {
  const wanted = [...new Set(names.map((n) => n.trim()).filter(Boolean))];
  const found = new Map<string, CollectionMatch>();
  for (const batch of batches(wanted)) {
    const rows = await tx.select({ id: collections.id, name: collections.name }).from(collections).where(inArray(collections.name, batch)).orderBy(collections.id);
    for (const row of rows) {
      const key = collectionKey(row.name);
      const seen = found.get(key);
      if (seen) seen.others++;
      else found.set(key, { id: row.id, name: row.name, others: 0 });
    }
  }
  return found;
}

export type PlaceCandidate = { id: number; kind: "city" | "area"; name: string; countryCode: string | null; subdivisionCode: string | null; population: number };

export const placeKey = (name: string, country: string | null) => `${foldName(name).slice(0, 200)}|${country ?? ""}`;

/**
 * Gazetteer places by folded name (the index the type-ahead uses), most populous first, per
 * name + country asked for; without a country, every country's places of that name.
 */
export async function findPlaces(tx: Executor, asked: { name: string; country: string | null }[]): Promise<Map<string, PlaceCandidate[]>> {
  const folded = [...new Set(asked.map((a) => foldName(a.name).slice(0, 200)).filter(Boolean))];
  const byName = new Map<string, PlaceCandidate[]>();
  for (const batch of batches(folded)) {
    const exact = new Set(batch);
    const rows = await tx
      .select({ id: places.id, kind: places.kind, name: places.name, foldedName: places.foldedName, countryCode: places.countryCode, subdivisionCode: places.subdivisionCode, population: places.population })
      .from(places)
      .where(inArray(places.foldedName, batch));
    for (const { foldedName, ...row } of rows) {
      // The collation would also let "sevilla " or other near-misses through; keep exact folded matches.
      if (!exact.has(foldedName)) continue;
      (byName.get(foldedName) ?? byName.set(foldedName, []).get(foldedName)!).push(row);
    }
  }
  const result = new Map<string, PlaceCandidate[]>();
  for (const { name, country } of asked) {
    const all = byName.get(foldName(name).slice(0, 200)) ?? [];
    const matching = country ? all.filter((p) => p.countryCode === country) : all;
    result.set(placeKey(name, country), [...matching].sort((a, b) => b.population - a.population || a.id - b.id));
  }
  return result;
}

export type CataloguedSource = { id: number; title: string; state: string; createdBy: number; deletedAt: Date | null };

export const accessionKey = (collectionId: number, accession: string) => `${collectionId}|${accession.normalize("NFC").trim().toLowerCase()}`;

/** Live sources holding any of these collection + accession number pairs; `lock` in the commit's transaction. */
export async function findCatalogued(tx: Executor, pairs: { collectionId: number; accession: string }[], lock = false): Promise<Map<string, CataloguedSource>> {
  const wanted = new Set(pairs.map((p) => accessionKey(p.collectionId, p.accession)));
  const found = new Map<string, CataloguedSource>();
  const byCollection = new Map<number, string[]>();
  for (const p of pairs) (byCollection.get(p.collectionId) ?? byCollection.set(p.collectionId, []).get(p.collectionId)!).push(p.accession.trim());
  for (const [collectionId, accessions] of byCollection) {
    for (const batch of batches([...new Set(accessions)])) {
      const query = tx
        .select({ id: sources.id, title: sources.title, state: sources.state, createdBy: sources.createdBy, deletedAt: sources.deletedAt, accessionNumber: sources.accessionNumber })
        .from(sources)
        .where(and(inArray(sources.collectionId, [collectionId]), inArray(sources.accessionNumber, batch), isNull(sources.deletedAt)))
        .orderBy(sources.id);
      const rows = lock ? await query.for("update") : await query;
      for (const { accessionNumber, ...row } of rows) {
        const key = accessionKey(collectionId, accessionNumber ?? "");
        if (wanted.has(key) && !found.has(key)) found.set(key, row);
      }
    }
  }
  return found;
}
