// POST /api/images/:id/reprocess: run the processing of a failed image again (editors).
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { reprocessImage } from "@/lib/images/uploads";

export const POST = route<{ id: string }>("image.reprocess", async ({ actor, params }) => ({
  image: await reprocessImage(actor, z.coerce.number().int().positive().parse(params.id)),
}));
