// GET /api/admin/audit: the audit trail, newest first, keyset-paged. Admins only.
import { readQuery, route } from "@/lib/api/handler";
import { auditQuerySchema, listAuditEvents } from "@/lib/audit/queries";

export const GET = route("audit.read", async ({ req, actor }) => listAuditEvents(actor, readQuery(req, auditQuerySchema)));
