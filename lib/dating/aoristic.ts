// Aoristic weights (J. Ratcliffe, J. Quant. Criminol. 18(1), 2002; E. Crema, J. Archaeol.
// Method Theory 19(3), 2012): an item known only to lie in [s, e) is spread evenly over it,
// so each time bin receives weight · overlap([s, e), bin) / (e − s).
//
// From ISO days to years — Cordarium's decision:
// - Default (endYearInclusive: true): EDTF bounds are inclusive days, converted to fractional
//   years at the day's start and end, so 1630-01-01..1660-12-31 is [1630.0, 1661.0). Hence
//   `1640/1660` gives 10/21 to each of the 1640s and 1650s and 1/21 to the 1660s, not the
//   "half each" a reading of year numbers as points would give.
// - endYearInclusive: false: both bounds are taken as whole years read as points, as in
//   Crema's year-number examples: 1640-01-01..1660-12-31 is [1640, 1660) → half each.
// A span of zero length (s = e) puts its whole weight in the bin containing s.
// Items with an open end cannot be spread and are skipped (and counted).

import { dayToFractionalYear } from "./days";
import { yearOf } from "./overlap";

export interface BinSpec {
  /** First year of the first bin. */
  start: number;
  /** End of the last bin (exclusive); a last bin that would pass it is cut short. */
  end: number;
  width: number;
}

export interface BinWeight {
  start: number;
  end: number;
  weight: number;
}

export interface Span {
  start: number;
  end: number;
  weight?: number;
}

export interface DatedItem {
  earliest: string | null;
  latest: string | null;
  weight?: number;
}

export interface AoristicOptions {
  /** Default true: a latest day counts up to its end (… 1660-12-31 → 1661.0). */
  endYearInclusive?: boolean;
}

/** Empty bins: bin i covers [start + i·width, start + (i+1)·width), the last one cut at `end`. */
export function makeBins(spec: BinSpec): BinWeight[] {
  const { start, end, width } = spec;
  if (![start, end, width].every(Number.isFinite) || width <= 0 || end <= start) {
    throw new RangeError(`Bins need finite start < end and width > 0 (got ${JSON.stringify(spec)}).`);
  }
  const count = Math.ceil((end - start) / width - 1e-9);
  return Array.from({ length: count }, (_, i) => ({
    start: start + i * width,
    end: Math.min(start + (i + 1) * width, end),
    weight: 0,
  }));
}

/** Decade bins covering the years fromYear..toYear inclusive: decadeBins(1600, 1699) → 1600–1700 by 10. */
export function decadeBins(fromYear: number, toYear: number): BinSpec {
  if (toYear < fromYear) throw new RangeError(`toYear (${toYear}) is before fromYear (${fromYear}).`);
  return { start: Math.floor(fromYear / 10) * 10, end: Math.floor(toYear / 10) * 10 + 10, width: 10 };
}

/** The numeric core: spans in (fractional) years, straight from the definition. */
export function aoristicFromSpans(spans: readonly Span[], spec: BinSpec): BinWeight[] {
  const bins = makeBins(spec);
  for (const span of spans) {
    const weight = span.weight ?? 1;
    if (!Number.isFinite(span.start) || !Number.isFinite(span.end) || span.end < span.start) {
      throw new RangeError(`A span needs finite start <= end (got ${span.start}, ${span.end}).`);
    }
    const length = span.end - span.start;
    if (length === 0) {
      const bin = bins.find((b) => span.start >= b.start && span.start < b.end);
      if (bin) bin.weight += weight;
      continue;
    }
    for (const bin of bins) {
      const overlap = Math.min(bin.end, span.end) - Math.max(bin.start, span.start);
      if (overlap > 0) bin.weight += (weight * overlap) / length;
    }
  }
  return bins;
}

/** Converts a dated item's ISO bounds to a span of years under the chosen reading. */
export function itemToSpan(item: DatedItem & { earliest: string; latest: string }, options: AoristicOptions = {}): Span {
  const inclusive = options.endYearInclusive ?? true;
  return inclusive
    ? { start: dayToFractionalYear(item.earliest, "start"), end: dayToFractionalYear(item.latest, "end"), weight: item.weight }
    : { start: yearOf(item.earliest), end: yearOf(item.latest), weight: item.weight };
}

/** Aoristic weights of dated items (ISO-day bounds, e.g. widened bounds from readDating). */
export function aoristicWeights(
  items: readonly DatedItem[],
  spec: BinSpec,
  options: AoristicOptions = {},
): { bins: BinWeight[]; skipped: number } {
  const spans: Span[] = [];
  let skipped = 0;
  for (const item of items) {
    if (item.earliest === null || item.latest === null) skipped++;
    else spans.push(itemToSpan({ ...item, earliest: item.earliest, latest: item.latest }, options));
  }
  return { bins: aoristicFromSpans(spans, spec), skipped };
}
