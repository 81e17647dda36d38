"use client";

// Gathering regions for the light table from anywhere a region is listed:
//
//   import { AddToLightTable, OpenLightTableLink } from "@/components/light-table/add-to-light-table";
//   <AddToLightTable regionId={region.id} />          // a toggle per region, plus "Open light table (n)"
//   <AddToLightTable regionId={region.id} showOpen={false} />   // the toggle alone, in long lists…
//   <OpenLightTableLink />                             // …with one "Open light table (n)" for the whole list
//
// The selection is kept in this browser (localStorage, at most MAX_REGIONS, in the order added) and
// opened as a light-table link; the table's own link is what one shares. Pass `proposed` where the list
// shows proposed work, so that the table opens with it too. To link to a known set of regions instead,
// use lightTableHref(ids) from lib/light-table/links.ts.
import Link from "next/link";
import { useState } from "react";
import { lightTableHref, MAX_REGIONS } from "@/lib/light-table/links";
import { useLightTableSelection } from "./use-light-table-selection";

type Props = { regionId: number; proposed?: boolean; showOpen?: boolean; className?: string };

export function AddToLightTable({ regionId, proposed = false, showOpen = true, className = "" }: Props) {
  const selection = useLightTableSelection();
  const [refused, setRefused] = useState(false);
  const added = selection.has(regionId);
  const toggle = () => {
    if (added) {
      selection.remove(regionId);
      setRefused(false);
    } else setRefused(!selection.add(regionId));
  };
  return (
    <div className={`flex flex-wrap items-center gap-x-3 gap-y-1 text-sm print:hidden ${className}`}>
      <button
        type="button"
        aria-pressed={added}
        onClick={toggle}
        className={`rounded border px-2.5 py-1 font-semibold ${added ? "border-accent bg-accent-wash text-accent-deep" : "border-rule bg-card text-ink hover:bg-paper-deep"}`}
      >
        {added ? "On the light table ✓" : "Add to light table"}
      </button>
      {showOpen && <OpenLightTableLink proposed={proposed} />}
      {refused && (
        <span role="alert" className="text-warn">
          The light table holds at most {MAX_REGIONS} regions.
        </span>
      )}
    </div>
  );
}

/** "Open light table (n)" for the regions gathered in this browser; nothing when none are. */
export function OpenLightTableLink({ proposed = false, label = "Open light table" }: { proposed?: boolean; label?: string }) {
  const { ids } = useLightTableSelection();
  if (ids.length === 0) return null;
  return (
    <Link href={lightTableHref(ids, { proposed })} className="font-semibold">
      {label} ({ids.length})
    </Link>
  );
}
