// What the dossier routes accept: the same zod schemas for the forms in the browser and the API.
import { z } from "zod";
import { DOSSIER_VISIBILITIES } from "./vocab";

const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);
const versionField = z.number({ error: "Say which version you read." }).int().positive();
const id = z.number().int().positive();

export const dossierTitle = z.string({ error: "Give the dossier a title." }).trim().min(1, "Give the dossier a title.").max(200, "Use at most 200 characters.");
const description = z.preprocess(blankToNull, z.string().trim().max(5000, "Use at most 5000 characters.").nullable());
export const visibility = z.enum(DOSSIER_VISIBILITIES, { error: "Choose private, shared or public." });

// The fields the owner types: the create form and the edit form check them in the browser too.
export const dossierFieldsSchema = z.object({ title: dossierTitle, description: description.default(null) });
export type DossierFields = z.output<typeof dossierFieldsSchema>;

export const dossierCreateSchema = dossierFieldsSchema.extend({ visibility: visibility.default("private") });
export type DossierCreate = z.output<typeof dossierCreateSchema>;

// Rename, describe, change visibility: any of them, with the version read.
export const dossierUpdateSchema = z
  .object({ version: versionField, title: dossierTitle.optional(), description: description.optional(), visibility: visibility.optional() })
  .refine((v) => v.title !== undefined || v.description !== undefined || v.visibility !== undefined, { message: "Change the title, the description or the visibility." });
export type DossierUpdate = z.output<typeof dossierUpdateSchema>;

export const versionOnlySchema = z.object({ version: versionField });

// The whole list of people the dossier is shared with, by e-mail: sharing adds one, unsharing leaves one out.
export const dossierSharesSchema = z.object({
  version: versionField,
  emails: z.array(z.string().trim().toLowerCase().email("Give an e-mail address.").max(254)).max(100, "Share with at most 100 people."),
  visibility: visibility.optional(),
});
export type DossierShares = z.output<typeof dossierSharesSchema>;

export const itemAddSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("region"), regionId: id, note: description.default(null) }),
  z.object({ kind: z.literal("source"), sourceId: id, note: description.default(null) }),
], { error: "Say whether a region or a source is added." });
export type ItemAdd = z.output<typeof itemAddSchema>;

export const itemNoteSchema = z.object({ version: versionField, note: description });
export type ItemNote = z.output<typeof itemNoteSchema>;

// Every item of the dossier in the new order, each with the version read: a stale or partial list is a 409.
export const itemOrderSchema = z.object({
  items: z
    .array(z.object({ id, version: versionField }))
    .min(1, "Send the whole order.")
    .max(2000)
    .refine((list) => new Set(list.map((e) => e.id)).size === list.length, { message: "An item appears twice in the order." }),
});
export type ItemOrder = z.output<typeof itemOrderSchema>;

export const dossierIdSchema = z.coerce.number().int().positive();
