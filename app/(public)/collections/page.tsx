import type { Metadata } from "next";
import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { countryName } from "@/lib/catalogue/countries";
import { listCollections } from "@/lib/collections/queries";

export const metadata: Metadata = { title: "Collections" };

export default async function CollectionsPage() {
  const actor = await currentActor();
  const collections = await listCollections(actor);
  return (
    <>
      <PageTitle title="Collections" lead="The institutions and private collections that hold the works.">
        {can(actor, "collection.create") && (
          <Link href="/collections/new" className="rounded bg-accent px-4 py-2 text-sm font-semibold text-white no-underline hover:bg-accent-deep">
            Add a collection
          </Link>
        )}
      </PageTitle>
      {collections.length === 0 ? (
        <EmptyState title="No collections yet" />
      ) : (
        <ul className="divide-y divide-rule rounded border border-rule bg-card">
          {collections.map((c) => (
            <li key={c.id} className="px-4 py-3">
              <Link href={`/collections/${c.id}`} className="font-serif text-lg font-semibold">
                {c.name}
              </Link>
              <span className="ml-2 text-ink-soft">{[c.city, countryName(c.countryCode)].filter(Boolean).join(", ")}</span>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}
