// GET /iiif/3/:id/info.json: the IIIF Image API 3.0 description of an image (only for those who may see it).
import { NextResponse } from "next/server";
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { imageInfo, INFO_CONTENT_TYPE } from "@/lib/iiif/serve";

export const GET = route<{ id: string }>("archive.read", async ({ actor, params, req }) => {
  const { info, published } = await imageInfo(actor, z.coerce.number().int().positive().parse(params.id));
  // Clients that ask for JSON-LD get that media type (Image API 3.0 §7.1); others plain JSON.
  const wantsLd = (req.headers.get("accept") ?? "").includes("application/ld+json");
  return new NextResponse(JSON.stringify(info), {
    headers: {
      "content-type": wantsLd ? INFO_CONTENT_TYPE : "application/json",
      "access-control-allow-origin": "*",
      "cache-control": published ? "public, max-age=300" : "private, max-age=60",
      vary: "accept, cookie",
    },
  });
});
