// GET /api/images/:id/annotations: the photograph's regions and observations the caller may see, as a
// W3C Web Annotation AnnotationPage in JSON-LD (?proposed=1 adds work not yet reviewed).
import { NextResponse } from "next/server";
import { z } from "zod";
import { readQuery, route } from "@/lib/api/handler";
import { ANNOTATION_CONTENT_TYPE, imageAnnotationPage } from "@/lib/exports/documents";
import { regionListQuerySchema } from "@/lib/regions/schemas";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("export.visible", async ({ req, actor, params }) => {
  const query = readQuery(req, regionListQuerySchema);
  const page = await imageAnnotationPage(actor, idSchema.parse(params.id), { proposed: query.proposed === "1" });
  return new NextResponse(JSON.stringify(page, null, 2), {
    headers: { "content-type": ANNOTATION_CONTENT_TYPE, "access-control-allow-origin": "*", vary: "cookie" },
  });
});
