// A reading in short, natural English (common practice of catalogues, not a standard):
// "about 1650", "perhaps 1650", "the 1650s", "the 17th century", "between 1640 and 1660".
// Centuries follow common usage: 16XX (1600–1699) is "the 17th century".

import { MONTH_NAMES } from "./days";
import { SEASONS } from "./seasons";
import type { DatingPoint, DatingShape, IntervalEnd, SetRange } from "./types";

/** 1 → "1st", 2 → "2nd", 3 → "3rd", 11–13 → "11th"–"13th", 21 → "21st". */
export function ordinal(n: number): string {
  const lastTwo = Math.abs(n) % 100;
  if (lastTwo >= 11 && lastTwo <= 13) return `${n}th`;
  const suffix = ["th", "st", "nd", "rd"][Math.abs(n) % 10] ?? "th";
  return `${n}${suffix}`;
}

/** "1650–51" for a season that runs into the next year, "1699–1700" across a century. */
function yearRun(year: number): string {
  const next = year + 1;
  const short = Math.floor(year / 100) === Math.floor(next / 100);
  return `${year}–${short ? String(next).slice(-2) : next}`;
}

function seasonWords(p: DatingPoint): string {
  const rule = SEASONS[p.season ?? 0];
  if (!rule) return String(p.year);
  if (rule.form === "part") return `the ${rule.name} of ${p.year}`;
  const crosses = rule.month + rule.months - 1 > 12;
  return `${rule.name} ${crosses ? yearRun(p.year) : p.year}`;
}

function monthName(p: DatingPoint): string {
  return MONTH_NAMES[(p.month ?? 1) - 1];
}

/** A point without its qualifiers. */
function bare(p: DatingPoint): string {
  switch (p.precision) {
    case "day":
      return `${p.day} ${monthName(p)} ${p.year}`;
    case "month":
      return `${monthName(p)} ${p.year}`;
    case "season":
      return seasonWords(p);
    case "decade":
      return `the ${p.year}s`;
    case "century":
      return `the ${ordinal(Math.floor(p.year / 100) + 1)} century`;
    default:
      return String(p.year);
  }
}

/** A point with its qualifiers: "about 1650", "perhaps 1650", "perhaps about 1650". */
export function pointInWords(p: DatingPoint): string {
  const text = bare(p);
  if (p.approximate && p.uncertain) return `perhaps about ${text}`;
  if (p.approximate) return `about ${text}`;
  if (p.uncertain) return `perhaps ${text}`;
  return text;
}

function intervalInWords(start: IntervalEnd, end: IntervalEnd): string {
  if (typeof start !== "string" && typeof end !== "string") {
    const [a, b] = [pointInWords(start), pointInWords(end)];
    return a === b ? a : `between ${a} and ${b}`;
  }
  if (typeof end !== "string") {
    return start === "open" ? `by ${pointInWords(end)}` : `by ${pointInWords(end)} (start unknown)`;
  }
  if (typeof start !== "string") {
    return end === "open" ? `${pointInWords(start)} or later` : `from ${pointInWords(start)} (end unknown)`;
  }
  return "at an unknown date";
}

function memberInWords(m: DatingPoint | SetRange): string {
  return "from" in m ? `${pointInWords(m.from)} to ${pointInWords(m.to)}` : pointInWords(m);
}

function setInWords(shape: Extract<DatingShape, { kind: "set" }>): string {
  const list = shape.members.map(memberInWords).join(", ");
  const single = shape.members.length === 1 && !("from" in shape.members[0]);
  if (shape.mode === "all") {
    const head = single ? list : `all of ${list}`;
    return head + (shape.earlier ? ", and earlier dates" : "") + (shape.later ? ", and later dates" : "");
  }
  if (single) return list + (shape.earlier ? " or earlier" : "") + (shape.later ? " or later" : "");
  return `one of ${list}` + (shape.earlier ? ", or earlier" : "") + (shape.later ? ", or later" : "");
}

/** The words for a reading's structure; readDating fills `words` with this. */
export function datingInWords(shape: DatingShape): string {
  switch (shape.kind) {
    case "point":
      return pointInWords(shape.point);
    case "interval":
      return intervalInWords(shape.start, shape.end);
    case "set":
      return setInWords(shape);
  }
}
