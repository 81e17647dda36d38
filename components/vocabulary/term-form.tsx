"use client";

// Adds a term to an aspect's list, or rewords one with the version it was opened at.
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { ConflictPanel } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { SaveButtons } from "@/components/forms/save-buttons";
import { useVersionedForm } from "@/components/forms/use-versioned-form";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { keyFromLabel, termCreateSchema, termFieldsSchema } from "@/lib/vocabulary/schemas";
import type { TermView } from "@/lib/vocabulary/types";

type Values = { key: string; label: string; description: string };
const LABELS: Record<keyof Values, string> = { key: "Key", label: "Label", description: "Description" };
const toValues = (t?: TermView): Values => ({ key: t?.key ?? "", label: t?.label ?? "", description: t?.description ?? "" });

export function TermForm({ aspect, term, onDone }: { aspect: { id: number; label: string }; term?: TermView; onDone?: () => void }) {
  const router = useRouter();
  const [saved, setSaved] = useState<string | null>(null);
  const keyTyped = useRef(false);
  const { form, submit, refusal, conflict } = useVersionedForm({
    schema: term ? termFieldsSchema : termCreateSchema,
    stored: term,
    toValues,
    labels: LABELS,
    compared: ["label", "description"],
    async send(fields, version) {
      setSaved(null);
      let next: number | undefined;
      if (term) {
        const body = { label: fields.label, description: fields.description, version };
        const res = await api<{ term: TermView }>(`/api/vocabulary/terms/${term.id}`, { method: "PATCH", body });
        next = res.term.version;
        onDone?.();
      } else {
        const res = await api<{ term: TermView }>(`/api/vocabulary/aspects/${aspect.id}/terms`, { body: fields });
        form.reset(toValues());
        keyTyped.current = false;
        setSaved(`Added ${res.term.label} to ${aspect.label}.`);
      }
      router.refresh();
      return next;
    },
  });
  const { register, setValue, formState } = form;
  const e = formState.errors;

  // Until the editor types a key of their own, it follows the label.
  const labelField = register("label", {
    onChange: (event: { target: { value: string } }) => {
      if (!term && !keyTyped.current) setValue("key", keyFromLabel(event.target.value));
    },
  });
  const keyField = register("key", { onChange: () => (keyTyped.current = true) });
  const name = term ? `Edit term ${term.label}` : `Add a term to ${aspect.label}`;

  return (
    <form onSubmit={submit} noValidate aria-label={name} className="grid gap-3 sm:grid-cols-2">
      {conflict && (
        <div className="sm:col-span-2">
          <ConflictPanel what="term" {...conflict} />
        </div>
      )}
      <FormField label="Label" error={e.label?.message}>
        <input {...inputProps(e.label)} {...labelField} />
      </FormField>
      {term ? (
        <p className="self-end pb-2 text-sm text-ink-soft">
          Key <code className="font-mono">{term.key}</code> (fixed)
        </p>
      ) : (
        <FormField label="Key" hint="Lowercase letters, digits and _; it never changes." error={e.key?.message}>
          <input {...inputProps(e.key, "font-mono")} {...keyField} />
        </FormField>
      )}
      <FormField label="Description" className="sm:col-span-2" error={e.description?.message}>
        <input {...inputProps(e.description)} {...register("description")} />
      </FormField>
      <SaveButtons label={term ? "Save term" : "Add term"} busy={formState.isSubmitting} onCancel={onDone} className="flex flex-wrap gap-2 sm:col-span-2" />
      <div className="sm:col-span-2" aria-live="polite">
        {refusal && <Notice tone="warn">{refusal}</Notice>}
        {saved && <Notice tone="ok">{saved}</Notice>}
      </div>
    </form>
  );
}
