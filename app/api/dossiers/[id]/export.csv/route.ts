// GET /api/dossiers/:id/export.csv: the dossier as CSV (RFC 4180), the items the caller may see, each
// with its suggested citation accessed today. Whoever may read the dossier may export it.
import { route } from "@/lib/api/handler";
import { appUrl } from "@/lib/config";
import { csvFileName, evidenceCsv } from "@/lib/exports/csv";
import { getDossier } from "@/lib/dossiers/queries";
import { dossierIdSchema } from "@/lib/dossiers/schemas";

export const GET = route<{ id: string }>("export.visible", async ({ actor, params }) => {
  const dossier = await getDossier(actor, dossierIdSchema.parse(params.id));
  const csv = evidenceCsv(dossier.items, { baseUrl: appUrl(), accessed: new Date() });
  return new Response(csv, {
    headers: {
      // RFC 4180 §3: text/csv with the optional header parameter.
      "content-type": "text/csv; charset=utf-8; header=present",
      "content-disposition": `attachment; filename="${csvFileName(dossier.title, dossier.id)}"`,
      "cache-control": "private, no-store",
      vary: "cookie",
    },
  });
});
