"use client";

// Start a dossier, or rename and describe one (the owner), with the 409 comparison when another window
// saved first.
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { ConflictPanel, type Comparison } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import { dossierFieldsSchema, type DossierFields } from "@/lib/dossiers/schemas";

type Values = { title: string; description: string };
type Stored = { id: number; version: number; title: string; description: string | null };
const LABELS: Record<keyof Values, string> = { title: "title", description: "description" };
const toValues = (d?: Partial<Stored>): Values => ({ title: d?.title ?? "", description: d?.description ?? "" });

export function DossierForm({ existing, onDone }: { existing?: Stored; onDone?: () => void }) {
  const router = useRouter();
  const [version, setVersion] = useState(existing?.version ?? 0);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ theirs: Stored; rows: Comparison } | null>(null);
  const { register, handleSubmit, setError, getValues, formState } = useForm<Values, unknown, DossierFields>({
    resolver: zodResolver(dossierFieldsSchema) as unknown as Resolver<Values, unknown, DossierFields>,
    defaultValues: toValues(existing),
    mode: "onTouched",
  });
  const e = formState.errors;

  async function save(fields: DossierFields, asVersion = version) {
    setRefusal(null);
    try {
      if (existing) {
        await api(`/api/dossiers/${existing.id}`, { method: "PATCH", body: { ...fields, version: asVersion } });
        onDone?.();
        router.refresh();
      } else {
        const res = await api<{ dossier: Stored }>("/api/dossiers", { body: fields });
        router.push(`/dossiers/${res.dossier.id}`);
      }
    } catch (error) {
      if (!(error instanceof ApiError)) return setRefusal("The server could not be reached. Nothing was saved.");
      if (error.status === 409 && error.body.current) {
        const theirs = error.body.current as Stored;
        const stored = toValues(theirs);
        const mine = getValues();
        const rows = (Object.keys(stored) as (keyof Values)[])
          .filter((k) => stored[k].trim() !== mine[k].trim())
          .map((k) => ({ field: k, label: LABELS[k], theirs: stored[k], yours: mine[k] }));
        return setConflict({ theirs, rows });
      }
      for (const [field, messages] of Object.entries(error.fields)) setError(field as keyof Values, { message: messages.join(" ") });
      setRefusal(`${error.message} Nothing was saved; your entries are still here.`);
    }
  }

  return (
    <form onSubmit={handleSubmit((f) => save(f))} noValidate className="grid max-w-2xl gap-4">
      {conflict && (
        <ConflictPanel
          what="dossier"
          rows={conflict.rows}
          onLoadTheirs={() => window.location.reload()}
          onKeepMine={() => {
            setVersion(conflict.theirs.version);
            setConflict(null);
            void handleSubmit((f) => save(f, conflict.theirs.version))();
          }}
        />
      )}
      {refusal && <Notice tone="warn">{refusal}</Notice>}
      <FormField label="Title" error={e.title?.message}>
        <input {...inputProps(e.title)} {...register("title")} />
      </FormField>
      <FormField label="Description" hint="What the study is about; readers of the dossier see it first." error={e.description?.message}>
        <textarea rows={3} {...inputProps(e.description)} {...register("description")} />
      </FormField>
      <div className="flex gap-2">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : existing ? "Save title and description" : "Start the dossier"}
        </Button>
        {onDone && (
          <Button type="button" variant="quiet" onClick={onDone}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
