"use client";

// Adds a term to an aspect's list, or rewords one with the version it was opened at.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { ConflictPanel, type Comparison } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import { keyFromLabel, termCreateSchema, termFieldsSchema, type TermCreate } from "@/lib/vocabulary/schemas";
import type { TermView } from "@/lib/vocabulary/types";

type Values = { key: string; label: string; description: string };
const LABELS: Record<keyof Values, string> = { key: "Key", label: "Label", description: "Description" };
const toValues = (t?: TermView): Values => ({ key: t?.key ?? "", label: t?.label ?? "", description: t?.description ?? "" });

export function TermForm({ aspect, term, onDone }: { aspect: { id: number; label: string }; term?: TermView; onDone?: () => void }) {
  const router = useRouter();
  const [version, setVersion] = useState(term?.version ?? 0);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ theirs: TermView; rows: Comparison } | null>(null);
  const keyTyped = useRef(false);
  const { register, handleSubmit, setError, getValues, setValue, reset, formState } = useForm<Values, unknown, TermCreate>({
    resolver: zodResolver(term ? termFieldsSchema : termCreateSchema) as unknown as Resolver<Values, unknown, TermCreate>,
    defaultValues: toValues(term),
    mode: "onTouched",
  });
  const e = formState.errors;

  async function save(fields: TermCreate, asVersion = version) {
    setRefusal(null);
    setSaved(null);
    try {
      if (term) {
        const body = { label: fields.label, description: fields.description, version: asVersion };
        const res = await api<{ term: TermView }>(`/api/vocabulary/terms/${term.id}`, { method: "PATCH", body });
        setVersion(res.term.version);
        onDone?.();
      } else {
        const res = await api<{ term: TermView }>(`/api/vocabulary/aspects/${aspect.id}/terms`, { body: fields });
        reset(toValues());
        keyTyped.current = false;
        setSaved(`Added ${res.term.label} to ${aspect.label}.`);
      }
      router.refresh();
    } catch (error) {
      if (!(error instanceof ApiError)) return setRefusal("The server could not be reached. Nothing was saved.");
      if (error.status === 409 && error.body.current) {
        const theirs = error.body.current as TermView;
        const stored = toValues(theirs);
        const mine = getValues();
        const rows = (["label", "description"] as const)
          .filter((k) => stored[k] !== mine[k])
          .map((k) => ({ field: k, label: LABELS[k], theirs: stored[k], yours: mine[k] }));
        return setConflict({ theirs, rows });
      }
      for (const [field, messages] of Object.entries(error.fields)) {
        if (field in LABELS) setError(field as keyof Values, { message: messages.join(" ") });
      }
      setRefusal(`${error.message} Nothing was saved; your entries are still here.`);
    }
  }

  // Until the editor types a key of their own, it follows the label.
  const labelField = register("label", {
    onChange: (event: { target: { value: string } }) => {
      if (!term && !keyTyped.current) setValue("key", keyFromLabel(event.target.value));
    },
  });
  const keyField = register("key", { onChange: () => (keyTyped.current = true) });
  const name = term ? `Edit term ${term.label}` : `Add a term to ${aspect.label}`;

  return (
    <form onSubmit={handleSubmit((f) => save(f))} noValidate aria-label={name} className="grid gap-3 sm:grid-cols-2">
      {conflict && (
        <div className="sm:col-span-2">
          <ConflictPanel
            what="term"
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
      <div className="flex flex-wrap gap-2 sm:col-span-2">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : term ? "Save term" : "Add term"}
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
