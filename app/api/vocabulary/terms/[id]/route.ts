// PATCH /api/vocabulary/terms/:id: change a term's label, description, position or deprecation, with the
// version read. DELETE: remove it while no observation uses it (editors).
import { readJson, route } from "@/lib/api/handler";
import { deleteSchema, idSchema, termUpdateSchema } from "@/lib/vocabulary/schemas";
import { deleteTerm, updateTerm } from "@/lib/vocabulary/term-mutations";

export const PATCH = route<{ id: string }>("vocabulary.edit", async ({ req, actor, params }) => ({
  term: await updateTerm(actor, idSchema.parse(params.id), await readJson(req, termUpdateSchema)),
}));

export const DELETE = route<{ id: string }>("vocabulary.edit", async ({ req, actor, params }) => {
  await deleteTerm(actor, idSchema.parse(params.id), (await readJson(req, deleteSchema)).version);
  return { ok: true };
});
