"use client";

import Link from "next/link";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";

// Used twice: a password reset (token only) and an accepted invitation (token, name and password).
export function ChoosePasswordForm({ token, mode, email }: { token: string; mode: "reset" | "invitation"; email?: string }) {
  const [done, setDone] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const password = String(form.get("password") ?? "");
    if (password !== String(form.get("confirm") ?? "")) {
      setError(new ApiError(400, "invalid_input", "The two passwords differ.", { confirm: ["Type the same password twice."] }));
      return;
    }
    setBusy(true);
    setError(null);
    try {
      if (mode === "reset") await api("/api/account/password", { body: { token, password } });
      else await api("/api/invitations/accept", { body: { token, password, name: String(form.get("name") ?? "") } });
      setDone(true);
    } catch (err) {
      setError(err instanceof ApiError ? err : new ApiError(0, "network", "The server could not be reached."));
    } finally {
      setBusy(false);
    }
  }

  if (done) {
    return (
      <Notice tone="ok">
        {mode === "reset" ? "Your new password is set." : "Your account is ready."} <Link href="/sign-in">Sign in now</Link>.
      </Notice>
    );
  }
  return (
    <form onSubmit={submit} className="grid gap-4">
      {error && <Notice tone="warn">{error.message}</Notice>}
      {email && <input type="hidden" name="username" value={email} autoComplete="username" />}
      {mode === "invitation" && <TextField label="Your name, as colleagues should see it" name="name" autoComplete="name" required errors={error?.fields.name} />}
      <TextField label="New password" name="password" type="password" autoComplete="new-password" minLength={10} required hint="At least 10 characters." errors={error?.fields.password} />
      <TextField label="The same password again" name="confirm" type="password" autoComplete="new-password" required errors={error?.fields.confirm} />
      <div>
        <Button type="submit" disabled={busy}>
          {busy ? "Saving…" : mode === "reset" ? "Set the new password" : "Create my account"}
        </Button>
      </div>
    </form>
  );
}
