type Entry = { key: string; label: string; fill: string; shape?: "square" | "circle" };

// A legend in HTML under the chart: it wraps on narrow screens and reads as a list.
export function ChartLegend({ title, entries }: { title: string; entries: Entry[] }) {
  if (!entries.length) return null;
  return (
    <div className="mt-2 flex flex-wrap items-center gap-x-4 gap-y-1 text-sm text-ink-soft">
      <span className="font-semibold">{title}</span>
      <ul className="flex flex-wrap items-center gap-x-4 gap-y-1">
        {entries.map((e) => (
          <li key={e.key} className="inline-flex items-center gap-1.5">
            <span
              aria-hidden="true"
              className={`inline-block h-3 w-3 border border-rule ${e.shape === "circle" ? "rounded-full" : "rounded-sm"}`}
              style={{ background: e.fill }}
            />
            {e.label}
          </li>
        ))}
      </ul>
    </div>
  );
}
