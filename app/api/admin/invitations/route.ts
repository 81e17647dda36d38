// POST /api/admin/invitations: e-mail an invitation that carries a role. Admins only.
import { readJson, route } from "@/lib/api/handler";
import { inviteUser } from "@/lib/users/account-tokens";
import { invitationSchema } from "@/lib/users/schemas";

export const POST = route("user.manage", async ({ req, actor }) => ({
  invitation: await inviteUser(actor, await readJson(req, invitationSchema)),
}));
