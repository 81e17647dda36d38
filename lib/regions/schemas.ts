// The zod schemas of the regions API: the one parse of every body that changes a region.
import { z } from "zod";
import { CONFIDENCES, REVIEW_DECISIONS } from "@/db/schema/regions";
import { MAX_POLYGON_POINTS } from "./geometry";

const coordinate = z.number({ error: "Coordinates are numbers of pixels." }).finite().min(-1e6).max(1e7);

export const shapeSchema = z.discriminatedUnion("kind", [
  z.object({
    kind: z.literal("rectangle"),
    x: coordinate,
    y: coordinate,
    w: coordinate.positive("A rectangle needs a width."),
    h: coordinate.positive("A rectangle needs a height."),
  }),
  z.object({
    kind: z.literal("polygon"),
    points: z
      .array(z.tuple([coordinate, coordinate]))
      .min(3, "A polygon needs at least three points.")
      .max(MAX_POLYGON_POINTS, `A polygon may have at most ${MAX_POLYGON_POINTS} points.`),
  }),
]);

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `At most ${max} characters.`)
    .nullish()
    .transform((s) => (s ? s : null));

export const observationInputSchema = z.object({
  aspectId: z.number().int().positive("Choose what the observation is about."),
  termId: z.number().int().positive().nullish(),
  count: z.number().int("A count is a whole number.").min(0, "A count cannot be negative.").max(999, "A count of more than 999 is not plausible here.").nullish(),
  text: optionalText(500),
  confidence: z.enum(CONFIDENCES, { error: "Choose certain, probable or possible." }),
  note: optionalText(4000),
});

export const observationsSchema = z.array(observationInputSchema).max(60, "At most 60 observations on one region.");

export const regionCreateSchema = z.object({
  shape: shapeSchema,
  label: optionalText(200),
  observations: observationsSchema.optional(),
});

export const regionUpdateSchema = z
  .object({
    version: z.number().int().positive(),
    shape: shapeSchema.optional(),
    label: optionalText(200).optional(),
    observations: observationsSchema.optional(),
  })
  .refine((v) => v.shape !== undefined || v.label !== undefined || v.observations !== undefined, { message: "Nothing to change." });

export const versionOnlySchema = z.object({ version: z.number().int().positive() });

export const reviewDecisionSchema = z
  .object({
    version: z.number().int().positive(),
    decision: z.enum(REVIEW_DECISIONS, { error: "Decide vetted or returned." }),
    comment: optionalText(4000),
  })
  .refine((v) => v.decision !== "returned" || (v.comment && v.comment.length > 0), {
    path: ["comment"],
    message: "Say why the region goes back to its author.",
  });

export const regionListQuerySchema = z.object({ proposed: z.enum(["0", "1"]).optional() });

export type RegionCreate = z.infer<typeof regionCreateSchema>;
export type RegionUpdate = z.infer<typeof regionUpdateSchema>;
export type ReviewDecision = z.infer<typeof reviewDecisionSchema>;
