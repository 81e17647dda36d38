// The stringing check: pegs, strings and courses of a depicted instrument checked against each other.
// Pure TypeScript, no I/O: the region form may run it in the browser as well as on the server.
// Arithmetic: a course holds one, two or three strings and each string needs its own peg. What counts
// as "usual" (every course double, or only the first single) and what each instrument commonly has are
// common practice; every finding says which of the two it rests on. docs/stringing.md has the rules.

export type Confidence = "certain" | "probable" | "possible";
export type CountReading = { value: number; confidence: Confidence; regionId?: number };
export type TermReading = { key: string; confidence: Confidence; regionId?: number };
export type StringingInput = {
  pegs?: CountReading[];
  strings?: CountReading[];
  courses?: CountReading[];
  arrangement?: TermReading[];
  instrumentType?: TermReading[];
};
export type FindingLevel = "fits" | "note" | "disagrees";
export type FindingBasis = "arithmetic" | "common practice";
export type StringingFinding = { level: FindingLevel; code: string; message: string; basis: FindingBasis };
export type Interpretation = {
  courses: number;
  singleCourses: number;
  doubleCourses: number;
  tripleCourses: number;
  strings: number;
  pegsUsed: number; // one peg per string
  pegs: number | null;
  unusedPegs: number | null;
  usual: boolean;
  words: string;
};
export type StringingStatus = "fits" | "disagrees" | "incomplete" | "empty";
export type SettledStringing = {
  pegs: number | null;
  strings: number | null;
  courses: number | null;
  arrangement: string[]; // sorted keys the check applies
  instrumentType: string | null;
};
export type StringingReport = {
  status: StringingStatus;
  summary: string;
  findings: StringingFinding[];
  interpretations: Interpretation[];
  settled: SettledStringing;
};

export const ARRANGEMENTS: Record<string, string> = {
  all_double: "all courses double",
  single_first: "single first course",
  octave_lower: "octave strings on lower courses",
  bourdons: "bourdons",
};

// Common practice, kept modest: what is usual, not what is possible.
export type InstrumentPractice = {
  label: string;
  courses: [number, number];
  strings?: [number, number];
  triple?: boolean; // courses of three strings are part of its usual stringing
  manySingle?: boolean; // more than one single course is common, so not flagged
  said: string;
};
export const INSTRUMENT_PRACTICE: Record<string, InstrumentPractice> = {
  five_course_guitar: {
    label: "five-course guitar",
    courses: [5, 5],
    strings: [9, 10],
    said: "a five-course guitar commonly has five courses, with nine or ten strings",
  },
  four_course_guitar: {
    label: "four-course guitar",
    courses: [4, 4],
    strings: [7, 8],
    said: "a four-course guitar commonly has four courses, with seven or eight strings",
  },
  six_course_guitar: { label: "six-course guitar", courses: [6, 6], said: "a six-course guitar has six courses" },
  vihuela: { label: "vihuela", courses: [6, 6], said: "a vihuela usually has six courses" },
  lute: {
    label: "lute",
    courses: [6, 13],
    manySingle: true,
    said: "lutes commonly have six to ten or more courses in the renaissance and eleven to thirteen in the baroque",
  },
  theorbo: {
    label: "theorbo",
    courses: [14, 14],
    manySingle: true,
    said: "fourteen courses are common on a theorbo, though not the only number",
  },
  cittern: {
    label: "cittern",
    courses: [4, 4],
    triple: true,
    said: "a cittern commonly has four courses, often some of them triple",
  },
  other: { label: "other instrument", courses: [1, 99], said: "" },
};

const RANK: Record<Confidence, number> = { certain: 0, probable: 1, possible: 2 };
const MAX_COUNT = 99;
const SMALL = [
  ..."zero one two three four five six seven eight nine".split(" "),
  ..."ten eleven twelve thirteen fourteen fifteen sixteen seventeen eighteen nineteen".split(" "),
];
const TENS = ["", "", "twenty", "thirty", "forty", "fifty", "sixty", "seventy", "eighty", "ninety"];

/** A whole number in words up to 99, digits beyond. */
export function numberWords(x: number): string {
  if (!Number.isInteger(x) || x < 0 || x > 99) return String(x);
  if (x < 20) return SMALL[x];
  return TENS[Math.floor(x / 10)] + (x % 10 ? `-${SMALL[x % 10]}` : "");
}
const n = (x: number, noun: string) => `${numberWords(x)} ${noun}${x === 1 ? "" : "s"}`;
const cap = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const list = (parts: string[], last = "and") =>
  parts.length <= 1 ? (parts[0] ?? "") : `${parts.slice(0, -1).join(", ")} ${last} ${parts[parts.length - 1]}`;

type Count = "pegs" | "strings" | "courses";
const NOUN: Record<Count, string> = { pegs: "peg", strings: "string", courses: "course" };

/** The given counts, in words: "ten pegs, nine strings and five courses". */
function givenWords(s: SettledStringing): string {
  const parts = (["pegs", "strings", "courses"] as Count[]).filter((k) => s[k] !== null).map((k) => n(s[k]!, NOUN[k]));
  return list(parts);
}

type Group<T> = { value: T; readings: { confidence: Confidence; regionId?: number }[]; best: number };

// Readings grouped by value, strongest first: best confidence, then most readings, then value.
function groups<T extends string | number>(
  readings: { value: T; confidence: Confidence; regionId?: number }[],
): Group<T>[] {
  const byValue = new Map<T, Group<T>>();
  for (const r of readings) {
    const g = byValue.get(r.value) ?? { value: r.value, readings: [], best: 9 };
    g.readings.push({ confidence: r.confidence, regionId: r.regionId });
    g.best = Math.min(g.best, RANK[r.confidence]);
    byValue.set(r.value, g);
  }
  const all = [...byValue.values()];
  for (const g of all)
    g.readings.sort((a, b) => RANK[a.confidence] - RANK[b.confidence] || (a.regionId ?? 0) - (b.regionId ?? 0));
  const byOrder = (a: T, b: T) => (a < b ? -1 : a > b ? 1 : 0);
  return all.sort((a, b) => a.best - b.best || b.readings.length - a.readings.length || byOrder(a.value, b.value));
}
const tied = (a: Group<unknown>, b?: Group<unknown>) =>
  !!b && a.best === b.best && a.readings.length === b.readings.length;

function readingWords(g: Group<string | number>, label: (v: string | number) => string): string {
  const each = g.readings.map((r) => (r.regionId === undefined ? r.confidence : `${r.confidence}, region ${r.regionId}`));
  return `${label(g.value)} (${each.join("; ")})`;
}

type Setup = { triple: boolean; manySingle: boolean; practice: InstrumentPractice | null };
function setupOf(s: SettledStringing): Setup {
  const practice = s.instrumentType ? (INSTRUMENT_PRACTICE[s.instrumentType] ?? null) : null;
  return { triple: !!practice?.triple, manySingle: !!practice?.manySingle, practice };
}

function isUsual(i: { singleCourses: number; tripleCourses: number }, set: Setup): boolean {
  return (set.triple || i.tripleCourses === 0) && (set.manySingle || i.singleCourses <= 1);
}

function meetsTerm(key: string, i: { singleCourses: number; doubleCourses: number; tripleCourses: number }): boolean {
  if (key === "all_double") return i.singleCourses === 0 && i.tripleCourses === 0;
  if (key === "single_first") return i.singleCourses === 1;
  return i.doubleCourses + i.tripleCourses > 0; // octave strings and bourdons sit in courses of two or more
}

/** Every grouping of courses consistent with the given counts (one peg per string, pegs ≥ strings). */
export function enumerateStringings(s: SettledStringing, terms: string[] = s.arrangement): Interpretation[] {
  const set = setupOf(s);
  const out: Interpretation[] = [];
  const most = s.courses ?? s.strings ?? s.pegs ?? 0;
  for (let c = s.courses ?? 1; c <= most; c++) {
    for (let t = 0; t <= (set.triple ? c : 0); t++) {
      for (let d = 0; d <= c - t; d++) {
        const single = c - t - d;
        const strings = single + 2 * d + 3 * t;
        if (s.strings !== null && strings !== s.strings) continue;
        if (s.pegs !== null && strings > s.pegs) continue;
        const shape = { singleCourses: single, doubleCourses: d, tripleCourses: t };
        if (!terms.every((k) => meetsTerm(k, shape))) continue;
        const unusedPegs = s.pegs === null ? null : s.pegs - strings;
        const usual = isUsual(shape, set);
        const base = { courses: c, ...shape, strings, pegsUsed: strings, pegs: s.pegs, unusedPegs, usual };
        out.push({ ...base, words: interpretationWords(base) });
      }
    }
  }
  // The usual groupings first: the first course single, then all double; then fewer single and triple courses.
  const singles = (k: number) => (k === 1 ? 0 : k === 0 ? 1 : 1 + k);
  const order = (i: Interpretation) => [i.usual ? 0 : 1, singles(i.singleCourses), i.tripleCourses, i.courses];
  return out.sort((a, b) => {
    const x = order(a), y = order(b);
    return x[0] - y[0] || x[1] - y[1] || x[2] - y[2] || x[3] - y[3];
  });
}

/** "five courses, the first single and four double (nine strings on ten pegs, one peg unused)" */
export function interpretationWords(i: Omit<Interpretation, "words">): string {
  const { courses: c, singleCourses: s, doubleCourses: d, tripleCourses: t } = i;
  let shape: string;
  if (d === c) shape = `${numberWords(c)} double course${c === 1 ? "" : "s"}`;
  else if (s === c) shape = `${numberWords(c)} single course${c === 1 ? "" : "s"}`;
  else if (t === c) shape = `${numberWords(c)} triple course${c === 1 ? "" : "s"}`;
  else {
    const parts = [
      s === 1 ? "the first single" : s > 1 ? `${numberWords(s)} single` : "",
      d ? `${numberWords(d)} double` : "",
      t ? `${numberWords(t)} triple` : "",
    ];
    shape = `${n(c, "course")}, ${list(parts.filter(Boolean))}`;
  }
  const spare = i.unusedPegs === 0 ? "every peg used" : `${n(i.unusedPegs!, "peg")} unused`;
  const pegs = i.pegs === null ? "" : ` on ${n(i.pegs, "peg")}, ${spare}`;
  return `${shape} (${n(i.strings, "string")}${pegs})`;
}

// At most three readings in a sentence; the report's list holds more.
function listed(items: Interpretation[]): string {
  const first = items.slice(0, 3).map((i) => i.words).join("; or ");
  const rest = items.length - 3;
  return rest > 0 ? `${first}; or ${numberWords(rest)} other grouping${rest === 1 ? "" : "s"}` : first;
}
const are = (x: number) => (x === 1 ? "is" : "are");

// Why a term cannot hold with the counts: the rule, then what was counted.
function termMismatch(key: string, s: SettledStringing, set: Setup): string {
  const label = `"${cap(ARRANGEMENTS[key])}" does not fit`;
  const counted =
    s.strings !== null ? `${numberWords(s.strings)} ${are(s.strings)} counted` : `${n(s.pegs ?? 0, "peg")} ${are(s.pegs ?? 0)} counted`;
  if (key === "octave_lower" || key === "bourdons")
    return `${label}: the term needs courses of two or more strings, and ${givenWords(s)} leave every course single.`;
  if (s.courses !== null) {
    const options = enumerateStringings({ ...s, strings: null, pegs: null }, [key]).map((i) => i.strings);
    const lo = Math.min(...options), hi = Math.max(...options);
    const take = lo === hi ? n(lo, "string") : `${numberWords(lo)} to ${n(hi, "string")}`;
    const pegs = s.strings === null ? `, and so as many pegs` : "";
    const shape =
      key === "all_double" ? n(s.courses, "double course") : `${n(s.courses, "course")} with the first single`;
    return `${label}: ${shape} take ${take}${pegs}; ${counted}.`;
  }
  if (key === "all_double") return `${label}: double courses need an even number of strings; ${counted}.`;
  return set.triple
    ? `${label}: no grouping of ${n(s.strings ?? s.pegs ?? 0, "string")} has exactly one single course; ${counted}.`
    : `${label}: a single first course with the rest double makes an odd number of strings; ${counted}.`;
}

type Core = { findings: StringingFinding[]; interpretations: Interpretation[] };

/** The check of one settled set of counts and terms (no readings left to weigh). */
function evaluate(s: SettledStringing): Core {
  const set = setupOf(s);
  const findings: StringingFinding[] = [];
  const say = (level: FindingLevel, basis: FindingBasis, code: string, message: string) =>
    findings.push({ level, basis, code, message });
  const { pegs: P, strings: S, courses: C } = s;
  const perCourse = set.triple ? 3 : 2;

  if (S !== null && P !== null) {
    const need = `${cap(n(S, "string"))} need ${n(S, "peg")}, one for each string; only ${n(P, "peg")} ${are(P)} counted.`;
    const spare = P === S ? "every peg carries a string" : `${n(P - S, "peg")} unused`;
    if (S > P) say("disagrees", "arithmetic", "strings-exceed-pegs", need);
    else say("fits", "arithmetic", "pegs-hold-strings", `${cap(n(S, "string"))} on ${n(P, "peg")}: ${spare}.`);
  }
  if (C !== null && S !== null && C > S)
    say("disagrees", "arithmetic", "courses-exceed-strings",
      `${cap(n(C, "course"))} need at least ${n(C, "string")}, one for each course; only ${numberWords(S)} ${are(S)} counted.`);
  if (C !== null && S !== null && S > perCourse * C) {
    const why = set.triple
      ? `would put more than three strings on some course; ` +
        `${n(C, "course")} hold at most ${n(3 * C, "string")} even if all were triple`
      : `would need courses of three strings or more, which does not fit the usual single or double stringing; ` +
        `${n(C, "course")} hold at most ${n(2 * C, "string")} (courses of three strings are found on citterns)`;
    say("disagrees", "arithmetic", "strings-exceed-courses", `${cap(n(S, "string"))} on ${n(C, "course")} ${why}.`);
  }
  if (C !== null && S === null && P !== null && P < C)
    say("disagrees", "arithmetic", "pegs-below-courses",
      `${cap(n(C, "course"))} need at least ${n(C, "string")}, one for each course, and so ${n(C, "peg")}; ` +
        `only ${numberWords(P)} ${are(P)} counted.`);
  if (findings.some((f) => f.level === "disagrees")) return { findings, interpretations: [] };

  const known = [P, S, C].filter((x) => x !== null).length;
  if (known === 0) return { findings, interpretations: [] };
  const arithmetic = enumerateStringings(s, []);
  const arranged = enumerateStringings(s);
  if (arithmetic.length && !arranged.length) {
    for (const key of s.arrangement)
      if (!enumerateStringings(s, [key]).length) say("disagrees", "arithmetic", `arrangement-${key}`, termMismatch(key, s, set));
    const terms = list(s.arrangement.map((k) => `"${ARRANGEMENTS[k]}"`));
    if (!findings.some((f) => f.level === "disagrees"))
      say("disagrees", "arithmetic", "arrangement-together", `The arrangement terms ${terms} do not fit ${givenWords(s)} together.`);
    return { findings, interpretations: [] };
  }

  const usual = arranged.filter((i) => i.usual);
  if (!usual.length && arranged.length) {
    const fewest = Math.min(...arranged.map((i) => i.singleCourses));
    const why = "the usual stringing has every course double, or only the first single";
    const message =
      C !== null && S === null && P !== null
        ? `${cap(n(C, "course"))} strung in the usual way (every course double, or only the first single) need at least ` +
          `${n(2 * C - 1, "string")}, and so ${n(2 * C - 1, "peg")}; only ${n(P, "peg")} ${are(P)} counted. ` +
          `${cap(n(P, "peg"))} would do only with at least ${numberWords(fewest)} single courses.`
        : `${cap(givenWords(s))} fit only with at least ${numberWords(fewest)} single courses; ${why}.`;
    say("disagrees", "common practice", "unusual-single-courses", message);
    return { findings, interpretations: arranged.slice(0, 6) };
  }

  const basis: FindingBasis = usual.length < arranged.length ? "common practice" : "arithmetic";
  const inUsual = basis === "common practice" ? " in the usual stringing" : "";
  if (known === 1) say("note", "arithmetic", `range-${P !== null ? "pegs" : S !== null ? "strings" : "courses"}`, rangeWords(s, set));
  if (known === 1 && P !== null) return { findings, interpretations: [] };
  const shown = usual.slice(0, 6);
  const more = basis === "common practice" ? " Other groupings fit the arithmetic only with more single courses." : "";
  const message = `${cap(givenWords(s))} fit${inUsual}: ${listed(usual)}.${known === 1 ? "" : more}`;
  say("fits", basis, known === 1 ? "readings" : "counts-fit", message);
  return { findings, interpretations: shown };
}

// What a single count implies on its own, as bounds (arithmetic only).
function rangeWords(s: SettledStringing, set: Setup): string {
  const fixed = s.arrangement.find((k) => k === "all_double" || k === "single_first");
  if (s.pegs !== null) {
    const P = s.pegs;
    const parts: string[] = [];
    if (fixed !== "single_first" && P >= 2) parts.push(`at most ${n(Math.floor(P / 2), "double course")}`);
    const withSingle = Math.floor((P + 1) / 2);
    if (fixed !== "all_double")
      parts.push(`at most ${n(withSingle, "course")} with the first single (${n(2 * withSingle - 1, "string")})`);
    if (set.triple && !fixed && P >= 3) parts.push(`at most ${n(Math.floor(P / 3), "triple course")}`);
    if (!fixed) parts.push(`at most ${n(P, "course")} if every course were single`);
    return `${cap(n(P, "peg"))} hold at most ${n(P, "string")}: ${list(parts, "or")}.`;
  }
  if (s.strings !== null) {
    const S = s.strings;
    const fewest = Math.ceil(S / (set.triple ? 3 : 2));
    const make =
      fewest === S
        ? `${S === 1 ? "makes" : "make"} ${n(S, "single course")}`
        : `make between ${numberWords(fewest)} courses (grouped in ${set.triple ? "threes" : "twos"} as far as they go) ` +
          `and ${numberWords(S)} (every course single)`;
    return `${cap(n(S, "string"))} ${S === 1 ? "needs" : "need"} at least ${n(S, "peg")}, one for each string, and ${make}.`;
  }
  const C = s.courses!;
  const top = set.triple ? `${numberWords(3 * C)} if all were triple` : `${numberWords(2 * C)} when strung single or double`;
  const take = `${cap(n(C, "course"))} ${C === 1 ? "takes" : "take"} at least ${n(C, "string")} (every course single)`;
  return `${take} and at most ${top}; each string needs its own peg.`;
}

// Which of differing readings the check uses: the most confident, then the one most regions give.
// A tie leaves them all aside rather than guess.
function weigh<T>(g: Group<T>[], aside: string, chosen: (v: T) => string): { value: T | null; outcome: string } {
  if (!g.length) return { value: null, outcome: "" };
  if (tied(g[0], g[1])) return { value: null, outcome: `They are equally confident, so the check ${aside}.` };
  const why = g[1] && g[0].best === g[1].best ? "the reading most regions give" : "the most confident reading";
  return { value: g[0].value, outcome: `The check uses ${chosen(g[0].value)}, ${why}.` };
}

type Say = (f: StringingFinding) => void;
const differ = (code: string, message: string): StringingFinding => ({ level: "disagrees", basis: "arithmetic", code, message });
const aside = (code: string, message: string): StringingFinding => ({ level: "note", basis: "arithmetic", code, message });

function settleTerms(input: StringingInput, say: Say): Pick<SettledStringing, "arrangement" | "instrumentType"> {
  const label = (v: string) => INSTRUMENT_PRACTICE[v]?.label ?? `"${v}"`;
  const types = groups((input.instrumentType ?? []).map((r) => ({ ...r, value: r.key })));
  const type = weigh(types, "leaves the instrument type aside", label);
  if (types.length > 1) {
    const readings = list(types.map((g) => readingWords(g, (v) => label(String(v)))));
    say(differ("readings-differ-instrument", `Regions differ on the instrument type: ${readings}. ${type.outcome}`));
  }
  let instrumentType = type.value;
  if (instrumentType !== null && !INSTRUMENT_PRACTICE[instrumentType]) {
    say(aside("unknown-instrument", `The instrument type "${instrumentType}" is not one the check knows; only the arithmetic is checked.`));
    instrumentType = null;
  }

  const terms = groups((input.arrangement ?? []).map((r) => ({ ...r, value: r.key })));
  const keys = new Set(terms.map((g) => g.value).filter((k) => k in ARRANGEMENTS));
  for (const g of terms.filter((g) => !(g.value in ARRANGEMENTS)))
    say(aside("unknown-arrangement", `The arrangement term "${g.value}" is not one the check knows; it is left aside.`));
  // "All courses double" and "single first course" cannot both hold: keep the stronger, or neither.
  const first = terms.filter((g) => g.value === "all_double" || g.value === "single_first");
  if (first.length === 2) {
    const pick = weigh(first, "uses neither", (v) => `"${ARRANGEMENTS[v]}"`);
    for (const g of first) if (g.value !== pick.value) keys.delete(g.value);
    const readings = list(first.map((g) => readingWords(g, (v) => `"${ARRANGEMENTS[v]}"`)));
    say(differ("readings-differ-arrangement", `Regions differ on the first course: ${readings} cannot both hold. ${pick.outcome}`));
  }
  return { arrangement: [...keys].sort(), instrumentType };
}

function settleCounts(input: StringingInput, settled: SettledStringing, say: Say): void {
  const spread: [Count, Group<number>[], string][] = [];
  for (const k of ["pegs", "strings", "courses"] as Count[]) {
    const readings = input[k] ?? [];
    const usable = readings.filter((r) => Number.isInteger(r.value) && r.value >= 1 && r.value <= MAX_COUNT);
    for (const r of readings.filter((r) => !usable.includes(r)))
      say(aside(`left-aside-${k}`,
        `A ${NOUN[k]} count of ${r.value} cannot be checked (a whole number from 1 to ${MAX_COUNT} is needed); it is left aside.`));
    const g = groups(usable);
    const pick = weigh(g, `leaves the ${NOUN[k]} count aside`, numberWords);
    settled[k] = pick.value;
    if (g.length > 1) spread.push([k, g, pick.outcome]);
  }
  // Each other reading is tried against the settled counts, to show which one the evidence favours.
  for (const [k, g, outcome] of spread) {
    const tie = settled[k] === null;
    const others = (["pegs", "strings", "courses"] as Count[]).some((o) => o !== k && settled[o] !== null);
    const trials = (tie ? g : g.slice(1)).map((alt) => {
      const fits = !evaluate({ ...settled, [k]: alt.value }).findings.some((f) => f.level === "disagrees");
      return `${n(alt.value, NOUN[k])} would ${fits ? (tie ? "" : "also ") : "not "}fit the other counts`;
    });
    const trial = others ? ` ${cap(trials.join("; "))}.` : "";
    const readings = list(g.map((x) => readingWords(x, (v) => numberWords(Number(v)))));
    say(differ(`readings-differ-${k}`, `Regions differ on the ${NOUN[k]} count: ${readings}. ${outcome}${trial}`));
  }
}

// Gentle notes against common practice for the instrument type; never a disagreement.
function instrumentNotes(s: SettledStringing, say: Say): void {
  const p = s.instrumentType ? INSTRUMENT_PRACTICE[s.instrumentType] : undefined;
  if (!p || !p.said) return;
  const notes: string[] = [];
  let checked = false;
  const against = (x: number | null, [lo, hi]: [number, number], noun: string, also = "") => {
    if (x === null) return;
    checked = true;
    if (x < lo || x > hi) notes.push(`${cap(p.said)}${also}; ${n(x, noun)} ${are(x)} counted.`);
  };
  against(s.courses, p.courses, "course");
  if (p.strings) {
    const [lo, hi] = p.strings;
    against(s.strings, p.strings, "string");
    against(s.pegs, p.strings, "peg", `, and so about ${lo === hi ? n(lo, "peg") : `${numberWords(lo)} to ${n(hi, "peg")}`}`);
  }
  for (const message of notes) say({ level: "note", basis: "common practice", code: "unusual-for-instrument", message });
  const message = `The counts match common practice: ${p.said}.`;
  if (checked && !notes.length) say({ level: "fits", basis: "common practice", code: "usual-for-instrument", message });
}

function summarise(input: StringingInput, s: SettledStringing, findings: StringingFinding[]): [StringingStatus, string] {
  const given = [input.pegs, input.strings, input.courses, input.arrangement, input.instrumentType].some((r) => r?.length);
  if (!given) return ["empty", "No pegs, strings or courses have been counted yet."];
  const against = findings.find((f) => f.level === "disagrees");
  if (against) {
    const who = against.code.startsWith("readings-differ") ? "The regions disagree." : "The counts disagree.";
    return ["disagrees", `${who} ${against.message}`];
  }
  const known = [s.pegs, s.strings, s.courses].filter((x) => x !== null).length;
  const fit = findings.find((f) => f.code === "counts-fit");
  if (known >= 2 && fit) return ["fits", fit.message];
  const said = findings.find((f) => f.code === "readings") ?? findings.find((f) => f.code.startsWith("range-"));
  const nothing = "No pegs, strings or courses have been counted yet, so there is nothing to check against each other.";
  return ["incomplete", said?.message ?? nothing];
}

/** Checks the pegs, strings and courses recorded on a source's regions against each other. Deterministic. */
export function checkStringing(input: StringingInput): StringingReport {
  const findings: StringingFinding[] = [];
  const say: Say = (f) => findings.push(f);
  const settled: SettledStringing = { pegs: null, strings: null, courses: null, ...settleTerms(input, say) };
  settleCounts(input, settled, say);
  const core = evaluate(settled);
  findings.push(...core.findings);
  instrumentNotes(settled, say);
  const [status, summary] = summarise(input, settled, findings);
  return { status, summary, findings, interpretations: core.interpretations, settled };
}
