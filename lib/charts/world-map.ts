// The base map of the place chart, drawn on the server: Natural Earth 1:110m countries
// (world-atlas, public domain data) projected and turned into SVG path strings. Marked
// server-only so the ~100 KB topology never lands in a browser bundle; the page passes the
// finished WorldMap (plain strings and numbers) to the map component, wherever it renders.
import "server-only";

import { geoGraticule10, geoPath } from "d3-geo";
import type { Feature, FeatureCollection, Geometry } from "geojson";
import { feature } from "topojson-client";
import countries110m from "world-atlas/countries-110m.json";
import { alpha2FromNumeric } from "./country-codes";
import { fitProjection, makeProjection, type GeoBox, type ProjectionName, type ProjectionSpec } from "./projection";

export interface MapCountry {
  /** ISO 3166-1 numeric, as Natural Earth gives it ("724"), or "" when it has none. */
  numeric: string;
  /** ISO 3166-1 alpha-2, or null (N. Cyprus, Somaliland, Kosovo). */
  code: string | null;
  /** Natural Earth's short English name. */
  name: string;
  d: string;
}

export interface WorldMap {
  projection: ProjectionSpec;
  /** The outline of the globe, for the sea. */
  sphere: string;
  graticule: string;
  countries: MapCountry[];
}

export interface WorldMapOptions {
  width?: number;
  height?: number;
  projection?: ProjectionName;
  padding?: number;
  /** Fit this box instead of the whole globe (boxAround(summary.places) zooms to the evidence). */
  focus?: GeoBox;
}

type CountryProperties = { name: string };
type Atlas = Parameters<typeof feature>[0];

const atlas = countries110m as unknown as Atlas;
const cache = new Map<string, WorldMap>();
let shapes: Feature<Geometry, CountryProperties>[] | null = null;

function countryShapes(): Feature<Geometry, CountryProperties>[] {
  shapes ??= (feature(atlas, atlas.objects.countries) as FeatureCollection<Geometry, CountryProperties>).features;
  return shapes;
}

/** Builds (once per size and projection) the projected base map. */
export function worldMap(options: WorldMapOptions = {}): WorldMap {
  const { width = 960, height = 500, projection: name = "naturalEarth1", padding = 4, focus } = options;
  const cacheKey = `${name}:${width}x${height}:${padding}:${focus ? Object.values(focus).join(",") : "globe"}`;
  const cached = cache.get(cacheKey);
  if (cached) return cached;

  // Focused maps vary with the search, so the cache is kept small.
  if (cache.size > 32) cache.clear();
  const spec = fitProjection(name, width, height, padding, focus);
  // One decimal of a pixel is finer than the 1:110m shapes; it halves the markup.
  const path = geoPath(makeProjection(spec)).digits(1);
  const { width: w, height: h } = spec;
  const countries: MapCountry[] = [];
  for (const f of countryShapes()) {
    // A focused map leaves most countries outside the box: no need to send their outlines.
    const [[x0, y0], [x1, y1]] = path.bounds(f);
    if (!(x1 >= 0 && x0 <= w && y1 >= 0 && y0 <= h)) continue;
    const numeric = f.id === undefined ? "" : String(f.id);
    countries.push({ numeric, code: alpha2FromNumeric(numeric), name: f.properties.name, d: path(f) ?? "" });
  }
  const map: WorldMap = {
    projection: spec,
    sphere: path({ type: "Sphere" }) ?? "",
    graticule: path(geoGraticule10()) ?? "",
    countries: countries.filter((c) => c.d !== ""),
  };
  cache.set(cacheKey, map);
  return map;
}
