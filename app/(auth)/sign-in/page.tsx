import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { SignInForms } from "@/components/auth/sign-in-forms";
import { currentActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };

// next-auth's error codes, said plainly.
const MESSAGES: Record<string, string> = {
  Verification: "This sign-in link is no longer valid: it was used already or has expired. Ask for a new one below.",
  AccessDenied: "This account may not sign in. If it was disabled, ask an administrator.",
  CredentialsSignin: "Sign-in failed. Check the e-mail address and password.",
  SessionRequired: "Sign in to see that page.",
};

const safePath = (p: string | undefined) => (p && p.startsWith("/") && !p.startsWith("//") ? p : "/");

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const params = await searchParams;
  const callbackUrl = safePath(params.callbackUrl);
  if (await currentActor()) redirect(callbackUrl);
  const error = params.error ? (MESSAGES[params.error] ?? "Sign-in failed. Try again.") : undefined;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-6 text-3xl">Sign in to Cordarium</h1>
      <SignInForms callbackUrl={callbackUrl} initialError={error} />
    </div>
  );
}
