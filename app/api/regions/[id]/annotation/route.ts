// GET /api/regions/:id/annotation: one region as a W3C Web Annotation in JSON-LD; the annotations of
// the exports name regions by this address, so it answers with the annotation itself.
import { NextResponse } from "next/server";
import { z } from "zod";
import { readQuery, route } from "@/lib/api/handler";
import { ANNOTATION_CONTENT_TYPE, regionAnnotationDocument } from "@/lib/exports/documents";
import { regionListQuerySchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("export.visible", async ({ req, actor, params }) => {
  const query = readQuery(req, regionListQuerySchema);
  const annotation = await regionAnnotationDocument(actor, idSchema.parse(params.id), { proposed: query.proposed === "1" });
  return new NextResponse(JSON.stringify(annotation, null, 2), {
    headers: { "content-type": ANNOTATION_CONTENT_TYPE, "access-control-allow-origin": "*", vary: "cookie" },
  });
});
