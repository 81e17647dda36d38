import type { Metadata } from "next";
import Link from "next/link";
import { OpenLightTableLink } from "@/components/light-table/add-to-light-table";
import { LightTableBoard } from "@/components/light-table/light-table-board";
import { EmptyState } from "@/components/ui/empty-state";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { lightTableHref, MAX_REGIONS, readCropSize, readProposed, readSelection } from "@/lib/light-table/links";
import { lightTableRegions } from "@/lib/light-table/queries";
import { hiddenWords } from "@/lib/light-table/types";

export const metadata: Metadata = { title: "Light table" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function LightTablePage({ searchParams }: Props) {
  const query = await searchParams;
  const actor = await currentActor();
  const selection = readSelection(query.r);
  const size = readCropSize(query.size);
  const mayOptIn = can(actor, "archive.read_proposed");
  const askedProposed = readProposed(query.proposed);
  const proposed = askedProposed && mayOptIn;
  const { items, hidden } = await lightTableRegions(actor, selection.ids, { proposed });
  const notShown = hiddenWords(hidden + selection.malformed);
  const shownIds = items.map((i) => i.regionId);
  const lead =
    "Regions from different sources side by side at one height, zoomed and moved together. The link holds the table in its order: share it, or keep it as a bookmark.";

  if (selection.ids.length === 0 && selection.malformed === 0) {
    return (
      <div>
        <PageTitle title="Light table" lead={lead} />
        <EmptyState title="No regions on the table yet">
          <p>Choose regions with “Add to light table” where a photograph&apos;s regions are listed, then open the table from there.</p>
          <p className="mt-3">
            <OpenLightTableLink label="Lay out your gathered regions" />
          </p>
        </EmptyState>
      </div>
    );
  }

  return (
    <div>
      <PageTitle title="Light table" lead={lead}>
        {mayOptIn && (
          <Link href={lightTableHref(selection.ids, { size, proposed: !proposed })} className="text-sm font-semibold print:hidden">
            {proposed ? "Show vetted work only" : "Include proposed work (not yet reviewed)"}
          </Link>
        )}
      </PageTitle>
      <div className="mb-4 space-y-2 print:hidden">
        {proposed && (
          <Notice>
            Proposed work is included: regions marked “Proposed, not yet reviewed” have not been checked by an editor. Cite them with care.
          </Notice>
        )}
        {askedProposed && !mayOptIn && <Notice>Proposed work is shown to signed-in readers only; this table shows vetted work.</Notice>}
        {notShown && (
          <Notice tone="warn">
            {notShown}{" "}
            {items.length > 0 && (
              <Link href={lightTableHref(shownIds, { size, proposed })} className="font-semibold">
                Leave them out of the link
              </Link>
            )}
          </Notice>
        )}
        {selection.beyondLimit > 0 && (
          <Notice tone="warn">
            The light table lays out at most {MAX_REGIONS} regions; the {selection.beyondLimit} after them in the link are left out.
          </Notice>
        )}
      </div>
      {items.length === 0 ? (
        <EmptyState title="Nothing to lay out">
          <p>None of the regions in this link can be shown to you.</p>
        </EmptyState>
      ) : (
        <LightTableBoard items={items} requested={selection.ids} size={size} proposed={proposed} canSaveDossier={can(actor, "dossier.manage")} />
      )}
    </div>
  );
}
