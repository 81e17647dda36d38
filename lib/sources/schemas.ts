// The one schema of a source's fields: the form validates with it in the browser (react-hook-form's
// zod resolver), the API and the CSV import validate with it on the server.
import { z } from "zod";
import { readDating } from "@/lib/dating";
import { rightsUriSchema } from "@/lib/catalogue/rights";
import { ATTRIBUTION_QUALIFIERS, DIMENSION_UNITS, OBJECT_TYPES, SOURCE_STATES } from "./vocab";

// Empty form fields arrive as "" and mean "not given".
const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);
const optionalText = (max: number) =>
  z.preprocess(blankToNull, z.string().trim().max(max, `Use at most ${max} characters.`).nullable()).default(null);
const optionalMeasure = z
  .preprocess(
    (v) => (blankToNull(v) === null ? null : typeof v === "string" ? Number(v.replace(",", ".")) : v),
    z.number({ error: "Give a number, e.g. 64.5." }).positive("Give a positive number.").max(100_000, "That is too large.").nullable(),
  )
  .default(null);
const optionalId = z
  .preprocess((v) => (blankToNull(v) === null ? null : Number(v)), z.number().int().positive().nullable())
  .default(null);

export const edtfSchema = z.preprocess(
  blankToNull,
  z
    .string()
    .max(100, "Use at most 100 characters.")
    .superRefine((value, ctx) => {
      const reading = readDating(value);
      if (!reading.ok) ctx.addIssue({ code: "custom", message: reading.error });
    })
    .nullable(),
);

export const bibliographyEntrySchema = z.object({
  author: z.string().trim().min(1, "Give the author (or editor).").max(200, "Use at most 200 characters."),
  title: z.string().trim().min(1, "Give the title.").max(300, "Use at most 300 characters."),
  year: optionalText(20),
  pages: optionalText(50),
  link: z.preprocess(blankToNull, z.string().trim().url("Give a full web address, starting with https://").max(500).nullable()).default(null),
});

export const sourceFieldsSchema = z.object({
  title: z.string({ error: "Give the work a title." }).trim().min(1, "Give the work a title.").max(300, "Use at most 300 characters."),
  objectType: z.enum(OBJECT_TYPES, { error: "Choose the kind of object." }),
  artist: optionalText(200),
  attributionQualifier: z.enum(ATTRIBUTION_QUALIFIERS, { error: "Choose how sure the attribution is." }).default("by"),
  medium: optionalText(200),
  height: optionalMeasure,
  width: optionalMeasure,
  dimensionUnit: z.enum(DIMENSION_UNITS, { error: "Choose cm, mm or in." }).default("cm"),
  collectionId: optionalId,
  accessionNumber: optionalText(100),
  datingEdtf: edtfSchema.default(null),
  placeId: optionalId,
  rightsUri: z.preprocess(blankToNull, rightsUriSchema.nullable()).default(null),
  creditLine: optionalText(500),
  description: optionalText(10_000),
  reliabilityNote: optionalText(5_000),
  bibliography: z.array(bibliographyEntrySchema).max(100, "At most 100 references.").default([]),
  state: z.enum(SOURCE_STATES, { error: "Choose draft or published." }).default("draft"),
});

export type SourceFieldsInput = z.input<typeof sourceFieldsSchema>;
export type SourceFields = z.output<typeof sourceFieldsSchema>;

export const sourceUpdateSchema = sourceFieldsSchema.extend({ version: z.number().int().positive() });
export type SourceUpdate = z.output<typeof sourceUpdateSchema>;

export const SOURCE_SORTS = ["title", "dating", "created"] as const;

export const sourceListQuerySchema = z.object({
  q: z.string().trim().max(200).optional(),
  objectType: z.enum(OBJECT_TYPES).optional(),
  collection: z.coerce.number().int().positive().optional(),
  country: z.string().trim().toUpperCase().regex(/^[A-Z]{2}$/, "Use a two-letter country code.").optional(),
  creator: z.coerce.number().int().positive().optional(),
  // Date overlap: a year ("1620"), a month ("1620-06") or a day.
  from: z.string().regex(/^\d{1,4}(-\d{2}(-\d{2})?)?$/, "Give a year such as 1620.").optional(),
  to: z.string().regex(/^\d{1,4}(-\d{2}(-\d{2})?)?$/, "Give a year such as 1700.").optional(),
  state: z.enum(SOURCE_STATES).optional(),
  deleted: z.enum(["only"]).optional(),
  sort: z.enum(SOURCE_SORTS).default("title"),
  dir: z.enum(["asc", "desc"]).default("asc"),
  after: z.string().max(500).optional(),
  before: z.string().max(500).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(25),
});
export type SourceListQuery = z.output<typeof sourceListQuerySchema>;
