// POST /api/regions/:id/restore: undo the deletion of a region (its author), with the version read.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { restoreRegion } from "@/lib/regions/mutations";
import { versionOnlySchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const POST = route<{ id: string }>("region.edit", async ({ req, actor, params }) =>
  restoreRegion(actor, idSchema.parse(params.id), (await readJson(req, versionOnlySchema)).version),
);
