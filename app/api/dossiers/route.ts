// GET /api/dossiers: the caller's dossiers, those shared with them and their deleted ones. POST: start one (readers and up).
import { NextResponse } from "next/server";
import { readJson, route } from "@/lib/api/handler";
import { createDossier } from "@/lib/dossiers/mutations";
import { listMyDossiers } from "@/lib/dossiers/queries";
import { dossierCreateSchema } from "@/lib/dossiers/schemas";

export const GET = route("dossier.manage", async ({ actor }) => listMyDossiers(actor));

export const POST = route("dossier.manage", async ({ req, actor }) =>
  NextResponse.json({ dossier: await createDossier(actor, await readJson(req, dossierCreateSchema)) }, { status: 201 }),
);
