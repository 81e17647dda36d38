import { geoCircle, geoPath } from "d3-geo";
import { formatWeight } from "@/lib/charts/axis";
import { kmToDegrees } from "@/lib/charts/distance";
import { ITEMS, count, placeMapSummary, placeName, type Noun } from "@/lib/charts/describe";
import { PLACE_FILL, SEA_FILL, AXIS_STROKE, choroplethFill } from "@/lib/charts/palette";
import { choroplethClasses, type PlaceCount, type PlaceSummary } from "@/lib/charts/places";
import { circleRadius, makeProjection, projectPoint } from "@/lib/charts/projection";
import type { WorldMap } from "@/lib/charts/world-map";
import { ChartLegend } from "./chart-legend";
import { ChartMark } from "./chart-mark";
import { PlaceTable } from "./place-table";

export type PlaceMapProps = {
  /** The projected base map, built on the server with worldMap() (lib/charts/world-map.ts). */
  map: WorldMap;
  /** From aggregatePlaces (lib/charts/places.ts). */
  summary: PlaceSummary;
  title: string;
  hrefForPlace?: (place: PlaceCount) => string;
  /** Called on click (instead of following the link) or on Enter/Space. Client components only. */
  onSelectPlace?: (place: PlaceCount) => void;
  /** A link per country with evidence, e.g. the search narrowed to that country. */
  hrefForCountry?: (code: string) => string;
  /** Country names for the table; defaults to Natural Earth's short names on the map. */
  countryName?: (code: string) => string | null;
  selectAction?: string;
  /** Colour countries by their number of items (default true). */
  choropleth?: boolean;
  maxRadius?: number;
  noun?: Noun;
  /** Where distances are measured from, with the distance's ring (great circle), e.g. a search's `near`. */
  origin?: { name: string; latitude: number; longitude: number; km: number };
};

// World map of evidence: countries shaded by count, a circle per place with area ∝ count.
// No state and no effects, so it renders in a server component and the browser gets only SVG.
export function PlaceMap({
  map,
  summary,
  title,
  hrefForPlace,
  onSelectPlace,
  hrefForCountry,
  countryName,
  selectAction = "Show evidence from this place",
  choropleth = true,
  maxRadius = 16,
  noun = ITEMS,
  origin,
}: PlaceMapProps) {
  const { width, height } = map.projection;
  const projection = makeProjection(map.projection);
  const byCountry = new Map(summary.countries.map((c) => [c.code, c.count]));
  const classes = choroplethClasses(summary.countries[0]?.count ?? 0);
  const maxCount = summary.places[0]?.count ?? 0;
  const interactive = Boolean(hrefForPlace || onSelectPlace || hrefForCountry);
  const text = placeMapSummary(title, summary, noun);
  const names = new Map(map.countries.flatMap((c) => (c.code ? [[c.code, c.name] as const] : [])));
  const nameOf = (code: string) => countryName?.(code) ?? names.get(code) ?? code;
  // aggregatePlaces lists places largest first, so small circles are drawn on top and stay clickable.
  const circles = summary.places
    .map((place) => ({ place, at: projectPoint(projection, place.longitude, place.latitude) }))
    .filter((c): c is { place: PlaceCount; at: [number, number] } => c.at !== null);
  const originAt = origin ? projectPoint(projection, origin.longitude, origin.latitude) : null;
  // The ring is the set of points at that distance on the sphere, drawn through the map's own projection.
  const ring = origin ? geoPath(projection)(geoCircle().center([origin.longitude, origin.latitude]).radius(kmToDegrees(origin.km))()) : null;

  return (
    <figure className="m-0">
      <svg viewBox={`0 0 ${width} ${height}`} className="h-auto w-full" role={interactive ? "group" : "img"} aria-label={text}>
        <path d={map.sphere} style={{ fill: SEA_FILL, stroke: AXIS_STROKE }} aria-hidden="true" />
        <path d={map.graticule} style={{ fill: "none", stroke: AXIS_STROKE }} strokeWidth={0.4} aria-hidden="true" />
        {map.countries.map((c) => {
          const n = c.code ? (byCountry.get(c.code) ?? 0) : 0;
          const fill = choropleth ? choroplethFill(classes.classOf(n), classes.breaks.length) : choroplethFill(0, 1);
          // Stroke colours are classes, not inline styles, so hover and focus can override them.
          const shape = (
            <path d={c.d} style={{ fill }} strokeWidth={0.5} className="stroke-card group-hover:stroke-ink-faint group-focus-visible:stroke-ink" />
          );
          if (n === 0 || !c.code) return <g key={c.numeric || c.name} aria-hidden="true">{shape}</g>;
          return (
            <ChartMark
              key={c.numeric}
              label={`${nameOf(c.code)}: ${count(n, noun)}`}
              action={hrefForCountry ? "Show evidence from this country" : undefined}
              href={hrefForCountry?.(c.code)}
            >
              {shape}
            </ChartMark>
          );
        })}
        {circles.map(({ place, at: [x, y] }) => (
          <ChartMark
            key={place.key}
            label={`${placeName(place)}${place.countryCode ? ` (${nameOf(place.countryCode)})` : ""}: ${count(place.count, noun)}`}
            action={hrefForPlace || onSelectPlace ? selectAction : undefined}
            href={hrefForPlace?.(place)}
            onSelect={onSelectPlace ? () => onSelectPlace(place) : undefined}
          >
            <circle
              cx={x}
              cy={y}
              r={circleRadius(place.count, maxCount, maxRadius)}
              style={{ fill: PLACE_FILL }}
              fillOpacity={0.6}
              className="stroke-card group-hover:stroke-ink group-focus-visible:stroke-ink group-focus-visible:[stroke-width:2.5]"
              strokeWidth={1}
            />
          </ChartMark>
        ))}
        {origin && originAt && (
          <g role="img" aria-label={`Within ${origin.km} km of ${origin.name}`} data-testid="map-origin">
            {ring && <path d={ring} fill="none" strokeDasharray="6 4" strokeWidth={1.5} className="stroke-ink" />}
            <path d={`M${originAt[0] - 6},${originAt[1]}h12M${originAt[0]},${originAt[1] - 6}v12`} strokeWidth={2.5} className="stroke-ink" />
          </g>
        )}
      </svg>
      {choropleth && classes.breaks.length > 0 && (
        <ChartLegend
          title={`${noun.many[0].toUpperCase()}${noun.many.slice(1)} per country`}
          entries={classes.labels.map((label, i) => ({ key: label, label, fill: choroplethFill(i + 1, classes.breaks.length) }))}
        />
      )}
      {circles.length > 0 && (
        <p className="mt-1 text-sm text-ink-faint">
          Circle area shows the number of {noun.many} from each place (largest: {formatWeight(maxCount)}).
        </p>
      )}
      <PlaceTable summary={summary} title={title} nameOf={nameOf} noun={noun} />
    </figure>
  );
}
