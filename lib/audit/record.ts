import "server-only";
import type { Executor } from "@/db/client";
import { auditEvents } from "@/db/schema";

export type AuditEntry = {
  actorId: number | null;
  action: string;
  entityType: string;
  entityId: string | number;
  before?: unknown;
  after?: unknown;
};

// Secrets never enter the audit trail, whatever record is logged.
const SECRET_FIELDS = new Set(["passwordHash", "tokenHash", "token", "storageKey", "multipartUploadId"]);

function scrub(value: unknown): unknown {
  if (value === null || value === undefined || typeof value !== "object" || value instanceof Date) return value ?? null;
  if (Array.isArray(value)) return value.map(scrub);
  return Object.fromEntries(
    Object.entries(value as Record<string, unknown>).map(([k, v]) => [k, SECRET_FIELDS.has(k) ? "[hidden]" : scrub(v)]),
  );
}

/** Call inside the transaction that makes the change, so history and data never disagree. */
export async function recordAudit(tx: Executor, entry: AuditEntry): Promise<void> {
  await tx.insert(auditEvents).values({
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: String(entry.entityId),
    before: scrub(entry.before),
    after: scrub(entry.after),
  });
}
