// The one parse of a comment in a region's discussion, shared by the form and the API.
import { z } from "zod";

export const COMMENT_MAX = 4000;

export const commentSchema = z.object({
  body: z
    .string({ error: "Write the comment as text." })
    .trim()
    .min(1, "Write something before sending.")
    .max(COMMENT_MAX, `At most ${COMMENT_MAX} characters.`),
});

export type CommentInput = z.infer<typeof commentSchema>;

/** One line of a region's discussion: a comment, or an editor's decision with its comment. */
export type ThreadEntry =
  | { kind: "comment"; id: number; authorId: number; authorName: string; body: string; createdAt: string }
  | {
      kind: "review";
      id: number;
      authorId: number;
      authorName: string;
      decision: "vetted" | "returned";
      body: string | null;
      versionNumber: number;
      createdAt: string;
    };
