import "server-only";
import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { notifications, users } from "@/db/schema";
import { appUrl } from "@/lib/config";
import type { JobHandler } from "@/lib/jobs/worker";
import { PermanentJobError } from "@/lib/jobs/worker";
import { sendMail } from "@/lib/mail/transport";
import { noticeLetter } from "./letters";

export type Delivery = "sent" | "already_sent" | "held" | "missing";

/**
 * Sends one notification by e-mail and marks it sent, or leaves it for later when the person now wants
 * a digest (the next digest carries it) or no e-mail at all (it stays unsent and nothing goes out).
 *
 * At least once, never knowingly twice: the notification row stays locked (FOR UPDATE) from the check
 * of `sent_at` until the transaction that sets it commits, after the relay has accepted the letter. A
 * second run of the same job, or the digest (which skips locked rows), waits or passes it by, then sees
 * it sent. Only a crash between the relay's acceptance and the commit sends it again on the retry; we
 * prefer that rare duplicate to a notice lost for good, which marking it sent before sending would risk.
 */
export async function deliverNotification(notificationId: number): Promise<Delivery> {
  return db().transaction(async (tx) => {
    const [notice] = await tx.select().from(notifications).where(eq(notifications.id, notificationId)).for("update");
    if (!notice) return "missing";
    if (notice.sentAt) return "already_sent";
    const [person] = await tx
      .select({ email: users.email, notify: users.notify, disabledAt: users.disabledAt })
      .from(users)
      .where(eq(users.id, notice.userId));
    if (!person || person.disabledAt || person.notify !== "immediate") return "held";
    await sendMail(noticeLetter(person.email, notice, appUrl()));
    await tx.update(notifications).set({ sentAt: new Date() }).where(eq(notifications.id, notice.id));
    return "sent";
  });
}

const payloadSchema = z.object({ notificationId: z.number().int().positive() });

export const notificationSendHandler: JobHandler = {
  async run(job) {
    const parsed = payloadSchema.safeParse(job.payload);
    if (!parsed.success) throw new PermanentJobError("the job names no notification");
    await deliverNotification(parsed.data.notificationId);
  },
  async onFinalFailure(job, error) {
    // The notification stays unsent (sent_at empty), so nothing is half-done; say so in the log.
    console.error(`notification ${String(job.payload.notificationId)} was not delivered after ${job.attempts} attempts: ${error}`);
  },
};
