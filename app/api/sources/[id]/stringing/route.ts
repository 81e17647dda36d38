// GET /api/sources/:id/stringing: the peg, string and course counts of the source's regions checked
// against each other (?proposed=1 includes work not yet reviewed).
import { z } from "zod";
import { readQuery, route } from "@/lib/api/handler";
import { regionListQuerySchema } from "@/lib/regions/schemas";
import { sourceStringing } from "@/lib/regions/stringing";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("archive.read", async ({ req, actor, params }) => {
  const query = readQuery(req, regionListQuerySchema);
  return sourceStringing(actor, idSchema.parse(params.id), { proposed: query.proposed === "1" });
});
