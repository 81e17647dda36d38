// Place-name folding, on which the type-ahead matches: what people type must find the gazetteer's
// spelling whatever the case and accents.
import { describe, expect, it } from "vitest";
import { foldName } from "@/lib/places/fold";
import { formatCoordinates, placeLine } from "@/lib/places/format";

describe("foldName", () => {
  it("folds case", () => {
    expect(foldName("Sevilla")).toBe("sevilla");
    expect(foldName("SEVILLA")).toBe("sevilla");
    expect(foldName("sevilla")).toBe(foldName("Sevilla"));
  });

  // Unicode Standard Annex #15 (normalization forms), canonical decomposition: NFD splits a
  // precomposed letter into its base letter and combining marks, which are then dropped.
  it.each([
    ["Köln", "koln"],
    ["São Paulo", "sao paulo"],
    ["Córdoba", "cordoba"],
    ["Zürich", "zurich"],
    ["Besançon", "besancon"],
    ["Mâcon", "macon"],
    ["Kraków", "krakow"],
    ["Brač", "brac"],
  ])("drops accents by canonical decomposition: %s → %s", (name, folded) => {
    expect(foldName(name)).toBe(folded);
  });

  it("agrees whether the accent is precomposed or combining (UAX #15 canonical equivalence)", () => {
    expect(foldName("K\u00f6ln")).toBe(foldName("Ko\u0308ln"));
  });

  // Letters that have no canonical decomposition are spelled out as their usual Latin
  // transliteration: common practice, as in library catalogues and postal addresses.
  it.each([
    ["Straße", "strasse"],
    ["Łódź", "lodz"],
    ["Ærøskøbing", "aeroskobing"],
    ["Œuilly", "oeuilly"],
    ["Đakovo", "dakovo"],
    ["Þórshöfn", "thorshofn"],
    ["Diyarbakır", "diyarbakir"],
  ])("spells out letters Unicode does not decompose (common practice): %s → %s", (name, folded) => {
    expect(foldName(name)).toBe(folded);
  });

  it("treats apostrophes alike and collapses spaces", () => {
    expect(foldName("L’Aquila")).toBe("l'aquila");
    expect(foldName("L`Aquila")).toBe("l'aquila");
    expect(foldName("  Den   Haag ")).toBe("den haag");
  });

  it("leaves the start of a name a prefix of the whole, so the type-ahead can match as you type", () => {
    for (const name of ["Köln", "São Paulo", "Łódź", "Straße"]) {
      const whole = foldName(name);
      for (let i = 1; i <= name.length; i++) {
        expect(whole.startsWith(foldName(name.slice(0, i)))).toBe(true);
      }
    }
  });
});

describe("how a place reads", () => {
  it("gives latitude first with hemispheres, to the five decimals the archive stores", () => {
    expect(formatCoordinates(50.93333, 6.95)).toBe("50.93333° N, 6.95000° E");
    expect(formatCoordinates(-34.60368, -58.38156)).toBe("34.60368° S, 58.38156° W");
  });

  it("names the subdivision and country when known", () => {
    expect(placeLine({ name: "Köln", subdivisionCode: "07", country: "Germany", countryCode: "DE" })).toBe("Köln — 07, Germany");
    expect(placeLine({ name: "Kingdom of Naples", subdivisionCode: null, country: "Italy", countryCode: "IT" })).toBe("Kingdom of Naples — Italy");
    expect(placeLine({ name: "Somewhere", subdivisionCode: null, country: null, countryCode: null })).toBe("Somewhere");
  });
});
