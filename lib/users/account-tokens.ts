import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { db } from "@/db/client";
import { accountTokens, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { forgetActor } from "@/lib/auth/actor";
import { hashPassword } from "@/lib/auth/passwords";
import { authorize, type Actor } from "@/lib/auth/policy";
import { hashToken, newToken } from "@/lib/auth/tokens";
import { appUrl } from "@/lib/config";
import { ValidationError } from "@/lib/errors";
import { invitationLetter, passwordResetLetter } from "@/lib/mail/letters";
import { sendMail } from "@/lib/mail/transport";
import type { InvitationInput } from "./schemas";

const HOUR = 3600_000;
const BAD_LINK = "This link is not valid any more: it was used already, has expired, or was replaced by a newer one.";

export async function inviteUser(actor: Actor | null, input: InvitationInput) {
  authorize(actor, "user.manage");
  const { token, hash } = newToken();
  const invitation = await db().transaction(async (tx) => {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, input.email));
    if (existing) throw new ValidationError("An account with this e-mail address exists already.", { email: ["Already has an account."] });
    // A new invitation replaces any earlier one to the same address.
    await tx
      .update(accountTokens)
      .set({ revokedAt: new Date() })
      .where(and(eq(accountTokens.email, input.email), eq(accountTokens.purpose, "invitation"), isNull(accountTokens.usedAt)));
    const expiresAt = new Date(Date.now() + 7 * 24 * HOUR);
    const [{ id }] = await tx
      .insert(accountTokens)
      .values({ purpose: "invitation", tokenHash: hash, email: input.email, role: input.role, createdBy: actor!.id, expiresAt })
      .$returningId();
    const record = { id, email: input.email, role: input.role, expiresAt };
    await recordAudit(tx, { actorId: actor!.id, action: "invitation.sent", entityType: "invitation", entityId: id, after: record });
    return record;
  });
  await sendMail(invitationLetter(input.email, `${appUrl()}/invitation/${token}`, input.role, actor!.name));
  return invitation;
}

async function findLiveToken(token: string, purpose: "invitation" | "password_reset") {
  const [row] = await db()
    .select()
    .from(accountTokens)
    .where(
      and(
        eq(accountTokens.tokenHash, hashToken(token)),
        eq(accountTokens.purpose, purpose),
        isNull(accountTokens.usedAt),
        isNull(accountTokens.revokedAt),
        gt(accountTokens.expiresAt, new Date()),
      ),
    )
    .limit(1);
  return row ?? null;
}

export async function describeInvitation(token: string) {
  const row = await findLiveToken(token, "invitation");
  return row ? { email: row.email, role: row.role ?? "reader" } : null;
}

export async function acceptInvitation(token: string, input: { name: string; password: string }) {
  const passwordHash = await hashPassword(input.password);
  return db().transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(accountTokens)
      .where(and(eq(accountTokens.tokenHash, hashToken(token)), eq(accountTokens.purpose, "invitation")))
      .for("update");
    if (!row || row.usedAt || row.revokedAt || row.expiresAt <= new Date()) throw new ValidationError(BAD_LINK);
    const [taken] = await tx.select({ id: users.id }).from(users).where(eq(users.email, row.email));
    if (taken) throw new ValidationError("An account with this e-mail address exists already. Sign in instead.");
    const role = row.role ?? "reader";
    const [{ id }] = await tx
      .insert(users)
      .values({ email: row.email, name: input.name, role, passwordHash, emailVerifiedAt: new Date() })
      .$returningId();
    await tx.update(accountTokens).set({ usedAt: new Date(), userId: id }).where(eq(accountTokens.id, row.id));
    await recordAudit(tx, {
      actorId: id,
      action: "invitation.accepted",
      entityType: "user",
      entityId: id,
      after: { id, email: row.email, name: input.name, role, invitedBy: row.createdBy },
    });
    return { id, email: row.email, role };
  });
}

/** Always looks the same from outside, whether or not the address has an account. */
export async function requestPasswordReset(email: string): Promise<void> {
  const [user] = await db().select().from(users).where(eq(users.email, email)).limit(1);
  if (!user || user.disabledAt) return;
  const { token, hash } = newToken();
  await db().transaction(async (tx) => {
    await tx
      .update(accountTokens)
      .set({ revokedAt: new Date() })
      .where(and(eq(accountTokens.userId, user.id), eq(accountTokens.purpose, "password_reset"), isNull(accountTokens.usedAt)));
    const [{ id }] = await tx
      .insert(accountTokens)
      .values({ purpose: "password_reset", tokenHash: hash, email: user.email, userId: user.id, expiresAt: new Date(Date.now() + HOUR) })
      .$returningId();
    await recordAudit(tx, { actorId: user.id, action: "password.reset_requested", entityType: "user", entityId: user.id, after: { tokenId: id } });
  });
  await sendMail(passwordResetLetter(user.email, `${appUrl()}/reset-password/${token}`));
}

export async function passwordResetIsLive(token: string): Promise<boolean> {
  return (await findLiveToken(token, "password_reset")) !== null;
}

export async function resetPassword(token: string, password: string): Promise<void> {
  const passwordHash = await hashPassword(password);
  const userId = await db().transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(accountTokens)
      .where(and(eq(accountTokens.tokenHash, hashToken(token)), eq(accountTokens.purpose, "password_reset")))
      .for("update");
    if (!row || !row.userId || row.usedAt || row.revokedAt || row.expiresAt <= new Date()) throw new ValidationError(BAD_LINK);
    const [user] = await tx.select().from(users).where(eq(users.id, row.userId)).for("update");
    if (!user || user.disabledAt) throw new ValidationError("This account is disabled. Ask an administrator.");
    await tx.update(users).set({ passwordHash, version: user.version + 1 }).where(eq(users.id, user.id));
    await tx.update(accountTokens).set({ usedAt: new Date() }).where(eq(accountTokens.id, row.id));
    await recordAudit(tx, { actorId: user.id, action: "password.reset", entityType: "user", entityId: user.id });
    return user.id;
  });
  forgetActor(userId);
}
