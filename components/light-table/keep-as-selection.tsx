"use client";

// Takes the table on screen as the regions gathered in this browser, so that a table opened from a
// colleague's link can be extended with "Add to light table" elsewhere in the archive.
import { useState } from "react";
import { useLightTableSelection } from "./use-light-table-selection";

export function KeepAsSelection({ order }: { order: number[] }) {
  const selection = useLightTableSelection();
  const [done, setDone] = useState(false);
  const same = selection.ids.length === order.length && selection.ids.every((id, i) => id === order[i]);
  if (order.length === 0) return null;
  return (
    <div className="flex items-center gap-2 text-sm">
      <button
        type="button"
        disabled={same}
        onClick={() => {
          selection.replace(order);
          setDone(true);
        }}
        className="rounded border border-rule bg-card px-3 py-1.5 font-semibold text-ink hover:bg-paper-deep disabled:cursor-not-allowed disabled:opacity-60"
        title="The regions you gather with “Add to light table” become this table"
      >
        {same ? "This is your selection" : "Keep as my selection"}
      </button>
      <span aria-live="polite" className="text-ink-soft">
        {done && same && "Add more regions from any photograph; “Open light table” brings this table back."}
      </span>
    </div>
  );
}
