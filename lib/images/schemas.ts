import { z } from "zod";
import { rightsUriSchema } from "@/lib/catalogue/rights";

const blankToNull = (v: unknown) => (typeof v === "string" && v.trim() === "" ? null : v);

export const ACCEPTED_TYPES = ["image/jpeg", "image/png", "image/tiff", "image/webp"] as const;
export const ACCEPTED_LABEL = "JPEG, PNG, TIFF or WebP";

export const imageMetadataSchema = z.object({
  kind: z.enum(["whole", "detail"]).default("whole"),
  caption: z.preprocess(blankToNull, z.string().trim().max(300, "Use at most 300 characters.").nullable()).default(null),
  photoCredit: z.preprocess(blankToNull, z.string().trim().max(300, "Use at most 300 characters.").nullable()).default(null),
  rightsUri: z.preprocess(blankToNull, rightsUriSchema.nullable()).default(null),
});

export const startUploadSchema = imageMetadataSchema.extend({
  filename: z.string().trim().min(1, "The file has no name.").max(255, "The file name is too long."),
  size: z.number().int().min(0),
  contentType: z.string().max(100).default("application/octet-stream"),
});
export type StartUpload = z.output<typeof startUploadSchema>;

export const completeUploadSchema = z.object({
  parts: z.array(z.object({ partNumber: z.number().int().min(1).max(10_000), etag: z.string().min(1).max(200) })).max(10_000).optional(),
});

export const imageUpdateSchema = imageMetadataSchema.extend({ version: z.number().int().positive() });
