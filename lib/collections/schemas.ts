// A holding collection's fields: the form checks them in the browser, the API on the server.
import { z } from "zod";
import { countryCodeSchema } from "@/lib/catalogue/countries";

const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

export const collectionFieldsSchema = z.object({
  name: z.string({ error: "Give the collection's name." }).trim().min(1, "Give the collection's name.").max(200, "Use at most 200 characters."),
  city: z.preprocess(blankToNull, z.string().trim().max(120, "Use at most 120 characters.").nullable()).default(null),
  countryCode: z.preprocess(blankToNull, countryCodeSchema.nullable()).default(null),
  url: z.preprocess(blankToNull, z.string().trim().url("Give a full web address, starting with https://").max(500).nullable()).default(null),
  notes: z.preprocess(blankToNull, z.string().trim().max(5000, "Use at most 5000 characters.").nullable()).default(null),
});
export type CollectionFields = z.output<typeof collectionFieldsSchema>;

export const collectionUpdateSchema = collectionFieldsSchema.extend({ version: z.number().int().positive() });
