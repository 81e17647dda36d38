// POST /api/vocabulary/aspects/:id/order: put an aspect's terms in a new order, each with the version read (editors).
import { readJson, route } from "@/lib/api/handler";
import { idSchema, termOrderSchema } from "@/lib/vocabulary/schemas";
import { reorderTerms } from "@/lib/vocabulary/term-mutations";

export const POST = route<{ id: string }>("vocabulary.edit", async ({ req, actor, params }) => ({
  aspect: await reorderTerms(actor, idSchema.parse(params.id), await readJson(req, termOrderSchema)),
}));
