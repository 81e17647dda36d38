// GET /api/images/:id/regions: the regions of a photograph the caller may see (?proposed=1 adds work
// not yet reviewed). POST: mark a new region (contributors).
import { NextResponse } from "next/server";
import { z } from "zod";
import { readJson, readQuery, route } from "@/lib/api/handler";
import { createRegion } from "@/lib/regions/mutations";
import { listRegionsOfImage } from "@/lib/regions/queries";
import { regionCreateSchema, regionListQuerySchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("archive.read", async ({ req, actor, params }) => {
  const query = readQuery(req, regionListQuerySchema);
  return { regions: await listRegionsOfImage(actor, idSchema.parse(params.id), { proposed: query.proposed === "1" }) };
});

export const POST = route<{ id: string }>("region.create", async ({ req, actor, params }) =>
  NextResponse.json(await createRegion(actor, idSchema.parse(params.id), await readJson(req, regionCreateSchema)), { status: 201 }),
);
