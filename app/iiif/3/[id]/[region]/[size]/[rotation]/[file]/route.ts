// GET /iiif/3/:id/{region}/{size}/{rotation}/{quality}.{format}: tiles and any other region or size (Image API 3.0).
import { NextResponse } from "next/server";
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { imageRequest } from "@/lib/iiif/serve";

type Params = { id: string; region: string; size: string; rotation: string; file: string };

export const GET = route<Params>("archive.read", async ({ actor, params }) => {
  const dot = params.file.lastIndexOf(".");
  if (dot <= 0) return NextResponse.json({ error: { code: "invalid_input", message: "Give quality.format, e.g. default.jpg" } }, { status: 400 });
  const answer = await imageRequest(actor, z.coerce.number().int().positive().parse(params.id), {
    region: decodeURIComponent(params.region),
    size: decodeURIComponent(params.size),
    rotation: decodeURIComponent(params.rotation),
    quality: params.file.slice(0, dot),
    format: params.file.slice(dot + 1),
  });
  const cors = { "access-control-allow-origin": "*" };
  if ("error" in answer) {
    return NextResponse.json({ error: { code: answer.error.status === 501 ? "not_implemented" : "invalid_input", message: answer.error.message } }, { status: answer.error.status, headers: cors });
  }
  return new NextResponse(answer.body as BodyInit, {
    headers: { ...cors, "content-type": answer.contentType, "cache-control": answer.published ? "public, max-age=86400" : "private, max-age=3600", vary: "cookie" },
  });
});
