// GET /api/search: regions (scope=regions, the default) or sources (scope=sources) matching words and
// facet filters, with facet counts; only what the caller may see, proposed work only on request.
import { route } from "@/lib/api/handler";
import { searchArchive } from "@/lib/search/query";
import { searchParamsToQuery, searchQuerySchema } from "@/lib/search/schemas";

export const GET = route("archive.read", async ({ req, actor }) => searchArchive(actor, searchQuerySchema.parse(searchParamsToQuery(req.nextUrl.searchParams))));
