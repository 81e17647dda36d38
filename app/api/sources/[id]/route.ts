// GET /api/sources/:id: one source. PATCH: edit it with the version read (own drafts for contributors,
// any for editors). DELETE: soft-delete with the version read (admins).
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { deleteSource, updateSource } from "@/lib/sources/mutations";
import { getSource } from "@/lib/sources/queries";
import { sourceUpdateSchema } from "@/lib/sources/schemas";

const idSchema = z.coerce.number().int().positive();
const versionSchema = z.object({ version: z.number().int().positive() });

export const GET = route<{ id: string }>("archive.read", async ({ actor, params }) => ({ source: await getSource(actor, idSchema.parse(params.id)) }));

export const PATCH = route<{ id: string }>("source.edit", async ({ req, actor, params }) => ({
  source: await updateSource(actor, idSchema.parse(params.id), await readJson(req, sourceUpdateSchema)),
}));

export const DELETE = route<{ id: string }>("source.delete", async ({ req, actor, params }) => ({
  source: await deleteSource(actor, idSchema.parse(params.id), (await readJson(req, versionSchema)).version),
}));
