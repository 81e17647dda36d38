// ISO-day arithmetic, proleptic Gregorian, all in UTC so that no local time zone can shift a day.

export const MIN_YEAR = 1;
export const MAX_YEAR = 9999;

export const MONTH_NAMES = [
  "January", "February", "March", "April", "May", "June",
  "July", "August", "September", "October", "November", "December",
] as const;

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Days in a month; `month` is 1-based. */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return isLeapYear(year) ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

export function daysInYear(year: number): number {
  return isLeapYear(year) ? 366 : 365;
}

/** "YYYY-MM-DD" from parts (month and day 1-based). */
export function isoDay(year: number, month: number, day: number): string {
  return `${String(year).padStart(4, "0")}-${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`;
}

/** The UTC day containing an epoch-millisecond instant. */
export function msToIsoDay(ms: number): string {
  return new Date(ms).toISOString().slice(0, 10);
}

/** Splits an ISO day; throws RangeError if it is not a real "YYYY-MM-DD" day. */
export function splitIsoDay(day: string): { year: number; month: number; day: number } {
  const m = ISO_DAY.exec(day);
  if (!m) throw new RangeError(`Not an ISO day (YYYY-MM-DD): ${JSON.stringify(day)}`);
  const [year, month, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (month < 1 || month > 12 || d < 1 || d > daysInMonth(year, month)) {
    throw new RangeError(`Not a real day: ${day}`);
  }
  return { year, month, day: d };
}

export function yearStartDay(year: number): string {
  return isoDay(year, 1, 1);
}

export function yearEndDay(year: number): string {
  return isoDay(year, 12, 31);
}

export function monthStartDay(year: number, month: number): string {
  return isoDay(year, month, 1);
}

export function monthEndDay(year: number, month: number): string {
  return isoDay(year, month, daysInMonth(year, month));
}

/**
 * Moves a day by whole years, keeping month and day (29 February → 28 February in a
 * common year) and clamping to 0001-01-01 … 9999-12-31, the range this module supports.
 */
export function addYears(day: string, years: number): string {
  const p = splitIsoDay(day);
  const year = p.year + years;
  if (year < MIN_YEAR) return yearStartDay(MIN_YEAR);
  if (year > MAX_YEAR) return yearEndDay(MAX_YEAR);
  return isoDay(year, p.month, Math.min(p.day, daysInMonth(year, p.month)));
}

/** 1-based day of the year. */
export function dayOfYear(day: string): number {
  const p = splitIsoDay(day);
  let n = p.day;
  for (let m = 1; m < p.month; m++) n += daysInMonth(p.year, m);
  return n;
}

/**
 * A day as a fractional year: its start (1630-01-01 → 1630.0) or its end
 * (1660-12-31 → 1661.0), so that inclusive ISO bounds become a half-open span.
 */
export function dayToFractionalYear(day: string, edge: "start" | "end"): number {
  const { year } = splitIsoDay(day);
  const n = dayOfYear(day) - (edge === "start" ? 1 : 0);
  return year + n / daysInYear(year);
}
