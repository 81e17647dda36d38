"use client";

// Start a dossier, or rename and describe one (the owner), with the 409 comparison when another window
// saved first.
import { useRouter } from "next/navigation";
import { ConflictPanel } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { SaveButtons } from "@/components/forms/save-buttons";
import { useVersionedForm } from "@/components/forms/use-versioned-form";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { dossierFieldsSchema } from "@/lib/dossiers/schemas";

type Values = { title: string; description: string };
type Stored = { id: number; version: number; title: string; description: string | null };
const LABELS: Record<keyof Values, string> = { title: "Title", description: "Description" };
const toValues = (d?: Partial<Stored>): Values => ({ title: d?.title ?? "", description: d?.description ?? "" });

export function DossierForm({ existing, onDone }: { existing?: Stored; onDone?: () => void }) {
  const router = useRouter();
  const { form, submit, refusal, conflict } = useVersionedForm({
    schema: dossierFieldsSchema,
    stored: existing,
    toValues,
    labels: LABELS,
    // Stored text comes back trimmed; spaces alone are no difference worth showing.
    reloadForTheirs: true,
    async send(fields, version) {
      if (existing) {
        await api(`/api/dossiers/${existing.id}`, { method: "PATCH", body: { ...fields, version } });
        onDone?.();
        router.refresh();
      } else {
        const res = await api<{ dossier: Stored }>("/api/dossiers", { body: fields });
        router.push(`/dossiers/${res.dossier.id}`);
      }
    },
  });
  const { register, formState } = form;
  const e = formState.errors;

  return (
    <form onSubmit={submit} noValidate className="grid max-w-2xl gap-4">
      {conflict && <ConflictPanel what="dossier" {...conflict} />}
      {refusal && <Notice tone="warn">{refusal}</Notice>}
      <FormField label="Title" error={e.title?.message}>
        <input {...inputProps(e.title)} {...register("title")} />
      </FormField>
      <FormField label="Description" hint="What the study is about; readers of the dossier see it first." error={e.description?.message}>
        <textarea rows={3} {...inputProps(e.description)} {...register("description")} />
      </FormField>
      <SaveButtons label={existing ? "Save title and description" : "Start the dossier"} busy={formState.isSubmitting} onCancel={onDone} className="flex gap-2" />
    </form>
  );
}
