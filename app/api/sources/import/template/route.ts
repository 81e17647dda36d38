// GET /api/sources/import/template: the CSV template (header and two invented example rows); public.
import { route } from "@/lib/api/handler";
import { importTemplateCsv, TEMPLATE_FILE_NAME } from "@/lib/sources/import-template";

export const GET = route("public", async () =>
  new Response(importTemplateCsv(), {
    headers: {
      "content-type": "text/csv; charset=utf-8; header=present",
      "content-disposition": `attachment; filename="${TEMPLATE_FILE_NAME}"`,
    },
  }),
);
