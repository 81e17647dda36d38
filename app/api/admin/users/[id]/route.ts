// PATCH /api/admin/users/:id: change a role or disable/enable an account, with the version read. Admins only.
import { z } from "zod";
import { readJson, route } from "@/lib/api/handler";
import { updateUser } from "@/lib/users/mutations";
import { userUpdateSchema } from "@/lib/users/schemas";

const idSchema = z.coerce.number().int().positive();

export const PATCH = route<{ id: string }>("user.manage", async ({ req, actor, params }) => ({
  user: await updateUser(actor, idSchema.parse(params.id), await readJson(req, userUpdateSchema)),
}));
