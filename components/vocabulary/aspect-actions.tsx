"use client";

// An editor's controls under one aspect: edit, move within its section, deprecate or reinstate,
// delete while unused, and add a term to its list.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import type { AspectView } from "@/lib/vocabulary/types";
import { AspectForm } from "./aspect-form";
import { DeleteConfirm, deleteJson, MoveButtons, patchJson, smallButton, type OrderEntry } from "./record-controls";
import { TermForm } from "./term-form";
import { useVocabularyCall } from "./use-vocabulary-call";

type Mode = "idle" | "edit" | "add-term" | "delete";

export function AspectActions({ aspect, order }: { aspect: AspectView; order: OrderEntry[] }) {
  const [mode, setMode] = useState<Mode>("idle");
  const [done, setDone] = useState<string | null>(null);
  const { busy, problem, run } = useVocabularyCall();
  const toggle = (m: Mode) => setMode(mode === m ? "idle" : m);

  const act = async (work: () => Promise<unknown>, message: string) => {
    setDone(null);
    if (await run(work)) {
      setMode("idle");
      setDone(message);
    }
  };

  return (
    <div className="mt-3 grid gap-2 border-t-2 border-rule pt-3">
      <div className="flex flex-wrap items-center gap-2">
        <Button type="button" variant="quiet" className={smallButton} aria-label={`Edit ${aspect.label}`} onClick={() => toggle("edit")}>
          Edit aspect
        </Button>
        <MoveButtons
          label={aspect.label}
          list={order}
          id={aspect.id}
          busy={busy}
          send={(next) => act(() => api("/api/vocabulary/order", { body: { section: aspect.section, aspects: next } }), `Moved ${aspect.label}.`)}
        />
        <Button
          type="button"
          variant="quiet"
          className={smallButton}
          disabled={busy}
          aria-label={`${aspect.deprecated ? "Reinstate" : "Deprecate"} ${aspect.label}`}
          onClick={() =>
            act(
              () => patchJson(`/api/vocabulary/aspects/${aspect.id}`, { version: aspect.version, deprecated: !aspect.deprecated }),
              aspect.deprecated ? `Reinstated ${aspect.label}.` : `Deprecated ${aspect.label}.`,
            )
          }
        >
          {aspect.deprecated ? "Reinstate" : "Deprecate"}
        </Button>
        {aspect.usage === 0 && (
          <Button type="button" variant="danger" className={smallButton} aria-label={`Delete ${aspect.label}`} onClick={() => setMode("delete")}>
            Delete
          </Button>
        )}
        {aspect.kind === "terms" && (
          <Button type="button" className={smallButton} onClick={() => toggle("add-term")} aria-expanded={mode === "add-term"}>
            Add a term
          </Button>
        )}
      </div>
      {mode === "edit" && <AspectForm aspect={aspect} onDone={() => setMode("idle")} />}
      {mode === "add-term" && <TermForm aspect={aspect} onDone={() => setMode("idle")} />}
      {mode === "delete" && (
        <DeleteConfirm
          label={aspect.label}
          busy={busy}
          onCancel={() => setMode("idle")}
          onConfirm={() => act(() => deleteJson(`/api/vocabulary/aspects/${aspect.id}`, { version: aspect.version }), `Deleted ${aspect.label}.`)}
        />
      )}
      <div aria-live="polite">
        {problem && <Notice tone="warn">{problem}</Notice>}
        {done && <Notice tone="ok">{done}</Notice>}
      </div>
    </div>
  );
}
