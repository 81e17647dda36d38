// GET /api/vocabulary: every aspect with its terms, deprecated ones flagged (anyone); ?all=1 adds
// usage counts (editors). POST: add an aspect (editors).
import { readJson, readQuery, route } from "@/lib/api/handler";
import { createAspect } from "@/lib/vocabulary/mutations";
import { listVocabulary } from "@/lib/vocabulary/queries";
import { aspectCreateSchema, listQuerySchema } from "@/lib/vocabulary/schemas";

export const GET = route("archive.read", async ({ req, actor }) => ({
  aspects: await listVocabulary(actor, { withUsage: readQuery(req, listQuerySchema).all === "1" }),
}));

export const POST = route("vocabulary.edit", async ({ req, actor }) => ({
  aspect: await createAspect(actor, await readJson(req, aspectCreateSchema)),
}));
