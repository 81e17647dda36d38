// POST /api/sources/:id/restore: bring back a soft-deleted source, with the version read (admins).
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { restoreSource } from "@/lib/sources/mutations";

export const POST = route<{ id: string }>("source.restore", async ({ req, actor, params }) => ({
  source: await restoreSource(actor, z.coerce.number().int().positive().parse(params.id), (await readJson(req, z.object({ version: z.number().int().positive() }))).version),
}));
