import "server-only";
import { and, eq } from "drizzle-orm";
import type { Adapter, AdapterUser, VerificationToken } from "next-auth/adapters";
import { db } from "@/db/client";
import { users, verificationTokens } from "@/db/schema";

// The part of a next-auth adapter that e-mail sign-in links need with JWT sessions: users are read,
// never created here (accounts come from invitations and the seed), and a link's token is used once.
const toAdapterUser = (u: typeof users.$inferSelect): AdapterUser => ({
  id: String(u.id),
  email: u.email,
  name: u.name,
  emailVerified: u.emailVerifiedAt,
});

export function cordariumAdapter(): Adapter {
  return {
    async getUser(id: string) {
      const [u] = await db().select().from(users).where(eq(users.id, Number(id))).limit(1);
      return u ? toAdapterUser(u) : null;
    },
    async getUserByEmail(email: string) {
      const [u] = await db().select().from(users).where(eq(users.email, email.toLowerCase())).limit(1);
      return u ? toAdapterUser(u) : null;
    },
    async getUserByAccount() {
      return null;
    },
    async createUser() {
      throw new Error("Accounts are created by invitation only.");
    },
    async updateUser(user: Partial<AdapterUser> & Pick<AdapterUser, "id">) {
      if (user.emailVerified) {
        await db().update(users).set({ emailVerifiedAt: user.emailVerified }).where(eq(users.id, Number(user.id)));
      }
      const [u] = await db().select().from(users).where(eq(users.id, Number(user.id))).limit(1);
      return toAdapterUser(u);
    },
    async linkAccount() {
      return undefined;
    },
    async createVerificationToken(token: VerificationToken) {
      await db().insert(verificationTokens).values(token);
      return token;
    },
    async useVerificationToken({ identifier, token }: { identifier: string; token: string }) {
      return db().transaction(async (tx) => {
        const where = and(eq(verificationTokens.identifier, identifier), eq(verificationTokens.token, token));
        const [row] = await tx.select().from(verificationTokens).where(where).for("update");
        if (!row) return null;
        await tx.delete(verificationTokens).where(where);
        return row;
      });
    },
  };
}
