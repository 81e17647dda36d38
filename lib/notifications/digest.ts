import "server-only";
import { and, asc, eq, inArray, isNull, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { jobs, notifications, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { appUrl } from "@/lib/config";
import { enqueue } from "@/lib/jobs/queue";
import type { JobHandler } from "@/lib/jobs/worker";
import { sendMail } from "@/lib/mail/transport";
import { nextDigestAt } from "./digest-time";
import { digestLetter } from "./letters";

export type DigestRun = { letters: number; notifications: number; failed: number };

/**
 * One letter to one person with every notification not yet sent to them, then marks those sent.
 *
 * The rows are claimed with SELECT … FOR UPDATE SKIP LOCKED and marked sent in the same transaction,
 * after the relay has accepted the letter. Two app instances running the digest at once therefore
 * never put the same notification in two letters: the second skips the rows the first holds and, finding
 * none left, writes nothing. Delivery is at least once: a crash after the relay accepted the letter but
 * before the commit leaves the rows unsent, and the next run sends them again. A lost digest would be
 * worse than a rare repeated one.
 */
async function sendDigestTo(userId: number, actorId: number | null): Promise<number> {
  return db().transaction(async (tx) => {
    const [person] = await tx.select({ email: users.email, notify: users.notify, disabledAt: users.disabledAt }).from(users).where(eq(users.id, userId));
    if (!person || person.disabledAt || person.notify !== "daily") return 0;
    const [claimed] = (await tx.execute(
      sql`SELECT id FROM notifications WHERE user_id = ${userId} AND sent_at IS NULL ORDER BY created_at, id FOR UPDATE SKIP LOCKED`,
    )) as unknown as [{ id: number }[]];
    if (claimed.length === 0) return 0;
    const ids = claimed.map((r) => Number(r.id));
    const notices = await tx.select().from(notifications).where(inArray(notifications.id, ids)).orderBy(asc(notifications.createdAt), asc(notifications.id));
    await sendMail(digestLetter(person.email, notices, appUrl()));
    await tx.update(notifications).set({ sentAt: new Date() }).where(inArray(notifications.id, ids));
    await recordAudit(tx, { actorId, action: "notification.digest_sent", entityType: "user", entityId: userId, after: { notificationIds: ids } });
    return ids.length;
  });
}

/**
 * Sends the digest to everyone who chose one a day and has something waiting. One person's failure
 * (a refused address) does not stop the others; their notices stay unsent for the next run.
 */
export async function sendDigests(actorId: number | null = null): Promise<DigestRun> {
  const waiting = await db()
    .selectDistinct({ id: users.id })
    .from(users)
    .innerJoin(notifications, and(eq(notifications.userId, users.id), isNull(notifications.sentAt)))
    .where(and(eq(users.notify, "daily"), isNull(users.disabledAt)));
  const run: DigestRun = { letters: 0, notifications: 0, failed: 0 };
  for (const { id } of waiting) {
    try {
      const n = await sendDigestTo(id, actorId);
      if (n > 0) {
        run.letters += 1;
        run.notifications += n;
      }
    } catch (error) {
      run.failed += 1;
      console.error(`digest for user ${id} not sent:`, error instanceof Error ? error.message : error);
    }
  }
  return run;
}

/** An admin sends the digest now (after a mail outage, or to check the letters), as the daily run would. */
export async function sendDigestsNow(actor: Actor | null): Promise<DigestRun> {
  authorize(actor, "system.digest");
  return sendDigests(actor!.id);
}

async function digestQueued(): Promise<boolean> {
  const [pending] = await db()
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.kind, "notification.digest"), eq(jobs.state, "queued")))
    .limit(1);
  return Boolean(pending);
}

/**
 * Makes sure the next daily digest is queued. Two instances starting together may both queue one; that
 * does no harm, since the second run finds every notification already claimed or sent.
 */
export async function scheduleDigest(now = new Date()): Promise<void> {
  if (!(await digestQueued())) await enqueue(db(), "notification.digest", {}, { runAt: nextDigestAt(now) });
}

export const notificationDigestHandler: JobHandler = {
  async run() {
    // Tomorrow's run is queued first, so that a failure today (retried with backoff) never ends the series.
    await scheduleDigest();
    const run = await sendDigests();
    if (run.failed > 0) throw new Error(`${run.failed} digest letters could not be sent; their notifications stay unsent`);
  },
};
