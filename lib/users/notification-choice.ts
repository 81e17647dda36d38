import "server-only";
import { and, asc, count, eq, isNull, sql } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { notifications, users, type NotifyMode } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, NotFoundError } from "@/lib/errors";
import { enqueue } from "@/lib/jobs/queue";
import type { NotificationChoiceInput } from "./schemas";

export type NotificationChoice = { notify: NotifyMode; version: number; waiting: number };

async function read(tx: Executor, userId: number, lock = false) {
  const query = tx.select({ notify: users.notify, version: users.version }).from(users).where(eq(users.id, userId));
  const [row] = lock ? await query.for("update") : await query;
  if (!row) throw new NotFoundError("account");
  const [{ waiting }] = await tx
    .select({ waiting: count() })
    .from(notifications)
    .where(and(eq(notifications.userId, userId), isNull(notifications.sentAt)));
  return { notify: row.notify, version: row.version, waiting: Number(waiting) };
}

/** The caller's own choice, with how many notices wait for the next letter. */
export async function getNotificationChoice(actor: Actor | null): Promise<NotificationChoice> {
  authorize(actor, "account.notifications");
  return read(db(), actor!.id);
}

/**
 * Changes the caller's own choice. Notices already waiting follow the new choice: with "immediate"
 * each is sent now, with "daily" they go in the next digest, with "off" they stay unsent.
 */
export async function setNotificationChoice(actor: Actor | null, input: NotificationChoiceInput): Promise<NotificationChoice> {
  authorize(actor, "account.notifications");
  return db().transaction(async (tx) => {
    const before = await read(tx, actor!.id, true);
    if (before.version !== input.version) {
      throw new ConflictError("Your account was changed elsewhere since you opened this page. Here is what is saved now.", before);
    }
    await tx
      .update(users)
      .set({ notify: input.notify, version: sql`${users.version} + 1` })
      .where(eq(users.id, actor!.id));
    if (input.notify === "immediate" && before.notify !== "immediate") {
      const waiting = await tx
        .select({ id: notifications.id })
        .from(notifications)
        .where(and(eq(notifications.userId, actor!.id), isNull(notifications.sentAt)))
        .orderBy(asc(notifications.createdAt));
      for (const { id } of waiting) await enqueue(tx, "notification.send", { notificationId: id }, { maxAttempts: 8 });
    }
    const after = await read(tx, actor!.id);
    await recordAudit(tx, {
      actorId: actor!.id,
      action: "user.notifications_changed",
      entityType: "user",
      entityId: actor!.id,
      before: { notify: before.notify, version: before.version },
      after: { notify: after.notify, version: after.version },
    });
    return after;
  });
}
