import "server-only";
import { asc } from "drizzle-orm";
import { db } from "@/db/client";
import { collections } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";

export async function listCollections(actor: Actor | null) {
  authorize(actor, "archive.read");
  return db()
    .select({ id: collections.id, name: collections.name, city: collections.city, countryCode: collections.countryCode, url: collections.url, notes: collections.notes })
    .from(collections)
    .orderBy(asc(collections.name));
}
