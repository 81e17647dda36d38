// "Within n km of a place": the filter and sort expressions sent to the search service, and each hit's
// distance for the table (pure). The origin always comes from the gazetteer row the server read
// (resolveNear in query.ts), never from coordinates a caller sent.
import { haversineKm } from "@/lib/charts/distance";
import type { PlaceSuggestion } from "@/lib/places/schemas";
import { NEAR_KM, type SearchQuery } from "./schemas";

/** The place a search measures from, as the gazetteer holds it, and how far it reaches. */
export type NearOrigin = { place: PlaceSuggestion; km: number };

// The gazetteer keeps five decimals (about a metre); printed without an exponent, which the filter
// grammar does not read.
const coordinate = (value: number) => {
  const fixed = value.toFixed(5);
  return fixed.includes(".") ? fixed.replace(/0+$/, "").replace(/\.$/, "") : fixed;
};

/** The distance a query asks for: its km, or the default when only a place is named. */
export const nearKm = (q: Pick<SearchQuery, "km">) => q.km ?? NEAR_KM.default;

/** `_geoRadius(lat, lng, metres)`: documents whose `_geo` lies within the distance (great circle). */
export function geoRadiusFilter(origin: NearOrigin): string {
  const { latitude, longitude } = origin.place;
  return `_geoRadius(${coordinate(latitude)}, ${coordinate(longitude)}, ${Math.round(origin.km * 1000)})`;
}

/** Nearest first; documents without a place come last. */
export function geoSort(origin: NearOrigin): string {
  return `_geoPoint(${coordinate(origin.place.latitude)}, ${coordinate(origin.place.longitude)}):asc`;
}

export type WithDistance<H> = H & { distanceKm: number | null };

/**
 * Each hit's great-circle distance from the origin in kilometres (haversine on the IUGG mean radius,
 * lib/charts/distance.ts), null for a hit without coordinates.
 */
export function withDistances<H extends { _geo?: { lat: number; lng: number } }>(hits: H[], origin: NearOrigin): WithDistance<H>[] {
  const from = { latitude: origin.place.latitude, longitude: origin.place.longitude };
  return hits.map((hit) => ({
    ...hit,
    distanceKm: hit._geo ? haversineKm(from, { latitude: hit._geo.lat, longitude: hit._geo.lng }) : null,
  }));
}

/** "12 km", "3.4 km", "less than 0.1 km": whole kilometres from 10 km on. */
export function formatKm(km: number): string {
  if (km < 0.05) return "less than 0.1 km";
  if (km < 10) return `${km.toFixed(1)} km`;
  return `${Math.round(km).toLocaleString("en-GB")} km`;
}

/** "Sevilla, Spain": how the active filter names its place. */
export const originName = (place: Pick<PlaceSuggestion, "name" | "country">) => (place.country ? `${place.name}, ${place.country}` : place.name);
