// EDTF season codes and the months Cordarium gives them.
//
// Cordarium's own rule (the EDTF specification names the seasons but defines no months, and
// the `edtf` package maps spring to January–March): seasons are METEOROLOGICAL seasons of the
// NORTHERN hemisphere — spring = March–May, summer = June–August, autumn = September–November,
// winter = December of the stated year to February of the next. Codes 21–24 (level 1) and
// 25–28 (level 2, "northern hemisphere") both follow it; 29–32 (southern hemisphere) are the
// same months shifted by half a year. Quarters (33–36), quadrimesters (37–39) and semestrals
// (40–41) are the plain calendar thirds, quarters and halves of the year.

import { isoDay, monthEndDay } from "./days";

export interface SeasonRule {
  /** First month, 1-based. */
  month: number;
  /** Number of months covered. */
  months: number;
  /** "season" reads "spring 1650"; "part" reads "the first quarter of 1650". */
  form: "season" | "part";
  name: string;
}

function seasons(hemisphere: string, start: number): Record<number, SeasonRule> {
  const prefix = hemisphere ? `${hemisphere} ` : "";
  const names = ["spring", "summer", "autumn", "winter"];
  const months = hemisphere === "southern-hemisphere" ? [9, 12, 3, 6] : [3, 6, 9, 12];
  return Object.fromEntries(
    names.map((name, i) => [start + i, { month: months[i], months: 3, form: "season", name: prefix + name }]),
  );
}

function parts(start: number, size: number, noun: string): Record<number, SeasonRule> {
  const ordinals = ["first", "second", "third", "fourth"];
  const count = 12 / size;
  return Object.fromEntries(
    Array.from({ length: count }, (_, i) => [
      start + i,
      { month: 1 + i * size, months: size, form: "part", name: `${ordinals[i]} ${noun}` },
    ]),
  );
}

export const SEASONS: Readonly<Record<number, SeasonRule>> = {
  ...seasons("", 21),
  ...seasons("", 25),
  ...seasons("southern-hemisphere", 29),
  ...parts(33, 3, "quarter"),
  ...parts(37, 4, "third"),
  ...parts(40, 6, "half"),
};

/** Strict bounds of a season; a winter runs into the next year. */
export function seasonBounds(year: number, code: number): { earliest: string; latest: string; endYear: number } {
  const rule = SEASONS[code];
  if (!rule) throw new RangeError(`Unknown season code ${code}`);
  const last = rule.month + rule.months - 1;
  const endYear = last > 12 ? year + 1 : year;
  const endMonth = last > 12 ? last - 12 : last;
  return { earliest: isoDay(year, rule.month, 1), latest: monthEndDay(endYear, endMonth), endYear };
}
