"use client";

// Who may read the dossier: private, shared with named people, or public; and the people, by e-mail.
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { VISIBILITY_WORDS, type DossierShare, type DossierVisibility, type DossierView } from "@/lib/dossiers/types";
import { DOSSIER_VISIBILITIES } from "@/lib/dossiers/vocab";
import { useDossierCall } from "./use-dossier-call";

type Props = { dossierId: number; version: number; visibility: DossierVisibility; shares: DossierShare[] };

export function DossierSharing({ dossierId, version, visibility, shares }: Props) {
  const { busy, problem, run } = useDossierCall();
  const emailId = useId();
  const [email, setEmail] = useState("");
  const [done, setDone] = useState<string | null>(null);

  async function putShares(emails: string[], then: string, newVisibility?: DossierVisibility) {
    setDone(null);
    const res = await run(() => api<{ dossier: DossierView }>(`/api/dossiers/${dossierId}/shares`, { method: "PUT", body: { version, emails, visibility: newVisibility } }));
    if (res) setDone(then);
    return res;
  }

  async function share(event: React.FormEvent) {
    event.preventDefault();
    const address = email.trim().toLowerCase();
    if (!address) return;
    // Naming someone on a private dossier makes it "shared": otherwise they still could not open it.
    const res = await putShares([...shares.map((s) => s.email), address], `Shared with ${address}.`, visibility === "private" ? "shared" : undefined);
    if (res) setEmail("");
  }

  async function choose(next: DossierVisibility) {
    setDone(null);
    const res = await run(() => api(`/api/dossiers/${dossierId}`, { method: "PATCH", body: { version, visibility: next } }));
    if (res) setDone(`The dossier is now ${next}.`);
  }

  return (
    <section aria-labelledby="sharing-heading" className="rounded border border-rule bg-card p-4">
      <h2 id="sharing-heading" className="text-xl">Who may read it</h2>
      <fieldset className="mt-2" disabled={busy}>
        <legend className="sr-only">Visibility</legend>
        {DOSSIER_VISIBILITIES.map((v) => (
          <label key={v} className="flex items-center gap-2 py-1">
            <input type="radio" name="visibility" value={v} checked={visibility === v} onChange={() => choose(v)} />
            <span>{VISIBILITY_WORDS[v]}</span>
          </label>
        ))}
      </fieldset>
      <h3 className="mt-4 text-base font-semibold">People it is shared with</h3>
      {shares.length === 0 ? (
        <p className="text-sm text-ink-soft">Nobody yet.</p>
      ) : (
        <ul className="mt-1 divide-y divide-rule">
          {shares.map((s) => (
            <li key={s.userId} className="flex items-center justify-between gap-2 py-1 text-sm">
              <span>
                {s.name} <span className="text-ink-faint">{s.email}</span>
              </span>
              <Button
                type="button"
                variant="quiet"
                className="px-3 py-1 text-xs"
                disabled={busy}
                aria-label={`Stop sharing with ${s.name}`}
                onClick={() => putShares(shares.filter((x) => x.userId !== s.userId).map((x) => x.email), `No longer shared with ${s.email}.`)}
              >
                Stop sharing
              </Button>
            </li>
          ))}
        </ul>
      )}
      {visibility === "private" && shares.length > 0 && <p className="mt-1 text-sm text-ink-soft">While the dossier is private, these people cannot open it.</p>}
      <form onSubmit={share} className="mt-3 flex flex-wrap items-end gap-2">
        <div className="flex grow flex-col gap-1">
          <label htmlFor={emailId} className="text-sm font-semibold text-ink-soft">
            Share with (e-mail address of an account)
          </label>
          <input id={emailId} type="email" value={email} onChange={(e) => setEmail(e.target.value)} className={inputClass} autoComplete="off" />
        </div>
        <Button type="submit" disabled={busy || !email.trim()}>
          Share
        </Button>
      </form>
      <div className="mt-2" aria-live="polite">
        {problem && <Notice tone="warn">{problem}</Notice>}
        {done && !problem && <Notice tone="ok">{done}</Notice>}
      </div>
    </section>
  );
}
