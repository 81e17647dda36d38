// ISO 3166-1 countries with English names, from the i18n-iso-countries package.
import countries from "i18n-iso-countries";
import en from "i18n-iso-countries/langs/en.json";
import { z } from "zod";

countries.registerLocale(en);

const names = countries.getNames("en", { select: "official" }) as Record<string, string>;

/** Alpha-2 codes sorted by English name, for pickers. */
export const COUNTRIES: { code: string; name: string }[] = Object.entries(names)
  .map(([code, name]) => ({ code, name }))
  .sort((a, b) => a.name.localeCompare(b.name, "en"));

export function countryName(code: string | null | undefined): string | null {
  if (!code) return null;
  return names[code.toUpperCase()] ?? null;
}

export const countryCodeSchema = z
  .string()
  .trim()
  .toUpperCase()
  .refine((c) => countries.isValid(c) && c.length === 2, { message: "Use an ISO 3166-1 country code such as ES, IT or NL." });
