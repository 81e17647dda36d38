// DELETE /api/images/:id/upload: cancel an unfinished upload; nothing of it stays behind.
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { cancelUpload } from "@/lib/images/uploads";

export const DELETE = route<{ id: string }>("image.upload", async ({ actor, params }) => {
  await cancelUpload(actor, z.coerce.number().int().positive().parse(params.id));
  return { ok: true };
});
