// GET /api/regions/:id/comments: the region's discussion, comments and review decisions in time order.
// POST: add a comment (contributors and up, on a region they may see); the author and earlier participants are told.
import { NextResponse } from "next/server";
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { addComment, listDiscussion } from "@/lib/regions/discussion";
import { commentSchema } from "@/lib/regions/discussion-schema";

const idSchema = z.coerce.number().int().positive();

export const GET = route<{ id: string }>("archive.read_proposed", async ({ actor, params }) => ({
  entries: await listDiscussion(actor, idSchema.parse(params.id)),
}));

export const POST = route<{ id: string }>("region.discuss", async ({ req, actor, params }) =>
  NextResponse.json(await addComment(actor, idSchema.parse(params.id), await readJson(req, commentSchema)), { status: 201 }),
);
