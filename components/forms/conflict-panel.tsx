"use client";

import { Button } from "@/components/ui/button";

export type Comparison = { field: string; label: string; theirs: string; yours: string }[];

// Shown when the server refused a save because someone else saved first (409): what they changed,
// what you typed, and the two ways on. Nothing is overwritten without the user saying so.
export function ConflictPanel({ rows, onLoadTheirs, onKeepMine, what = "source" }: { rows: Comparison; onLoadTheirs: () => void; onKeepMine: () => void; what?: string }) {
  return (
    <section role="alert" aria-labelledby="conflict-heading" className="rounded border border-warn bg-warn-wash p-4">
      <h2 id="conflict-heading" className="text-xl text-warn">
        Someone else saved this {what} while you were editing
      </h2>
      <p className="mt-1 text-sm">Your changes are still in the form. Compare, then choose.</p>
      {rows.length > 0 ? (
        <table className="mt-3 w-full text-left text-sm">
          <thead>
            <tr>
              <th scope="col" className="py-1 pr-3">Field</th>
              <th scope="col" className="py-1 pr-3">Their saved version</th>
              <th scope="col" className="py-1">Yours</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.field} className="border-t border-rule align-top">
                <th scope="row" className="py-1 pr-3 font-semibold">{r.label}</th>
                <td className="py-1 pr-3 break-words">{r.theirs || "—"}</td>
                <td className="py-1 break-words">{r.yours || "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="mt-2 text-sm">Their version has the same values as yours in every field.</p>
      )}
      <div className="mt-3 flex flex-wrap gap-2">
        <Button type="button" variant="quiet" onClick={onLoadTheirs}>
          Load their version (discard mine)
        </Button>
        <Button type="button" onClick={onKeepMine}>
          Save mine over theirs
        </Button>
      </div>
    </section>
  );
}
