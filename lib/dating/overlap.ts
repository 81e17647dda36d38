// Overlap of a dating with a filter range ("from 1620 to 1700"). Both are closed ranges of
// ISO days; touching counts as overlapping (a work of 1619-12-31 is outside "from 1620", one
// of 1620-01-01 inside). Null bounds and missing filter ends are unbounded.

import { monthEndDay, monthStartDay, splitIsoDay, yearEndDay, yearStartDay } from "./days";

export interface Bounds {
  earliest: string | null;
  latest: string | null;
}

/** A filter end: a year number (the whole year), or "YYYY", "YYYY-MM" or "YYYY-MM-DD". */
export type RangeEnd = string | number;

export interface FilterRange {
  from?: RangeEnd | null;
  to?: RangeEnd | null;
}

/** The year of an ISO day: "1650-06-15" → 1650. */
export function yearOf(isoDay: string): number {
  return splitIsoDay(isoDay).year;
}

/** The same for a nullable bound (null stays null). */
export function yearOfOrNull(isoDay: string | null): number | null {
  return isoDay === null ? null : yearOf(isoDay);
}

/**
 * Resolves a filter end to an ISO day: the first day of the year/month for `from`,
 * the last for `to`. Throws RangeError for anything else (years 1–9999 only).
 */
export function rangeEndToDay(value: RangeEnd, edge: "from" | "to"): string {
  const text = typeof value === "number" ? String(value) : value.trim();
  if (typeof value === "number" && !Number.isInteger(value)) {
    throw new RangeError(`A year must be a whole number (got ${value}).`);
  }
  const m = /^(\d{1,4})(?:-(\d{2})(?:-(\d{2}))?)?$/.exec(text);
  if (!m) throw new RangeError(`Not a year, month or day: ${JSON.stringify(value)}`);
  const year = Number(m[1]);
  if (year < 1) throw new RangeError("Years before 1 CE are not supported.");
  if (m[3] !== undefined) {
    const day = `${m[1].padStart(4, "0")}-${m[2]}-${m[3]}`;
    splitIsoDay(day); // validates
    return day;
  }
  if (m[2] !== undefined) {
    const month = Number(m[2]);
    if (month < 1 || month > 12) throw new RangeError(`There is no month ${m[2]}.`);
    return edge === "from" ? monthStartDay(year, month) : monthEndDay(year, month);
  }
  return edge === "from" ? yearStartDay(year) : yearEndDay(year);
}

/**
 * The ISO days a database query compares against the stored WIDENED bounds:
 *   (widened_earliest IS NULL OR widened_earliest <= :toDay)
 *   AND (widened_latest IS NULL OR widened_latest >= :fromDay)
 * A null `fromDay` / `toDay` means "leave that condition out". Throws RangeError if from > to.
 */
export function overlapQueryDays(range: FilterRange): { fromDay: string | null; toDay: string | null } {
  const fromDay = range.from == null ? null : rangeEndToDay(range.from, "from");
  const toDay = range.to == null ? null : rangeEndToDay(range.to, "to");
  if (fromDay !== null && toDay !== null && fromDay > toDay) {
    throw new RangeError(`The range starts (${fromDay}) after it ends (${toDay}).`);
  }
  return { fromDay, toDay };
}

/**
 * Whether a dating overlaps a filter range. Pass widened bounds for "could be in range"
 * filtering, strict bounds for "stated to be in range". ISO days compare as strings.
 */
export function overlaps(a: Bounds, range: FilterRange): boolean {
  const { fromDay, toDay } = overlapQueryDays(range);
  const startsBeforeEnd = a.earliest === null || toDay === null || a.earliest <= toDay;
  const endsAfterStart = a.latest === null || fromDay === null || a.latest >= fromDay;
  return startsBeforeEnd && endsAfterStart;
}

/** Whether a dating lies wholly inside a range (open dating ends never do, unless the range is open there too). */
export function within(a: Bounds, range: FilterRange): boolean {
  const { fromDay, toDay } = overlapQueryDays(range);
  const afterStart = fromDay === null || (a.earliest !== null && a.earliest >= fromDay);
  const beforeEnd = toDay === null || (a.latest !== null && a.latest <= toDay);
  return afterStart && beforeEnd;
}
