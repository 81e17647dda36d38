// POST /api/dossiers/:id/restore: bring back a deleted dossier, with the version read (the owner).
import { readJson, route } from "@/lib/api/handler";
import { restoreDossier } from "@/lib/dossiers/mutations";
import { dossierIdSchema, versionOnlySchema } from "@/lib/dossiers/schemas";

export const POST = route<{ id: string }>("dossier.manage", async ({ req, actor, params }) => {
  const { version } = await readJson(req, versionOnlySchema);
  return { dossier: await restoreDossier(actor, dossierIdSchema.parse(params.id), version) };
});
