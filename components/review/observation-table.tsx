import { CONFIDENCE_WORDS, observationValue, type ObservationView } from "@/lib/regions/types";
import type { ObservationChange } from "@/lib/review/changes";

const STATUS_WORDS: Record<ObservationChange["status"], string> = { added: "added", removed: "removed", changed: "changed", unchanged: "unchanged" };
const ROW_LOOK: Record<ObservationChange["status"], string> = {
  added: "bg-accent-wash",
  removed: "bg-warn-wash",
  changed: "bg-paper-deep",
  unchanged: "",
};

function Said({ o, strike = false }: { o: ObservationView | null; strike?: boolean }) {
  if (!o) return <span className="text-ink-faint">—</span>;
  return (
    <span className={strike ? "line-through decoration-warn" : ""}>
      <span className="font-semibold">{observationValue(o)}</span> <span className="text-ink-soft">({CONFIDENCE_WORDS[o.confidence]})</span>
      {o.note && <span className="block text-sm text-ink-soft">{o.note}</span>}
    </span>
  );
}

/** The observations of the version in review; beside the earlier decided version's when there is one. */
export function ObservationTable({ current, changes, beforeHeading, nowHeading }: { current: ObservationView[]; changes: ObservationChange[] | null; beforeHeading?: string; nowHeading: string }) {
  if (!changes) {
    if (current.length === 0) return <p className="text-ink-soft">No observations recorded.</p>;
    return (
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Observations</caption>
        <thead className="border-b border-rule">
          <tr>
            <th scope="col" className="py-1 pr-3">Aspect</th>
            <th scope="col" className="py-1">{nowHeading}</th>
          </tr>
        </thead>
        <tbody>
          {current.map((o) => (
            <tr key={o.id} className="border-b border-rule align-top last:border-0">
              <th scope="row" className="py-1 pr-3 font-normal">{o.aspectLabel}</th>
              <td className="py-1"><Said o={o} /></td>
            </tr>
          ))}
        </tbody>
      </table>
    );
  }
  return (
    <table className="w-full text-left text-sm">
      <caption className="sr-only">Observations, earlier and now</caption>
      <thead className="border-b border-rule">
        <tr>
          <th scope="col" className="py-1 pr-3">Aspect</th>
          <th scope="col" className="py-1 pr-3">{beforeHeading}</th>
          <th scope="col" className="py-1 pr-3">{nowHeading}</th>
          <th scope="col" className="py-1">Change</th>
        </tr>
      </thead>
      <tbody>
        {changes.map((c, i) => (
          <tr key={`${c.aspectId}-${c.before?.id ?? "n"}-${c.after?.id ?? "n"}-${i}`} data-change={c.status} className={`border-b border-rule align-top last:border-0 ${ROW_LOOK[c.status]}`}>
            <th scope="row" className="py-1 pr-3 font-normal">{c.aspectLabel}</th>
            <td className="py-1 pr-3"><Said o={c.before} strike={c.status === "removed"} /></td>
            <td className="py-1 pr-3"><Said o={c.after} /></td>
            <td className="py-1">
              <span className={c.status === "unchanged" ? "text-ink-faint" : "font-semibold"}>{STATUS_WORDS[c.status]}</span>
              {c.status === "changed" && <span className="block text-ink-soft">{c.fields.join(", ")}</span>}
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
