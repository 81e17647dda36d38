// Aoristic weights. Worked examples from E. Crema, "Modelling Temporal Uncertainty in
// Archaeological Analysis", J. Archaeol. Method Theory 19(3), 2012 (rule as in J. Ratcliffe,
// J. Quant. Criminol. 18(1), 2002). The ISO-day → year conversion is Cordarium's own rule.
import { describe, expect, it } from "vitest";
import { aoristicFromSpans, aoristicWeights, decadeBins, dayToFractionalYear, makeBins } from "@/lib/dating";

const quarters = { start: 1600, end: 1700, width: 25 };
const weights = (bins: { weight: number }[]) => bins.map((b) => b.weight);

function expectClose(actual: number[], expected: number[]) {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((value, i) => expect(value).toBeCloseTo(expected[i], 4));
}

describe("aoristicFromSpans — Crema 2012 worked examples, 25-year bins 1600–1700", () => {
  it("1600–1700 gives .25 to each bin", () => {
    expectClose(weights(aoristicFromSpans([{ start: 1600, end: 1700 }], quarters)), [0.25, 0.25, 0.25, 0.25]);
  });

  it("1630–1660 gives 0, .6667, .3333, 0", () => {
    expectClose(weights(aoristicFromSpans([{ start: 1630, end: 1660 }], quarters)), [0, 0.6667, 0.3333, 0]);
  });

  it("1640–1650 gives 0, 1, 0, 0", () => {
    expectClose(weights(aoristicFromSpans([{ start: 1640, end: 1650 }], quarters)), [0, 1, 0, 0]);
  });

  it("1690–1710 gives 0, 0, 0, .5 (half falls outside)", () => {
    expectClose(weights(aoristicFromSpans([{ start: 1690, end: 1710 }], quarters)), [0, 0, 0, 0.5]);
  });

  it("sums items and scales by their weight", () => {
    const spans = [
      { start: 1600, end: 1700 },
      { start: 1640, end: 1650, weight: 2 },
    ];
    expectClose(weights(aoristicFromSpans(spans, quarters)), [0.25, 2.25, 0.25, 0.25]);
  });

  it("puts a zero-length span wholly in the bin that contains it", () => {
    expectClose(weights(aoristicFromSpans([{ start: 1650, end: 1650 }], quarters)), [0, 0, 1, 0]);
  });

  it("rejects a span that ends before it starts", () => {
    expect(() => aoristicFromSpans([{ start: 1660, end: 1630 }], quarters)).toThrow(RangeError);
  });
});

describe("bins", () => {
  it("cover [start + i·width, start + (i+1)·width) and cut the last at `end`", () => {
    expect(makeBins({ start: 1600, end: 1660, width: 25 }).map((b) => [b.start, b.end])).toEqual([
      [1600, 1625],
      [1625, 1650],
      [1650, 1660],
    ]);
  });

  it("refuses empty or inverted specs", () => {
    expect(() => makeBins({ start: 1600, end: 1600, width: 10 })).toThrow(RangeError);
    expect(() => makeBins({ start: 1600, end: 1700, width: 0 })).toThrow(RangeError);
  });

  it("decadeBins covers both years inclusively, aligned to decades", () => {
    expect(decadeBins(1600, 1699)).toEqual({ start: 1600, end: 1700, width: 10 });
    expect(decadeBins(1623, 1700)).toEqual({ start: 1620, end: 1710, width: 10 });
  });
});

describe("ISO days to years — Cordarium's own rule", () => {
  it("makes inclusive days a half-open span of fractional years", () => {
    expect(dayToFractionalYear("1630-01-01", "start")).toBe(1630);
    expect(dayToFractionalYear("1660-12-31", "end")).toBe(1661);
    expect(dayToFractionalYear("1650-07-02", "start")).toBeCloseTo(1650 + 182 / 365, 10);
  });

  it("reads 1630-01-01..1660-12-31 as [1630, 1661) by default", () => {
    const { bins } = aoristicWeights([{ earliest: "1630-01-01", latest: "1660-12-31" }], quarters);
    expectClose(weights(bins), [0, 20 / 31, 11 / 31, 0]);
  });

  it("DESIGN example 1640/1660: 10/21, 10/21, 1/21 with inclusive years (the default)", () => {
    const { bins } = aoristicWeights([{ earliest: "1640-01-01", latest: "1660-12-31" }], decadeBins(1640, 1669));
    expectClose(weights(bins), [10 / 21, 10 / 21, 1 / 21]);
  });

  it("DESIGN example 1640/1660: exactly half to the 1640s and 1650s with endYearInclusive: false", () => {
    const { bins } = aoristicWeights([{ earliest: "1640-01-01", latest: "1660-12-31" }], decadeBins(1640, 1669), {
      endYearInclusive: false,
    });
    expectClose(weights(bins), [0.5, 0.5, 0]);
  });

  it("endYearInclusive: false reproduces Crema's year-number spans from ISO days", () => {
    const { bins } = aoristicWeights([{ earliest: "1630-01-01", latest: "1660-12-31" }], quarters, {
      endYearInclusive: false,
    });
    expectClose(weights(bins), [0, 0.6667, 0.3333, 0]);
  });

  it("spreads a single day and a single month within their bin", () => {
    const { bins } = aoristicWeights(
      [
        { earliest: "1650-06-15", latest: "1650-06-15" },
        { earliest: "1612-03-01", latest: "1612-03-31", weight: 3 },
      ],
      quarters,
    );
    expectClose(weights(bins), [3, 0, 1, 0]);
  });

  it("skips items with an open end and counts them", () => {
    const result = aoristicWeights(
      [
        { earliest: null, latest: "1700-12-31" },
        { earliest: "1650-01-01", latest: null },
        { earliest: "1600-01-01", latest: "1699-12-31" },
      ],
      quarters,
    );
    expect(result.skipped).toBe(2);
    expectClose(weights(result.bins), [0.25, 0.25, 0.25, 0.25]);
  });
});
