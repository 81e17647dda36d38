// The shapes editors send when they change the vocabulary: the forms check them in the browser, the API
// on the server. A key is fixed at creation (exports and checks name aspects and terms by it).
import { z } from "zod";
import { ASPECT_KINDS, ASPECT_SECTIONS } from "./kinds";

const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

export const keySchema = z
  .string({ error: "Give a key." })
  .trim()
  .min(1, "Give a key.")
  .max(60, "Use at most 60 characters.")
  .regex(/^[a-z0-9_]+$/, "Use only lowercase letters a–z, digits and underscores, e.g. fret_slant.");

export const labelSchema = z
  .string({ error: "Give a label." })
  .trim()
  .min(1, "Give a label.")
  .max(120, "Use at most 120 characters.");

export const descriptionSchema = z.preprocess(blankToNull, z.string().trim().max(1000, "Use at most 1000 characters.").nullable());

const versionSchema = z.number({ error: "Say which version you read." }).int().positive();
const positionSchema = z.number().int().min(0).max(100_000);
const kindSchema = z.enum(ASPECT_KINDS, { error: "Choose how the value is given: a term, a count or text." });
const sectionSchema = z.enum(ASPECT_SECTIONS, { error: "Choose a section." });

// What the aspect form edits; a new aspect adds its key.
export const aspectFieldsSchema = z.object({
  label: labelSchema,
  description: descriptionSchema.default(null),
  kind: kindSchema,
  section: sectionSchema,
});
export type AspectFields = z.output<typeof aspectFieldsSchema>;

export const aspectCreateSchema = aspectFieldsSchema.extend({ key: keySchema, position: positionSchema.optional() });
export type AspectCreate = z.output<typeof aspectCreateSchema>;

// Deprecation travels with the other fields, so that it carries the same version check.
export const aspectUpdateSchema = z.object({
  version: versionSchema,
  label: labelSchema.optional(),
  description: descriptionSchema.optional(),
  kind: kindSchema.optional(),
  section: sectionSchema.optional(),
  position: positionSchema.optional(),
  deprecated: z.boolean().optional(),
});
export type AspectUpdate = z.output<typeof aspectUpdateSchema>;

export const termFieldsSchema = z.object({ label: labelSchema, description: descriptionSchema.default(null) });
export type TermFields = z.output<typeof termFieldsSchema>;

export const termCreateSchema = termFieldsSchema.extend({ key: keySchema, position: positionSchema.optional() });
export type TermCreate = z.output<typeof termCreateSchema>;

export const termUpdateSchema = z.object({
  version: versionSchema,
  label: labelSchema.optional(),
  description: descriptionSchema.optional(),
  position: positionSchema.optional(),
  deprecated: z.boolean().optional(),
});
export type TermUpdate = z.output<typeof termUpdateSchema>;

/** Deleting names the version read, like any other change. */
export const deleteSchema = z.object({ version: versionSchema });

export const mergeSchema = z.object({
  intoTermId: z.number({ error: "Choose the term to merge into." }).int().positive(),
  version: versionSchema,
});
export type MergeInput = z.output<typeof mergeSchema>;

// A new order is the whole list, each entry with the version read: a list someone changed meanwhile
// (an entry added, removed or edited) is refused rather than half applied.
const orderEntry = z.object({ id: z.number().int().positive(), version: versionSchema });
const orderList = z.array(orderEntry).min(1, "Give the whole list in its new order.").max(500);

export const aspectOrderSchema = z.object({ section: sectionSchema, aspects: orderList });
export type AspectOrder = z.output<typeof aspectOrderSchema>;

export const termOrderSchema = z.object({ terms: orderList });
export type TermOrder = z.output<typeof termOrderSchema>;

export const listQuerySchema = z.object({ all: z.enum(["0", "1"]).optional() });

export const idSchema = z.coerce.number().int().positive();

/** A key suggested from a label: "Thumb over the neck" → thumb_over_the_neck. */
export function keyFromLabel(label: string): string {
  return label
    .normalize("NFD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "_")
    .replace(/^_+|_+$/g, "")
    .slice(0, 60);
}
