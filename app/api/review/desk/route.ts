// GET /api/review/desk: proposed regions awaiting review, oldest first, filtered by aspect, source and contributor (editors).
import { readQuery, route } from "@/lib/api/handler";
import { listDesk } from "@/lib/review/desk";
import { deskQuerySchema } from "@/lib/review/desk-schema";

export const GET = route("review.read_desk", async ({ req, actor }) => listDesk(actor, readQuery(req, deskQuerySchema)));
