"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import { ROLE_LABELS } from "./role-labels";

export function InviteForm() {
  const queryClient = useQueryClient();
  const [error, setError] = useState<ApiError | null>(null);
  const [sent, setSent] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const formElement = e.currentTarget;
    const form = new FormData(formElement);
    setBusy(true);
    setError(null);
    setSent(null);
    try {
      const email = String(form.get("email") ?? "");
      await api("/api/admin/invitations", { body: { email, role: String(form.get("role")) } });
      setSent(email);
      formElement.reset();
      await queryClient.invalidateQueries({ queryKey: ["audit"] });
    } catch (err) {
      setError(err instanceof ApiError ? err : new ApiError(0, "network", "The server could not be reached."));
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="grid gap-3 sm:grid-cols-[2fr_1fr_auto] sm:items-end">
      <TextField label="E-mail address" name="email" type="email" required errors={error?.fields.email} />
      <SelectField label="Role" name="role" defaultValue="reader" errors={error?.fields.role}>
        {Object.entries(ROLE_LABELS).map(([value, label]) => (
          <option key={value} value={value}>
            {label}
          </option>
        ))}
      </SelectField>
      <Button type="submit" disabled={busy}>
        {busy ? "Sending…" : "Send invitation"}
      </Button>
      <div className="sm:col-span-3" aria-live="polite">
        {error && !error.fields.email && <Notice tone="warn">{error.message}</Notice>}
        {sent && <Notice tone="ok">Invitation sent to {sent}.</Notice>}
      </div>
    </form>
  );
}
