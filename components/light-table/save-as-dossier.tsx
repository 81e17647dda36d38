"use client";

// "Save as dossier": starts a dossier with the title given and adds the table's regions to it in the
// table's order, one request each through the dossier API (which checks again what the caller may
// see). A region the dossier refuses (proposed work of someone else, which dossiers do not keep) is
// left out and named; any other refusal stops and says how far it got.
import Link from "next/link";
import { useId, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { api, ApiError } from "@/lib/client/api";
import { dossierTitle } from "@/lib/dossiers/schemas";

type Outcome =
  | { ok: true; dossier: { id: number; title: string }; added: number; refused: number[] }
  | { ok: false; text: string; dossier?: { id: number; title: string }; added?: number };

export function SaveAsDossier({ order, nameOf }: { order: number[]; nameOf(id: number): string }) {
  const formId = useId();
  const [open, setOpen] = useState(false);
  const [title, setTitle] = useState("");
  const [titleError, setTitleError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome | null>(null);

  async function save(event: FormEvent) {
    event.preventDefault();
    const checked = dossierTitle.safeParse(title);
    if (!checked.success) return setTitleError(checked.error.issues[0].message);
    setTitleError(null);
    setBusy(true);
    setOutcome(null);
    let dossier: { id: number; title: string } | undefined;
    let added = 0;
    const refused: number[] = [];
    try {
      dossier = (await api<{ dossier: { id: number; title: string } }>("/api/dossiers", { body: { title: checked.data } })).dossier;
      for (const regionId of order) {
        try {
          await api(`/api/dossiers/${dossier.id}/items`, { body: { kind: "region", regionId } });
          added++;
        } catch (error) {
          if (error instanceof ApiError && error.status === 400 && error.fields.regionId) refused.push(regionId);
          else throw error;
        }
      }
      setOutcome({ ok: true, dossier, added, refused });
      setTitle("");
    } catch (error) {
      const why = error instanceof ApiError ? (error.status === 401 ? "Sign in to keep dossiers." : error.fields.title?.join(" ") || error.message) : "The server could not be reached.";
      setOutcome({ ok: false, text: why, dossier, added });
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="relative text-sm">
      <Button type="button" variant="quiet" className="py-1.5" aria-expanded={open} aria-controls={formId} onClick={() => setOpen(!open)}>
        Save as dossier
      </Button>
      {open && (
        <form id={formId} onSubmit={save} aria-label="Save the table as a dossier" className="absolute right-0 z-20 mt-1 grid w-80 gap-2 rounded border border-rule bg-card p-3 shadow-lg">
          <label htmlFor={`${formId}-title`} className="font-semibold text-ink-soft">
            Title of the dossier
          </label>
          <input
            id={`${formId}-title`}
            value={title}
            onChange={(e) => setTitle(e.target.value)}
            aria-invalid={titleError ? true : undefined}
            aria-describedby={titleError ? `${formId}-error` : undefined}
            className={inputClass}
            maxLength={200}
          />
          {titleError && (
            <p id={`${formId}-error`} className="text-warn">
              {titleError}
            </p>
          )}
          <p className="text-ink-faint">The {order.length === 1 ? "region" : `${order.length} regions`} of the table, in this order.</p>
          <Button type="submit" disabled={busy}>
            {busy ? "Saving…" : "Save"}
          </Button>
          <div aria-live="polite">{outcome && <OutcomeNote outcome={outcome} nameOf={nameOf} />}</div>
        </form>
      )}
    </div>
  );
}

function OutcomeNote({ outcome, nameOf }: { outcome: Outcome; nameOf(id: number): string }) {
  const link = outcome.dossier && <Link href={`/dossiers/${outcome.dossier.id}`}>Open “{outcome.dossier.title}”</Link>;
  if (!outcome.ok) {
    return (
      <p className="text-warn">
        {outcome.dossier ? `The dossier was started with ${outcome.added} of the regions, then refused: ${outcome.text} ` : `Not saved: ${outcome.text}`}
        {link}
      </p>
    );
  }
  return (
    <p className="text-accent-deep">
      Saved with {outcome.added} {outcome.added === 1 ? "region" : "regions"}.{" "}
      {outcome.refused.length > 0 && `Left out (proposed work not yet reviewed is not kept in dossiers): ${outcome.refused.map(nameOf).join(", ")}. `}
      {link}
    </p>
  );
}
