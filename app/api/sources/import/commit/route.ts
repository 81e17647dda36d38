// POST /api/sources/import/commit: { csv, allowDuplicates? } → every row saved in one transaction, or
// none and a 400 carrying the row report (contributors and up).
import { route } from "@/lib/api/handler";
import { commitImport, readImportRequest } from "@/lib/sources/import";

export const POST = route("source.create", async ({ req, actor }) => commitImport(actor, await readImportRequest(req)));
