// POST /api/vocabulary/order: put the aspects of one section in a new order, each with the version read (editors).
import { readJson, route } from "@/lib/api/handler";
import { reorderAspects } from "@/lib/vocabulary/mutations";
import { aspectOrderSchema } from "@/lib/vocabulary/schemas";

export const POST = route("vocabulary.edit", async ({ req, actor }) => ({
  aspects: await reorderAspects(actor, await readJson(req, aspectOrderSchema)),
}));
