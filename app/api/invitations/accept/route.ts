// POST /api/invitations/accept: the invitee chooses a name and password; the account gets the invited role. Public (the token is the proof).
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { passwordSchema } from "@/lib/auth/passwords";
import { acceptInvitation } from "@/lib/users/account-tokens";
import { personNameSchema } from "@/lib/users/schemas";

const schema = z.object({ token: z.string().min(10).max(200), name: personNameSchema, password: passwordSchema });

export const POST = route("public", async ({ req }) => {
  const { token, ...input } = await readJson(req, schema);
  return { account: await acceptInvitation(token, input) };
});
