// The accumulator behind the decade and century charts: aoristic weights (J. Ratcliffe 2002;
// E. Crema 2012) as lib/dating/aoristic.ts defines them — a span [s, e) puts
// weight · overlap([s, e), bin) / (e − s) in each bin, a zero-length span puts its whole weight
// in the bin containing s — but stacked by series and fast: one Float64Array per series, and
// each span visits only the bins it overlaps, so 100,000 items cost no per-item allocation.

/** How a series key came about: a value of the aspect, items without one, or the folded tail. */
export type SeriesKind = "value" | "none" | "other";

export interface SeriesTotals {
  key: string;
  kind: SeriesKind;
  /** Weight that fell inside the chart's range. */
  inRange: number;
  /** Weight of items with no dating at all. */
  undated: number;
  /** Weight of items open at one end (`../1700`, `1700/..`), which cannot be spread. */
  openEnded: number;
}

/** Series 0 is always "no value", so an item without one needs no lookup. */
export const NO_VALUE = 0;

export class TimeBins {
  readonly start: number;
  readonly width: number;
  readonly count: number;
  readonly keys: string[] = [""];
  readonly bins: Float64Array[];
  readonly undated: number[] = [0];
  readonly openEnded: number[] = [0];
  outside = 0;
  private readonly index = new Map<string, number>();

  constructor(start: number, width: number, count: number) {
    this.start = start;
    this.width = width;
    this.count = count;
    this.bins = [new Float64Array(count)];
  }

  /** The series index of a value, made on first sight (one O(bins) array per series). */
  seriesOf(key: string): number {
    if (key === "") return NO_VALUE;
    let i = this.index.get(key);
    if (i === undefined) {
      i = this.keys.length;
      this.index.set(key, i);
      this.keys.push(key);
      this.bins.push(new Float64Array(this.count));
      this.undated.push(0);
      this.openEnded.push(0);
    }
    return i;
  }

  /**
   * Adds one item to a series. `s` and `e` are years of a half-open span [s, e); NaN marks an
   * unknown or open end. Weight outside the bins is kept in `outside`, never dropped silently.
   */
  add(s: number, e: number, weight: number, series: number): void {
    const sOpen = Number.isNaN(s);
    const eOpen = Number.isNaN(e);
    if (sOpen || eOpen) {
      if (sOpen && eOpen) this.undated[series] += weight;
      else this.openEnded[series] += weight;
      return;
    }
    if (!(e >= s)) throw new RangeError(`A dating must not end before it starts (got ${s} to ${e}).`);
    const acc = this.bins[series];
    const length = e - s;
    if (length === 0) {
      const i = Math.floor((s - this.start) / this.width);
      if (i >= 0 && i < this.count) acc[i] += weight;
      else this.outside += weight;
      return;
    }
    const first = Math.max(0, Math.floor((s - this.start) / this.width));
    const last = Math.min(this.count - 1, Math.ceil((e - this.start) / this.width) - 1);
    let inside = 0;
    for (let i = first; i <= last; i++) {
      const binStart = this.start + i * this.width;
      const overlap = Math.min(binStart + this.width, e) - Math.max(binStart, s);
      if (overlap > 0) {
        const share = (weight * overlap) / length;
        acc[i] += share;
        inside += share;
      }
    }
    const rest = weight - inside;
    // Rounding leaves crumbs like 1e-17 when a span lies wholly inside; they are not "outside".
    if (rest > 1e-9 * weight) this.outside += rest;
  }

  /** Per-series totals with their index, values by weight in range (largest first), "no value" last. */
  totals(): (SeriesTotals & { index: number })[] {
    const all = this.keys.map((key, index) => ({
      key,
      kind: (index === NO_VALUE ? "none" : "value") as SeriesKind,
      inRange: sum(this.bins[index]),
      undated: this.undated[index],
      openEnded: this.openEnded[index],
      index,
    }));
    return all
      .filter((t) => t.index !== NO_VALUE || t.inRange + t.undated + t.openEnded > 0)
      .sort((a, b) => rank(a) - rank(b) || b.inRange - a.inRange || compareKeys(a.key, b.key));
  }
}

function compareKeys(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

function rank(t: { kind: SeriesKind }): number {
  return t.kind === "none" ? 1 : 0;
}

export function sum(values: ArrayLike<number>): number {
  let total = 0;
  for (let i = 0; i < values.length; i++) total += values[i];
  return total;
}
