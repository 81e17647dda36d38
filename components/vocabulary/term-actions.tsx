"use client";

// An editor's controls under one term: edit, move, deprecate or reinstate, merge, delete.
import { useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import type { TermView } from "@/lib/vocabulary/types";
import { MergeForm } from "./merge-form";
import { DeleteConfirm, deleteJson, MoveButtons, patchJson, smallButton, type OrderEntry } from "./record-controls";
import { TermForm } from "./term-form";
import { useVocabularyCall } from "./use-vocabulary-call";

type Mode = "idle" | "edit" | "merge" | "delete";

// The term's own words come in as children, so that the buttons sit beside them and the forms open below.
export function TermActions({ term, aspect, order, candidates, children }: { term: TermView; aspect: { id: number; label: string }; order: OrderEntry[]; candidates: { id: number; label: string }[]; children: ReactNode }) {
  const [mode, setMode] = useState<Mode>("idle");
  const [done, setDone] = useState<string | null>(null);
  const { busy, problem, run } = useVocabularyCall();
  const merged = term.mergedIntoId !== null;

  const act = async (work: () => Promise<unknown>, message: string) => {
    setDone(null);
    if (await run(work)) {
      setMode("idle");
      setDone(message);
    }
  };
  const setDeprecated = (deprecated: boolean) =>
    act(() => patchJson(`/api/vocabulary/terms/${term.id}`, { version: term.version, deprecated }), deprecated ? `Deprecated ${term.label}.` : `Reinstated ${term.label}.`);

  return (
    <div className="grid gap-2">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0 flex-1">{children}</div>
        <div className="flex flex-wrap items-center gap-1.5">
          <Button type="button" variant="quiet" className={smallButton} aria-label={`Edit ${term.label}`} onClick={() => setMode(mode === "edit" ? "idle" : "edit")}>
            Edit
          </Button>
          <MoveButtons
            label={term.label}
            list={order}
            id={term.id}
            busy={busy}
            send={(next) => act(() => api(`/api/vocabulary/aspects/${aspect.id}/order`, { body: { terms: next } }), `Moved ${term.label}.`)}
          />
          {!merged && (
            <Button type="button" variant="quiet" className={smallButton} disabled={busy} aria-label={`${term.deprecated ? "Reinstate" : "Deprecate"} ${term.label}`} onClick={() => setDeprecated(!term.deprecated)}>
              {term.deprecated ? "Reinstate" : "Deprecate"}
            </Button>
          )}
          {!merged && (
            <Button type="button" variant="quiet" className={smallButton} aria-label={`Merge ${term.label}`} onClick={() => setMode(mode === "merge" ? "idle" : "merge")}>
              Merge…
            </Button>
          )}
          {term.usage === 0 && (
            <Button type="button" variant="danger" className={smallButton} aria-label={`Delete ${term.label}`} onClick={() => setMode("delete")}>
              Delete
            </Button>
          )}
        </div>
      </div>
      {mode === "edit" && <TermForm aspect={aspect} term={term} onDone={() => setMode("idle")} />}
      {mode === "merge" && (
        <MergeForm
          term={term}
          candidates={candidates}
          onCancel={() => setMode("idle")}
          onMerged={(message) => act(async () => undefined, message)}
        />
      )}
      {mode === "delete" && (
        <DeleteConfirm label={term.label} busy={busy} onCancel={() => setMode("idle")} onConfirm={() => act(() => deleteJson(`/api/vocabulary/terms/${term.id}`, { version: term.version }), `Deleted ${term.label}.`)} />
      )}
      <div aria-live="polite">
        {problem && <Notice tone="warn">{problem}</Notice>}
        {done && <Notice tone="ok">{done}</Notice>}
      </div>
    </div>
  );
}
