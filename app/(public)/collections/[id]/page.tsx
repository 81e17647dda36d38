import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { countryName } from "@/lib/catalogue/countries";
import { getCollection } from "@/lib/collections/queries";
import { NotFoundError } from "@/lib/errors";

export const metadata: Metadata = { title: "Collection" };

export default async function CollectionPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const actor = await currentActor();
  const collection = await getCollection(actor, Number(id)).catch((e) => {
    if (e instanceof NotFoundError || Number.isNaN(Number(id))) notFound();
    throw e;
  });
  return (
    <>
      <PageTitle title={collection.name} lead={[collection.city, countryName(collection.countryCode)].filter(Boolean).join(", ") || undefined}>
        {can(actor, "collection.edit", { ownerId: collection.createdBy }) && (
          <Link href={`/collections/${collection.id}/edit`} className="rounded bg-accent px-4 py-2 text-sm font-semibold text-white no-underline hover:bg-accent-deep">
            Edit
          </Link>
        )}
      </PageTitle>
      <dl className="grid max-w-2xl gap-3">
        <div>
          <dt className="text-sm font-semibold text-ink-soft">Sources in the archive</dt>
          <dd>
            <Link href={`/sources?collection=${collection.id}`}>
              {collection.sourceCount} source{collection.sourceCount === 1 ? "" : "s"}
            </Link>
          </dd>
        </div>
        {collection.countryCode && (
          <div>
            <dt className="text-sm font-semibold text-ink-soft">Country</dt>
            <dd>
              {countryName(collection.countryCode)} <span className="font-mono text-sm">{collection.countryCode}</span>
            </dd>
          </div>
        )}
        {collection.url && (
          <div>
            <dt className="text-sm font-semibold text-ink-soft">Web address</dt>
            <dd>
              <a href={collection.url} rel="noopener noreferrer">
                {collection.url}
              </a>
            </dd>
          </div>
        )}
        {collection.notes && (
          <div>
            <dt className="text-sm font-semibold text-ink-soft">Notes</dt>
            <dd className="whitespace-pre-line">{collection.notes}</dd>
          </div>
        )}
      </dl>
    </>
  );
}
