// GET /iiif/3/manifests/:sourceId: the source as a IIIF Presentation API 3.0 manifest, a canvas per
// photograph the caller may see, each with the image service and its regions' annotation page.
import { NextResponse } from "next/server";
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { MANIFEST_CONTENT_TYPE, sourceManifestDocument } from "@/lib/exports/documents";
import { ValidationError } from "@/lib/errors";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ sourceId: string }>("export.visible", async ({ actor, params }) => {
  const id = idSchema.safeParse(params.sourceId);
  if (!id.success) throw new ValidationError("A manifest is asked for by the number of its source.");
  const manifest = await sourceManifestDocument(actor, id.data);
  return new NextResponse(JSON.stringify(manifest, null, 2), {
    headers: { "content-type": MANIFEST_CONTENT_TYPE, "access-control-allow-origin": "*", vary: "cookie" },
  });
});
