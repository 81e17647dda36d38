"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm, type Resolver } from "react-hook-form";
import { ConflictPanel, type Comparison } from "@/components/forms/conflict-panel";
import { FormField, inputProps } from "@/components/forms/form-field";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import { collectionFieldsSchema, type CollectionFields } from "@/lib/collections/schemas";

type Values = { name: string; city: string; countryCode: string; url: string; notes: string };
type Stored = { id: number; version: number; name: string; city: string | null; countryCode: string | null; url: string | null; notes: string | null };

const LABELS: Record<keyof Values, string> = { name: "name", city: "city", countryCode: "country", url: "web address", notes: "notes" };
const toValues = (c?: Partial<Stored>): Values => ({ name: c?.name ?? "", city: c?.city ?? "", countryCode: c?.countryCode ?? "", url: c?.url ?? "", notes: c?.notes ?? "" });

export function CollectionForm({ countries, existing }: { countries: { code: string; name: string }[]; existing?: Stored }) {
  const router = useRouter();
  const [version, setVersion] = useState(existing?.version ?? 0);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ theirs: Stored; rows: Comparison } | null>(null);
  const { register, handleSubmit, setError, getValues, formState } = useForm<Values, unknown, CollectionFields>({
    resolver: zodResolver(collectionFieldsSchema) as unknown as Resolver<Values, unknown, CollectionFields>,
    defaultValues: toValues(existing),
    mode: "onTouched",
  });
  const e = formState.errors;

  async function save(fields: CollectionFields, asVersion = version) {
    setRefusal(null);
    try {
      const res = existing
        ? await api<{ collection: Stored }>(`/api/collections/${existing.id}`, { method: "PATCH", body: { ...fields, version: asVersion } })
        : await api<{ collection: Stored }>("/api/collections", { body: fields });
      router.push(`/collections/${res.collection.id}`);
      router.refresh();
    } catch (error) {
      if (!(error instanceof ApiError)) return setRefusal("The server could not be reached. Nothing was saved.");
      if (error.status === 409 && error.body.current) {
        const theirs = error.body.current as Stored;
        const stored = toValues(theirs);
        const mine = getValues();
        const rows = (Object.keys(stored) as (keyof Values)[])
          .filter((k) => stored[k] !== mine[k])
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
          what="collection"
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
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : existing ? "Save changes" : "Add the collection"}
        </Button>
      </div>
    </form>
  );
}
