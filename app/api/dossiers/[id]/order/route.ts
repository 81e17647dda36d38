// POST /api/dossiers/:id/order: every item in its new order with the version read; stale → 409 (the owner).
import { readJson, route } from "@/lib/api/handler";
import { reorderItems } from "@/lib/dossiers/item-mutations";
import { dossierIdSchema, itemOrderSchema } from "@/lib/dossiers/schemas";

export const POST = route<{ id: string }>("dossier.manage", async ({ req, actor, params }) => {
  const order = await readJson(req, itemOrderSchema);
  return { dossier: await reorderItems(actor, dossierIdSchema.parse(params.id), order) };
});
