// How a place reads on screen, the same on the server and in the browser.
import type { PlaceSuggestion } from "./schemas";

/** Latitude first, as in ISO 6709, with the hemisphere spelled out: "50.93333° N, 6.95000° E". */
export function formatCoordinates(latitude: number, longitude: number): string {
  const lat = `${Math.abs(latitude).toFixed(5)}° ${latitude < 0 ? "S" : "N"}`;
  const lon = `${Math.abs(longitude).toFixed(5)}° ${longitude < 0 ? "W" : "E"}`;
  return `${lat}, ${lon}`;
}

/** "Köln — 07, Germany": the name, then where it lies (subdivision code and country) when known. */
export function placeLine(place: Pick<PlaceSuggestion, "name" | "subdivisionCode" | "country" | "countryCode">): string {
  const where = [place.subdivisionCode, place.country ?? place.countryCode].filter(Boolean).join(", ");
  return where ? `${place.name} — ${where}` : place.name;
}
