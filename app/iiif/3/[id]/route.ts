// GET /iiif/3/:id: the image service's base URI redirects to its info.json (Image API 3.0 §2.2).
import { NextResponse } from "next/server";
import { z } from "zod";
import { route } from "@/lib/api/handler";
import { serviceId } from "@/lib/iiif/serve";

export const GET = route<{ id: string }>("archive.read", async ({ params }) =>
  NextResponse.redirect(`${serviceId(z.coerce.number().int().positive().parse(params.id))}/info.json`, { status: 303, headers: { "access-control-allow-origin": "*" } }),
);
