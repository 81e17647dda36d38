// Evidence counted by place of making and by country, for the place map. Pure.
// A place is one gazetteer entry when the item names its id; otherwise items are grouped by
// coordinates rounded to `precision` decimals (2 ≈ 1 km), so two records of the same town
// typed apart still meet. Countries count every item with a country code, placed on the map
// or not (a named historical area may have a country and no useful point).

export interface EvidencePlace {
  id?: string | number | null;
  name?: string | null;
  /** ISO 3166-1 alpha-2. */
  countryCode?: string | null;
  latitude?: number | null;
  longitude?: number | null;
}

export interface PlacedEvidence {
  place?: EvidencePlace | null;
  /** Default 1. */
  weight?: number;
}

export interface PlaceCount {
  key: string;
  id: string | number | null;
  name: string | null;
  countryCode: string | null;
  latitude: number;
  longitude: number;
  count: number;
}

export interface CountryCount {
  code: string;
  count: number;
}

export interface PlaceSummary {
  /** Largest first, ties by name. */
  places: PlaceCount[];
  /** Largest first, ties by code. */
  countries: CountryCount[];
  /** Items with no place at all. */
  unplaced: number;
  /** Items with a place (and perhaps a country) but no coordinates to draw. */
  withoutCoordinates: number;
}

function hasPoint(p: EvidencePlace): p is EvidencePlace & { latitude: number; longitude: number } {
  return (
    typeof p.latitude === "number" && Number.isFinite(p.latitude) && Math.abs(p.latitude) <= 90 &&
    typeof p.longitude === "number" && Number.isFinite(p.longitude) && Math.abs(p.longitude) <= 180
  );
}

function countryOf(p: EvidencePlace): string | null {
  const code = p.countryCode?.trim().toUpperCase();
  return code && /^[A-Z]{2}$/.test(code) ? code : null;
}

/** The key two items share when they are drawn as one circle. */
export function placeKey(p: EvidencePlace, precision = 2): string | null {
  if (p.id !== null && p.id !== undefined && p.id !== "") return `id:${p.id}`;
  if (!hasPoint(p)) return null;
  return `at:${p.latitude.toFixed(precision)},${p.longitude.toFixed(precision)}`;
}

export function aggregatePlaces(items: readonly PlacedEvidence[], options: { precision?: number } = {}): PlaceSummary {
  const precision = options.precision ?? 2;
  const places = new Map<string, PlaceCount>();
  const countries = new Map<string, number>();
  let unplaced = 0;
  let withoutCoordinates = 0;
  for (const item of items) {
    const weight = item.weight ?? 1;
    const p = item.place;
    if (!p) {
      unplaced += weight;
      continue;
    }
    const country = countryOf(p);
    if (country) countries.set(country, (countries.get(country) ?? 0) + weight);
    const key = placeKey(p, precision);
    if (key === null || !hasPoint(p)) {
      withoutCoordinates += weight;
      continue;
    }
    const found = places.get(key);
    if (found) {
      found.count += weight;
      found.name ??= p.name ?? null;
      found.countryCode ??= country;
      continue;
    }
    const byId = key.startsWith("id:");
    places.set(key, {
      key,
      id: byId ? (p.id ?? null) : null,
      name: p.name ?? null,
      countryCode: country,
      latitude: byId ? p.latitude : round(p.latitude, precision),
      longitude: byId ? p.longitude : round(p.longitude, precision),
      count: weight,
    });
  }
  return {
    places: [...places.values()].sort((a, b) => b.count - a.count || (a.name ?? "").localeCompare(b.name ?? "") || a.key.localeCompare(b.key)),
    countries: [...countries]
      .map(([code, count]) => ({ code, count }))
      .sort((a, b) => b.count - a.count || a.code.localeCompare(b.code)),
    unplaced,
    withoutCoordinates,
  };
}

function round(value: number, precision: number): number {
  return Number(value.toFixed(precision));
}

export interface ChoroplethClasses {
  /** Lower bound of each class, rising; class i holds counts in [breaks[i], breaks[i + 1]). */
  breaks: number[];
  /** 0 for no evidence, else 1 … breaks.length. */
  classOf(count: number): number;
  /** "1–2", "3–9", "10+": the classes in words, for whole-number counts. */
  labels: string[];
}

/**
 * A few classes on a geometric scale from 1 to the largest count (counts of evidence are skewed:
 * a few countries hold most of it). Bounds are whole numbers; a small maximum gives fewer classes.
 */
export function choroplethClasses(maxCount: number, classes = 4): ChoroplethClasses {
  const breaks: number[] = [];
  if (maxCount >= 1) {
    for (let i = 0; i < classes; i++) {
      const lower = Math.max(1, Math.round(maxCount ** (i / classes)));
      if (!breaks.length || lower > breaks[breaks.length - 1]) breaks.push(lower);
    }
  }
  const classOf = (count: number) => {
    if (!(count > 0)) return 0;
    let c = 1;
    while (c < breaks.length && count >= breaks[c]) c++;
    return c;
  };
  const labels = breaks.map((lower, i) => {
    const next = breaks[i + 1];
    if (next === undefined) return `${lower}+`;
    return next - 1 > lower ? `${lower}–${next - 1}` : `${lower}`;
  });
  return { breaks, classOf, labels };
}
