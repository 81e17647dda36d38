import "server-only";
import { eq } from "drizzle-orm";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import EmailProvider from "next-auth/providers/email";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { config } from "@/lib/config";
import { AppError } from "@/lib/errors";
import { signInLetter } from "@/lib/mail/letters";
import { sendMail } from "@/lib/mail/transport";
import { emailSchema } from "@/lib/users/schemas";
import { cordariumAdapter } from "./adapter";
import { DEMO_PASSWORD, verifyPassword } from "./passwords";
import { assertSignInAllowed, recordFailedSignIn, recordSuccessfulSignIn } from "./throttle";

const WRONG = "That e-mail address and password do not match an account.";

function clientAddress(headers: Record<string, unknown> | undefined): string {
  const forwarded = headers?.["x-forwarded-for"];
  const first = typeof forwarded === "string" ? forwarded.split(",")[0].trim() : "";
  return first || "unknown";
}

async function authorizeWithPassword(email: string, password: string, address: string) {
  await assertSignInAllowed(email, address);
  const [user] = await db().select().from(users).where(eq(users.email, email)).limit(1);
  const matches = await verifyPassword(user?.passwordHash ?? null, password);
  if (!user || !matches) {
    await recordFailedSignIn(email, address);
    throw new Error(WRONG);
  }
  if (user.disabledAt) throw new Error("This account is disabled. Ask an administrator.");
  if (config().CORDARIUM_ENV === "production" && password === DEMO_PASSWORD) {
    throw new Error("The demo password is refused in production. Reset your password by e-mail.");
  }
  await recordSuccessfulSignIn(email);
  return { id: String(user.id), email: user.email, name: user.name };
}

export function authOptions(): NextAuthOptions {
  return {
    secret: config().NEXTAUTH_SECRET,
    adapter: cordariumAdapter(),
    // An adapter would switch next-auth to database sessions, which Credentials cannot use.
    session: { strategy: "jwt", maxAge: 7 * 24 * 3600 },
    pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
    providers: [
      CredentialsProvider({
        id: "credentials",
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(credentials, req) {
          const email = emailSchema.safeParse(credentials?.email ?? "");
          const password = credentials?.password ?? "";
          if (!email.success || !password) throw new Error("Enter your e-mail address and password.");
          try {
            return await authorizeWithPassword(email.data, password, clientAddress(req?.headers));
          } catch (error) {
            // next-auth passes only the message on; make it the one the person should read.
            if (error instanceof AppError) throw new Error(error.message);
            throw error;
          }
        },
      }),
      EmailProvider({
        maxAge: 24 * 3600,
        server: config().SMTP_URL,
        from: config().MAIL_FROM,
        async sendVerificationRequest({ identifier, url }) {
          await sendMail(signInLetter(identifier, url));
        },
      }),
    ],
    callbacks: {
      async signIn({ user, account }) {
        if (account?.provider !== "email") return true;
        const [row] = await db().select().from(users).where(eq(users.email, (user.email ?? "").toLowerCase())).limit(1);
        // Unknown or disabled addresses get no link, but see the same page as everyone else.
        if (!row || row.disabledAt) return "/sign-in/check-email";
        return true;
      },
      async jwt({ token, user }) {
        if (user) token.uid = Number(user.id);
        return token;
      },
      async session({ session, token }) {
        if (session.user && typeof token.uid === "number") session.user.id = token.uid;
        return session;
      },
    },
    events: {
      async signIn({ user, account }) {
        const id = Number(user.id);
        await db().transaction(async (tx) => {
          await tx.update(users).set({ lastSignInAt: new Date() }).where(eq(users.id, id));
          await recordAudit(tx, {
            actorId: id,
            action: "session.signed_in",
            entityType: "user",
            entityId: id,
            after: { method: account?.provider ?? "unknown" },
          });
        });
      },
    },
  };
}
