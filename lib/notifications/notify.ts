import "server-only";
import { and, inArray, isNull, ne } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { notifications, users } from "@/db/schema";
import { enqueue } from "@/lib/jobs/queue";

export type NotificationDraft = { kind: string; subject: string; body: string; link?: string | null; payload?: Record<string, unknown> };

/**
 * Records what each recipient is to be told, inside the transaction of the change: the letter exists
 * exactly when the change does. Those who chose "immediate" get a delivery job at once; "daily" ones
 * wait for the digest; "off" ones get nothing recorded. Disabled accounts are skipped.
 */
export async function notify(tx: Executor, recipientIds: number[], draft: NotificationDraft): Promise<number> {
  const ids = [...new Set(recipientIds)];
  if (ids.length === 0) return 0;
  const people = await tx
    .select({ id: users.id, notify: users.notify })
    .from(users)
    .where(and(inArray(users.id, ids), isNull(users.disabledAt), ne(users.notify, "off")));
  for (const person of people) {
    const [{ id }] = await tx
      .insert(notifications)
      .values({ userId: person.id, kind: draft.kind, subject: draft.subject, body: draft.body, link: draft.link ?? null, payload: draft.payload ?? null })
      .$returningId();
    if (person.notify === "immediate") await enqueue(tx, "notification.send", { notificationId: id }, { maxAttempts: 8 });
  }
  return people.length;
}

/** Every editor and admin except the one who acted: the reviewers of new proposals. */
export async function reviewerIds(tx: Executor, exceptId: number): Promise<number[]> {
  const rows = await tx
    .select({ id: users.id })
    .from(users)
    .where(and(inArray(users.role, ["editor", "admin"]), isNull(users.disabledAt), ne(users.id, exceptId)));
  return rows.map((r) => r.id);
}
