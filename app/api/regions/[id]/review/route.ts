// POST /api/regions/:id/review: an editor vets a proposed region or returns it with a comment (never their own).
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { decideRegion } from "@/lib/review/decide";
import { reviewDecisionSchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const POST = route<{ id: string }>("review.decide", async ({ req, actor, params }) =>
  decideRegion(actor, idSchema.parse(params.id), await readJson(req, reviewDecisionSchema)),
);
