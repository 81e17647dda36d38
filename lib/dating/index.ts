// Public API of Cordarium's dating module: EDTF readings, words, overlap filters, aoristic weights.
// Pure TypeScript with no Node-specific imports: usable on the server and in the browser.

export {
  readDating,
  normaliseEdtf,
  DEFAULT_APPROXIMATE_MARGIN_YEARS,
  DEFAULT_UNCERTAIN_MARGIN_YEARS,
} from "./parse";
export { datingInWords, pointInWords, ordinal } from "./words";
export {
  overlaps,
  within,
  overlapQueryDays,
  rangeEndToDay,
  yearOf,
  yearOfOrNull,
  type Bounds,
  type FilterRange,
  type RangeEnd,
} from "./overlap";
export {
  aoristicWeights,
  aoristicFromSpans,
  decadeBins,
  makeBins,
  itemToSpan,
  type AoristicOptions,
  type BinSpec,
  type BinWeight,
  type DatedItem,
  type Span,
} from "./aoristic";
export { SEASONS, seasonBounds, type SeasonRule } from "./seasons";
export { dayToFractionalYear, yearStartDay, yearEndDay, isLeapYear, daysInMonth } from "./days";
export type {
  DatingOptions,
  DatingPoint,
  DatingReading,
  DatingRefusal,
  DatingResult,
  DatingShape,
  IntervalEnd,
  Precision,
  PointPrecision,
  SetRange,
} from "./types";
