"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";

export function RequestResetForm() {
  const [sent, setSent] = useState<string | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const email = String(new FormData(e.currentTarget).get("email") ?? "");
    setBusy(true);
    setError(null);
    try {
      await api("/api/account/password-reset", { body: { email } });
      setSent(email);
    } catch (err) {
      setError(err instanceof ApiError ? err : new ApiError(0, "network", "The server could not be reached."));
    } finally {
      setBusy(false);
    }
  }

  if (sent) {
    return (
      <Notice tone="ok">
        If <strong>{sent}</strong> belongs to an account, a link to choose a new password is on its way. It expires in one hour.
      </Notice>
    );
  }
  return (
    <form onSubmit={submit} className="grid gap-4">
      {error && <Notice tone="warn">{error.message}</Notice>}
      <TextField label="E-mail address" name="email" type="email" autoComplete="email" required errors={error?.fields.email} />
      <div>
        <Button type="submit" disabled={busy}>
          {busy ? "Sending…" : "Send me a reset link"}
        </Button>
      </div>
    </form>
  );
}
