// GET /api/admin/users: the users table (search, role and status filters, sorting, paging). Admins only.
import { readQuery, route } from "@/lib/api/handler";
import { listUsers } from "@/lib/users/queries";
import { userListQuerySchema } from "@/lib/users/schemas";

export const GET = route("user.manage", async ({ req, actor }) => listUsers(actor, readQuery(req, userListQuerySchema)));
