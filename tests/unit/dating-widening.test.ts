// Widened bounds for overlap queries. The margins and how they combine are Cordarium's own rule
// (not a standard): the LoC EDTF 2019 specification does not say how wide "approximate" is.
import { describe, expect, it } from "vitest";
import {
  DEFAULT_APPROXIMATE_MARGIN_YEARS,
  DEFAULT_UNCERTAIN_MARGIN_YEARS,
  readDating,
  type DatingReading,
} from "@/lib/dating";

function read(input: string, options?: Parameters<typeof readDating>[1]): DatingReading {
  const r = readDating(input, options);
  if (!r.ok) throw new Error(`expected ${input} to be read, got: ${r.error}`);
  return r;
}

const widened = (r: DatingReading) => [r.widenedEarliest, r.widenedLatest];

describe("defaults — Cordarium's own rule", () => {
  it("are five years each", () => {
    expect(DEFAULT_APPROXIMATE_MARGIN_YEARS).toBe(5);
    expect(DEFAULT_UNCERTAIN_MARGIN_YEARS).toBe(5);
  });

  it("leave unqualified dates as they are", () => {
    expect(widened(read("1650"))).toEqual(["1650-01-01", "1650-12-31"]);
    expect(widened(read("1640/1660"))).toEqual(["1640-01-01", "1660-12-31"]);
  });

  it("widen ~ and ? by their margin on both sides", () => {
    expect(widened(read("1650~"))).toEqual(["1645-01-01", "1655-12-31"]);
    expect(widened(read("1650?"))).toEqual(["1645-01-01", "1655-12-31"]);
    expect(widened(read("?1650"))).toEqual(["1645-01-01", "1655-12-31"]);
  });

  it("widen % by the sum of both margins", () => {
    expect(widened(read("1650%"))).toEqual(["1640-01-01", "1660-12-31"]);
    expect(widened(read("1650%", { approximateMarginYears: 2, uncertainMarginYears: 3 }))).toEqual([
      "1645-01-01",
      "1655-12-31",
    ]);
  });

  it("widen decades, centuries and months by years too", () => {
    expect(widened(read("165?"))).toEqual(["1645-01-01", "1664-12-31"]);
    expect(widened(read("16~"))).toEqual(["1595-01-01", "1704-12-31"]);
    expect(widened(read("1650-06~"))).toEqual(["1645-06-01", "1655-06-30"]);
  });
});

describe("custom margins — Cordarium's own rule", () => {
  it("uses each margin for its own qualifier", () => {
    const options = { approximateMarginYears: 10, uncertainMarginYears: 2 };
    expect(widened(read("1650~", options))).toEqual(["1640-01-01", "1660-12-31"]);
    expect(widened(read("1650?", options))).toEqual(["1648-01-01", "1652-12-31"]);
  });

  it("allows zero (no widening)", () => {
    expect(widened(read("1650~", { approximateMarginYears: 0 }))).toEqual(["1650-01-01", "1650-12-31"]);
  });

  it("rejects negative or fractional margins as a programming error", () => {
    expect(() => readDating("1650~", { approximateMarginYears: -1 })).toThrow(RangeError);
    expect(() => readDating("1650~", { uncertainMarginYears: 1.5 })).toThrow(RangeError);
  });
});

describe("where the qualifier applies — LoC EDTF 2019 qualified intervals; widening Cordarium's own", () => {
  it("widens only the qualified end of an interval", () => {
    expect(widened(read("1640~/1660"))).toEqual(["1635-01-01", "1660-12-31"]);
    expect(widened(read("1640/1660?"))).toEqual(["1640-01-01", "1665-12-31"]);
    expect(widened(read("1640?/1660~"))).toEqual(["1635-01-01", "1665-12-31"]);
  });

  it("keeps open ends null", () => {
    expect(widened(read("1650~/.."))).toEqual(["1645-01-01", null]);
    expect(widened(read("../1700~"))).toEqual([null, "1705-12-31"]);
  });

  it("widens a set as the union of its members, each by its own qualifier", () => {
    // The package accepts qualifiers inside sets only in the level 2 prefix form (?1670).
    const r = read("[1667,?1670]");
    expect([r.earliest, r.latest]).toEqual(["1667-01-01", "1670-12-31"]);
    expect(widened(r)).toEqual(["1665-01-01", "1675-12-31"]);
  });

  it("widens a qualified month only to its year, a qualified day only to its month", () => {
    expect(widened(read("1650-~06"))).toEqual(["1650-01-01", "1650-12-31"]);
    expect(widened(read("2004-06-?11"))).toEqual(["2004-06-01", "2004-06-30"]);
  });

  it("widens by years when the year itself is qualified in level 2 form", () => {
    expect(widened(read("2004-06~-11"))).toEqual(["1999-06-11", "2009-06-11"]);
  });

  it("clamps widening to the supported years 1–9999", () => {
    expect(widened(read("0003~"))).toEqual(["0001-01-01", "0008-12-31"]);
    expect(widened(read("9998~"))).toEqual(["9993-01-01", "9999-12-31"]);
  });

  it("keeps 29 February valid when moving by years", () => {
    expect(widened(read("1648-02-29~", { approximateMarginYears: 1 }))).toEqual(["1647-02-28", "1649-02-28"]);
  });
});
