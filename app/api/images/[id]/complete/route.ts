// POST /api/images/:id/complete: the browser's upload is done; check the bytes and queue processing.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { completeUploadSchema } from "@/lib/images/schemas";
import { completeUpload } from "@/lib/images/uploads";

export const POST = route<{ id: string }>("image.upload", async ({ req, actor, params }) => ({
  image: await completeUpload(actor, z.coerce.number().int().positive().parse(params.id), (await readJson(req, completeUploadSchema)).parts),
}));
