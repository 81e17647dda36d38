// GET /api/regions/:id: one region as the caller may see it. PATCH: edit the shape, label or
// observations with the version read (the author). DELETE: remove it with the version read (undoable).
import { z } from "zod";
import { readJson, readQuery, route } from "@/lib/api/handler";
import { deleteRegion, updateRegion } from "@/lib/regions/mutations";
import { getRegion } from "@/lib/regions/queries";
import { regionListQuerySchema, regionUpdateSchema, versionOnlySchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("archive.read", async ({ req, actor, params }) => {
  const query = readQuery(req, regionListQuerySchema);
  return getRegion(actor, idSchema.parse(params.id), { proposed: query.proposed === "1" });
});

export const PATCH = route<{ id: string }>("region.edit", async ({ req, actor, params }) =>
  updateRegion(actor, idSchema.parse(params.id), await readJson(req, regionUpdateSchema)),
);

export const DELETE = route<{ id: string }>("region.edit", async ({ req, actor, params }) => ({
  ok: true,
  ...(await deleteRegion(actor, idSchema.parse(params.id), (await readJson(req, versionOnlySchema)).version)),
}));
