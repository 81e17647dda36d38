// Decade and century histograms of dated evidence, stacked by the values of one aspect.
// Pure: no I/O, usable on the server and in the browser. Rules (docs/charts.md):
// - Bounds are ISO days as lib/dating gives them (use the WIDENED bounds, so `1650~` spreads
//   over 1645–1655) or year numbers. By default both ends are read as year points, as in the
//   product's example: 1640/1660 is the span [1640, 1660), half to the 1640s, half to the 1650s.
//   `endYearInclusive: true` reads the last year to its end instead ([1640, 1661): 10/21, 10/21,
//   1/21), exactly as lib/dating/aoristic.ts's default does.
// - An item with several values is split evenly between them ("split", bars still count
//   items) or counted once per value ("each", bars then count observations).
// - Undated and open-ended items are counted apart, never spread over an unbounded span.

import { dayToFractionalYear, ordinal, yearOf } from "@/lib/dating";
import { NO_VALUE, TimeBins, sum, type SeriesKind, type SeriesTotals } from "./time-bins";

export type { SeriesKind, SeriesTotals } from "./time-bins";

/** An ISO day ("1650-06-15"), a year number, or null / undefined for no bound. */
export type YearBound = string | number | null | undefined;

export interface DatedEvidence {
  earliest: YearBound;
  latest: YearBound;
  /** Default 1. */
  weight?: number;
  /** The item's value(s) of the aspect the chart is stacked by. */
  series?: string | readonly string[] | null;
}

export interface HistogramOptions {
  /** First and last year shown, inclusive, widened to whole bins; each defaults to the data's. */
  from?: number | null;
  to?: number | null;
  /** Default false: 1640/1660 → [1640, 1660). */
  endYearInclusive?: boolean;
  /** Default "split". */
  multiValue?: "split" | "each";
  /** Values beyond the largest `maxSeries` are folded into one "other" series. Default 5. */
  maxSeries?: number;
}

export interface ChartBin {
  start: number;
  /** Exclusive: the 1640s are 1640–1650. */
  end: number;
  width: number;
  label: string;
  total: number;
  /** Weights in the order of `TimeHistogram.series`. */
  bySeries: number[];
}

export interface TimeHistogram {
  width: number;
  start: number;
  end: number;
  bins: ChartBin[];
  series: SeriesTotals[];
  totals: { weight: number; inRange: number; outside: number; undated: number; openEnded: number };
}

/**
 * Columnar input for callers that already hold arrays: `start`/`end` are years of the half-open
 * span [start, end) (NaN = unknown or open end), `series` indexes `seriesKeys` (−1 = no value).
 */
export interface DatingColumns {
  start: Float64Array;
  end: Float64Array;
  weight?: Float64Array;
  series?: Int32Array;
  seriesKeys?: readonly string[];
}

const MAX_BINS = 20_000;

/** "1640s" for a decade, "17th century" for 1600–1700, "1625–1649" otherwise. */
export function binLabel(start: number, width: number): string {
  if (width === 10 && start % 10 === 0) return `${start}s`;
  if (width === 100 && start % 100 === 0) return `${ordinal(start / 100 + 1)} century`;
  return `${start}–${start + width - 1}`;
}

/** A bound as a year: the start edge of `earliest`, the end edge of `latest`; NaN if absent. */
export function boundToYear(bound: YearBound, edge: "start" | "end", endYearInclusive = false): number {
  if (bound === null || bound === undefined || bound === "") return Number.NaN;
  if (typeof bound === "number") {
    if (!Number.isFinite(bound)) throw new RangeError(`A year must be a finite number (got ${bound}).`);
    return edge === "end" && endYearInclusive ? bound + 1 : bound;
  }
  return endYearInclusive ? dayToFractionalYear(bound, edge) : yearOf(bound);
}

function memoYear(memo: Map<string, number>, bound: YearBound, edge: "start" | "end", inclusive: boolean): number {
  if (typeof bound !== "string") return boundToYear(bound, edge, inclusive);
  let year = memo.get(bound);
  if (year === undefined) memo.set(bound, (year = boundToYear(bound, edge, inclusive)));
  return year;
}

export function timeHistogram(items: readonly DatedEvidence[], width: number, options: HistogramOptions = {}): TimeHistogram {
  const inclusive = options.endYearInclusive ?? false;
  const starts = new Float64Array(items.length);
  const ends = new Float64Array(items.length);
  // Datings repeat (every "1650" ends on 1650-12-31): each distinct day is converted once.
  const startYears = new Map<string, number>();
  const endYears = new Map<string, number>();
  for (let i = 0; i < items.length; i++) {
    starts[i] = memoYear(startYears, items[i].earliest, "start", inclusive);
    ends[i] = memoYear(endYears, items[i].latest, "end", inclusive);
  }
  const bins = makeAccumulator(starts, ends, width, options);
  const each = options.multiValue === "each";
  let weight = 0;
  for (let i = 0; i < items.length; i++) {
    const w = weightOf(items[i].weight);
    weight += w;
    const series = items[i].series;
    if (typeof series === "string" || series == null) {
      bins.add(starts[i], ends[i], w, series ? bins.seriesOf(series) : NO_VALUE);
      continue;
    }
    const distinct = countDistinct(series);
    if (distinct === 0) {
      bins.add(starts[i], ends[i], w, NO_VALUE);
      continue;
    }
    const share = each ? w : w / distinct;
    for (let j = 0; j < series.length; j++) {
      if (series[j] && series.indexOf(series[j]) === j) bins.add(starts[i], ends[i], share, bins.seriesOf(series[j]));
    }
  }
  return finish(bins, weight, options.maxSeries ?? 5);
}

export function decadeHistogram(items: readonly DatedEvidence[], options: HistogramOptions = {}): TimeHistogram {
  return timeHistogram(items, 10, options);
}

export function centuryHistogram(items: readonly DatedEvidence[], options: HistogramOptions = {}): TimeHistogram {
  return timeHistogram(items, 100, options);
}

/** The same from columns; `endYearInclusive` and `multiValue` do not apply (spans are given). */
export function histogramFromColumns(columns: DatingColumns, width: number, options: HistogramOptions = {}): TimeHistogram {
  const { start, end, weight: weights, series, seriesKeys = [] } = columns;
  if (end.length !== start.length) throw new RangeError("start and end columns differ in length.");
  const bins = makeAccumulator(start, end, width, options);
  const ids = seriesKeys.map((key) => bins.seriesOf(key));
  let weight = 0;
  for (let i = 0; i < start.length; i++) {
    const w = weightOf(weights?.[i]);
    weight += w;
    const k = series ? series[i] : -1;
    bins.add(start[i], end[i], w, k >= 0 ? ids[k] : NO_VALUE);
  }
  return finish(bins, weight, options.maxSeries ?? 5);
}

function weightOf(weight: number | undefined): number {
  if (weight === undefined) return 1;
  if (!Number.isFinite(weight) || weight < 0) throw new RangeError(`A weight must be 0 or more (got ${weight}).`);
  return weight;
}

function countDistinct(values: readonly string[]): number {
  let n = 0;
  for (let j = 0; j < values.length; j++) if (values[j] && values.indexOf(values[j]) === j) n++;
  return n;
}

/** Bins aligned to `width`, over the given years or else the years the dated items reach. */
function makeAccumulator(starts: Float64Array, ends: Float64Array, width: number, options: HistogramOptions): TimeBins {
  if (!(width > 0) || !Number.isFinite(width)) throw new RangeError(`A bin width must be positive (got ${width}).`);
  let first = options.from ?? Number.POSITIVE_INFINITY;
  let last = options.to ?? Number.NEGATIVE_INFINITY;
  if (options.from == null || options.to == null) {
    let lo = Number.POSITIVE_INFINITY;
    let hi = Number.NEGATIVE_INFINITY;
    for (let i = 0; i < starts.length; i++) {
      const s = starts[i];
      const e = ends[i];
      if (Number.isNaN(s) || Number.isNaN(e)) continue;
      if (s < lo) lo = s;
      // The last year a span reaches: [1640, 1660) reaches 1659, a point at 1650 reaches 1650.
      const reach = e > s ? Math.ceil(e) - 1 : Math.floor(s);
      if (reach > hi) hi = reach;
    }
    if (options.from == null) first = Math.floor(lo);
    if (options.to == null) last = hi;
  }
  if (!Number.isFinite(first) || !Number.isFinite(last)) return new TimeBins(0, width, 0);
  if (last < first) throw new RangeError(`The chart's last year (${last}) is before its first (${first}).`);
  const start = Math.floor(first / width) * width;
  const count = Math.floor(last / width) - Math.floor(first / width) + 1;
  if (count > MAX_BINS) throw new RangeError(`That range needs ${count} bins; at most ${MAX_BINS} are drawn.`);
  return new TimeBins(start, width, count);
}

/** Folds the tail of the values into "other" and lays the weights out bin by bin. */
function finish(bins: TimeBins, weight: number, maxSeries: number): TimeHistogram {
  const all = bins.totals();
  const values = all.filter((t) => t.kind === "value");
  const kept = values.slice(0, Math.max(0, maxSeries));
  const folded = values.slice(kept.length);
  const columns: Float64Array[] = kept.map((t) => bins.bins[t.index]);
  const series: SeriesTotals[] = kept.map(strip);
  if (folded.length) {
    const other = new Float64Array(bins.count);
    for (const t of folded) bins.bins[t.index].forEach((v, b) => (other[b] += v));
    columns.push(other);
    series.push({
      key: "",
      kind: "other" as SeriesKind,
      inRange: sum(other),
      undated: folded.reduce((a, t) => a + t.undated, 0),
      openEnded: folded.reduce((a, t) => a + t.openEnded, 0),
    });
  }
  for (const t of all) {
    if (t.kind !== "none") continue;
    columns.push(bins.bins[NO_VALUE]);
    series.push(strip(t));
  }
  const out: ChartBin[] = [];
  for (let b = 0; b < bins.count; b++) {
    const start = bins.start + b * bins.width;
    const bySeries = columns.map((c) => c[b]);
    out.push({ start, end: start + bins.width, width: bins.width, label: binLabel(start, bins.width), total: sum(bySeries), bySeries });
  }
  return {
    width: bins.width,
    start: bins.start,
    end: bins.start + bins.count * bins.width,
    bins: out,
    series,
    totals: {
      weight,
      inRange: series.reduce((a, t) => a + t.inRange, 0),
      outside: bins.outside,
      undated: sum(bins.undated),
      openEnded: sum(bins.openEnded),
    },
  };
}

function strip({ key, kind, inRange, undated, openEnded }: SeriesTotals): SeriesTotals {
  return { key, kind, inRange, undated, openEnded };
}
