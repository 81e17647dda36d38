// One parsed EDTF point (date, season, decade, century, long year) → strict and widened bounds.
//
// Widening is Cordarium's own rule, not a standard: the EDTF specification says nothing about
// how wide "approximate" or "uncertain" is.
// - A qualified YEAR (`1650~`, `?1650-06`, `16~`) widens both bounds of that point by the margin:
//   approximate → approximateMarginYears, uncertain → uncertainMarginYears, `%` → their SUM.
// - A qualified month only (`1650-~06`) widens the point to its whole year; a qualified day only
//   (`1650-06-?15`) to its whole month. Year margins do not apply there.
// - Widened bounds are clamped to 0001-01-01 … 9999-12-31.

import edtf, { type EdtfBits, type EdtfNode } from "edtf";
import {
  MAX_YEAR,
  MIN_YEAR,
  addYears,
  isoDay,
  monthEndDay,
  monthStartDay,
  msToIsoDay,
  yearEndDay,
  yearStartDay,
} from "./days";
import { BEFORE_1, BEYOND_9999, DatingError, dayProblem, invalidDate } from "./messages";
import { SEASONS, seasonBounds } from "./seasons";
import type { DatingPoint, PointPrecision } from "./types";

export interface Margins {
  approximate: number;
  uncertain: number;
}

// Bitmask layout of the package (YYYYMMDD, first year digit = bit 0).
const YEAR_BITS = 0b00001111;
const MONTH_BITS = 0b00110000;
const DAY_BITS = 0b11000000;
const DECADE_MASK = 0b1000; // 165X
const CENTURY_MASK = 0b1100; // 16XX

/** Level 1 flags are `true` (the whole value); level 2 flags are bitmasks. */
function bits(value: EdtfBits | undefined): number {
  if (value === true) return YEAR_BITS | MONTH_BITS | DAY_BITS;
  return typeof value === "number" ? value : 0;
}

export function checkYear(year: number): void {
  if (!Number.isFinite(year) || year > MAX_YEAR) throw new DatingError(BEYOND_9999);
  if (year < MIN_YEAR) throw new DatingError(BEFORE_1);
}

/** The package's own min/max for a node, as ISO days. */
function packageBounds(node: EdtfNode): { earliest: string; latest: string } {
  const value = edtf(node);
  if (!Number.isFinite(value.min) || !Number.isFinite(value.max)) throw new DatingError(BEYOND_9999);
  return { earliest: msToIsoDay(value.min), latest: msToIsoDay(value.max) };
}

function widen(
  p: Omit<DatingPoint, "widenedEarliest" | "widenedLatest">,
  approximate: number,
  uncertain: number,
  margins: Margins,
): DatingPoint {
  const any = approximate | uncertain;
  let [widenedEarliest, widenedLatest] = [p.earliest, p.latest];
  if (any & YEAR_BITS) {
    const years =
      (approximate & YEAR_BITS ? margins.approximate : 0) + (uncertain & YEAR_BITS ? margins.uncertain : 0);
    widenedEarliest = addYears(p.earliest, -years);
    widenedLatest = addYears(p.latest, years);
  } else if (any & MONTH_BITS) {
    [widenedEarliest, widenedLatest] = [yearStartDay(p.year), yearEndDay(p.year)];
  } else if (any & DAY_BITS && p.month !== undefined) {
    [widenedEarliest, widenedLatest] = [monthStartDay(p.year, p.month), monthEndDay(p.year, p.month)];
  }
  return { ...p, widenedEarliest, widenedLatest };
}

function datePoint(node: EdtfNode, margins: Margins): DatingPoint {
  const values = node.values as number[];
  if (values.length > 3) throw new DatingError("Times of day are not supported here; give a day, month or year.");
  const [year, month0, day] = values;
  const month = month0 === undefined ? undefined : month0 + 1;

  const mask = node.unspecified ?? 0;
  const [yearX, monthX, dayX] = [mask & YEAR_BITS, mask & MONTH_BITS, mask & DAY_BITS];
  if (yearX === 0b1110 || yearX === YEAR_BITS) {
    throw new DatingError("That is too vague to be useful here; give at least the century, e.g. 16XX.");
  }
  const wholeParts =
    [0, DECADE_MASK, CENTURY_MASK].includes(yearX) &&
    [0, MONTH_BITS].includes(monthX) &&
    [0, DAY_BITS].includes(dayX) &&
    !(yearX && values.length > 1 && !monthX) &&
    !(monthX && values.length > 2 && !dayX);
  if (!wholeParts) {
    throw new DatingError(
      "Unspecified digits (X) are supported here only for whole trailing parts: 165X, 16XX, 1650-XX, 1650-06-XX.",
    );
  }
  checkYear(year);
  if (month !== undefined && day !== undefined && !dayX) {
    const why = dayProblem(year, month, day);
    if (why) throw new DatingError(invalidDate(isoDay(year, month, day), why));
  }

  const precision: PointPrecision =
    yearX === DECADE_MASK ? "decade"
    : yearX === CENTURY_MASK ? "century"
    : values.length === 1 || monthX ? "year"
    : values.length === 2 || dayX ? "month"
    : "day";
  const { earliest, latest } = packageBounds({ ...node, type: "Date" });
  const a = bits(node.approximate);
  const u = bits(node.uncertain);
  return widen(
    {
      precision,
      year,
      month: precision === "month" || precision === "day" ? month : undefined,
      day: precision === "day" ? day : undefined,
      approximate: a !== 0,
      uncertain: u !== 0,
      earliest,
      latest,
    },
    a,
    u,
    margins,
  );
}

function seasonPoint(node: EdtfNode, margins: Margins): DatingPoint {
  const [year, code] = node.values as number[];
  checkYear(year);
  if (!SEASONS[code]) throw new DatingError(`There is no season ${code}.`);
  const { earliest, latest, endYear } = seasonBounds(year, code);
  checkYear(endYear);
  const a = bits(node.approximate);
  const u = bits(node.uncertain);
  return widen(
    { precision: "season", year, season: code, approximate: a !== 0, uncertain: u !== 0, earliest, latest },
    a,
    u,
    margins,
  );
}

/** ISO 8601-2 decades ("165") and centuries ("16"), and long years ("Y…"). */
function groupPoint(node: EdtfNode, margins: Margins): DatingPoint {
  const n = Number(node.values[0]);
  if (node.type === "Year" && node.significant) {
    throw new DatingError("Significant digits (1650S2) are not supported here; write 16XX or 1600/1699 instead.");
  }
  const precision: PointPrecision =
    node.type === "Decade" ? "decade" : node.type === "Century" ? "century" : "year";
  const year = precision === "decade" ? n * 10 : precision === "century" ? n * 100 : n;
  checkYear(year);
  const { earliest, latest } = packageBounds(node);
  const a = bits(node.approximate);
  const u = bits(node.uncertain);
  return widen({ precision, year, approximate: a !== 0, uncertain: u !== 0, earliest, latest }, a, u, margins);
}

export function toPoint(node: EdtfNode, margins: Margins): DatingPoint {
  switch (node.type ?? "Date") {
    case "Date":
      return datePoint(node, margins);
    case "Season":
      return seasonPoint(node, margins);
    case "Decade":
    case "Century":
    case "Year":
      return groupPoint(node, margins);
    default:
      throw new DatingError("Intervals and sets cannot be nested inside one another.");
  }
}
