// PATCH /api/dossiers/:id/items/:itemId: the owner's note on an item, with the version read.
// DELETE: take the item out of the dossier, with the version read (the owner).
import { readJson, route } from "@/lib/api/handler";
import { annotateItem, removeItem } from "@/lib/dossiers/item-mutations";
import { dossierIdSchema, itemNoteSchema, versionOnlySchema } from "@/lib/dossiers/schemas";

type Params = { id: string; itemId: string };

export const PATCH = route<Params>("dossier.manage", async ({ req, actor, params }) => {
  const input = await readJson(req, itemNoteSchema);
  return { dossier: await annotateItem(actor, dossierIdSchema.parse(params.id), dossierIdSchema.parse(params.itemId), input) };
});

export const DELETE = route<Params>("dossier.manage", async ({ req, actor, params }) => {
  const { version } = await readJson(req, versionOnlySchema);
  return { dossier: await removeItem(actor, dossierIdSchema.parse(params.id), dossierIdSchema.parse(params.itemId), version) };
});
