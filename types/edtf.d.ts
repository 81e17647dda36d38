// Minimal types for the `edtf` package (4.11.1), covering only what lib/dating uses.
// The package is ESM with a default export and ships no types of its own.
declare module "edtf" {
  /** A qualifier or unspecified flag: `true` for the whole value (level 1) or a YYYYMMDD bitmask (level 2). */
  export type EdtfBits = boolean | number;

  /**
   * One node of the parser's output. Nested unspecified dates may lack `type` (then they are dates).
   * `values`: numbers for Date (month is 0-based), Year, Decade, Century and Season ([year, code]);
   * child nodes for Interval (`Infinity` = open end "..", `null` = unknown end) and for Set/List
   * (a `[from, to]` pair for a range "a..b").
   */
  export interface EdtfNode {
    type?: "Date" | "Year" | "Decade" | "Century" | "Season" | "Interval" | "Set" | "List";
    level?: number;
    values: unknown[];
    approximate?: EdtfBits;
    uncertain?: EdtfBits;
    unspecified?: number;
    significant?: number;
    earlier?: boolean;
    later?: boolean;
    offset?: number;
  }

  export interface EdtfConstraints {
    level?: number;
    types?: string[];
    seasonIntervals?: boolean;
    seasonUncertainty?: boolean;
  }

  /** A parsed value; `min` and `max` are epoch milliseconds (±Infinity or null for open ends). */
  export interface EdtfValue {
    readonly type: string;
    readonly min: number;
    readonly max: number;
    readonly edtf: string;
    toEDTF(): string;
  }

  /** Parses to the raw node tree; throws on invalid input. */
  export function parse(input: string, constraints?: EdtfConstraints): EdtfNode;

  /** Parses (or rebuilds from a node) to a value object; throws on invalid input. */
  export default function edtf(input: string | number | EdtfNode): EdtfValue;
}
