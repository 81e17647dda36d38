"use client";

// Folds one term into another of the same aspect. Says what will happen before it happens: the
// observations naming this term will name the other, and this one is deprecated for good.
import { useId, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import type { TermView } from "@/lib/vocabulary/types";
import { refusalOf } from "./use-vocabulary-call";

type Merged = { term: TermView; into: TermView; observations: number; regionVersions: number };

const observationsPhrase = (n: number) => `${n} observation${n === 1 ? "" : "s"}`;

export function MergeForm({ term, candidates, onMerged, onCancel }: { term: TermView; candidates: { id: number; label: string }[]; onMerged: (message: string) => void; onCancel: () => void }) {
  const selectId = useId();
  const [into, setInto] = useState<string>("");
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const target = candidates.find((c) => String(c.id) === into);

  async function submit(e: FormEvent) {
    e.preventDefault();
    if (!target) return setProblem("Choose the term to merge into.");
    setBusy(true);
    setProblem(null);
    try {
      const res = await api<Merged>(`/api/vocabulary/terms/${term.id}/merge`, { body: { intoTermId: target.id, version: term.version } });
      onMerged(`Merged ${res.term.label} into ${res.into.label}: ${observationsPhrase(res.observations)} rewritten.`);
    } catch (error) {
      setProblem(refusalOf(error));
    } finally {
      setBusy(false);
    }
  }

  if (candidates.length === 0) {
    return <Notice tone="info">This aspect has no other term in use to merge {term.label} into.</Notice>;
  }
  return (
    <form onSubmit={submit} aria-label={`Merge ${term.label}`} className="grid gap-2">
      <label htmlFor={selectId} className="text-sm font-semibold text-ink-soft">
        Merge {term.label} into
      </label>
      <select id={selectId} value={into} onChange={(e) => setInto(e.target.value)} className={inputClass}>
        <option value="">Choose a term…</option>
        {candidates.map((c) => (
          <option key={c.id} value={c.id}>
            {c.label}
          </option>
        ))}
      </select>
      <p className="text-sm text-ink-soft">
        {term.usage !== undefined ? `The ${observationsPhrase(term.usage)} naming ${term.label}` : `Every observation naming ${term.label}`} will name{" "}
        {target ? target.label : "the chosen term"} instead, and {term.label} will be deprecated. The audit trail keeps the record.
      </p>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" variant="danger" disabled={busy || !target}>
          {busy ? "Merging…" : "Merge"}
        </Button>
        <Button type="button" variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
      <div aria-live="polite">{problem && <Notice tone="warn">{problem}</Notice>}</div>
    </form>
  );
}
