// POST /api/images/:id/regions/propose: propose for review every region of the photograph the caller marked.
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { proposeAllOfImage } from "@/lib/regions/mutations";

const idSchema = z.coerce.number().int().positive();

export const POST = route<{ id: string }>("region.propose", async ({ actor, params }) => proposeAllOfImage(actor, idSchema.parse(params.id)));
