// Natural Earth shapes (as world-atlas ships them) carry ISO 3166-1 NUMERIC codes in `id`
// ("724"); Cordarium stores ISO 3166-1 ALPHA-2 ("ES"). i18n-iso-countries holds the table.
// A few Natural Earth shapes have no ISO code (N. Cyprus, Somaliland, Kosovo): they map to null
// and are drawn uncoloured.
import countries from "i18n-iso-countries";

/** "724" (or 724) → "ES"; null for a code ISO 3166-1 does not assign. */
export function alpha2FromNumeric(numeric: string | number | null | undefined): string | null {
  if (numeric === null || numeric === undefined || numeric === "") return null;
  const code = String(numeric).padStart(3, "0");
  if (!/^\d{3}$/.test(code)) return null;
  return countries.numericToAlpha2(code) ?? null;
}
