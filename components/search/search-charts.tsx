// The charts of the current search, drawn on the server: evidence per decade (stacked by the aspect
// chosen in the address, `stack=`) and the world map. A bar narrows the dates to its decade; a country
// or a place narrows the search to it.
import { DecadeChart } from "@/components/charts/decade-chart";
import { PlaceMap } from "@/components/charts/place-map";
import type { TimeHistogram } from "@/lib/charts/decades";
import type { PlaceSummary } from "@/lib/charts/places";
import type { WorldMap } from "@/lib/charts/world-map";
import { decadeHref, toggleValue, withParams } from "@/lib/search/page/url";

type Props = {
  histogram: TimeHistogram;
  places: PlaceSummary;
  map: WorldMap;
  params: URLSearchParams;
  stack: string | null;
  stackOptions: { key: string; label: string; terms: Record<string, string> }[];
  charted: number;
  total: number;
  countryName: (code: string) => string;
  /** The place a distance filter measures from, marked on the map with its ring. */
  origin?: { name: string; latitude: number; longitude: number; km: number };
};

export function SearchCharts({ histogram, places, map, params, stack, stackOptions, charted, total, countryName, origin }: Props) {
  const chosen = stackOptions.find((o) => o.key === stack) ?? null;
  const kept = [...params].filter(([k]) => k !== "stack" && k !== "page");
  return (
    <section aria-labelledby="charts-title" className="space-y-4">
      <h2 id="charts-title" className="text-xl">When and where</h2>
      {charted < total && <p className="text-sm text-ink-faint">The charts summarise the first {charted} of {total} results.</p>}
      <form action="/search" className="flex flex-wrap items-end gap-2 text-sm">
        {kept.map(([k, v], i) => (
          <input key={`${k}-${i}`} type="hidden" name={k} value={v} />
        ))}
        <label htmlFor="chart-stack">Divide the bars by</label>
        <select id="chart-stack" name="stack" defaultValue={stack ?? ""} className="rounded border border-rule bg-card px-2 py-1">
          <option value="">nothing</option>
          {stackOptions.map((o) => (
            <option key={o.key} value={o.key}>{o.label}</option>
          ))}
        </select>
        <button type="submit" className="rounded border border-rule bg-card px-3 py-1 font-semibold hover:bg-paper-deep">Redraw</button>
      </form>
      <DecadeChart
        histogram={histogram}
        title="Evidence by decade"
        seriesTitle={chosen?.label}
        seriesLabel={(s) => (s.kind === "value" ? (chosen?.terms[s.key] ?? s.key) : s.kind === "other" ? "other values" : "no value recorded")}
        hrefForBin={(bin) => decadeHref(params, bin.start, bin.width)}
        selectAction="Show the evidence of this decade"
        noun={{ one: "region", many: "regions" }}
      />
      <PlaceMap
        map={map}
        summary={places}
        title="Evidence by place"
        hrefForCountry={(code) => withParams(params, { country: code })}
        hrefForPlace={(p) => (p.id ? toggleValue(params, "place", String(p.id)) : withParams(params, {}))}
        countryName={countryName}
        noun={{ one: "region", many: "regions" }}
        origin={origin}
      />
    </section>
  );
}
