// Human messages for refused datings. The parser's own errors name grammar rules, which mean
// nothing to a cataloguer, so the common mistakes are recognised here before parsing.

import { MONTH_NAMES, daysInMonth } from "./days";

/** A refusal meant for the person typing; readDating turns it into `{ ok: false, error }`. */
export class DatingError extends Error {
  override name = "DatingError";
}

export const EXAMPLES = "Examples: 1650, 1650~, 1650-06, 165X, 1640/1660, [1667,1670].";
export const BEYOND_9999 = "Years beyond 9999 are not supported here.";
export const BEFORE_1 =
  "Years before 1 CE are not supported here: Cordarium holds artworks made after year 0.";

/** Why a two-digit month (or season code) is impossible, or null if it is fine. */
export function monthProblem(month: number, hasDay: boolean): string | null {
  if (month === 0 || (month > 12 && month < 21)) return `there is no month ${pad2(month)}.`;
  if (month > 41) return `there is no month or season ${month}.`;
  if (month >= 21 && hasDay) return `${month} is a season code, and a season has no days.`;
  return null;
}

/** Why a day of a month is impossible, or null if it is fine (month 1-based). */
export function dayProblem(year: number, month: number, day: number): string | null {
  if (day === 0 || day > 31) return `there is no day ${pad2(day)}.`;
  const max = daysInMonth(year, month);
  if (day <= max) return null;
  if (month === 2 && day === 29) return `${year} is not a leap year, so February has 28 days.`;
  if (month === 2) return `February ${year} has only ${max} days.`;
  return `${MONTH_NAMES[month - 1]} has only ${max} days.`;
}

export function invalidDate(token: string, why: string): string {
  return `‘${token}’ is not a valid EDTF date: ${why}`;
}

/**
 * Checks made before parsing, on the normalised text; returns a message or null.
 * Each date-like token between separators is checked for impossible months and days.
 */
export function precheck(text: string): string | null {
  if (/\s/.test(text)) {
    return `‘${text}’ contains a space inside a date; EDTF dates have none (1650-06, not 1650 06).`;
  }
  if (/T\d|\d:\d/.test(text)) return "Times of day are not supported here; give a day, month or year.";
  if (/(^|[/,[{.])-\d|Y-/.test(text)) return BEFORE_1;
  if (/Y|\d{5,}/.test(text)) return BEYOND_9999;

  for (const token of text.split(/\.\.|[/,[\]{}]/)) {
    const plain = token.replace(/[~?%]/g, "");
    const m = /^(\d{4})-(\d{2})(?:-(\d{2}))?$/.exec(plain);
    if (!m) continue;
    const [year, month] = [Number(m[1]), Number(m[2])];
    const why =
      monthProblem(month, m[3] !== undefined) ??
      (m[3] !== undefined ? dayProblem(year, month, Number(m[3])) : null);
    if (why) return invalidDate(plain, why);
  }
  return null;
}

/** Turns a parser exception into a message that says where the problem is. */
export function syntaxMessage(text: string, error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  const col = /col (\d+)/.exec(message);
  if (col) {
    const at = Number(col[1]);
    const char = text[at - 1];
    const where = char ? `unexpected ‘${char}’ at character ${at}` : `it ends too early`;
    return `‘${text}’ is not a valid EDTF date (${where}). ${EXAMPLES}`;
  }
  return `‘${text}’ is not a valid EDTF date: it stops short or combines parts EDTF does not allow. ${EXAMPLES}`;
}

function pad2(n: number): string {
  return String(n).padStart(2, "0");
}
