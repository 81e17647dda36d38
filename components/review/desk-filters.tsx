import Link from "next/link";
import { inputClass } from "@/components/ui/field";
import type { DeskQuery } from "@/lib/review/desk-schema";

type Options = { aspects: { key: string; label: string; section: string }[]; contributors: { id: number; name: string }[] };

const SECTION_WORDS: Record<string, string> = { instrument: "Instrument", player: "Player", context: "Context", reliability: "Reliability" };
const label = "flex flex-col gap-1 text-sm font-semibold text-ink-soft";

// A plain GET form: the filters live in the address, so a view of the desk can be shared and works without script.
export function DeskFilters({ options, values }: { options: Options; values: Partial<DeskQuery> }) {
  const sections = [...new Set(options.aspects.map((a) => a.section))];
  return (
    <form method="get" action="/review" role="search" aria-label="Filter the review desk" className="mb-6 grid gap-3 rounded border border-rule bg-card p-3 sm:grid-cols-[1fr_1fr_1fr_auto] sm:items-end">
      <label className={label}>
        Aspect observed
        <select name="aspect" defaultValue={values.aspect ?? ""} className={inputClass}>
          <option value="">Any aspect</option>
          {sections.map((s) => (
            <optgroup key={s} label={SECTION_WORDS[s] ?? s}>
              {options.aspects
                .filter((a) => a.section === s)
                .map((a) => (
                  <option key={a.key} value={a.key}>
                    {a.label}
                  </option>
                ))}
            </optgroup>
          ))}
        </select>
      </label>
      <label className={label}>
        Source (title or number)
        <input type="search" name="source" defaultValue={values.source ?? ""} className={inputClass} />
      </label>
      <label className={label}>
        Contributor
        <select name="contributor" defaultValue={values.contributor ? String(values.contributor) : ""} className={inputClass}>
          <option value="">Anyone</option>
          {options.contributors.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
      </label>
      <div className="flex gap-2">
        <button type="submit" className="rounded border border-accent bg-accent px-4 py-2 text-sm font-semibold text-white hover:bg-accent-deep">
          Filter
        </button>
        <Link href="/review" className="rounded border border-rule px-4 py-2 text-sm font-semibold no-underline hover:bg-paper-deep">
          Clear
        </Link>
      </div>
    </form>
  );
}
