// Input rules and shared shapes for places. No server-only marker: the picker and the area forms
// import the types, and the page may reuse the limits.
import { z } from "zod";
import { countryCodeSchema } from "@/lib/catalogue/countries";

/** One type-ahead answer: enough to show the place and to store its id. */
export type PlaceSuggestion = {
  id: number;
  kind: "city" | "area";
  name: string;
  countryCode: string | null;
  /** English name of the country, from ISO 3166-1. */
  country: string | null;
  /** GeoNames first-level subdivision code (admin1), e.g. "07"; areas have none. */
  subdivisionCode: string | null;
  latitude: number;
  longitude: number;
};

/** A whole place, as the page and the edit form need it. */
export type PlaceRecord = PlaceSuggestion & {
  altName: string | null;
  population: number;
  description: string | null;
  version: number;
};

export const PLACE_KINDS = ["city", "area"] as const;
export const SUGGESTION_LIMIT_MAX = 50;

// An empty form field means "not given", never "the empty string".
const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

export const placeQuerySchema = z.object({
  q: z.string().max(100, "Type at most 100 characters.").optional(),
  country: countryCodeSchema.optional(),
  kind: z.enum(PLACE_KINDS).optional(),
  limit: z.coerce.number().int().min(1).max(SUGGESTION_LIMIT_MAX).default(10),
});
export type PlaceQuery = z.infer<typeof placeQuerySchema>;

export const placeIdSchema = z.coerce.number().int().positive();

const areaName = z.string().trim().min(1, "Enter the area's name.").max(200, "Use at most 200 characters.");
const latitude = z
  .number({ error: "Enter the latitude in decimal degrees, e.g. 40.8518." })
  .min(-90, "Latitude runs from -90 (south) to 90 (north).")
  .max(90, "Latitude runs from -90 (south) to 90 (north).");
const longitude = z
  .number({ error: "Enter the longitude in decimal degrees, e.g. 14.2681." })
  .min(-180, "Longitude runs from -180 (west) to 180 (east).")
  .max(180, "Longitude runs from -180 (west) to 180 (east).");
const areaCountry = z.preprocess(blankToNull, countryCodeSchema.nullable());
const areaDescription = z.preprocess(
  blankToNull,
  z.string().trim().max(2000, "Use at most 2000 characters.").nullable(),
);

export const areaCreateSchema = z.object({
  name: areaName,
  countryCode: areaCountry.optional(),
  latitude,
  longitude,
  description: areaDescription.optional(),
});
export type AreaInput = z.infer<typeof areaCreateSchema>;

export const areaUpdateSchema = z
  .object({
    version: z.number({ error: "Say which version of the area you read." }).int().positive(),
    name: areaName.optional(),
    countryCode: areaCountry.optional(),
    latitude: latitude.optional(),
    longitude: longitude.optional(),
    description: areaDescription.optional(),
  })
  .refine((v) => Object.entries(v).some(([k, value]) => k !== "version" && value !== undefined), "Say what to change: name, country, coordinates or description.");
export type AreaUpdate = z.infer<typeof areaUpdateSchema>;
