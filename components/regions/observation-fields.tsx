"use client";

// The controls of one observation: which aspect (grouped by section), its value in the form its kind
// takes (a term from the list, a whole number, or words), and how sure the describer is.
import { inputClass } from "@/components/ui/field";
import { CONFIDENCE_WORDS, type Confidence, type ObservationInput } from "@/lib/regions/types";
import type { Vocabulary, VocabularyAspect } from "./use-vocabulary";

const small = `${inputClass} py-1 text-sm`;

export function AspectPicker({ id, value, vocabulary, onChange }: { id: string; value: number | null; vocabulary: Vocabulary; onChange(aspectId: number | null): void }) {
  return (
    <select id={id} className={small} value={value ?? ""} onChange={(e) => onChange(e.target.value ? Number(e.target.value) : null)}>
      <option value="">Choose what you observe…</option>
      {vocabulary.sections.map(({ section, label, aspects }) => (
        <optgroup key={section} label={label}>
          {aspects
            .filter((a) => !a.deprecated || a.id === value)
            .map((a) => (
              <option key={a.id} value={a.id} title={a.description ?? undefined}>
                {a.label}
              </option>
            ))}
        </optgroup>
      ))}
    </select>
  );
}

type ValueProps = { id: string; aspect: VocabularyAspect; value: ObservationInput; onChange(change: Partial<ObservationInput>): void };

/** A term select, a number, or a line of text, as the aspect's kind says. */
export function ObservationValue({ id, aspect, value, onChange }: ValueProps) {
  if (aspect.kind === "terms") {
    return (
      <select id={id} className={small} value={value.termId ?? ""} onChange={(e) => onChange({ termId: e.target.value ? Number(e.target.value) : null })}>
        <option value="">Choose…</option>
        {aspect.terms
          // Deprecated and merged terms are not offered, but one already recorded stays shown.
          .filter((t) => (!t.deprecated && t.mergedIntoId === null) || t.id === value.termId)
          .map((t) => (
            <option key={t.id} value={t.id} title={t.description ?? undefined}>
              {t.label}
            </option>
          ))}
      </select>
    );
  }
  if (aspect.kind === "count") {
    return (
      <input
        id={id}
        type="number"
        inputMode="numeric"
        min={0}
        max={999}
        step={1}
        className={small}
        value={value.count ?? ""}
        onChange={(e) => onChange({ count: e.target.value === "" ? null : Math.trunc(Number(e.target.value)) })}
      />
    );
  }
  return <input id={id} type="text" maxLength={500} className={small} value={value.text ?? ""} onChange={(e) => onChange({ text: e.target.value })} />;
}

const CONFIDENCES = Object.keys(CONFIDENCE_WORDS) as Confidence[];

/** Three radio buttons; none is chosen for the describer. */
export function ConfidenceChoice({ name, value, onChange }: { name: string; value: Confidence | null; onChange(c: Confidence): void }) {
  return (
    <fieldset className="flex flex-wrap items-center gap-3 text-sm">
      <legend className="sr-only">Confidence</legend>
      <span aria-hidden="true" className="font-semibold text-ink-soft">
        Confidence
      </span>
      {CONFIDENCES.map((c) => (
        <label key={c} className="inline-flex items-center gap-1">
          <input type="radio" name={name} value={c} checked={value === c} onChange={() => onChange(c)} className="accent-accent" />
          {CONFIDENCE_WORDS[c]}
        </label>
      ))}
    </fieldset>
  );
}

/** Is the observation whole enough to save (the server checks it again)? */
export function isComplete(o: Partial<ObservationInput>, aspect: VocabularyAspect | undefined): o is ObservationInput {
  if (!aspect || !o.confidence) return false;
  if (aspect.kind === "terms") return typeof o.termId === "number";
  if (aspect.kind === "count") return typeof o.count === "number" && o.count >= 0;
  return typeof o.text === "string" && o.text.trim().length > 0;
}
