import "server-only";
import { and, desc, eq, lt, type SQL } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { auditEvents, users } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";

export const auditQuerySchema = z.object({
  entityType: z.string().max(40).optional(),
  entityId: z.string().max(64).optional(),
  actorId: z.coerce.number().int().positive().optional(),
  // Keyset paging: events older than this id.
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

export type AuditQuery = z.infer<typeof auditQuerySchema>;

export async function listAuditEvents(actor: Actor | null, query: AuditQuery) {
  authorize(actor, "audit.read");
  const where: SQL[] = [];
  if (query.entityType) where.push(eq(auditEvents.entityType, query.entityType));
  if (query.entityId) where.push(eq(auditEvents.entityId, query.entityId));
  if (query.actorId) where.push(eq(auditEvents.actorId, query.actorId));
  if (query.before) where.push(lt(auditEvents.id, query.before));
  const rows = await db()
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      entityType: auditEvents.entityType,
      entityId: auditEvents.entityId,
      before: auditEvents.before,
      after: auditEvents.after,
      createdAt: auditEvents.createdAt,
      actorId: auditEvents.actorId,
      actorName: users.name,
      actorEmail: users.email,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(auditEvents.id))
    .limit(query.limit + 1);
  const more = rows.length > query.limit;
  const events = rows.slice(0, query.limit);
  return { events, nextBefore: more ? events[events.length - 1].id : null };
}
