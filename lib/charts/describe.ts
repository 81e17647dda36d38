// The words screen readers hear for the charts (and sighted readers see as tooltips and notes).
import { formatWeight } from "./axis";
import type { ChartBin, SeriesTotals, TimeHistogram } from "./decades";
import type { PlaceCount, PlaceSummary } from "./places";

export interface Noun {
  one: string;
  many: string;
}

export const ITEMS: Noun = { one: "item", many: "items" };

/** "1 item", "12.5 items". */
export function count(value: number, noun: Noun = ITEMS): string {
  return `${formatWeight(value)} ${value === 1 ? noun.one : noun.many}`;
}

/** The default name of a series: its value, or words for the two made-up series. */
export function defaultSeriesLabel(series: SeriesTotals): string {
  if (series.kind === "none") return "no value recorded";
  if (series.kind === "other") return "other values";
  return series.key;
}

/** "1640s: 12 items (guitar 5, lute 7)" — the parts only when the chart is stacked. */
export function binSummary(bin: ChartBin, series: SeriesTotals[], label: (s: SeriesTotals) => string, noun: Noun = ITEMS): string {
  const head = `${bin.label}: ${count(bin.total, noun)}`;
  if (series.length < 2 || bin.total === 0) return head;
  const parts = series
    .map((s, i) => ({ s, v: bin.bySeries[i] }))
    .filter((p) => p.v > 0)
    .map((p) => `${label(p.s)} ${formatWeight(p.v)}`);
  return `${head} (${parts.join(", ")})`;
}

/** What is not drawn: undated, open-ended, outside the range. Empty when everything is drawn. */
export function notShown(h: TimeHistogram, noun: Noun = ITEMS): string {
  const parts: string[] = [];
  if (h.totals.undated > 0) parts.push(`${count(h.totals.undated, noun)} undated`);
  if (h.totals.openEnded > 0) parts.push(`${count(h.totals.openEnded, noun)} with an open-ended dating`);
  if (h.totals.outside > 0) parts.push(`${count(h.totals.outside, noun)} outside ${h.bins[0]?.label ?? ""}–${h.bins.at(-1)?.label ?? ""}`);
  return parts.length ? `Not shown: ${parts.join("; ")}.` : "";
}

/** The chart as one sentence or two, for its accessible name. */
export function histogramSummary(title: string, h: TimeHistogram, noun: Noun = ITEMS): string {
  if (!h.bins.length) return `${title}: no dated ${noun.many}. ${notShown(h, noun)}`.trim();
  const peak = h.bins.reduce((a, b) => (b.total > a.total ? b : a));
  const span = `${h.bins[0].label} to ${h.bins[h.bins.length - 1].label}`;
  const most = peak.total > 0 ? `; most in the ${peak.label} (${formatWeight(peak.total)})` : "";
  return `${title}, ${span}: ${count(h.totals.inRange, noun)}${most}. ${notShown(h, noun)}`.trim();
}

export function placeName(place: PlaceCount): string {
  return place.name ?? `${place.latitude.toFixed(2)}°, ${place.longitude.toFixed(2)}°`;
}

export function placeMapSummary(title: string, s: PlaceSummary, noun: Noun = ITEMS): string {
  const countries = s.countries.length;
  const head = `${title}: ${s.places.length} ${s.places.length === 1 ? "place" : "places"} in ${countries} ${countries === 1 ? "country" : "countries"}`;
  const top = s.places[0] ? `; most at ${placeName(s.places[0])} (${formatWeight(s.places[0].count)})` : "";
  const missing = s.unplaced + s.withoutCoordinates;
  const tail = missing > 0 ? ` ${count(missing, noun)} cannot be placed on the map.` : "";
  return `${head}${top}.${tail}`;
}
