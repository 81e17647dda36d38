import type { FindingLevel, StringingReport, StringingStatus } from "@/lib/stringing";

// What the stringing check says about a source: the verdict first, then each finding with its basis,
// so a reader can tell counting from common practice. Presentational only; the caller runs the check.

const STATUS: Record<StringingStatus, { label: string; look: string }> = {
  fits: { label: "Consistent", look: "border-accent bg-accent-wash text-accent-deep" },
  disagrees: { label: "Disagreement", look: "border-warn bg-warn-wash text-warn" },
  incomplete: { label: "Incomplete", look: "border-rule bg-card text-ink" },
  empty: { label: "Not yet checked", look: "border-dashed border-rule bg-card/60 text-ink-soft" },
};

const LEVEL: Record<FindingLevel, { label: string; look: string }> = {
  fits: { label: "fits", look: "border-accent text-accent-deep" },
  note: { label: "note", look: "border-rule text-ink-soft" },
  disagrees: { label: "disagrees", look: "border-warn text-warn" },
};

export function StringingReportPanel({ report, headingId = "stringing-heading" }: { report: StringingReport; headingId?: string }) {
  const status = STATUS[report.status];
  // The summary repeats one finding word for word; list the rest.
  const findings = report.findings.filter((f) => !report.summary.endsWith(f.message));
  return (
    <section aria-labelledby={headingId} className="grid gap-3">
      <h3 id={headingId} className="font-serif text-xl text-ink">
        Stringing: pegs, strings and courses
      </h3>
      <div
        role={report.status === "disagrees" ? "alert" : "status"}
        className={`rounded border px-4 py-3 text-sm ${status.look}`}
      >
        <p className="font-semibold">{status.label}</p>
        <p className="mt-1">{report.summary}</p>
      </div>
      {findings.length > 0 && (
        <ul className="grid gap-2 text-sm">
          {findings.map((f) => (
            <li key={`${f.code}:${f.message}`} className="flex items-start gap-2">
              <span className={`shrink-0 rounded border px-1.5 text-xs ${LEVEL[f.level].look}`}>{LEVEL[f.level].label}</span>
              <span className="text-ink">
                {f.message} <span className="text-ink-faint">({f.basis})</span>
              </span>
            </li>
          ))}
        </ul>
      )}
      {report.interpretations.length > 1 && (
        <div className="text-sm">
          <p className="text-ink-soft">Groupings that fit the counts:</p>
          <ol className="mt-1 list-decimal pl-6 text-ink">
            {report.interpretations.map((i) => (
              <li key={i.words}>
                {i.words}
                {!i.usual && <span className="text-ink-faint"> (not the usual stringing)</span>}
              </li>
            ))}
          </ol>
        </div>
      )}
    </section>
  );
}
