// GET /api/places: type-ahead over historical areas and gazetteer cities (anyone). POST: define a historical area (editors).
import { readJson, readQuery, route } from "@/lib/api/handler";
import { createArea } from "@/lib/places/mutations";
import { suggestPlaces } from "@/lib/places/queries";
import { areaCreateSchema, placeQuerySchema } from "@/lib/places/schemas";

export const GET = route("archive.read", async ({ req, actor }) => {
  const query = readQuery(req, placeQuerySchema);
  const places = query.q ? await suggestPlaces(actor, query.q, query) : [];
  return { places };
});

export const POST = route("place.define_area", async ({ req, actor }) => ({
  place: await createArea(actor, await readJson(req, areaCreateSchema)),
}));
