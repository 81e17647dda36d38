// POST /api/vocabulary/aspects/:id/terms: add a term to an aspect whose values are terms (editors).
import { readJson, route } from "@/lib/api/handler";
import { idSchema, termCreateSchema } from "@/lib/vocabulary/schemas";
import { createTerm } from "@/lib/vocabulary/term-mutations";

export const POST = route<{ id: string }>("vocabulary.edit", async ({ req, actor, params }) => ({
  term: await createTerm(actor, idSchema.parse(params.id), await readJson(req, termCreateSchema)),
}));
