// GET /api/collections: every holding collection. POST: add one (contributors and up).
import { readJson, route } from "@/lib/api/handler";
import { createCollection } from "@/lib/collections/mutations";
import { listCollections } from "@/lib/collections/queries";
import { collectionFieldsSchema } from "@/lib/collections/schemas";

export const GET = route("archive.read", async ({ actor }) => ({ collections: await listCollections(actor) }));

export const POST = route("collection.create", async ({ req, actor }) => ({
  collection: await createCollection(actor, await readJson(req, collectionFieldsSchema)),
}));
