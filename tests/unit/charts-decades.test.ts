// Decade and century histograms. The weighting rule is the aoristic method of J. Ratcliffe
// (J. Quant. Criminol. 18(1), 2002) as worked by E. Crema, "Modelling Temporal Uncertainty in
// Archaeological Analysis", J. Archaeol. Method Theory 19(3), 2012; reading EDTF years as points
// ([1640, 1660) for 1640/1660) and the 5-year approximate margin are Cordarium's own rules.
import { describe, expect, it } from "vitest";
import { aoristicWeights, decadeBins, readDating, type DatingReading } from "@/lib/dating";
import {
  binLabel,
  centuryHistogram,
  decadeHistogram,
  histogramFromColumns,
  timeHistogram,
  type DatedEvidence,
} from "@/lib/charts/decades";

function expectClose(actual: number[], expected: number[]) {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((value, i) => expect(value).toBeCloseTo(expected[i], 4));
}

const totals = (h: { bins: { total: number }[] }) => h.bins.map((b) => b.total);

/** Widened bounds, as the search stores them; margins 5/5 (Cordarium's defaults, stated here). */
function dated(edtf: string, extra: Partial<DatedEvidence> = {}): DatedEvidence {
  const r = readDating(edtf, { approximateMarginYears: 5, uncertainMarginYears: 5 });
  if (!r.ok) throw new Error(r.error);
  return { earliest: (r as DatingReading).widenedEarliest, latest: (r as DatingReading).widenedLatest, ...extra };
}

describe("Crema 2012 worked example: 25-year bins from 1600 to 1700", () => {
  const quarters = (start: number, end: number) =>
    totals(histogramFromColumns({ start: Float64Array.of(start), end: Float64Array.of(end) }, 25, { from: 1600, to: 1699 }));

  it("an item dated 1600–1700 gives .25 to each bin", () => expectClose(quarters(1600, 1700), [0.25, 0.25, 0.25, 0.25]));
  it("1630–1660 gives 0, .6667, .3333, 0", () => expectClose(quarters(1630, 1660), [0, 0.6667, 0.3333, 0]));
  it("1640–1650 gives 0, 1, 0, 0", () => expectClose(quarters(1640, 1650), [0, 1, 0, 0]));
  it("1690–1710 gives 0, 0, 0, .5, the other half falling outside the range", () => {
    const h = histogramFromColumns({ start: Float64Array.of(1690), end: Float64Array.of(1710) }, 25, { from: 1600, to: 1699 });
    expectClose(totals(h), [0, 0, 0, 0.5]);
    expect(h.totals.outside).toBeCloseTo(0.5, 10);
  });
  it("gives the same from year numbers read as points", () => {
    const h = timeHistogram([{ earliest: 1630, latest: 1660 }], 25, { from: 1600, to: 1699 });
    expectClose(totals(h), [0, 0.6667, 0.3333, 0]);
  });
});

describe("decades from EDTF", () => {
  it("1640/1660 puts half in the 1640s and half in the 1650s (the product's example; years read as points)", () => {
    const h = decadeHistogram([dated("1640/1660")]);
    expect(h.bins.map((b) => b.label)).toEqual(["1640s", "1650s"]);
    expectClose(totals(h), [0.5, 0.5]);
  });

  it("with endYearInclusive the last year counts to its end: 10/21, 10/21, 1/21, as lib/dating's default", () => {
    const h = decadeHistogram([dated("1640/1660")], { endYearInclusive: true });
    expectClose(totals(h), [10 / 21, 10 / 21, 1 / 21]);
  });

  it("1650~ is widened to 1645–1655 and spread over the 1640s and 1650s", () => {
    const item = dated("1650~");
    expect([item.earliest, item.latest]).toEqual(["1645-01-01", "1655-12-31"]);
    const h = decadeHistogram([item]);
    expect(h.bins.map((b) => b.start)).toEqual([1640, 1650]);
    expectClose(totals(h), [0.5, 0.5]);
  });

  it("a single year or a decade stays in its own decade", () => {
    const h = decadeHistogram([dated("1652"), dated("165X"), dated("1650-06")]);
    expectClose(totals(h), [3]);
  });

  it("agrees with lib/dating's aoristicWeights under both readings", () => {
    const days = ["1601-03-04", "1612-12-31", "1630-01-01", "1644-07-15", "1660-12-31", "1688-02-29", "1699-12-31"];
    const items = days.flatMap((a) => days.filter((b) => b >= a).map((b) => ({ earliest: a, latest: b })));
    for (const endYearInclusive of [false, true]) {
      const mine = decadeHistogram(items, { from: 1600, to: 1699, endYearInclusive });
      const theirs = aoristicWeights(items, decadeBins(1600, 1699), { endYearInclusive }).bins.map((b) => b.weight);
      expectClose(totals(mine), theirs);
    }
  });
});

describe("totals", () => {
  const items: DatedEvidence[] = [
    dated("1640/1660", { series: "strumming" }),
    dated("1623", { series: "plucking" }),
    dated("1650~", { series: ["strumming", "plucking"] }),
    dated("16XX", { series: "plucking", weight: 2 }),
    dated("1672-03", { series: null }),
    { earliest: null, latest: null, series: "strumming" },
    dated("../1700", { series: "plucking" }),
    dated("1690/..", { series: "strumming" }),
  ];

  it("weights in the range add up to the dated items, undated and open-ended counted apart", () => {
    const h = decadeHistogram(items);
    expect(h.start).toBe(1600);
    expect(h.end).toBe(1700);
    expect(h.totals.inRange).toBeCloseTo(1 + 1 + 1 + 2 + 1, 10);
    expect(totals(h).reduce((a, b) => a + b, 0)).toBeCloseTo(6, 10);
    expect(h.totals.undated).toBe(1);
    expect(h.totals.openEnded).toBe(2);
    expect(h.totals.outside).toBe(0);
    expect(h.totals.weight).toBe(9);
  });

  it("each bar is the sum of its stack, and each series the sum of its segments", () => {
    const h = decadeHistogram(items);
    expect(h.series.map((s) => [s.kind, s.key])).toEqual([
      ["value", "plucking"],
      ["value", "strumming"],
      ["none", ""],
    ]);
    for (const bin of h.bins) expect(bin.total).toBeCloseTo(bin.bySeries.reduce((a, b) => a + b, 0), 10);
    h.series.forEach((s, k) => expect(h.bins.reduce((a, b) => a + b.bySeries[k], 0)).toBeCloseTo(s.inRange, 10));
    // plucking: 1623 (1) + half of 1650~ (0.5) + 16XX (2); strumming: 1640/1660 (1) + half of 1650~.
    expect(h.series[0].inRange).toBeCloseTo(3.5, 10);
    expect(h.series[1].inRange).toBeCloseTo(1.5, 10);
    expect(h.series[2].inRange).toBeCloseTo(1, 10);
    expect([h.series[1].undated, h.series[1].openEnded, h.series[0].openEnded]).toEqual([1, 1, 1]);
  });

  it("counts an item with several values once per value when asked", () => {
    const h = decadeHistogram([dated("1652", { series: ["strumming", "plucking", "strumming"] })], { multiValue: "each" });
    expect(h.bins[0].bySeries).toEqual([1, 1]);
    const split = decadeHistogram([dated("1652", { series: ["strumming", "plucking", "strumming"] })]);
    expect(split.bins[0].bySeries).toEqual([0.5, 0.5]);
  });

  it("folds values beyond maxSeries into one 'other' series", () => {
    const h = decadeHistogram(
      ["a", "a", "a", "b", "b", "c", "d"].map((v) => ({ earliest: 1650, latest: 1650, series: v })),
      { maxSeries: 2 },
    );
    expect(h.series.map((s) => [s.kind, s.key, s.inRange])).toEqual([
      ["value", "a", 3],
      ["value", "b", 2],
      ["other", "", 2],
    ]);
  });

  it("clips to a given range and keeps what falls outside", () => {
    const h = decadeHistogram([dated("1640/1660"), dated("1700")], { from: 1650, to: 1659 });
    expectClose(totals(h), [0.5]);
    expect(h.totals.outside).toBeCloseTo(1.5, 10);
  });

  it("has no bins when nothing is dated", () => {
    const h = decadeHistogram([{ earliest: null, latest: null }]);
    expect(h.bins).toEqual([]);
    expect(h.totals.undated).toBe(1);
  });
});

describe("centuries and columns", () => {
  it("labels centuries as catalogues do: 1600–1699 is the 17th century", () => {
    expect(binLabel(1600, 100)).toBe("17th century");
    expect(binLabel(1640, 10)).toBe("1640s");
    const h = centuryHistogram([dated("16XX"), dated("1590/1610")]);
    expect(h.bins.map((b) => b.label)).toEqual(["16th century", "17th century"]);
    expectClose(totals(h), [0.5, 1.5]);
  });

  it("gives the same from columns as from rows, for 100,000 items", () => {
    const n = 100_000;
    const start = new Float64Array(n);
    const end = new Float64Array(n);
    const series = new Int32Array(n);
    const rows: DatedEvidence[] = [];
    for (let i = 0; i < n; i++) {
      start[i] = 1500 + (i % 250);
      end[i] = start[i] + (i % 37);
      series[i] = i % 3 === 0 ? -1 : i % 3;
      rows.push({ earliest: start[i], latest: end[i], series: series[i] < 0 ? null : ["", "lute", "guitar"][series[i]] });
    }
    const fromColumns = histogramFromColumns({ start, end, series, seriesKeys: ["", "lute", "guitar"] }, 10);
    const fromRows = decadeHistogram(rows);
    expect(fromColumns.totals.inRange).toBeCloseTo(n, 6);
    expect(fromRows.series.map((s) => s.key)).toEqual(fromColumns.series.map((s) => s.key));
    expectClose(totals(fromRows), totals(fromColumns));
  });
});
