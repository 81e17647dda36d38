"use client";

// Adds an aspect, or edits one with the version it was opened at. The server's field errors land on
// the fields; a stale edit shows theirs beside yours and waits for a choice.
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { ConflictPanel } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { SaveButtons } from "@/components/forms/save-buttons";
import { useVersionedForm } from "@/components/forms/use-versioned-form";
import { Notice } from "@/components/ui/notice";
import { ASPECT_KINDS, ASPECT_SECTIONS, KIND_LABELS, SECTION_LABELS } from "@/lib/vocabulary/kinds";
import { api } from "@/lib/client/api";
import { aspectCreateSchema, aspectFieldsSchema, keyFromLabel } from "@/lib/vocabulary/schemas";
import type { AspectView } from "@/lib/vocabulary/types";

type Values = { key: string; label: string; description: string; kind: string; section: string };
const LABELS: Record<keyof Values, string> = { key: "Key", label: "Label", description: "Description", kind: "Value", section: "Section" };

const toValues = (a?: AspectView): Values => ({
  key: a?.key ?? "",
  label: a?.label ?? "",
  description: a?.description ?? "",
  kind: a?.kind ?? "terms",
  section: a?.section ?? "instrument",
});
const shown = (field: keyof Values, v: Values) =>
  field === "kind" ? KIND_LABELS[v.kind as AspectView["kind"]] : field === "section" ? SECTION_LABELS[v.section as AspectView["section"]] : v[field];

export function AspectForm({ aspect, onDone }: { aspect?: AspectView; onDone?: () => void }) {
  const router = useRouter();
  const [saved, setSaved] = useState<string | null>(null);
  const { form, submit, refusal, conflict } = useVersionedForm({
    schema: aspect ? aspectFieldsSchema : aspectCreateSchema,
    stored: aspect,
    toValues,
    labels: LABELS,
    compared: ["label", "description", "kind", "section"],
    shown,
    async send(fields, version) {
      setSaved(null);
      let next: number | undefined;
      if (aspect) {
        const change = { label: fields.label, description: fields.description, kind: fields.kind, section: fields.section };
        const res = await api<{ aspect: AspectView }>(`/api/vocabulary/aspects/${aspect.id}`, { method: "PATCH", body: { ...change, version } });
        next = res.aspect.version;
        onDone?.();
      } else {
        const res = await api<{ aspect: AspectView }>("/api/vocabulary", { body: fields });
        form.reset(toValues());
        keyTyped.current = false;
        setSaved(`Added the aspect ${res.aspect.label}.`);
      }
      router.refresh();
      return next;
    },
  });
  const { register, setValue, formState } = form;
  const e = formState.errors;

  // Until the editor types a key of their own, it follows the label.
  const keyTyped = useRef(false);
  const labelField = register("label", {
    onChange: (event: { target: { value: string } }) => {
      if (!aspect && !keyTyped.current) setValue("key", keyFromLabel(event.target.value));
    },
  });
  const keyField = register("key", { onChange: () => (keyTyped.current = true) });

  return (
    <form onSubmit={submit} noValidate aria-label={aspect ? `Edit aspect ${aspect.label}` : "Add an aspect"} className="grid gap-3 sm:grid-cols-2">
      {conflict && (
        <div className="sm:col-span-2">
          <ConflictPanel what="aspect" {...conflict} />
        </div>
      )}
      <FormField label="Label" error={e.label?.message}>
        <input {...inputProps(e.label)} {...labelField} />
      </FormField>
      {aspect ? (
        <p className="self-end pb-2 text-sm text-ink-soft">
          Key <code className="font-mono">{aspect.key}</code> (fixed: exports name the aspect by it)
        </p>
      ) : (
        <FormField label="Key" hint="Lowercase letters, digits and _; it never changes." error={e.key?.message}>
          <input {...inputProps(e.key, "font-mono")} {...keyField} />
        </FormField>
      )}
      <FormField label="Section" error={e.section?.message}>
        <select {...inputProps(e.section)} {...register("section")}>
          {ASPECT_SECTIONS.map((s) => (
            <option key={s} value={s}>
              {SECTION_LABELS[s]}
            </option>
          ))}
        </select>
      </FormField>
      <FormField label="Value" hint="What an observation of this aspect records." error={e.kind?.message}>
        <select {...inputProps(e.kind)} {...register("kind")}>
          {ASPECT_KINDS.map((k) => (
            <option key={k} value={k}>
              {KIND_LABELS[k]}
            </option>
          ))}
        </select>
      </FormField>
      <FormField label="Description" className="sm:col-span-2" error={e.description?.message}>
        <textarea rows={2} {...inputProps(e.description)} {...register("description")} />
      </FormField>
      <SaveButtons label={aspect ? "Save aspect" : "Add aspect"} busy={formState.isSubmitting} onCancel={onDone} className="flex flex-wrap gap-2 sm:col-span-2" />
      <div className="sm:col-span-2" aria-live="polite">
        {refusal && <Notice tone="warn">{refusal}</Notice>}
        {saved && <Notice tone="ok">{saved}</Notice>}
      </div>
    </form>
  );
}
