// POST /api/regions/:id/withdraw: take a proposed region back from review (its author), with the version read.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { withdrawRegion } from "@/lib/regions/mutations";
import { versionOnlySchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const POST = route<{ id: string }>("region.withdraw", async ({ req, actor, params }) =>
  withdrawRegion(actor, idSchema.parse(params.id), (await readJson(req, versionOnlySchema)).version),
);
