import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { forgetActor } from "@/lib/auth/actor";
import { authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { publicUserColumns, type UserRow } from "./queries";
import type { UserUpdate } from "./schemas";

/** Role change and disable/enable by an admin, refused when the record changed since it was read. */
export async function updateUser(actor: Actor | null, userId: number, change: UserUpdate): Promise<UserRow> {
  authorize(actor, "user.manage");
  if (userId === actor!.id && (change.disabled || (change.role && change.role !== "admin"))) {
    throw new ValidationError("You cannot disable your own account or take away your own admin role.");
  }
  const updated = await db().transaction(async (tx) => {
    const [before] = await tx.select(publicUserColumns).from(users).where(eq(users.id, userId)).for("update");
    if (!before) throw new NotFoundError("user");
    if (before.version !== change.version) {
      throw new ConflictError("Someone changed this account since you loaded it. Reload to see the change.", before);
    }
    const values: Partial<typeof users.$inferInsert> = {};
    if (change.role !== undefined) values.role = change.role;
    if (change.disabled !== undefined) values.disabledAt = change.disabled ? (before.disabledAt ?? new Date()) : null;
    await tx
      .update(users)
      .set({ ...values, version: sql`${users.version} + 1` })
      .where(and(eq(users.id, userId), eq(users.version, change.version)));
    const [after] = await tx.select(publicUserColumns).from(users).where(eq(users.id, userId));
    const action =
      change.disabled === true ? "user.disabled" : change.disabled === false ? "user.enabled" : "user.role_changed";
    await recordAudit(tx, { actorId: actor!.id, action, entityType: "user", entityId: userId, before, after });
    return after as UserRow;
  });
  forgetActor(userId);
  return updated;
}
