"use client";

// The observations of the selected region: each can be changed in place or removed, and a new one is
// put together below and added when it is whole (an aspect, its value, a confidence). Every change
// replaces the region's list and is saved by the region's saver.
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import type { ObservationInput } from "@/lib/regions/types";
import { AspectPicker, ConfidenceChoice, isComplete, ObservationValue } from "./observation-fields";
import { describeObservation, type Vocabulary } from "./use-vocabulary";

type Props = { observations: ObservationInput[]; vocabulary: Vocabulary; editable: boolean; onChange(next: ObservationInput[]): void };

export function ObservationEditor({ observations, vocabulary, editable, onChange }: Props) {
  const replace = (i: number, change: Partial<ObservationInput>) => onChange(observations.map((o, k) => (k === i ? { ...o, ...change } : o)));
  return (
    <section aria-labelledby="observations-heading" className="grid gap-3">
      <h4 id="observations-heading" className="font-semibold text-ink">
        Observations
      </h4>
      {observations.length === 0 && <p className="text-sm text-ink-faint">None yet.</p>}
      <ul className="grid gap-3">
        {observations.map((o, i) => (
          <ObservationRow key={i} index={i} value={o} vocabulary={vocabulary} editable={editable} onChange={(c) => replace(i, c)} onRemove={() => onChange(observations.filter((_, k) => k !== i))} />
        ))}
      </ul>
      {editable && <NewObservation vocabulary={vocabulary} onAdd={(o) => onChange([...observations, o])} />}
    </section>
  );
}

type RowProps = { index: number; value: ObservationInput; vocabulary: Vocabulary; editable: boolean; onChange(c: Partial<ObservationInput>): void; onRemove(): void };

function ObservationRow({ index, value, vocabulary, editable, onChange, onRemove }: RowProps) {
  const id = useId();
  const aspect = vocabulary.byId.get(value.aspectId);
  const sentence = describeObservation(value, vocabulary);
  if (!editable || !aspect) return <li className="text-sm text-ink-soft">{sentence}</li>;
  return (
    <li data-testid="observation-row" className="grid gap-2 rounded border border-rule bg-paper p-2 text-sm">
      <div className="flex items-baseline justify-between gap-2">
        <label htmlFor={`${id}-value`} className="font-semibold text-ink-soft">
          {aspect.label}
        </label>
        <button type="button" onClick={onRemove} className="text-sm text-warn underline-offset-2 hover:underline" aria-label={`Remove the observation ${sentence}`}>
          Remove
        </button>
      </div>
      <ObservationValue id={`${id}-value`} aspect={aspect} value={value} onChange={onChange} />
      <ConfidenceChoice name={`${id}-confidence-${index}`} value={value.confidence} onChange={(confidence) => onChange({ confidence })} />
      <label className="grid gap-1">
        <span className="text-ink-soft">Note</span>
        <textarea rows={2} maxLength={4000} className={`${inputClass} py-1 text-sm`} value={value.note ?? ""} onChange={(e) => onChange({ note: e.target.value || null })} />
      </label>
    </li>
  );
}

function NewObservation({ vocabulary, onAdd }: { vocabulary: Vocabulary; onAdd(o: ObservationInput): void }) {
  const id = useId();
  const [draft, setDraft] = useState<Partial<ObservationInput>>({});
  const aspect = draft.aspectId ? vocabulary.byId.get(draft.aspectId) : undefined;
  const whole = isComplete(draft, aspect);
  return (
    <fieldset className="grid gap-2 rounded border border-dashed border-rule p-2 text-sm">
      <legend className="px-1 font-semibold text-ink-soft">Add an observation</legend>
      <label htmlFor={`${id}-aspect`} className="text-ink-soft">
        Aspect
      </label>
      <AspectPicker id={`${id}-aspect`} value={draft.aspectId ?? null} vocabulary={vocabulary} onChange={(aspectId) => setDraft(aspectId ? { aspectId, confidence: draft.confidence, note: draft.note } : {})} />
      {aspect?.description && <p className="text-ink-faint">{aspect.description}</p>}
      {aspect && (
        <>
          <label htmlFor={`${id}-value`} className="text-ink-soft">
            {aspect.kind === "terms" ? "Value" : aspect.kind === "count" ? "Number" : "What you see"}
          </label>
          <ObservationValue id={`${id}-value`} aspect={aspect} value={{ confidence: "probable", ...draft, aspectId: aspect.id }} onChange={(c) => setDraft({ ...draft, ...c })} />
          <ConfidenceChoice name={`${id}-confidence`} value={draft.confidence ?? null} onChange={(confidence) => setDraft({ ...draft, confidence })} />
          <label className="grid gap-1">
            <span className="text-ink-soft">Note (optional)</span>
            <textarea rows={2} maxLength={4000} className={`${inputClass} py-1 text-sm`} value={draft.note ?? ""} onChange={(e) => setDraft({ ...draft, note: e.target.value || null })} />
          </label>
        </>
      )}
      <div>
        <Button
          type="button"
          disabled={!whole}
          onClick={() => {
            if (!isComplete(draft, aspect)) return;
            onAdd(draft);
            setDraft({});
          }}
        >
          Add observation
        </Button>
      </div>
    </fieldset>
  );
}
