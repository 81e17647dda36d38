// POST /api/sources/import/preview: { csv } → a report on every row, nothing saved (contributors and up).
import { route } from "@/lib/api/handler";
import { previewImport, readImportRequest } from "@/lib/sources/import";

export const POST = route("source.create", async ({ req, actor }) => previewImport(actor, (await readImportRequest(req)).csv));
