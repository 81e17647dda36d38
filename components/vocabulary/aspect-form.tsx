"use client";

// Adds an aspect, or edits one with the version it was opened at. The server's field errors land on
// the fields; a stale edit shows theirs beside yours and waits for a choice.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { ConflictPanel, type Comparison } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ASPECT_KINDS, ASPECT_SECTIONS, KIND_LABELS, SECTION_LABELS } from "@/lib/vocabulary/kinds";
import { api, ApiError } from "@/lib/client/api";
import { aspectCreateSchema, aspectFieldsSchema, keyFromLabel, type AspectCreate } from "@/lib/vocabulary/schemas";
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
  const [version, setVersion] = useState(aspect?.version ?? 0);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ theirs: AspectView; rows: Comparison } | null>(null);
  const schema = aspect ? aspectFieldsSchema : aspectCreateSchema;
  const { register, handleSubmit, setError, getValues, setValue, reset, formState } = useForm<Values, unknown, AspectCreate>({
    resolver: zodResolver(schema) as unknown as Resolver<Values, unknown, AspectCreate>,
    defaultValues: toValues(aspect),
    mode: "onTouched",
  });
  const e = formState.errors;

  async function save(fields: AspectCreate, asVersion = version) {
    setRefusal(null);
    setSaved(null);
    try {
      if (aspect) {
        const change = { label: fields.label, description: fields.description, kind: fields.kind, section: fields.section };
        const res = await api<{ aspect: AspectView }>(`/api/vocabulary/aspects/${aspect.id}`, { method: "PATCH", body: { ...change, version: asVersion } });
        setVersion(res.aspect.version);
        onDone?.();
      } else {
        const res = await api<{ aspect: AspectView }>("/api/vocabulary", { body: fields });
        reset(toValues());
        keyTyped.current = false;
        setSaved(`Added the aspect ${res.aspect.label}.`);
      }
      router.refresh();
    } catch (error) {
      if (!(error instanceof ApiError)) return setRefusal("The server could not be reached. Nothing was saved.");
      if (error.status === 409 && error.body.current) {
        const theirs = error.body.current as AspectView;
        const stored = toValues(theirs);
        const mine = getValues();
        const rows = (["label", "description", "kind", "section"] as const)
          .filter((k) => stored[k] !== mine[k])
          .map((k) => ({ field: k, label: LABELS[k], theirs: shown(k, stored), yours: shown(k, mine) }));
        return setConflict({ theirs, rows });
      }
      for (const [field, messages] of Object.entries(error.fields)) {
        if (field in LABELS) setError(field as keyof Values, { message: messages.join(" ") });
      }
      setRefusal(`${error.message} Nothing was saved; your entries are still here.`);
    }
  }

  // Until the editor types a key of their own, it follows the label.
  const keyTyped = useRef(false);
  const labelField = register("label", {
    onChange: (event: { target: { value: string } }) => {
      if (!aspect && !keyTyped.current) setValue("key", keyFromLabel(event.target.value));
    },
  });
  const keyField = register("key", { onChange: () => (keyTyped.current = true) });

  return (
    <form onSubmit={handleSubmit((f) => save(f))} noValidate aria-label={aspect ? `Edit aspect ${aspect.label}` : "Add an aspect"} className="grid gap-3 sm:grid-cols-2">
      {conflict && (
        <div className="sm:col-span-2">
          <ConflictPanel
            what="aspect"
            rows={conflict.rows}
            onLoadTheirs={() => {
              reset(toValues(conflict.theirs));
              setVersion(conflict.theirs.version);
              setConflict(null);
              router.refresh();
            }}
            onKeepMine={() => {
              setVersion(conflict.theirs.version);
              setConflict(null);
              void handleSubmit((f) => save(f, conflict.theirs.version))();
            }}
          />
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
      <div className="flex flex-wrap gap-2 sm:col-span-2">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : aspect ? "Save aspect" : "Add aspect"}
        </Button>
        {onDone && (
          <Button type="button" variant="quiet" onClick={onDone}>
            Cancel
          </Button>
        )}
      </div>
      <div className="sm:col-span-2" aria-live="polite">
        {refusal && <Notice tone="warn">{refusal}</Notice>}
        {saved && <Notice tone="ok">{saved}</Notice>}
      </div>
    </form>
  );
}
