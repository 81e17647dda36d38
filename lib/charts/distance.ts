// Great-circle distance by the haversine formula, for "evidence near a place" (how far a
// source's place of making lies from a gazetteer place). On a sphere of the IUGG mean Earth
// radius, 6371.0 km (the usual choice); the error against the ellipsoid stays under about 0.5 %.

export const MEAN_EARTH_RADIUS_KM = 6371.0;

export interface LatLon {
  latitude: number;
  longitude: number;
}

const toRadians = (degrees: number) => (degrees * Math.PI) / 180;

/** A great-circle distance as the angle it spans at the Earth's centre, in degrees (for d3's geoCircle). */
export const kmToDegrees = (km: number, radiusKm: number = MEAN_EARTH_RADIUS_KM) => (km * 180) / (Math.PI * radiusKm);

/** Kilometres between two points given in decimal degrees (WGS 84 latitude and longitude). */
export function haversineKm(a: LatLon, b: LatLon, radiusKm: number = MEAN_EARTH_RADIUS_KM): number {
  for (const p of [a, b]) {
    if (!Number.isFinite(p.latitude) || !Number.isFinite(p.longitude) || Math.abs(p.latitude) > 90) {
      throw new RangeError(`Not a latitude/longitude pair: ${p.latitude}, ${p.longitude}.`);
    }
  }
  const dLat = toRadians(b.latitude - a.latitude);
  const dLon = toRadians(b.longitude - a.longitude);
  const h =
    Math.sin(dLat / 2) ** 2 +
    Math.cos(toRadians(a.latitude)) * Math.cos(toRadians(b.latitude)) * Math.sin(dLon / 2) ** 2;
  // min() guards asin against 1 + ε from rounding for antipodal points.
  return 2 * radiusKm * Math.asin(Math.min(1, Math.sqrt(h)));
}
