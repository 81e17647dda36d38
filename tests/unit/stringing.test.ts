// The stringing check. Two kinds of check, named beside each one:
// - arithmetic: a course holds one, two or three strings, each string needs its own peg (counting, no source needed);
// - common practice: the instrument facts (see the "Instruments (facts of the trade)" notes the project keeps:
//   the baroque guitar has five courses, often a single first course, nine strings on ten pegs).
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { StringingReportPanel } from "@/components/regions/stringing-report";
import {
  checkStringing,
  enumerateStringings,
  numberWords,
  type Confidence,
  type CountReading,
  type StringingInput,
  type StringingReport,
} from "@/lib/stringing";

const sure = (value: number, regionId?: number): CountReading[] => [{ value, confidence: "certain", regionId }];
const term = (key: string, confidence: Confidence = "certain", regionId?: number) => [{ key, confidence, regionId }];
const codes = (r: StringingReport) => r.findings.map((f) => `${f.level}:${f.code}`);
const finding = (r: StringingReport, code: string) => {
  const f = r.findings.find((x) => x.code === code);
  if (!f) throw new Error(`no finding ${code} in ${JSON.stringify(codes(r))}`);
  return f;
};
const shapes = (r: StringingReport) =>
  r.interpretations.map((i) => [i.courses, i.singleCourses, i.doubleCourses, i.tripleCourses, i.strings, i.unusedPegs]);

describe("what the counts fit", () => {
  it("ten pegs, nine strings, five courses: the first course single, one peg unused (arithmetic; common practice per the instrument notes)", () => {
    const r = checkStringing({ pegs: sure(10), strings: sure(9), courses: sure(5) });
    expect(r.status).toBe("fits");
    expect(shapes(r)).toEqual([[5, 1, 4, 0, 9, 1]]);
    expect(r.interpretations[0].pegsUsed).toBe(9);
    expect(r.summary).toBe(
      "Ten pegs, nine strings and five courses fit: five courses, the first single and four double (nine strings on ten pegs, one peg unused).",
    );
    expect(finding(r, "pegs-hold-strings").message).toBe("Nine strings on ten pegs: one peg unused.");
    expect(finding(r, "counts-fit").basis).toBe("arithmetic"); // only one grouping is possible at all
  });

  it("ten pegs and nine strings, courses not counted: five courses with a single first course (common practice: the usual stringing)", () => {
    const r = checkStringing({ pegs: sure(10), strings: sure(9) });
    expect(r.status).toBe("fits");
    expect(shapes(r)).toEqual([[5, 1, 4, 0, 9, 1]]);
    expect(r.summary).toContain("fit in the usual stringing: five courses, the first single and four double");
    expect(finding(r, "counts-fit").basis).toBe("common practice");
    // Arithmetic alone also allows six courses with three single ones: the check says so without listing it as usual.
    expect(r.summary).toContain("Other groupings fit the arithmetic only with more single courses.");
    expect(enumerateStringings({ ...r.settled }, []).map((i) => i.courses)).toEqual([5, 6, 7, 8, 9]);
  });

  it("ten pegs, ten strings: five double courses, every peg used (arithmetic + common practice)", () => {
    const r = checkStringing({ pegs: sure(10), strings: sure(10) });
    expect(r.status).toBe("fits");
    expect(shapes(r)).toEqual([[5, 0, 5, 0, 10, 0]]);
    expect(r.summary).toContain("five double courses (ten strings on ten pegs, every peg used)");
  });

  it("nine strings on five courses: a single first course, pegs unknown (arithmetic: 9 = 1 + 2·4)", () => {
    const r = checkStringing({ strings: sure(9), courses: sure(5) });
    expect(r.status).toBe("fits");
    expect(shapes(r)).toEqual([[5, 1, 4, 0, 9, null]]);
    expect(r.interpretations[0].words).toBe("five courses, the first single and four double (nine strings)");
  });

  it("ten pegs and five courses: the single-first reading first, then all double (arithmetic + common practice)", () => {
    const r = checkStringing({ pegs: sure(10), courses: sure(5) });
    expect(r.status).toBe("fits");
    expect(shapes(r)).toEqual([
      [5, 1, 4, 0, 9, 1],
      [5, 0, 5, 0, 10, 0],
    ]);
  });

  it("strings = s1 + 2·s2 + 3·s3 and pegs used = strings in every grouping (arithmetic)", () => {
    const all = enumerateStringings({ pegs: 14, strings: null, courses: 6, arrangement: [], instrumentType: "cittern" }, []);
    expect(all.length).toBeGreaterThan(10);
    for (const i of all) {
      expect(i.singleCourses + i.doubleCourses + i.tripleCourses).toBe(6);
      expect(i.strings).toBe(i.singleCourses + 2 * i.doubleCourses + 3 * i.tripleCourses);
      expect(i.pegsUsed).toBe(i.strings);
      expect(i.unusedPegs).toBe(14 - i.strings);
      expect(i.strings).toBeLessThanOrEqual(14);
    }
  });
});

describe("where the counts disagree", () => {
  it("more strings than pegs: each string needs a peg (arithmetic)", () => {
    const r = checkStringing({ pegs: sure(8), strings: sure(9) });
    expect(r.status).toBe("disagrees");
    expect(finding(r, "strings-exceed-pegs")).toMatchObject({
      level: "disagrees",
      basis: "arithmetic",
      message: "Nine strings need nine pegs, one for each string; only eight pegs are counted.",
    });
    expect(r.interpretations).toEqual([]);
  });

  it("more courses than strings (arithmetic)", () => {
    const r = checkStringing({ strings: sure(5), courses: sure(6) });
    expect(r.status).toBe("disagrees");
    expect(finding(r, "courses-exceed-strings").message).toBe(
      "Six courses need at least six strings, one for each course; only five are counted.",
    );
  });

  it("more pegs needed than counted, courses and pegs only (arithmetic)", () => {
    const r = checkStringing({ pegs: sure(4), courses: sure(5) });
    expect(r.status).toBe("disagrees");
    expect(finding(r, "pegs-below-courses").basis).toBe("arithmetic");
  });

  it("eight pegs for five courses: too few for the nine strings of the usual stringing (common practice), minimum stated", () => {
    const r = checkStringing({ pegs: sure(8), courses: sure(5) });
    expect(r.status).toBe("disagrees");
    const f = finding(r, "unusual-single-courses");
    expect(f.basis).toBe("common practice");
    expect(f.message).toContain("need at least nine strings, and so nine pegs; only eight pegs are counted");
    expect(f.message).toContain("Eight pegs would do only with at least two single courses.");
    // The arithmetic readings are still offered, none marked usual.
    expect(r.interpretations[0]).toMatchObject({ courses: 5, singleCourses: 2, doubleCourses: 3, strings: 8, usual: false });
  });

  it("more than two strings a course on a double-strung instrument does not fit single or double stringing (arithmetic)", () => {
    const r = checkStringing({ strings: sure(12), courses: sure(5) });
    expect(r.status).toBe("disagrees");
    const f = finding(r, "strings-exceed-courses");
    expect(f.message).toContain("does not fit the usual single or double stringing; five courses hold at most ten strings");
    expect(r.interpretations).toEqual([]);
  });

  it("the same counts fit a cittern, whose courses may be triple (common practice)", () => {
    const r = checkStringing({ strings: sure(12), courses: sure(4), instrumentType: term("cittern") });
    expect(r.status).toBe("fits");
    expect(shapes(r)).toEqual([[4, 0, 0, 4, 12, null]]);
    expect(finding(r, "usual-for-instrument").basis).toBe("common practice");
    // More than three a course is too many even there (arithmetic).
    expect(checkStringing({ strings: sure(13), courses: sure(4), instrumentType: term("cittern") }).status).toBe("disagrees");
  });

  it.each([
    [{ strings: sure(9), courses: sure(5), arrangement: term("all_double") }, "arrangement-all_double", "five double courses take ten strings; nine are counted"],
    [{ strings: sure(9), arrangement: term("all_double") }, "arrangement-all_double", "double courses need an even number of strings"],
    [{ strings: sure(10), courses: sure(5), arrangement: term("single_first") }, "arrangement-single_first", "five courses with the first single take nine strings; ten are counted"],
    [{ pegs: sure(8), courses: sure(5), arrangement: term("all_double") }, "arrangement-all_double", "take ten strings, and so as many pegs; eight pegs are counted"],
    [{ strings: sure(5), courses: sure(5), arrangement: term("bourdons") }, "arrangement-bourdons", "needs courses of two or more strings"],
  ] as [StringingInput, string, string][])("an arrangement term the counts cannot hold: %j (arithmetic)", (input, code, words) => {
    const r = checkStringing(input);
    expect(r.status).toBe("disagrees");
    expect(finding(r, code).message).toContain(words);
  });
});

describe("readings that differ between regions", () => {
  it("ten pegs (certain) against eleven (possible): the certain one is checked, the other would also fit (arithmetic)", () => {
    const r = checkStringing({
      pegs: [{ value: 11, confidence: "possible", regionId: 7 }, { value: 10, confidence: "certain", regionId: 3 }],
      strings: sure(9),
      courses: sure(5),
    });
    expect(r.status).toBe("disagrees");
    expect(r.settled.pegs).toBe(10);
    expect(finding(r, "readings-differ-pegs").message).toBe(
      "Regions differ on the peg count: ten (certain, region 3) and eleven (possible, region 7). " +
        "The check uses ten, the most confident reading. Eleven pegs would also fit the other counts.",
    );
    expect(shapes(r)).toEqual([[5, 1, 4, 0, 9, 1]]);
  });

  it("equally confident readings are left aside, and each is tried against the other counts (arithmetic)", () => {
    const r = checkStringing({
      pegs: [{ value: 8, confidence: "probable", regionId: 3 }, { value: 10, confidence: "probable", regionId: 7 }],
      strings: sure(9),
    });
    expect(r.settled.pegs).toBeNull();
    const f = finding(r, "readings-differ-pegs").message;
    expect(f).toContain("equally confident, so the check leaves the peg count aside");
    expect(f).toContain("Eight pegs would not fit the other counts; ten pegs would fit the other counts.");
  });

  it("with equal confidence, the reading more regions give is used", () => {
    const r = checkStringing({
      courses: [{ value: 6, confidence: "probable", regionId: 1 }, { value: 5, confidence: "probable", regionId: 2 }, { value: 5, confidence: "possible", regionId: 4 }],
    });
    expect(r.settled.courses).toBe(5);
    expect(finding(r, "readings-differ-courses").message).toContain("the reading most regions give");
  });

  it("instrument types and first-course terms that differ are weighed the same way", () => {
    const r = checkStringing({
      courses: sure(5),
      instrumentType: [...term("lute", "possible", 2), ...term("five_course_guitar", "certain", 1)],
      arrangement: [...term("all_double", "possible", 1), ...term("single_first", "probable", 2), ...term("bourdons")],
    });
    expect(r.settled).toMatchObject({ instrumentType: "five_course_guitar", arrangement: ["bourdons", "single_first"] });
    expect(codes(r)).toContain("disagrees:readings-differ-instrument");
    expect(finding(r, "readings-differ-arrangement").message).toContain("cannot both hold");
  });

  it("the same value from two regions is no disagreement", () => {
    const r = checkStringing({ pegs: [...sure(10, 1), { value: 10, confidence: "possible", regionId: 2 }], strings: sure(9) });
    expect(r.status).toBe("fits");
    expect(codes(r).some((c) => c.startsWith("disagrees"))).toBe(false);
  });
});

describe("missing counts", () => {
  it("nothing recorded", () => {
    expect(checkStringing({})).toMatchObject({ status: "empty", findings: [], interpretations: [] });
  });

  it("an instrument type alone has nothing to check against", () => {
    expect(checkStringing({ instrumentType: term("lute") }).status).toBe("incomplete");
  });

  it("ten pegs alone: bounds only (arithmetic)", () => {
    const r = checkStringing({ pegs: sure(10) });
    expect(r.status).toBe("incomplete");
    expect(r.summary).toBe(
      "Ten pegs hold at most ten strings: at most five double courses, at most five courses with the first single (nine strings) " +
        "or at most ten courses if every course were single.",
    );
    expect(r.interpretations).toEqual([]);
  });

  it("eleven pegs alone allow six courses with the first single (arithmetic: 1 + 2·5 = 11)", () => {
    expect(checkStringing({ pegs: sure(11) }).summary).toContain("at most six courses with the first single (eleven strings)");
  });

  it("nine strings alone: at least nine pegs, five to nine courses; usually five with the first single (arithmetic + common practice)", () => {
    const r = checkStringing({ strings: sure(9) });
    expect(r.status).toBe("incomplete");
    expect(finding(r, "range-strings").message).toContain("need at least nine pegs");
    expect(finding(r, "range-strings").message).toContain("between five courses");
    expect(shapes(r)).toEqual([[5, 1, 4, 0, 9, null]]);
  });

  it("five courses alone: nine or ten strings in the usual stringing (common practice)", () => {
    const r = checkStringing({ courses: sure(5) });
    expect(r.status).toBe("incomplete");
    expect(r.interpretations.map((i) => i.strings)).toEqual([9, 10]);
    expect(finding(r, "readings").basis).toBe("common practice");
  });

  it("a count that is not a whole number from 1 to 99 is left aside", () => {
    const r = checkStringing({ pegs: sure(0), strings: sure(9), courses: sure(5) });
    expect(r.settled.pegs).toBeNull();
    expect(codes(r)).toContain("note:left-aside-pegs");
    expect(r.status).toBe("fits");
  });
});

describe("instrument types — common practice, gentle notes only", () => {
  it("a five-course guitar with five courses and nine strings matches common practice", () => {
    const r = checkStringing({ pegs: sure(10), strings: sure(9), courses: sure(5), instrumentType: term("five_course_guitar") });
    expect(r.status).toBe("fits");
    expect(finding(r, "usual-for-instrument").message).toBe(
      "The counts match common practice: a five-course guitar commonly has five courses, with nine or ten strings.",
    );
  });

  it("six courses on a five-course guitar: a note, not a disagreement", () => {
    const r = checkStringing({ strings: sure(11), courses: sure(6), instrumentType: term("five_course_guitar") });
    expect(r.status).toBe("fits");
    const notes = r.findings.filter((f) => f.code === "unusual-for-instrument");
    expect(notes.map((f) => [f.level, f.basis])).toEqual([["note", "common practice"], ["note", "common practice"]]);
    expect(notes[0].message).toContain("six courses are counted");
  });

  it.each([
    ["four_course_guitar", 4, false],
    ["four_course_guitar", 5, true],
    ["vihuela", 6, false],
    ["six_course_guitar", 5, true],
    ["lute", 6, false], // renaissance lute
    ["lute", 13, false], // baroque lute
    ["lute", 4, true],
    ["theorbo", 14, false],
    ["theorbo", 12, true],
    ["cittern", 4, false],
    ["cittern", 6, true],
  ] as const)("%s with %i courses: note %s", (key, courses, noted) => {
    const r = checkStringing({ courses: sure(courses), instrumentType: term(key) });
    expect(codes(r).includes("note:unusual-for-instrument")).toBe(noted);
    expect(r.status).not.toBe("disagrees");
  });

  it("on a lute, several single courses are not flagged (common practice)", () => {
    const guitar = checkStringing({ pegs: sure(8), courses: sure(5), instrumentType: term("five_course_guitar") });
    const lute = checkStringing({ strings: sure(16), courses: sure(10), instrumentType: term("lute") });
    expect(guitar.status).toBe("disagrees");
    expect(lute.status).toBe("fits");
    expect(lute.interpretations[0]).toMatchObject({ singleCourses: 4, doubleCourses: 6 });
  });
});

describe("words are deterministic", () => {
  const input: StringingInput = {
    pegs: [{ value: 11, confidence: "possible", regionId: 9 }, { value: 10, confidence: "certain", regionId: 2 }, { value: 10, confidence: "probable", regionId: 5 }],
    strings: sure(9, 2),
    courses: sure(5, 5),
    arrangement: [...term("bourdons", "probable", 5), ...term("single_first", "certain", 2)],
    instrumentType: term("five_course_guitar", "probable", 2),
  };

  it("the same input gives the same report, whatever the order of the readings", () => {
    const a = checkStringing(input);
    const reversed = Object.fromEntries(Object.entries(input).map(([k, v]) => [k, [...v].reverse()])) as StringingInput;
    expect(checkStringing(input)).toEqual(a);
    expect(checkStringing(reversed)).toEqual(a);
    expect(a.findings.find((f) => f.code === "readings-differ-pegs")?.message).toBe(
      "Regions differ on the peg count: ten (certain, region 2; probable, region 5) and eleven (possible, region 9). " +
        "The check uses ten, the most confident reading. Eleven pegs would also fit the other counts.",
    );
  });

  it("numbers in words", () => {
    expect([0, 1, 9, 14, 20, 27, 99, 100].map(numberWords)).toEqual(
      ["zero", "one", "nine", "fourteen", "twenty", "twenty-seven", "ninety-nine", "100"],
    );
  });

  it("the module is pure: imports nothing (usable in client components)", () => {
    const source = readFileSync(fileURLToPath(new URL("../../lib/stringing/check.ts", import.meta.url)), "utf8");
    expect(source).not.toMatch(/\bimport\s/);
  });
});

describe("the report panel", () => {
  it("shows the verdict, the findings with their basis, and the groupings", () => {
    const report = checkStringing({ pegs: sure(10), courses: sure(5), instrumentType: term("five_course_guitar") });
    const html = renderToStaticMarkup(createElement(StringingReportPanel, { report }));
    expect(html).toContain("Consistent");
    expect(html).toContain(report.summary);
    expect(html).toContain("(common practice)");
    expect(html).toContain("<li>five double courses (ten strings on ten pegs, every peg used)</li>");
    const against = renderToStaticMarkup(createElement(StringingReportPanel, { report: checkStringing({ pegs: sure(8), strings: sure(9) }) }));
    expect(against).toContain('role="alert"');
  });
});
