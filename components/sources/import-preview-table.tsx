"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { ImportReport, ImportRow } from "@/lib/sources/import-types";
import { OBJECT_TYPE_LABELS, type ObjectType } from "@/lib/sources/vocab";

// A file of thousands of rows must still render at once: a page shows at most this many.
const PAGE = 200;

const STATUS: Record<ImportRow["status"], { label: string; look: string }> = {
  ok: { label: "Ready", look: "bg-accent-wash text-accent-deep" },
  error: { label: "Error", look: "bg-warn-wash text-warn" },
  duplicate: { label: "Duplicate?", look: "bg-paper-deep text-warn" },
};

export function ImportSummary({ report }: { report: ImportReport }) {
  const { total, ok, errors, duplicates } = report.summary;
  return (
    <p className="text-sm text-ink-soft" data-testid="import-summary">
      <strong className="text-ink">{total.toLocaleString("en")}</strong> row{total === 1 ? "" : "s"}: {ok.toLocaleString("en")} ready,{" "}
      <span className={errors ? "font-semibold text-warn" : ""}>{errors.toLocaleString("en")} with errors</span>,{" "}
      <span className={duplicates ? "font-semibold text-warn" : ""}>
        {duplicates.toLocaleString("en")} possible duplicate{duplicates === 1 ? "" : "s"}
      </span>
      .
    </p>
  );
}

export function ImportPreviewTable({ report }: { report: ImportReport }) {
  const problems = report.rows.filter((r) => r.status !== "ok");
  const [view, setView] = useState<"problems" | "all">(problems.length ? "problems" : "all");
  const [shown, setShown] = useState(PAGE);
  const rows = view === "problems" ? problems : report.rows;
  const visible = rows.slice(0, shown);

  return (
    <section aria-labelledby="preview-heading" className="grid gap-3">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="preview-heading" className="text-2xl">
          Preview
        </h2>
        <div role="group" aria-label="Rows to show" className="flex gap-2">
          {problems.length > 0 && (
            <Button type="button" variant="quiet" aria-pressed={view === "problems"} onClick={() => (setView("problems"), setShown(PAGE))}>
              Rows with problems ({problems.length.toLocaleString("en")})
            </Button>
          )}
          <Button type="button" variant="quiet" aria-pressed={view === "all"} onClick={() => (setView("all"), setShown(PAGE))}>
            All rows ({report.rows.length.toLocaleString("en")})
          </Button>
        </div>
      </div>
      {rows.length > visible.length && (
        <p className="text-sm text-ink-soft">
          Showing the first {visible.length.toLocaleString("en")} of {rows.length.toLocaleString("en")} {view === "problems" ? "rows with problems" : "rows"}.
        </p>
      )}
      <div className="overflow-x-auto rounded border border-rule bg-card">
        <table className="w-full min-w-[760px] text-left text-sm" aria-label="Rows of the file">
          <thead className="border-b border-rule bg-paper-deep">
            <tr>
              {["Line", "Title", "Object type", "Date", "Collection", "Place", "Status"].map((h) => (
                <th key={h} scope="col" className="px-3 py-2 font-semibold">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>{visible.map((row) => <PreviewRow key={row.line} row={row} />)}</tbody>
        </table>
      </div>
      {rows.length > visible.length && (
        <div>
          <Button type="button" variant="quiet" onClick={() => setShown((n) => n + PAGE)}>
            Show {Math.min(PAGE, rows.length - visible.length)} more
          </Button>
        </div>
      )}
    </section>
  );
}

function PreviewRow({ row }: { row: ImportRow }) {
  const v = row.values;
  const type = typeof v.objectType === "string" ? (OBJECT_TYPE_LABELS[v.objectType as ObjectType] ?? v.objectType) : "";
  const notes = Object.entries(row.errors).flatMap(([column, messages]) => messages.map((m) => ({ column, m })));
  const status = STATUS[row.status];
  return (
    <>
      <tr className={`align-top ${notes.length || row.warnings.length ? "" : "border-b border-rule"}`} data-line={row.line}>
        <td className="px-3 py-2 font-mono">{row.line}</td>
        <td className="max-w-[18rem] truncate px-3 py-2 font-serif text-base" title={String(v.title ?? "")}>
          {String(v.title ?? "") || <span className="text-ink-faint">no title</span>}
        </td>
        <td className="px-3 py-2">{type || "—"}</td>
        <td className="px-3 py-2">
          {row.dating ? (
            <>
              <div>{row.dating.words}</div>
              <div className="font-mono text-xs text-ink-faint">{String(v.datingEdtf ?? "")}</div>
            </>
          ) : v.datingEdtf ? (
            <span className="font-mono text-xs">{String(v.datingEdtf)}</span>
          ) : (
            <span className="text-ink-faint">undated</span>
          )}
        </td>
        <td className="px-3 py-2">
          {row.matched.collection ?? "—"}
          {v.accessionNumber ? <div className="font-mono text-xs text-ink-faint">{String(v.accessionNumber)}</div> : null}
        </td>
        <td className="px-3 py-2">{row.matched.place ?? "—"}</td>
        <td className="px-3 py-2">
          <span className={`rounded px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wider ${status.look}`}>{status.label}</span>
        </td>
      </tr>
      {(notes.length > 0 || row.warnings.length > 0) && (
        <tr className="border-b border-rule">
          <td />
          <td colSpan={6} className="px-3 pb-3">
            <ul className="grid gap-0.5" aria-label={`Problems on line ${row.line}`}>
              {notes.map(({ column, m }, i) => (
                <li key={`e${i}`} className="text-warn">
                  <span className="font-mono text-xs font-semibold">{column}</span>: {m}
                </li>
              ))}
              {row.warnings.map((w, i) => (
                <li key={`w${i}`} className="text-ink-faint">
                  {w}
                </li>
              ))}
            </ul>
          </td>
        </tr>
      )}
    </>
  );
}
