"use client";

import { useRouter } from "next/navigation";
import { ConflictPanel } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { SaveButtons } from "@/components/forms/save-buttons";
import { useVersionedForm } from "@/components/forms/use-versioned-form";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { collectionFieldsSchema } from "@/lib/collections/schemas";

type Values = { name: string; city: string; countryCode: string; url: string; notes: string };
type Stored = { id: number; version: number; name: string; city: string | null; countryCode: string | null; url: string | null; notes: string | null };

// The comparison's row names are the fields' own labels.
const LABELS: Record<keyof Values, string> = { name: "Name", city: "City", countryCode: "Country", url: "Web address", notes: "Notes" };
const toValues = (c?: Partial<Stored>): Values => ({ name: c?.name ?? "", city: c?.city ?? "", countryCode: c?.countryCode ?? "", url: c?.url ?? "", notes: c?.notes ?? "" });

export function CollectionForm({ countries, existing }: { countries: { code: string; name: string }[]; existing?: Stored }) {
  const router = useRouter();
  const { form, submit, refusal, conflict } = useVersionedForm({
    schema: collectionFieldsSchema,
    stored: existing,
    toValues,
    labels: LABELS,
    // A country reads by its name, as the list shows it.
    shown: (field, values) => (field === "countryCode" ? (countries.find((c) => c.code === values.countryCode)?.name ?? values.countryCode) : values[field]),
    reloadForTheirs: true,
    async send(fields, version) {
      const res = existing
        ? await api<{ collection: Stored }>(`/api/collections/${existing.id}`, { method: "PATCH", body: { ...fields, version } })
        : await api<{ collection: Stored }>("/api/collections", { body: fields });
      router.push(`/collections/${res.collection.id}`);
      router.refresh();
    },
  });
  const { register, formState } = form;
  const e = formState.errors;

  return (
    <form onSubmit={submit} noValidate className="grid max-w-2xl gap-4">
      {conflict && <ConflictPanel what="collection" {...conflict} />}
      {refusal && <Notice tone="warn">{refusal}</Notice>}
      <FormField label="Name" error={e.name?.message}>
        <input {...inputProps(e.name)} {...register("name")} />
      </FormField>
      <div className="grid gap-4 sm:grid-cols-2">
        <FormField label="City" error={e.city?.message}>
          <input {...inputProps(e.city)} {...register("city")} />
        </FormField>
        <FormField label="Country" error={e.countryCode?.message}>
          <select {...inputProps(e.countryCode)} {...register("countryCode")}>
            <option value="">Not recorded</option>
            {countries.map((c) => (
              <option key={c.code} value={c.code}>
                {c.name}
              </option>
            ))}
          </select>
        </FormField>
      </div>
      <FormField label="Web address" error={e.url?.message}>
        <input type="url" {...inputProps(e.url)} {...register("url")} />
      </FormField>
      <FormField label="Notes" hint="Access, photography policy, what the collection is strong in." error={e.notes?.message}>
        <textarea rows={4} {...inputProps(e.notes)} {...register("notes")} />
      </FormField>
      <SaveButtons label={existing ? "Save changes" : "Add the collection"} busy={formState.isSubmitting} />
    </form>
  );
}
