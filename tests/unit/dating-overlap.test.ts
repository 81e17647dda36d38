// Overlap filters on closed ranges of ISO days. Treating days as closed ranges and open ends as
// unbounded follows LoC EDTF 2019 (Library of Congress, Extended Date/Time Format (EDTF)
// Specification, 2019) and ISO 8601-2:2019; the filter conventions are Cordarium's own.
import { describe, expect, it } from "vitest";
import { overlapQueryDays, overlaps, rangeEndToDay, readDating, within, yearOf, yearOfOrNull } from "@/lib/dating";

const span = (earliest: string | null, latest: string | null) => ({ earliest, latest });

describe("yearOf", () => {
  it("reads the year of an ISO day", () => {
    expect(yearOf("1650-06-15")).toBe(1650);
    expect(yearOf("0050-01-01")).toBe(50);
    expect(yearOfOrNull(null)).toBeNull();
    expect(() => yearOf("1650-13-01")).toThrow(RangeError);
  });
});

describe("rangeEndToDay", () => {
  it("turns years, months and days into the first or last day", () => {
    expect(rangeEndToDay(1620, "from")).toBe("1620-01-01");
    expect(rangeEndToDay(1700, "to")).toBe("1700-12-31");
    expect(rangeEndToDay("1650-02", "to")).toBe("1650-02-28");
    expect(rangeEndToDay("1648-02", "to")).toBe("1648-02-29");
    expect(rangeEndToDay("1650-06-15", "from")).toBe("1650-06-15");
  });

  it("refuses what is not a year, month or day", () => {
    expect(() => rangeEndToDay("abc", "from")).toThrow(RangeError);
    expect(() => rangeEndToDay(1650.5, "from")).toThrow(RangeError);
    expect(() => rangeEndToDay("1650-13", "to")).toThrow(RangeError);
    expect(() => rangeEndToDay("1650-02-30", "to")).toThrow(RangeError);
  });
});

describe("overlapQueryDays — values for the SQL filter", () => {
  it("gives the days to compare with stored widened bounds", () => {
    // widened_earliest <= toDay AND widened_latest >= fromDay (nulls as open)
    expect(overlapQueryDays({ from: 1620, to: 1700 })).toEqual({ fromDay: "1620-01-01", toDay: "1700-12-31" });
    expect(overlapQueryDays({ from: 1620 })).toEqual({ fromDay: "1620-01-01", toDay: null });
    expect(overlapQueryDays({ to: "1700" })).toEqual({ fromDay: null, toDay: "1700-12-31" });
    expect(overlapQueryDays({})).toEqual({ fromDay: null, toDay: null });
  });

  it("refuses a range that ends before it starts", () => {
    expect(() => overlapQueryDays({ from: 1700, to: 1620 })).toThrow(RangeError);
  });
});

describe("overlaps", () => {
  const range = { from: 1620, to: 1700 };

  it("finds datings inside and across the range", () => {
    expect(overlaps(span("1650-01-01", "1650-12-31"), range)).toBe(true); // inside
    expect(overlaps(span("1600-01-01", "1750-12-31"), range)).toBe(true); // covers it
    expect(overlaps(span("1600-01-01", "1625-12-31"), range)).toBe(true); // across the start
  });

  it("counts touching as overlapping", () => {
    expect(overlaps(span("1610-01-01", "1620-01-01"), range)).toBe(true);
    expect(overlaps(span("1700-12-31", "1710-12-31"), range)).toBe(true);
  });

  it("rejects disjoint datings", () => {
    expect(overlaps(span("1610-01-01", "1619-12-31"), range)).toBe(false);
    expect(overlaps(span("1701-01-01", "1710-12-31"), range)).toBe(false);
  });

  it("treats open dating ends as unbounded", () => {
    expect(overlaps(span(null, "1630-12-31"), range)).toBe(true);
    expect(overlaps(span(null, "1610-12-31"), range)).toBe(false);
    expect(overlaps(span("1690-01-01", null), range)).toBe(true);
    expect(overlaps(span("1710-01-01", null), range)).toBe(false);
    expect(overlaps(span(null, null), range)).toBe(true);
  });

  it("treats missing range ends as unbounded", () => {
    expect(overlaps(span("1500-01-01", "1500-12-31"), { to: 1700 })).toBe(true);
    expect(overlaps(span("1800-01-01", "1800-12-31"), { to: 1700 })).toBe(false);
    expect(overlaps(span("1800-01-01", "1800-12-31"), {})).toBe(true);
  });

  it("uses widened bounds to include approximate datings near the edge (Cordarium's own margins)", () => {
    const r = readDating("1618~");
    if (!r.ok) throw new Error(r.error);
    expect(overlaps(r, range)).toBe(false); // strict: 1618 is before 1620
    expect(overlaps({ earliest: r.widenedEarliest, latest: r.widenedLatest }, range)).toBe(true);
  });
});

describe("within", () => {
  it("requires the whole dating inside the range", () => {
    expect(within(span("1650-01-01", "1660-12-31"), { from: 1620, to: 1700 })).toBe(true);
    expect(within(span("1610-01-01", "1660-12-31"), { from: 1620, to: 1700 })).toBe(false);
    expect(within(span(null, "1660-12-31"), { from: 1620, to: 1700 })).toBe(false);
    expect(within(span(null, "1660-12-31"), { to: 1700 })).toBe(true);
  });
});
