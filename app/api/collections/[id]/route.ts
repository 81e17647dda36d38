// GET /api/collections/:id: one collection with its count of visible sources.
// PATCH: edit it with the version read (its creator, or editors and up).
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { updateCollection } from "@/lib/collections/mutations";
import { getCollection } from "@/lib/collections/queries";
import { collectionUpdateSchema } from "@/lib/collections/schemas";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("archive.read", async ({ actor, params }) => ({ collection: await getCollection(actor, idSchema.parse(params.id)) }));

export const PATCH = route<{ id: string }>("collection.edit", async ({ req, actor, params }) => ({
  collection: await updateCollection(actor, idSchema.parse(params.id), await readJson(req, collectionUpdateSchema)),
}));
