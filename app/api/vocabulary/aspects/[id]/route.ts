// PATCH /api/vocabulary/aspects/:id: change an aspect's label, description, kind, section, position or
// deprecation, with the version read. DELETE: remove it while no observation uses it (editors).
import { readJson, route } from "@/lib/api/handler";
import { deleteAspect, updateAspect } from "@/lib/vocabulary/mutations";
import { aspectUpdateSchema, deleteSchema, idSchema } from "@/lib/vocabulary/schemas";

export const PATCH = route<{ id: string }>("vocabulary.edit", async ({ req, actor, params }) => ({
  aspect: await updateAspect(actor, idSchema.parse(params.id), await readJson(req, aspectUpdateSchema)),
}));

export const DELETE = route<{ id: string }>("vocabulary.edit", async ({ req, actor, params }) => {
  await deleteAspect(actor, idSchema.parse(params.id), (await readJson(req, deleteSchema)).version);
  return { ok: true };
});
