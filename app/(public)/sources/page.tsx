import type { Metadata } from "next";
import Link from "next/link";
import { Suspense } from "react";
import { SourcesTable } from "@/components/sources/sources-table";
import { PageTitle } from "@/components/ui/page-title";
import { atLeast, can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { COUNTRIES } from "@/lib/catalogue/countries";
import { listCollections } from "@/lib/collections/queries";

export const metadata: Metadata = { title: "Sources" };

export default async function SourcesPage() {
  const actor = await currentActor();
  const collections = await listCollections(actor);
  return (
    <>
      <PageTitle title="Sources" lead="Every artwork and printed image in the archive, with its date, place and holding collection. Filter, sort and share the view by its address.">
        <div className="flex flex-wrap gap-2">
          {can(actor, "source.create") && (
            <>
              <Link href="/sources/new" className="rounded bg-accent px-4 py-2 text-sm font-semibold text-white no-underline hover:bg-accent-deep">
                Catalogue a source
              </Link>
              <Link href="/sources/import" className="rounded border border-rule bg-card px-4 py-2 text-sm font-semibold no-underline hover:bg-paper-deep">
                Import from CSV
              </Link>
            </>
          )}
        </div>
      </PageTitle>
      <Suspense fallback={<p className="text-ink-soft">Fetching sources…</p>}>
        <SourcesTable
          options={{
            collections: collections.map((c) => ({ id: c.id, name: c.name })),
            countries: COUNTRIES,
            me: atLeast(actor, "contributor") ? actor!.id : null,
            admin: atLeast(actor, "admin"),
          }}
        />
      </Suspense>
    </>
  );
}
