// Shared types of the dating module. Days are ISO "YYYY-MM-DD" strings, proleptic Gregorian, UTC.

export type Precision =
  | "day"
  | "month"
  | "season"
  | "year"
  | "decade"
  | "century"
  | "interval"
  | "set";

/** The precision of one point (a date, season, decade or century), as opposed to an interval or set. */
export type PointPrecision = Exclude<Precision, "interval" | "set">;

export interface DatingOptions {
  /** Years added on each qualified side for `~`. Default DEFAULT_APPROXIMATE_MARGIN_YEARS. */
  approximateMarginYears?: number;
  /** Years added on each qualified side for `?`. Default DEFAULT_UNCERTAIN_MARGIN_YEARS. */
  uncertainMarginYears?: number;
}

export interface DatingReading {
  ok: true;
  /** The normalised input (trimmed, spaces around separators removed, `x` → `X`). */
  edtf: string;
  /** Strict bounds as the EDTF string states them; null = open or unknown. */
  earliest: string | null;
  latest: string | null;
  approximate: boolean;
  uncertain: boolean;
  precision: Precision;
  /** Bounds widened by the margins for `~` / `?` (Cordarium's own rule); use these for overlap queries. */
  widenedEarliest: string | null;
  widenedLatest: string | null;
  /** A short English phrase, e.g. "about 1650". */
  words: string;
}

export interface DatingRefusal {
  ok: false;
  error: string;
}

export type DatingResult = DatingReading | DatingRefusal;

/** One point, resolved to bounds. Months and days are 1-based. */
export interface DatingPoint {
  precision: PointPrecision;
  /** The first year the point covers (1650 for 165X, 1600 for 16XX). */
  year: number;
  month?: number;
  day?: number;
  /** EDTF season code, 21–41. */
  season?: number;
  approximate: boolean;
  uncertain: boolean;
  earliest: string;
  latest: string;
  widenedEarliest: string;
  widenedLatest: string;
}

/** An interval end: a point, open (`..`) or unknown (empty). */
export type IntervalEnd = DatingPoint | "open" | "unknown";

export interface SetRange {
  from: DatingPoint;
  to: DatingPoint;
}

/** The structure of a reading, as `datingInWords` needs it. */
export type DatingShape =
  | { kind: "point"; point: DatingPoint }
  | { kind: "interval"; start: IntervalEnd; end: IntervalEnd }
  | {
      kind: "set";
      /** "one" for `[...]` (one of), "all" for `{...}` (all of). */
      mode: "one" | "all";
      members: (DatingPoint | SetRange)[];
      earlier: boolean;
      later: boolean;
    };
