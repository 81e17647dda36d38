import type { Metadata } from "next";
import Link from "next/link";
import { CitedItemCard, itemLabel } from "@/components/exports/cited-item-card";
import { DossierOwnerActions } from "@/components/dossiers/dossier-owner-actions";
import { DossierSharing } from "@/components/dossiers/dossier-sharing";
import { ItemControls } from "@/components/dossiers/item-controls";
import { OpenLightTableLink } from "@/components/light-table/add-to-light-table";
import { OrderedItems, type OrderEntry } from "@/components/dossiers/ordered-items";
import { EmptyState } from "@/components/ui/empty-state";
import { Notice } from "@/components/ui/notice";
import { appUrl } from "@/lib/config";
import { accessedOn } from "@/lib/exports/citation";
import { lightTableHref, MAX_REGIONS } from "@/lib/light-table/links";
import { dossierCsvPath, dossierPrintPath, VISIBILITY_LABELS, type DossierItemView, type WithheldItem } from "@/lib/dossiers/types";
import { loadDossier } from "./load";

type Props = { params: Promise<{ id: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { dossier } = await loadDossier((await params).id);
  return { title: dossier.title };
}

type Entry = { position: number; id: number; version: number; item: DossierItemView | null; withheld?: WithheldItem };

export default async function DossierPage({ params }: Props) {
  const { dossier } = await loadDossier((await params).id);
  const accessed = accessedOn(new Date());
  const baseUrl = appUrl();
  const mine = dossier.mine;
  // The owner also sees the places of items they can no longer open, so that the order stays whole.
  const entries: Entry[] = [
    ...dossier.items.map((item) => ({ position: item.position, id: item.id, version: item.version, item })),
    ...dossier.withheldItems.map((w) => ({ position: w.position, id: w.id, version: w.version, item: null, withheld: w })),
  ].sort((a, b) => a.position - b.position || a.id - b.id);
  const label = (e: Entry) => (e.item ? itemLabel(e.item) : `a ${e.withheld!.kind} you can no longer see`);
  const order: OrderEntry[] = entries.map((e) => ({ id: e.id, version: e.version, label: label(e) }));
  // The dossier's regions side by side, in its order; proposed ones only where this reader sees them here.
  const regions = dossier.items.flatMap((item) => (item.kind === "region" ? [item.region] : []));
  const tableHref = regions.length ? lightTableHref(regions.slice(0, MAX_REGIONS).map((r) => r.id), { proposed: regions.some((r) => r.state !== "vetted") }) : null;

  return (
    <article>
      <header className="mb-6 border-b border-rule pb-4">
        <p className="text-sm uppercase tracking-wider text-ink-faint">
          Dossier · {VISIBILITY_LABELS[dossier.visibility]} · by {dossier.ownerName}
        </p>
        <h1 className="mt-1 text-3xl sm:text-4xl">{dossier.title}</h1>
        {dossier.description && <p className="mt-2 max-w-prose whitespace-pre-line text-ink-soft">{dossier.description}</p>}
        <p className="mt-3 flex flex-wrap gap-4 text-sm">
          <a href={dossierCsvPath(dossier.id)} download>
            Download as CSV
          </a>
          <Link href={dossierPrintPath(dossier.id)}>Printable page</Link>
          {tableHref && (
            <Link href={tableHref}>
              Lay {regions.length === 1 ? "its region" : regions.length > MAX_REGIONS ? `its first ${MAX_REGIONS} regions` : `its ${regions.length} regions`} on the light table
            </Link>
          )}
          <OpenLightTableLink label="Open the regions you gathered" />
        </p>
        {mine && (
          <div className="mt-4">
            <DossierOwnerActions id={dossier.id} version={dossier.version} title={dossier.title} description={dossier.description} deleted={Boolean(dossier.deletedAt)} />
          </div>
        )}
      </header>

      {!mine && dossier.withheld > 0 && (
        <div className="mb-4">
          <Notice>
            {dossier.withheld === 1 ? "One item of this dossier is" : `${dossier.withheld} items of this dossier are`} not shown: work not yet vetted, or no
            longer public.
          </Notice>
        </div>
      )}

      <div className={mine ? "grid gap-6 lg:grid-cols-[1fr_20rem]" : ""}>
        <section aria-labelledby="items-heading">
          <h2 id="items-heading" className="sr-only">
            Items
          </h2>
          {entries.length === 0 ? (
            <EmptyState title="Nothing in this dossier yet">
              {mine ? "Add sources with “Add to dossier” on their pages, and regions from the photograph viewer." : "The owner has not added anything yet."}
            </EmptyState>
          ) : (
            <OrderedItems dossierId={dossier.id} entries={order} editable={mine && !dossier.deletedAt}>
              {entries.map((e) =>
                e.item ? (
                  <CitedItemCard
                    key={e.id}
                    item={e.item}
                    baseUrl={baseUrl}
                    accessed={accessed}
                    gather
                    controls={mine && !dossier.deletedAt ? <ItemControls dossierId={dossier.id} itemId={e.id} version={e.version} note={e.item.note} label={label(e)} /> : undefined}
                  />
                ) : (
                  <div key={e.id} className="text-sm text-ink-soft">
                    <p>
                      A {e.withheld!.kind} you put here can no longer be opened by you (deleted, withdrawn or unpublished). Only you see this place; readers
                      see nothing of it.
                    </p>
                    {!dossier.deletedAt && <ItemControls dossierId={dossier.id} itemId={e.id} version={e.version} note={null} label={label(e)} />}
                  </div>
                ),
              )}
            </OrderedItems>
          )}
        </section>
        {mine && !dossier.deletedAt && (
          <aside>
            <DossierSharing dossierId={dossier.id} version={dossier.version} visibility={dossier.visibility} shares={dossier.shares} />
          </aside>
        )}
      </div>
    </article>
  );
}
