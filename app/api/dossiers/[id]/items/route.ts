// POST /api/dossiers/:id/items: add a region or a source the caller may see, at the end (the owner).
import { NextResponse } from "next/server";
import { readJson, route } from "@/lib/api/handler";
import { addItem } from "@/lib/dossiers/item-mutations";
import { dossierIdSchema, itemAddSchema } from "@/lib/dossiers/schemas";

export const POST = route<{ id: string }>("dossier.manage", async ({ req, actor, params }) => {
  const input = await readJson(req, itemAddSchema);
  return NextResponse.json(await addItem(actor, dossierIdSchema.parse(params.id), input), { status: 201 });
});
