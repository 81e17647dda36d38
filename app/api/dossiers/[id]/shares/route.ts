// PUT /api/dossiers/:id/shares: the whole list of people (by e-mail) the dossier is shared with, and
// optionally its visibility, with the version read (the owner). An unknown address is a 400.
import { readJson, route } from "@/lib/api/handler";
import { setShares } from "@/lib/dossiers/mutations";
import { dossierIdSchema, dossierSharesSchema } from "@/lib/dossiers/schemas";

export const PUT = route<{ id: string }>("dossier.manage", async ({ req, actor, params }) => {
  const input = await readJson(req, dossierSharesSchema);
  return { dossier: await setShares(actor, dossierIdSchema.parse(params.id), input) };
});
