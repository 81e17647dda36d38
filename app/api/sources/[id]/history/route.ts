// GET /api/sources/:id/history: who changed the source, when, and which fields.
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { getSourceHistory } from "@/lib/sources/queries";

export const GET = route<{ id: string }>("archive.read", async ({ actor, params }) => ({
  history: await getSourceHistory(actor, z.coerce.number().int().positive().parse(params.id)),
}));
