// Words for readings. The phrasing is common practice of English catalogues, not a standard;
// the readings themselves follow LoC EDTF 2019 (Library of Congress, Extended Date/Time Format
// (EDTF) Specification, 2019). Season months are Cordarium's own rule.
import { describe, expect, it } from "vitest";
import { ordinal, readDating } from "@/lib/dating";

function words(input: string): string {
  const r = readDating(input);
  if (!r.ok) throw new Error(`expected ${input} to be read, got: ${r.error}`);
  return r.words;
}

describe("points — common practice", () => {
  it.each([
    ["1650", "1650"],
    ["1650~", "about 1650"],
    ["1650?", "perhaps 1650"],
    ["1650%", "perhaps about 1650"],
    ["165X", "the 1650s"],
    ["165", "the 1650s"],
    ["16XX", "the 17th century"], // common usage: 1600–1699 as "the 17th century"
    ["16", "the 17th century"],
    ["16~", "about the 17th century"],
    ["1650-06", "June 1650"],
    ["1650-06~", "about June 1650"],
    ["1650-06-15", "15 June 1650"],
    ["1650-06-XX", "June 1650"],
  ])("%s → %s", (input, expected) => {
    expect(words(input)).toBe(expected);
  });
});

describe("seasons — Cordarium's own rule, common-practice words", () => {
  it.each([
    ["1650-21", "spring 1650"],
    ["1650-22", "summer 1650"],
    ["1650-23", "autumn 1650"],
    ["1650-24", "winter 1650–51"],
    ["1699-24", "winter 1699–1700"],
    ["1650-29", "southern-hemisphere spring 1650"],
    ["1650-33", "the first quarter of 1650"],
    ["1650-39", "the third third of 1650"],
    ["1650-40", "the first half of 1650"],
  ])("%s → %s", (input, expected) => {
    expect(words(input)).toBe(expected);
  });
});

describe("intervals — common practice", () => {
  it.each([
    ["1640/1660", "between 1640 and 1660"],
    ["1640~/1660", "between about 1640 and 1660"],
    ["1650-06/1650-08", "between June 1650 and August 1650"],
    ["../1700", "by 1700"],
    ["1700/..", "1700 or later"],
    ["/1700", "by 1700 (start unknown)"],
    ["1700/", "from 1700 (end unknown)"],
    ["1650/1650", "1650"],
  ])("%s → %s", (input, expected) => {
    expect(words(input)).toBe(expected);
  });
});

describe("sets — common practice", () => {
  it.each([
    ["[1667,1668,1670..1672]", "one of 1667, 1668, 1670 to 1672"],
    ["{1667,1670}", "all of 1667, 1670"],
    ["[1667,?1670]", "one of 1667, perhaps 1670"],
    ["[..1700]", "1700 or earlier"],
    ["[1700..]", "1700 or later"],
    ["[..1667,1668]", "one of 1667, 1668, or earlier"],
    ["[1667]", "1667"],
  ])("%s → %s", (input, expected) => {
    expect(words(input)).toBe(expected);
  });
});

describe("ordinals — common practice", () => {
  it.each([
    [1, "1st"],
    [2, "2nd"],
    [3, "3rd"],
    [4, "4th"],
    [11, "11th"],
    [12, "12th"],
    [13, "13th"],
    [21, "21st"],
    [22, "22nd"],
    [23, "23rd"],
    [101, "101st"],
    [111, "111th"],
  ])("%i → %s", (n, expected) => {
    expect(ordinal(n)).toBe(expected);
  });

  it("names centuries with them", () => {
    expect(words("01XX")).toBe("the 2nd century");
    expect(words("02XX")).toBe("the 3rd century");
    expect(words("10XX")).toBe("the 11th century");
    expect(words("20XX")).toBe("the 21st century");
  });
});
