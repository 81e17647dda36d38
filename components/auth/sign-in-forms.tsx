"use client";

import { signIn } from "next-auth/react";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";

export function SignInForms({ callbackUrl, initialError }: { callbackUrl: string; initialError?: string }) {
  const router = useRouter();
  const [error, setError] = useState(initialError);
  const [busy, setBusy] = useState<"password" | "link" | null>(null);

  async function withPassword(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setBusy("password");
    setError(undefined);
    const res = await signIn("credentials", {
      email: String(form.get("email") ?? ""),
      password: String(form.get("password") ?? ""),
      redirect: false,
    });
    setBusy(null);
    if (!res || res.error) {
      setError(res?.error && res.error !== "CredentialsSignin" ? res.error : "Sign-in failed. Check the e-mail address and password.");
      return;
    }
    router.push(callbackUrl);
    router.refresh();
  }

  async function withLink(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const email = String(new FormData(e.currentTarget).get("email") ?? "").trim();
    setBusy("link");
    setError(undefined);
    const res = await signIn("email", { email, redirect: false, callbackUrl });
    setBusy(null);
    if (res?.error) {
      setError(res.error === "EmailSignin" ? "The sign-in link could not be sent. Try again in a moment." : "Enter a valid e-mail address.");
      return;
    }
    router.push(`/sign-in/check-email?email=${encodeURIComponent(email)}`);
  }

  return (
    <div className="grid gap-8">
      {error && <Notice tone="warn">{error}</Notice>}
      <form onSubmit={withPassword} className="grid gap-4" aria-labelledby="password-heading">
        <h2 id="password-heading" className="text-xl">
          With your password
        </h2>
        <TextField label="E-mail address" name="email" type="email" autoComplete="username" required />
        <TextField label="Password" name="password" type="password" autoComplete="current-password" required />
        <div className="flex flex-wrap items-center justify-between gap-3">
          <Button type="submit" disabled={busy !== null}>
            {busy === "password" ? "Signing in…" : "Sign in"}
          </Button>
          <Link href="/forgot-password" className="text-sm">
            Forgotten your password?
          </Link>
        </div>
      </form>
      <form onSubmit={withLink} className="grid gap-4 border-t border-rule pt-6" aria-labelledby="link-heading">
        <h2 id="link-heading" className="text-xl">
          With a link by e-mail
        </h2>
        <p className="text-sm text-ink-soft">We send a link that signs you in once, without a password.</p>
        <TextField label="E-mail address" name="email" type="email" autoComplete="email" required />
        <div>
          <Button type="submit" variant="quiet" disabled={busy !== null}>
            {busy === "link" ? "Sending…" : "Send me a sign-in link"}
          </Button>
        </div>
      </form>
    </div>
  );
}
