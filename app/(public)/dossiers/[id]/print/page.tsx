import type { Metadata } from "next";
import Link from "next/link";
import { CitedItemCard } from "@/components/exports/cited-item-card";
import { PrintButton } from "@/components/exports/print-button";
import { appUrl } from "@/lib/config";
import { accessedOn } from "@/lib/exports/citation";
import { dossierPath } from "@/lib/dossiers/types";
import { loadDossier } from "../load";

type Props = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { dossier } = await loadDossier((await params).id);
  return { title: `${dossier.title} (for printing)` };
}

// The dossier laid out for paper: larger crops, one item never split across pages, no controls; the
// site's header and the links here are left out of the print (Tailwind's print: variants).
export default async function DossierPrintPage({ params }: Props) {
  const { dossier } = await loadDossier((await params).id);
  const accessed = accessedOn(new Date());
  return (
    <article className="mx-auto max-w-4xl print:max-w-none print:text-[11pt]">
      <p className="mb-4 flex flex-wrap items-center gap-4 text-sm print:hidden">
        <Link href={dossierPath(dossier.id)}>Back to the dossier</Link>
        <PrintButton />
      </p>
      <header className="mb-6 border-b border-rule pb-3">
        <h1 className="text-3xl print:text-2xl">{dossier.title}</h1>
        <p className="text-sm text-ink-soft">
          A dossier by {dossier.ownerName} in Cordarium · {dossier.items.length} {dossier.items.length === 1 ? "item" : "items"} · printed {accessed}
        </p>
        {dossier.description && <p className="mt-2 whitespace-pre-line">{dossier.description}</p>}
        {dossier.withheld > 0 && (
          <p className="mt-2 text-sm text-ink-soft">
            {dossier.withheld === 1 ? "One item is" : `${dossier.withheld} items are`} left out: not visible to you.
          </p>
        )}
      </header>
      <ol className="grid gap-6 print:block">
        {dossier.items.map((item, n) => (
          <li key={item.id} className="break-inside-avoid border-b border-rule pb-4 print:mb-4">
            <p className="mb-1 font-mono text-xs text-ink-faint">{n + 1}</p>
            <CitedItemCard item={item} baseUrl={appUrl()} accessed={accessed} size={600} />
          </li>
        ))}
      </ol>
    </article>
  );
}
