// Facets with their counts; each value is a link that switches its filter on or off in the address.
import Link from "next/link";
import { isOn, toggleValue } from "@/lib/search/page/url";

import type { FacetGroup } from "@/lib/search/page/facets";
export type { FacetGroup };

export function FacetPanel({ groups, params }: { groups: FacetGroup[]; params: URLSearchParams }) {
  return (
    <nav aria-label="Narrow the results" className="space-y-4">
      {groups.map((g) => (
        <section key={g.param} aria-labelledby={`facet-${g.param}`}>
          <h3 id={`facet-${g.param}`} className="mb-1 text-sm font-semibold uppercase tracking-wide text-ink-soft">{g.title}</h3>
          <ul className="space-y-0.5 text-sm">
            {g.values.map((v) => {
              const on = isOn(params, g.param, v.value);
              return (
                <li key={v.value}>
                  <Link
                    href={toggleValue(params, g.param, v.value)}
                    role="checkbox"
                    aria-checked={on}
                    data-facet={g.param}
                    data-value={v.value}
                    className={`flex items-center gap-2 no-underline ${on ? "font-semibold text-ink" : "text-ink-soft"}`}
                  >
                    <span aria-hidden="true" className={`inline-block h-3 w-3 rounded-sm border border-ink-faint ${on ? "bg-accent" : ""}`} />
                    <span className="flex-1">{v.label}</span>
                    <span className="tabular-nums text-ink-faint">{v.count}</span>
                  </Link>
                </li>
              );
            })}
          </ul>
        </section>
      ))}
    </nav>
  );
}
