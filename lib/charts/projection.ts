// World projections for the place map, fitted to a box. A projection is described by plain
// numbers (name, scale, translate) so the server can fit it once, draw the countries, and hand
// the same description to wherever the place circles are drawn.
import { geoEqualEarth, geoNaturalEarth1, type GeoProjection } from "d3-geo";

export type ProjectionName = "naturalEarth1" | "equalEarth";

export interface ProjectionSpec {
  name: ProjectionName;
  width: number;
  height: number;
  scale: number;
  translate: [number, number];
}

const FACTORIES: Record<ProjectionName, () => GeoProjection> = {
  naturalEarth1: geoNaturalEarth1,
  equalEarth: geoEqualEarth,
};

/** A box of longitudes and latitudes in degrees, west < east (boxes across the antimeridian are not supported). */
export interface GeoBox {
  west: number;
  south: number;
  east: number;
  north: number;
}

/**
 * The whole globe, or only `focus`, fitted inside width × height less `padding` on every side,
 * centred. The focus is fitted through points along its edges: a polygon would need the right
 * winding on the sphere, and a wrong one would mean "everything but the box".
 */
export function fitProjection(name: ProjectionName, width: number, height: number, padding = 0, focus?: GeoBox): ProjectionSpec {
  if (!(width > 2 * padding) || !(height > 2 * padding)) {
    throw new RangeError(`A map needs room inside its padding (got ${width} × ${height}, padding ${padding}).`);
  }
  const projection = FACTORIES[name]().fitExtent(
    [
      [padding, padding],
      [width - padding, height - padding],
    ],
    focus ? { type: "MultiPoint", coordinates: boxOutline(focus) } : { type: "Sphere" },
  );
  const [x, y] = projection.translate();
  return { name, width, height, scale: projection.scale(), translate: [x, y] };
}

export function makeProjection(spec: ProjectionSpec): GeoProjection {
  return FACTORIES[spec.name]().scale(spec.scale).translate(spec.translate);
}

/** Screen position of a longitude/latitude, or null when it cannot be placed. */
export function projectPoint(projection: GeoProjection, longitude: number, latitude: number): [number, number] | null {
  if (!Number.isFinite(longitude) || !Number.isFinite(latitude)) return null;
  const point = projection([longitude, latitude]);
  return point && Number.isFinite(point[0]) && Number.isFinite(point[1]) ? [point[0], point[1]] : null;
}

/**
 * Circle radius so that AREA grows with the count (radius ∝ √count, common practice for
 * proportional symbols): the largest count gets `maxRadius`; no circle is smaller than `minRadius`.
 */
export function circleRadius(count: number, maxCount: number, maxRadius = 16, minRadius = 2.5): number {
  if (!(count > 0) || !(maxCount > 0)) return 0;
  return Math.max(minRadius, maxRadius * Math.sqrt(Math.min(count, maxCount) / maxCount));
}

function boxOutline({ west, south, east, north }: GeoBox): [number, number][] {
  if (!(west < east) || !(south < north) || Math.abs(south) > 90 || Math.abs(north) > 90) {
    throw new RangeError(`Not a box of longitudes and latitudes: ${west}, ${south}, ${east}, ${north}.`);
  }
  const points: [number, number][] = [];
  for (let i = 0; i <= 8; i++) {
    const lon = west + ((east - west) * i) / 8;
    const lat = south + ((north - south) * i) / 8;
    points.push([lon, south], [lon, north], [west, lat], [east, lat]);
  }
  return points;
}

/**
 * A box around the given points, widened by `marginDegrees` and to at least `minSpan` degrees
 * each way (one town alone should not fill the map), or undefined when there are no points.
 */
export function boxAround(points: readonly { latitude: number; longitude: number }[], marginDegrees = 3, minSpan = 20): GeoBox | undefined {
  if (!points.length) return undefined;
  let [west, south, east, north] = [180, 90, -180, -90];
  for (const p of points) {
    west = Math.min(west, p.longitude);
    east = Math.max(east, p.longitude);
    south = Math.min(south, p.latitude);
    north = Math.max(north, p.latitude);
  }
  const grow = (lo: number, hi: number, limit: number): [number, number] => {
    const extra = Math.max(marginDegrees, (minSpan - (hi - lo)) / 2);
    return [Math.max(-limit, lo - extra), Math.min(limit, hi + extra)];
  };
  [west, east] = grow(west, east, 180);
  [south, north] = grow(south, north, 85);
  return { west, south, east, north };
}
