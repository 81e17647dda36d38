"use client";

import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";

type Mode = "immediate" | "daily" | "off";
type Choice = { notify: Mode; version: number; waiting: number };

const MODES: { value: Mode; label: string; hint: string }[] = [
  { value: "immediate", label: "Each notice at once", hint: "A letter for every region proposed for review, every decision on your work and every reply in a discussion you took part in." },
  { value: "daily", label: "One letter a day", hint: "Everything gathered into one digest, sent at 06:00 UTC when something happened." },
  { value: "off", label: "No e-mail", hint: "Cordarium does not write to you about reviews or discussions. Sign-in links and password resets still come." },
];

const WORDS: Record<Mode, string> = { immediate: "each notice at once", daily: "one letter a day", off: "no e-mail" };

export function NotificationChoiceForm({ initial }: { initial: Choice }) {
  const [saved, setSaved] = useState(initial);
  const [chosen, setChosen] = useState<Mode>(initial.notify);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ tone: "ok" | "warn"; text: string } | null>(null);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setBusy(true);
    setMessage(null);
    try {
      const next = await api<Choice>("/api/account/notifications", { method: "PATCH", body: { version: saved.version, notify: chosen } });
      setSaved(next);
      setMessage({ tone: "ok", text: `Saved: ${WORDS[next.notify]}.` });
    } catch (error) {
      if (error instanceof ApiError && error.status === 409 && error.body.current) {
        // Keep what the person picked; show what is stored and let them save again on purpose.
        const current = error.body.current as Choice;
        setSaved(current);
        setMessage({ tone: "warn", text: `${error.message} Saved now: ${WORDS[current.notify]}. Save again to replace it with your choice.` });
      } else {
        setMessage({ tone: "warn", text: error instanceof ApiError ? error.message : "The server could not be reached; nothing was changed." });
      }
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-4">
      <fieldset className="flex flex-col gap-3">
        <legend className="mb-2 text-sm font-semibold text-ink-soft">E-mail about reviews and discussions</legend>
        {MODES.map((m) => (
          <label key={m.value} className="flex cursor-pointer gap-3 rounded border border-rule bg-card p-3 has-[:checked]:border-accent has-[:checked]:bg-accent-wash">
            <input type="radio" name="notify" value={m.value} checked={chosen === m.value} onChange={() => setChosen(m.value)} className="mt-1" />
            <span>
              <span className="block font-semibold">{m.label}</span>
              <span className="block text-sm text-ink-soft">{m.hint}</span>
            </span>
          </label>
        ))}
      </fieldset>
      {saved.waiting > 0 && (
        <p className="text-sm text-ink-soft">
          {saved.waiting === 1 ? "One notice waits" : `${saved.waiting} notices wait`} for a letter. With “each notice at once” they go now; with “one letter a day”, in the next digest.
        </p>
      )}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={busy}>
          {busy ? "Saving…" : "Save the choice"}
        </Button>
      </div>
      <div aria-live="polite">{message && <Notice tone={message.tone}>{message.text}</Notice>}</div>
    </form>
  );
}
