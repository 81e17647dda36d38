// GET /api/search/export.csv?<the search page's parameters>: every region the search matches (all pages,
// up to 5,000 or `limit`, in the search's order) as CSV (RFC 4180), each with its suggested citation
// accessed today; only what the caller may see, proposed work only on request, as for the search itself.
import { route } from "@/lib/api/handler";
import { appUrl } from "@/lib/config";
import { accessedOn } from "@/lib/exports/citation";
import { evidenceCsv } from "@/lib/exports/csv";
import { exportSearch } from "@/lib/search/export";
import { searchCsvFileName } from "@/lib/search/page/words";
import { EXPORT_LIMIT, exportParamsToQuery, searchExportSchema } from "@/lib/search/schemas";

export const GET = route("export.visible", async ({ req, actor }) => {
  const { limit, ...query } = searchExportSchema(EXPORT_LIMIT).parse(exportParamsToQuery(req.nextUrl.searchParams));
  const found = await exportSearch(actor, query, limit);
  const accessed = accessedOn(new Date());
  return new Response(evidenceCsv(found.items, { baseUrl: appUrl(), accessed }), {
    headers: {
      // RFC 4180 §3: text/csv with the optional header parameter.
      "content-type": "text/csv; charset=utf-8; header=present",
      "content-disposition": `attachment; filename="${searchCsvFileName(query.q, accessed)}"`,
      "cache-control": "private, no-store",
      vary: "cookie",
      // How much of the search the file holds: all of it, or the first `limit` regions in its order.
      "x-result-total": String(found.total),
      "x-result-count": String(found.items.length),
      "x-result-truncated": found.truncated ? "true" : "false",
    },
  });
});
