// POST /api/vocabulary/terms/:id/merge { intoTermId, version }: fold this term into another of the same
// aspect, rewriting the observations that name it (editors).
import { readJson, route } from "@/lib/api/handler";
import { mergeTerm } from "@/lib/vocabulary/merge";
import { idSchema, mergeSchema } from "@/lib/vocabulary/schemas";

export const POST = route<{ id: string }>("vocabulary.edit", async ({ req, actor, params }) => mergeTerm(actor, idSchema.parse(params.id), await readJson(req, mergeSchema)));
