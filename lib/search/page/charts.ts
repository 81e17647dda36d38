// The search page's two charts, computed on the server from up to CHART_LIMIT hits of the search:
// evidence per decade (aoristic weights over the widened dating, stacked by one aspect's values) and
// the world map of places and countries. Pure apart from the types: the hits come from searchChartHits.
import { decadeHistogram, type DatedEvidence, type TimeHistogram } from "@/lib/charts/decades";
import { aggregatePlaces, type PlaceSummary } from "@/lib/charts/places";
import type { ChartHit } from "@/lib/search/query";

export const CHART_LIMIT = 5_000;

/** 16500615 → "1650-06-15" (the documents keep ISO days as numbers so that ranges filter). */
export function isoDay(day: number | undefined): string | null {
  if (day === undefined || day === null || !Number.isFinite(day)) return null;
  const s = String(Math.trunc(day)).padStart(8, "0");
  return `${s.slice(0, 4)}-${s.slice(4, 6)}-${s.slice(6, 8)}`;
}

const yearOf = (value: string | undefined) => (value && /^\d{1,4}/.test(value) ? Number(/^\d{1,4}/.exec(value)![0]) : null);

export function searchHistogram(hits: readonly ChartHit[], stackAspect: string | null, range: { from?: string; to?: string } = {}): TimeHistogram {
  const items: DatedEvidence[] = hits.map((h) => ({
    // An undated source has neither bound; a dated one open at one end keeps only the other.
    earliest: h.dated ? isoDay(h.dateFrom) : null,
    latest: h.dated ? isoDay(h.dateTo) : null,
    series: stackAspect ? (h[`t_${stackAspect}`] ?? null) : null,
  }));
  const from = yearOf(range.from);
  const to = yearOf(range.to);
  try {
    return decadeHistogram(items, { from: from ?? undefined, to: to !== null && (from === null || to >= from) ? to : undefined });
  } catch {
    // A range the evidence does not reach (or a huge one): draw what the evidence covers.
    return decadeHistogram(items);
  }
}

export function searchPlaces(hits: readonly ChartHit[]): PlaceSummary {
  return aggregatePlaces(
    hits.map((h) => ({
      place:
        h.placeId || h.country || h._geo
          ? { id: h.placeId, name: h.place, countryCode: h.country, latitude: h._geo?.lat ?? null, longitude: h._geo?.lng ?? null }
          : null,
    })),
  );
}
