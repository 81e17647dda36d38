// GET /api/images/:id: one image's details and state. PATCH: edit its caption, credit, rights and kind.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { getImageForViewer } from "@/lib/images/queries";
import { imageUpdateSchema } from "@/lib/images/schemas";
import { updateImageMetadata } from "@/lib/images/uploads";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("archive.read", async ({ actor, params }) => {
  const { storageKey: _, ...image } = await getImageForViewer(actor, idSchema.parse(params.id));
  return { image };
});

export const PATCH = route<{ id: string }>("image.upload", async ({ req, actor, params }) => ({
  image: await updateImageMetadata(actor, idSchema.parse(params.id), await readJson(req, imageUpdateSchema)),
}));
