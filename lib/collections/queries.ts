import "server-only";
import { and, asc, count, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { collections, sources } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { NotFoundError } from "@/lib/errors";
import { visibleSources } from "@/lib/sources/visibility";

const columns = {
  id: collections.id,
  name: collections.name,
  city: collections.city,
  countryCode: collections.countryCode,
  url: collections.url,
  notes: collections.notes,
  createdBy: collections.createdBy,
  version: collections.version,
};

export async function listCollections(actor: Actor | null) {
  authorize(actor, "archive.read");
  return db().select(columns).from(collections).orderBy(asc(collections.name));
}

/** A collection with the number of its sources the caller may see. */
export async function getCollection(actor: Actor | null, id: number) {
  authorize(actor, "archive.read");
  const [row] = await db().select(columns).from(collections).where(eq(collections.id, id)).limit(1);
  if (!row) throw new NotFoundError("collection");
  const [{ n }] = await db()
    .select({ n: count() })
    .from(sources)
    .where(and(eq(sources.collectionId, id), visibleSources(actor)));
  return { ...row, sourceCount: n };
}
