import { SOURCE_FIELD_LABELS as FIELD_LABELS } from "@/lib/sources/vocab";

const ACTIONS: Record<string, string> = {
  "source.created": "catalogued",
  "source.imported": "imported from CSV",
  "source.updated": "edited",
  "source.deleted": "deleted",
  "source.restored": "restored",
};

type Entry = { id: number; action: string; createdAt: Date; actorName: string | null; fields: string[] };

export function SourceHistory({ history }: { history: Entry[] }) {
  const shown = (fields: string[]) => [...new Set(fields.map((f) => FIELD_LABELS[f]).filter(Boolean))];
  return (
    <section aria-labelledby="history-heading">
      <h2 id="history-heading" className="mb-3 text-2xl">
        History
      </h2>
      <ol className="divide-y divide-rule rounded border border-rule bg-card">
        {history.map((h) => (
          <li key={h.id} className="grid gap-1 px-4 py-2 sm:grid-cols-[11rem_1fr]">
            <time dateTime={h.createdAt.toISOString()} className="font-mono text-xs text-ink-faint">
              {h.createdAt.toISOString().replace("T", " ").slice(0, 16)} UTC
            </time>
            <p>
              <strong>{h.actorName ?? "The system"}</strong> {ACTIONS[h.action] ?? h.action}
              {h.action === "source.updated" && shown(h.fields).length > 0 && <span className="text-ink-soft">: {shown(h.fields).join(", ")}</span>}
            </p>
          </li>
        ))}
      </ol>
    </section>
  );
}
