"use client";

// "Add to dossier": puts a region or a source into one of the caller's dossiers, or into a new one.
// Usable anywhere a signed-in reader sees a region or a source: <AddToDossier kind="region" id={region.id} />.
// The server checks again that the caller may see what is added.
import { useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { api, ApiError } from "@/lib/client/api";
import type { DossierItemKind, DossierSummary } from "@/lib/dossiers/types";

type Props = { kind: DossierItemKind; id: number; className?: string };
type Mine = { mine: DossierSummary[] };
const NEW = "new";

export function AddToDossier({ kind, id, className = "" }: Props) {
  const panelId = useId();
  const queryClient = useQueryClient();
  const [open, setOpen] = useState(false);
  const [choice, setChoice] = useState<string>("");
  const [title, setTitle] = useState("");
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<{ ok: boolean; text: string; dossier?: { id: number; title: string } } | null>(null);
  const dossiers = useQuery({ queryKey: ["dossiers", "mine"], queryFn: () => api<Mine>("/api/dossiers"), enabled: open });
  const mine = dossiers.data?.mine ?? [];
  const selected = choice || (mine.length ? String(mine[0].id) : NEW);

  async function add(event: React.FormEvent) {
    event.preventDefault();
    setBusy(true);
    setResult(null);
    try {
      let target = mine.find((d) => String(d.id) === selected) as { id: number; title: string } | undefined;
      if (selected === NEW) target = (await api<{ dossier: { id: number; title: string } }>("/api/dossiers", { body: { title } })).dossier;
      const body = kind === "region" ? { kind, regionId: id } : { kind, sourceId: id };
      await api(`/api/dossiers/${target!.id}/items`, { body });
      setResult({ ok: true, text: "Added to", dossier: target });
      setTitle("");
      void queryClient.invalidateQueries({ queryKey: ["dossiers"] });
    } catch (error) {
      const text = error instanceof ApiError ? (error.status === 401 ? "Sign in to collect it in a dossier." : error.message) : "The server could not be reached. Nothing was added.";
      setResult({ ok: false, text });
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className={`relative print:hidden ${className}`}>
      <Button type="button" variant="quiet" aria-expanded={open} aria-controls={panelId} onClick={() => setOpen(!open)}>
        Add to dossier
      </Button>
      {open && (
        <form id={panelId} onSubmit={add} className="absolute z-20 mt-1 grid w-80 gap-2 rounded border border-rule bg-card p-3 text-sm shadow-lg">
          {dossiers.isPending ? (
            <p className="text-ink-soft">Loading your dossiers…</p>
          ) : dossiers.isError ? (
            <p className="text-warn">{dossiers.error instanceof ApiError && dossiers.error.status === 401 ? "Sign in to use dossiers." : "Your dossiers could not be loaded."}</p>
          ) : (
            <>
              <label htmlFor={`${panelId}-dossier`} className="font-semibold text-ink-soft">
                Dossier
              </label>
              <select id={`${panelId}-dossier`} value={selected} onChange={(e) => setChoice(e.target.value)} className={inputClass}>
                {mine.map((d) => (
                  <option key={d.id} value={d.id}>
                    {d.title}
                  </option>
                ))}
                <option value={NEW}>A new dossier…</option>
              </select>
              {selected === NEW && (
                <>
                  <label htmlFor={`${panelId}-title`} className="font-semibold text-ink-soft">
                    Title of the new dossier
                  </label>
                  <input id={`${panelId}-title`} value={title} onChange={(e) => setTitle(e.target.value)} className={inputClass} required maxLength={200} />
                </>
              )}
              <Button type="submit" disabled={busy || (selected === NEW && !title.trim())}>
                {busy ? "Adding…" : `Add this ${kind}`}
              </Button>
            </>
          )}
          <div aria-live="polite">
            {result && (
              <p className={result.ok ? "text-accent-deep" : "text-warn"} role={result.ok ? "status" : "alert"}>
                {result.text}
                {result.dossier && (
                  <>
                    {" "}
                    <Link href={`/dossiers/${result.dossier.id}`}>{result.dossier.title}</Link>.
                  </>
                )}
              </p>
            )}
          </div>
        </form>
      )}
    </div>
  );
}
