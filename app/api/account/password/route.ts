// POST /api/account/password: set a new password with a reset link's token. Public (the token is the proof).
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { passwordSchema } from "@/lib/auth/passwords";
import { resetPassword } from "@/lib/users/account-tokens";

const schema = z.object({ token: z.string().min(10).max(200), password: passwordSchema });

export const POST = route("public", async ({ req }) => {
  const { token, password } = await readJson(req, schema);
  await resetPassword(token, password);
  return { ok: true };
});
