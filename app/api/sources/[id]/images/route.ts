// GET /api/sources/:id/images: the source's images with their processing state (the uploader polls it).
// POST: start an upload; answers presigned URLs for the browser to send the bytes straight to storage.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { listImagesOfSource } from "@/lib/images/queries";
import { startUploadSchema } from "@/lib/images/schemas";
import { startUpload } from "@/lib/images/uploads";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("archive.read", async ({ actor, params }) => ({ images: await listImagesOfSource(actor, idSchema.parse(params.id)) }));

export const POST = route<{ id: string }>("image.upload", async ({ req, actor, params }) => startUpload(actor, idSchema.parse(params.id), await readJson(req, startUploadSchema)));
