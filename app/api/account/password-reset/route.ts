// POST /api/account/password-reset: e-mail a reset link. Public; answers the same whether or not the address has an account.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { requestPasswordReset } from "@/lib/users/account-tokens";
import { emailSchema } from "@/lib/users/schemas";

export const POST = route("public", async ({ req }) => {
  const { email } = await readJson(req, z.object({ email: emailSchema }));
  await requestPasswordReset(email);
  return { ok: true };
});
