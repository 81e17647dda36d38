// readDating: strict bounds, flags, refusals. Sources are named beside each check;
// LoC EDTF = Library of Congress, Extended Date/Time Format (EDTF) Specification, 2019.
import { describe, expect, it } from "vitest";
import { readDating, type DatingReading } from "@/lib/dating";

function read(input: string, options?: Parameters<typeof readDating>[1]): DatingReading {
  const r = readDating(input, options);
  if (!r.ok) throw new Error(`expected ${input} to be read, got: ${r.error}`);
  return r;
}

function refusal(input: string): string {
  const r = readDating(input);
  if (r.ok) throw new Error(`expected ${input} to be refused`);
  return r.error;
}

describe("strict bounds — LoC EDTF 2019 (every row of the CHECKS.md table)", () => {
  it.each([
    ["1650", "1650-01-01", "1650-12-31"], // LoC EDTF 2019, level 0 year
    ["1640/1660", "1640-01-01", "1660-12-31"], // LoC EDTF 2019, level 0 interval
    ["1650~", "1650-01-01", "1650-12-31"], // LoC EDTF 2019, level 1 qualifiers
    ["1650?", "1650-01-01", "1650-12-31"],
    ["1650%", "1650-01-01", "1650-12-31"],
    ["165X", "1650-01-01", "1659-12-31"], // LoC EDTF 2019, level 1 unspecified digit
    ["16XX", "1600-01-01", "1699-12-31"],
    ["1650-06", "1650-06-01", "1650-06-30"], // LoC EDTF 2019, level 0 month
    ["[1667,1668,1670..1672]", "1667-01-01", "1672-12-31"], // LoC EDTF 2019, level 2 set "one of"
    ["../1700", null, "1700-12-31"], // LoC EDTF 2019, level 1 open start
    ["1700/..", "1700-01-01", null], // LoC EDTF 2019, level 1 open end
  ])("%s → %s … %s", (input, earliest, latest) => {
    const r = read(input);
    expect([r.earliest, r.latest]).toEqual([earliest, latest]);
  });

  it("sets the flags for ~, ? and % (LoC EDTF 2019, level 1 qualification)", () => {
    expect(read("1650~")).toMatchObject({ approximate: true, uncertain: false });
    expect(read("1650?")).toMatchObject({ approximate: false, uncertain: true });
    expect(read("1650%")).toMatchObject({ approximate: true, uncertain: true });
    expect(read("1650")).toMatchObject({ approximate: false, uncertain: false });
  });
});

describe("precision and kinds", () => {
  it("reads day, month, year, decade and century precision (LoC EDTF 2019)", () => {
    expect(read("1650-06-15")).toMatchObject({ precision: "day", earliest: "1650-06-15", latest: "1650-06-15" });
    expect(read("1650-06").precision).toBe("month");
    expect(read("1650").precision).toBe("year");
    expect(read("165X").precision).toBe("decade");
    expect(read("16XX").precision).toBe("century");
    expect(read("1640/1660").precision).toBe("interval");
    expect(read("[1667,1670]").precision).toBe("set");
  });

  it("knows month lengths and leap years (ISO 8601-2:2019, proleptic Gregorian)", () => {
    expect(read("1650-02").latest).toBe("1650-02-28");
    expect(read("1648-02").latest).toBe("1648-02-29");
    expect(read("2000-02-29").earliest).toBe("2000-02-29");
    expect(read("1650-04").latest).toBe("1650-04-30");
  });

  it("reads ISO 8601-2:2019 decades and centuries written short", () => {
    expect(read("165")).toMatchObject({ precision: "decade", earliest: "1650-01-01", latest: "1659-12-31" });
    expect(read("16")).toMatchObject({ precision: "century", earliest: "1600-01-01", latest: "1699-12-31" });
  });

  it("treats a whole unspecified month or day as the coarser unit (LoC EDTF 2019, level 1)", () => {
    expect(read("1650-XX")).toMatchObject({ precision: "year", earliest: "1650-01-01", latest: "1650-12-31" });
    expect(read("1650-06-XX")).toMatchObject({ precision: "month", latest: "1650-06-30" });
    expect(read("16XX-XX").precision).toBe("century");
  });
});

describe("sets and lists — LoC EDTF 2019, level 2", () => {
  it("computes set bounds from the members (the package ends this one at 1670)", () => {
    expect(read("[1667,1668,1670..1672]").latest).toBe("1672-12-31");
    expect(read("[1667,1668,1670..1672,1675]").latest).toBe("1675-12-31");
  });

  it("does not depend on member order (the package does not sort)", () => {
    const r = read("[1672,1667]");
    expect([r.earliest, r.latest]).toEqual(["1667-01-01", "1672-12-31"]);
  });

  it("bounds {…} (all of) the same way", () => {
    const r = read("{1667,1670}");
    expect([r.earliest, r.latest, r.precision]).toEqual(["1667-01-01", "1670-12-31", "set"]);
  });

  it("leaves a set open where it says 'or earlier' / 'or later'", () => {
    expect(read("[..1700]")).toMatchObject({ earliest: null, latest: "1700-12-31" });
    expect(read("[1700..]")).toMatchObject({ earliest: "1700-01-01", latest: null });
  });

  it("mixes precisions inside a set", () => {
    expect(read("[1650-06..1650-08]")).toMatchObject({ earliest: "1650-06-01", latest: "1650-08-31" });
  });
});

describe("intervals", () => {
  it("keeps open and unknown ends null (LoC EDTF 2019, level 1)", () => {
    expect(read("1700/")).toMatchObject({ earliest: "1700-01-01", latest: null, widenedLatest: null });
    expect(read("/1700")).toMatchObject({ earliest: null, latest: "1700-12-31", widenedEarliest: null });
  });

  it("reads a qualifier on one end only (LoC EDTF 2019, level 1 qualified interval)", () => {
    const r = read("1640~/1660");
    expect(r).toMatchObject({ approximate: true, uncertain: false, earliest: "1640-01-01", latest: "1660-12-31" });
  });

  it("reads season intervals", () => {
    expect(read("1650-21/1651-22")).toMatchObject({ earliest: "1650-03-01", latest: "1651-08-31" });
  });
});

describe("level 2 qualifiers on parts (LoC EDTF 2019, level 2)", () => {
  it.each(["?1650", "~1650-06", "1650?-06-15", "2004-06-~11", "%1650-06"])("reads %s", (input) => {
    const r = read(input);
    expect(r.approximate || r.uncertain).toBe(true);
  });

  it("reads a leading % as both flags", () => {
    expect(read("%1650-06")).toMatchObject({ approximate: true, uncertain: true, precision: "month" });
  });
});

describe("seasons — Cordarium's own rule (meteorological, northern hemisphere)", () => {
  it.each([
    ["1650-21", "1650-03-01", "1650-05-31"], // spring
    ["1650-22", "1650-06-01", "1650-08-31"], // summer
    ["1650-23", "1650-09-01", "1650-11-30"], // autumn
    ["1650-24", "1650-12-01", "1651-02-28"], // winter runs into the next year
    ["1651-24", "1651-12-01", "1652-02-29"], // 1652 is a leap year
    ["1650-25", "1650-03-01", "1650-05-31"], // level 2, northern spring = 21
    ["1650-29", "1650-09-01", "1650-11-30"], // southern spring
    ["1650-33", "1650-01-01", "1650-03-31"], // first quarter (calendar)
    ["1650-38", "1650-05-01", "1650-08-31"], // second quadrimester
    ["1650-41", "1650-07-01", "1650-12-31"], // second semestral
  ])("%s → %s … %s", (input, earliest, latest) => {
    const r = read(input);
    expect([r.earliest, r.latest, r.precision]).toEqual([earliest, latest, "season"]);
  });
});

describe("refusals with human messages", () => {
  it("names an impossible month or day", () => {
    expect(refusal("1650-13")).toBe("‘1650-13’ is not a valid EDTF date: there is no month 13.");
    expect(refusal("1650-00")).toContain("there is no month 00");
    expect(refusal("1650-02-30")).toBe("‘1650-02-30’ is not a valid EDTF date: February 1650 has only 28 days.");
    expect(refusal("1650-02-29")).toContain("1650 is not a leap year");
    expect(refusal("1900-02-29")).toContain("1900 is not a leap year"); // the package rolls this to 1 March
    expect(refusal("1650-04-31")).toContain("April has only 30 days");
    expect(refusal("1650-06-32")).toContain("there is no day 32");
    expect(refusal("1650-21-05")).toContain("a season has no days");
    expect(refusal("1640/1650-13")).toContain("‘1650-13’");
  });

  it("refuses gibberish and empty input", () => {
    expect(refusal("abc")).toMatch(/^‘abc’ is not a valid EDTF date \(unexpected ‘a’ at character 1\)/);
    expect(refusal("")).toMatch(/^Enter a date/);
    expect(refusal("   ")).toMatch(/^Enter a date/);
    expect(refusal("16 50")).toContain("contains a space");
  });

  it("refuses years beyond 9999 and before 1 CE", () => {
    expect(refusal("Y170000002")).toBe("Years beyond 9999 are not supported here.");
    expect(refusal("Y17000")).toBe("Years beyond 9999 are not supported here.");
    expect(refusal("12000")).toBe("Years beyond 9999 are not supported here."); // the package reads 5+ digits as Unix ms
    expect(refusal("9999-24")).toBe("Years beyond 9999 are not supported here."); // winter runs into 10000
    expect(refusal("-1650")).toMatch(/^Years before 1 CE/);
    expect(refusal("0000")).toMatch(/^Years before 1 CE/);
  });

  it("refuses a reversed interval or range", () => {
    expect(refusal("1650/1640")).toBe("‘1650/1640’ is not a valid interval: it ends (1640) before it starts (1650).");
    expect(refusal("[1660..1650]")).toContain("runs backwards");
  });

  it("refuses what it does not support, saying so", () => {
    expect(refusal("1650-06-15T12:00")).toMatch(/^Times of day are not supported/);
    expect(refusal("1650S2")).toMatch(/^Significant digits/);
    expect(refusal("1X50")).toMatch(/^Unspecified digits \(X\) are supported here only/);
    expect(refusal("1XXX")).toMatch(/too vague/);
    expect(refusal("../..")).toMatch(/open at both ends/);
  });
});

describe("normalisation", () => {
  it("trims and drops spaces around separators", () => {
    expect(read("  1650 ").edtf).toBe("1650");
    expect(read(" 1640 / 1660 ").edtf).toBe("1640/1660");
    expect(read("[1667, 1668, 1670 .. 1672]").edtf).toBe("[1667,1668,1670..1672]");
  });

  it("accepts a lower-case x", () => {
    expect(read("165x")).toMatchObject({ edtf: "165X", precision: "decade" });
  });
});
