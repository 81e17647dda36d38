// readDating: an EDTF string (Library of Congress EDTF 2019, ISO 8601-2:2019) → strict bounds,
// widened bounds and words. Pure: no I/O, safe in the browser (a form shows it while typing).
//
// Decisions where the specification is silent (see also points.ts and seasons.ts):
// - Bounds of intervals and sets are computed here from their members, not taken from the
//   `edtf` package (it ends `[1667,1668,1670..1672]` at 1670 and does not sort members).
// - Qualifier flags are read from the parse tree (the package ignores them for min/max).
// - Only years 1–9999 are accepted: BCE years, year 0 and long "Y" years are refused.
// - Times of day, significant digits (1650S2) and irregular unspecified digits (1X50) are refused.
// - An interval's end may not start before its start; `1650/1650` is accepted.
// - `../..` (open at both ends) is refused: it says nothing.

import { parse, type EdtfNode } from "edtf";
import { DatingError, precheck, syntaxMessage } from "./messages";
import { toPoint, type Margins } from "./points";
import type { DatingOptions, DatingPoint, DatingResult, DatingShape, IntervalEnd, Precision } from "./types";
import { datingInWords } from "./words";

/** Cordarium's own defaults (not a standard): a few years either side suit artworks. */
export const DEFAULT_APPROXIMATE_MARGIN_YEARS = 5;
export const DEFAULT_UNCERTAIN_MARGIN_YEARS = 5;

function margins(options: DatingOptions): Margins {
  const approximate = options.approximateMarginYears ?? DEFAULT_APPROXIMATE_MARGIN_YEARS;
  const uncertain = options.uncertainMarginYears ?? DEFAULT_UNCERTAIN_MARGIN_YEARS;
  for (const [name, value] of [["approximateMarginYears", approximate], ["uncertainMarginYears", uncertain]] as const) {
    if (!Number.isInteger(value) || value < 0) {
      throw new RangeError(`${name} must be a whole number of years, 0 or more (got ${value}).`);
    }
  }
  return { approximate, uncertain };
}

/** Trims, drops spaces around separators and accepts a lower-case `x` for unspecified digits. */
export function normaliseEdtf(input: string): string {
  return input
    .trim()
    .replace(/\s*(\.\.|[,/[\]{}])\s*/g, "$1")
    .replace(/x/g, "X");
}

/**
 * Season intervals (`1650-21/1651-22`) need the package's `seasonIntervals` option, which
 * crashes on intervals with an empty start (`/1700`), so it is only tried second.
 */
function parseEdtf(text: string): EdtfNode {
  try {
    return parse(text);
  } catch (error) {
    try {
      return parse(text, { seasonIntervals: true });
    } catch {
      throw error;
    }
  }
}

function intervalEnd(value: unknown, m: Margins): IntervalEnd {
  if (value === Infinity || value === -Infinity) return "open";
  if (value == null) return "unknown";
  return toPoint(value as EdtfNode, m);
}

function toShape(node: EdtfNode, text: string, m: Margins): DatingShape {
  if (node.type === "Interval") {
    const start = intervalEnd(node.values[0], m);
    const end = intervalEnd(node.values[1], m);
    if (typeof start === "string" && typeof end === "string") {
      throw new DatingError("An interval open at both ends says nothing about the date; leave it empty instead.");
    }
    if (typeof start !== "string" && typeof end !== "string") {
      if (end.earliest < start.earliest || end.latest < start.latest) {
        const [a, b] = text.split("/");
        throw new DatingError(`‘${text}’ is not a valid interval: it ends (${b}) before it starts (${a}).`);
      }
    }
    return { kind: "interval", start, end };
  }
  if (node.type === "Set" || node.type === "List") {
    const members = node.values.map((value) => {
      if (!Array.isArray(value)) return toPoint(value as EdtfNode, m);
      const [from, to] = value.map((v: EdtfNode) => toPoint(v, m));
      if (to.earliest < from.earliest) {
        throw new DatingError(`‘${text}’ is not a valid set: a range in it runs backwards.`);
      }
      return { from, to };
    });
    if (!members.length) throw new DatingError("A set needs at least one date.");
    return { kind: "set", mode: node.type === "Set" ? "one" : "all", members, earlier: !!node.earlier, later: !!node.later };
  }
  return { kind: "point", point: toPoint(node, m) };
}

function points(shape: DatingShape): DatingPoint[] {
  if (shape.kind === "point") return [shape.point];
  if (shape.kind === "interval") {
    return [shape.start, shape.end].filter((e): e is DatingPoint => typeof e !== "string");
  }
  return shape.members.flatMap((m) => ("from" in m ? [m.from, m.to] : [m]));
}

const min = (days: string[]) => days.reduce((a, b) => (b < a ? b : a));
const max = (days: string[]) => days.reduce((a, b) => (b > a ? b : a));

/** Strict and widened bounds of a shape. ISO days compare correctly as strings (years 1–9999). */
function bounds(shape: DatingShape) {
  if (shape.kind === "point") return shape.point;
  if (shape.kind === "interval") {
    const { start, end } = shape;
    return {
      earliest: typeof start === "string" ? null : start.earliest,
      widenedEarliest: typeof start === "string" ? null : start.widenedEarliest,
      latest: typeof end === "string" ? null : end.latest,
      widenedLatest: typeof end === "string" ? null : end.widenedLatest,
    };
  }
  // A set covers the union of its members, each widened by its own qualifiers.
  const all = points(shape);
  return {
    earliest: shape.earlier ? null : min(all.map((p) => p.earliest)),
    widenedEarliest: shape.earlier ? null : min(all.map((p) => p.widenedEarliest)),
    latest: shape.later ? null : max(all.map((p) => p.latest)),
    widenedLatest: shape.later ? null : max(all.map((p) => p.widenedLatest)),
  };
}

/**
 * Reads an EDTF string. Never throws for bad input (returns `{ ok: false, error }`);
 * throws RangeError only for bad options (negative or fractional margins).
 */
export function readDating(input: string, options: DatingOptions = {}): DatingResult {
  const m = margins(options);
  const text = normaliseEdtf(input);
  if (!text) return { ok: false, error: "Enter a date in EDTF, e.g. 1650, 1650~ or 1640/1660." };
  const problem = precheck(text);
  if (problem) return { ok: false, error: problem };

  let node: EdtfNode;
  try {
    node = parseEdtf(text);
  } catch (error) {
    return { ok: false, error: syntaxMessage(text, error) };
  }

  try {
    const shape = toShape(node, text, m);
    const all = points(shape);
    const precision: Precision =
      shape.kind === "point" ? shape.point.precision : shape.kind === "interval" ? "interval" : "set";
    const b = bounds(shape);
    return {
      ok: true,
      edtf: text,
      earliest: b.earliest,
      latest: b.latest,
      approximate: all.some((p) => p.approximate),
      uncertain: all.some((p) => p.uncertain),
      precision,
      widenedEarliest: b.widenedEarliest,
      widenedLatest: b.widenedLatest,
      words: datingInWords(shape),
    };
  } catch (error) {
    if (error instanceof DatingError) return { ok: false, error: error.message };
    return { ok: false, error: `‘${text}’ could not be read as an EDTF date. ${String(error)}` };
  }
}
