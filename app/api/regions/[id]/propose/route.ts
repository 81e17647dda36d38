// POST /api/regions/:id/propose: propose a region for review (its author), with the version read.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { proposeRegion } from "@/lib/regions/mutations";
import { versionOnlySchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const POST = route<{ id: string }>("region.propose", async ({ req, actor, params }) =>
  proposeRegion(actor, idSchema.parse(params.id), (await readJson(req, versionOnlySchema)).version),
);
