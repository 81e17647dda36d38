// GET /api/sources: the sources table (filters, sort, keyset pages), only what the caller may see.
// POST /api/sources: catalogue a new source (contributors and up).
import { readJson, readQuery, route } from "@/lib/api/handler";
import { createSource } from "@/lib/sources/mutations";
import { listSources } from "@/lib/sources/queries";
import { sourceFieldsSchema, sourceListQuerySchema } from "@/lib/sources/schemas";

export const GET = route("archive.read", async ({ req, actor }) => listSources(actor, readQuery(req, sourceListQuerySchema)));

export const POST = route("source.create", async ({ req, actor }) => ({
  source: await createSource(actor, await readJson(req, sourceFieldsSchema)),
}));
