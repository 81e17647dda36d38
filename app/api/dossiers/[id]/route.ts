// GET /api/dossiers/:id: a dossier with the items the caller may see (owner, people it is shared with,
// anyone when public; 404 otherwise). PATCH: rename, describe, set visibility with the version read
// (the owner). DELETE: soft-delete with the version read (the owner; undo with restore).
import { readJson, route } from "@/lib/api/handler";
import { deleteDossier, updateDossier } from "@/lib/dossiers/mutations";
import { getDossier } from "@/lib/dossiers/queries";
import { dossierIdSchema, dossierUpdateSchema, versionOnlySchema } from "@/lib/dossiers/schemas";

export const GET = route<{ id: string }>("archive.read", async ({ actor, params }) => ({ dossier: await getDossier(actor, dossierIdSchema.parse(params.id)) }));

export const PATCH = route<{ id: string }>("dossier.manage", async ({ req, actor, params }) => {
  const change = await readJson(req, dossierUpdateSchema);
  return { dossier: await updateDossier(actor, dossierIdSchema.parse(params.id), change) };
});

export const DELETE = route<{ id: string }>("dossier.manage", async ({ req, actor, params }) => {
  const { version } = await readJson(req, versionOnlySchema);
  return { dossier: await deleteDossier(actor, dossierIdSchema.parse(params.id), version) };
});
