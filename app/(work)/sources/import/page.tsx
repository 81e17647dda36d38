import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { ImportPanel } from "@/components/sources/import-panel";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { IMPORT_COLUMNS } from "@/lib/sources/import-types";

export const metadata: Metadata = { title: "Import sources from CSV" };

export default async function ImportSourcesPage() {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/sources/import");
  if (!can(actor, "source.create")) {
    return <Notice tone="warn">Importing sources needs the contributor role. Your role is {actor.role}.</Notice>;
  }
  return (
    <>
      <PageTitle
        title="Import sources from CSV"
        lead="Catalogue many sources at once from a spreadsheet saved as CSV (UTF-8). Check the file first: nothing is saved until every row is right, and then all rows are saved together."
      >
        <a href="/api/sources/import/template" download className="rounded border border-rule bg-card px-4 py-2 text-sm font-semibold no-underline hover:bg-paper-deep">
          Download the template
        </a>
      </PageTitle>
      <details className="mb-6 rounded border border-rule bg-card px-4 py-3 text-sm text-ink-soft">
        <summary className="cursor-pointer font-semibold text-ink">How to fill in the columns</summary>
        <ul className="mt-2 list-disc space-y-1 pl-5">
          <li>
            Columns: <span className="font-mono text-xs">{IMPORT_COLUMNS.join(", ")}</span>. Only title and object_type are required; leave out columns you do not use.
          </li>
          <li>Object type, attribution, unit and state by value or by the label the form shows, in any case: “Painting” or “painting”, “workshop of” or “workshop_of”.</li>
          <li>Collection by its exact name; place by its name and the two-letter country code (ISO 3166-1), as in the gazetteer. If several places share a name, the most populous is chosen and the preview says so.</li>
          <li>Dating in EDTF, e.g. 1650~, 165X or 1640/1660. Rights by URI or by the exact label of a RightsStatements.org statement or Creative Commons licence.</li>
          <li>Bibliography: “author | title | year | pages | link”, several references separated by “;”.</li>
          <li>At most 5,000 rows and 2 MB per file. A collection and accession number already catalogued, or given twice, is flagged as a possible duplicate.</li>
        </ul>
      </details>
      <ImportPanel me={actor.id} />
    </>
  );
}
