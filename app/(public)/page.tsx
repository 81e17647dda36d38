import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { PageTitle } from "@/components/ui/page-title";
import { currentActor } from "@/lib/auth/session";
import { listCollections } from "@/lib/collections/queries";

export default async function ArchivePage() {
  const actor = await currentActor();
  const collections = await listCollections(actor);
  return (
    <>
      <PageTitle
        title="The archive"
        lead="Paintings, drawings, prints and carvings that show early guitars, lutes, vihuelas, citterns and theorbos being played, with the evidence in each marked, dated, placed and checked by a second pair of eyes."
      />
      <p className="mb-8">
        <Link href="/sources" className="rounded bg-accent px-4 py-2 font-semibold text-white no-underline hover:bg-accent-deep">
          Browse the sources
        </Link>
      </p>
      <section aria-labelledby="collections-heading">
        <h2 id="collections-heading" className="mb-3 text-2xl">
          Holding collections
        </h2>
        {collections.length === 0 ? (
          <EmptyState title="No collections yet">Contributors add the institutions and private collections that hold the works.</EmptyState>
        ) : (
          <ul className="grid gap-4 sm:grid-cols-2">
            {collections.map((c) => (
              <li key={c.id} className="rounded border border-rule bg-card p-4">
                <Link href={`/collections/${c.id}`} className="font-serif text-xl font-semibold">
                  {c.name}
                </Link>
                <p className="text-sm text-ink-soft">
                  {[c.city, c.countryCode].filter(Boolean).join(", ")}
                  {c.countryCode && <span className="ml-2 font-mono text-xs text-ink-faint">{c.countryCode}</span>}
                </p>
                {c.notes && <p className="mt-2 text-sm">{c.notes}</p>}
                {c.url && (
                  <a href={c.url} className="mt-2 inline-block text-sm" rel="noopener noreferrer">
                    {new URL(c.url).host}
                  </a>
                )}
              </li>
            ))}
          </ul>
        )}
      </section>
      {!actor && (
        <p className="mt-8 text-ink-soft">
          <Link href="/sign-in">Sign in</Link> to keep dossiers, or, with a contributor&apos;s invitation, to add evidence.
        </p>
      )}
    </>
  );
}
