// GET /api/places/:id: one place (anyone). PATCH: change a historical area, with the version read (editors).
import { readJson, route } from "@/lib/api/handler";
import { NotFoundError } from "@/lib/errors";
import { updateArea } from "@/lib/places/mutations";
import { getPlace } from "@/lib/places/queries";
import { areaUpdateSchema, placeIdSchema } from "@/lib/places/schemas";

export const GET = route<{ id: string }>("archive.read", async ({ params }) => {
  const place = await getPlace(placeIdSchema.parse(params.id));
  if (!place) throw new NotFoundError("place");
  return { place };
});

export const PATCH = route<{ id: string }>("place.define_area", async ({ req, actor, params }) => ({
  place: await updateArea(actor, placeIdSchema.parse(params.id), await readJson(req, areaUpdateSchema)),
}));
