"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useFieldArray, useForm, type Resolver } from "react-hook-form";
import { PlacePicker, type PlaceChoice } from "@/components/places/place-picker";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { RIGHTS } from "@/lib/catalogue/rights";
import { api, ApiError } from "@/lib/client/api";
import { sourceFieldsSchema, type SourceFields } from "@/lib/sources/schemas";
import { ATTRIBUTION_LABELS, ATTRIBUTION_QUALIFIERS, DIMENSION_UNITS, OBJECT_TYPE_LABELS, OBJECT_TYPES, SOURCE_FIELD_LABELS } from "@/lib/sources/vocab";
import { ConflictPanel, type Comparison } from "@/components/forms/conflict-panel";
import { DatingPreview } from "./dating-preview";
import { FormField, inputProps } from "@/components/forms/form-field";
import { toFormValues, type SourceFormValues, type StoredSource } from "./form-values";

type Props = {
  collections: { id: number; name: string }[];
  margins: { approximateMarginYears: number; uncertainMarginYears: number };
  /** Editing: the stored source, its version and its place as the picker shows it. */
  existing?: { id: number; version: number; values: StoredSource; place: PlaceChoice | null };
};

type Saved = { source: { id: number; version: number } & StoredSource };

export function SourceForm({ collections, margins, existing }: Props) {
  const router = useRouter();
  const [version, setVersion] = useState(existing?.version ?? 0);
  const [place, setPlace] = useState<PlaceChoice | null>(existing?.place ?? null);
  const [refusal, setRefusal] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ theirs: Saved["source"]; rows: Comparison } | null>(null);
  const form = useForm<SourceFormValues, unknown, SourceFields>({
    resolver: zodResolver(sourceFieldsSchema) as unknown as Resolver<SourceFormValues, unknown, SourceFields>,
    defaultValues: toFormValues(existing?.values),
    mode: "onTouched",
  });
  const { register, handleSubmit, watch, setError, setValue, formState } = form;
  const references = useFieldArray({ control: form.control, name: "bibliography" });
  const errors = formState.errors;

  async function save(fields: SourceFields, asVersion = version) {
    setRefusal(null);
    try {
      const res = existing
        ? await api<Saved>(`/api/sources/${existing.id}`, { method: "PATCH", body: { ...fields, version: asVersion } })
        : await api<Saved>("/api/sources", { body: fields });
      setConflict(null);
      router.push(`/sources/${res.source.id}`);
      router.refresh();
    } catch (error) {
      if (!(error instanceof ApiError)) return setRefusal("The server could not be reached. Nothing was saved; your entries are still here.");
      if (error.status === 409 && error.body.current) return showConflict(error.body.current as Saved["source"]);
      for (const [field, messages] of Object.entries(error.fields)) setError(field as keyof SourceFormValues, { message: messages.join(" ") });
      setRefusal(`${error.message} Nothing was saved; your entries are still here.`);
    }
  }

  function showConflict(theirs: Saved["source"]) {
    const mine = form.getValues();
    const stored = toFormValues(theirs);
    const rows: Comparison = (Object.keys(stored) as (keyof SourceFormValues)[])
      .filter((k) => JSON.stringify(stored[k]) !== JSON.stringify(mine[k]))
      .map((k) => ({ field: k, label: SOURCE_FIELD_LABELS[k] ?? k, theirs: describe(stored[k]), yours: describe(mine[k]) }));
    setConflict({ theirs, rows });
  }

  const onSubmit = handleSubmit((fields) => save({ ...fields, placeId: place?.id ?? null }));

  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-6" aria-label={existing ? "Edit source" : "New source"}>
      {conflict && (
        <ConflictPanel
          rows={conflict.rows}
          onLoadTheirs={() => window.location.reload()}
          onKeepMine={() => {
            setVersion(conflict.theirs.version);
            void handleSubmit((fields) => save({ ...fields, placeId: place?.id ?? null }, conflict.theirs.version))();
          }}
        />
      )}
      {refusal && <Notice tone="warn">{refusal}</Notice>}

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-serif text-xl">The work</legend>
        <FormField label="Title" error={errors.title?.message} className="sm:col-span-2">
          <input {...inputProps(errors.title)} {...register("title")} />
        </FormField>
        <FormField label="Object type" error={errors.objectType?.message}>
          <select {...inputProps(errors.objectType)} {...register("objectType")}>
            {OBJECT_TYPES.map((t) => <option key={t} value={t}>{OBJECT_TYPE_LABELS[t]}</option>)}
          </select>
        </FormField>
        <FormField label="Medium" hint="e.g. oil on canvas, etching" error={errors.medium?.message}>
          <input {...inputProps(errors.medium)} {...register("medium")} />
        </FormField>
        <FormField label="Attribution" error={errors.attributionQualifier?.message}>
          <select {...inputProps(errors.attributionQualifier)} {...register("attributionQualifier")}>
            {ATTRIBUTION_QUALIFIERS.map((q) => <option key={q} value={q}>{ATTRIBUTION_LABELS[q]}</option>)}
          </select>
        </FormField>
        <FormField label="Artist, as written" error={errors.artist?.message}>
          <input {...inputProps(errors.artist)} {...register("artist")} />
        </FormField>
        <div className="grid grid-cols-[1fr_1fr_6rem] gap-2 sm:col-span-2">
          <FormField label="Height" error={errors.height?.message}>
            <input inputMode="decimal" {...inputProps(errors.height, "font-mono")} {...register("height")} />
          </FormField>
          <FormField label="Width" error={errors.width?.message}>
            <input inputMode="decimal" {...inputProps(errors.width, "font-mono")} {...register("width")} />
          </FormField>
          <FormField label="Unit" error={errors.dimensionUnit?.message}>
            <select {...inputProps(errors.dimensionUnit)} {...register("dimensionUnit")}>
              {DIMENSION_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
            </select>
          </FormField>
        </div>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-serif text-xl">Date and place</legend>
        <FormField label="Date (EDTF)" hint="e.g. 1650, 1650~ (about), 1650? (uncertain), 165X, 1640/1660, [1667,1670..1672], ../1700" error={errors.datingEdtf?.message} className="sm:col-span-2">
          <input {...inputProps(errors.datingEdtf, "font-mono")} {...register("datingEdtf")} autoComplete="off" spellCheck={false} />
        </FormField>
        <div className="sm:col-span-2">
          <DatingPreview edtf={watch("datingEdtf") ?? ""} margins={margins} />
        </div>
        <div className="sm:col-span-2">
          <PlacePicker
            label="Place of making"
            value={place}
            onChange={(p) => {
              setPlace(p);
              setValue("placeId", p?.id ?? null, { shouldDirty: true });
            }}
            errors={errors.placeId?.message ? [errors.placeId.message] : undefined}
          />
        </div>
      </fieldset>

      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-2 font-serif text-xl">Holding and rights</legend>
        <FormField label="Collection" error={errors.collectionId?.message}>
          <select {...inputProps(errors.collectionId)} {...register("collectionId")}>
            <option value="">Not recorded</option>
            {collections.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
          </select>
        </FormField>
        <FormField label="Accession number" error={errors.accessionNumber?.message}>
          <input {...inputProps(errors.accessionNumber, "font-mono")} {...register("accessionNumber")} />
        </FormField>
        <FormField label="Rights" error={errors.rightsUri?.message}>
          <select {...inputProps(errors.rightsUri)} {...register("rightsUri")}>
            <option value="">Not stated</option>
            {["In copyright", "No copyright", "Other", "Creative Commons"].map((group) => (
              <optgroup key={group} label={group}>
                {RIGHTS.filter((r) => r.group === group).map((r) => <option key={r.uri} value={r.uri}>{r.label}</option>)}
              </optgroup>
            ))}
          </select>
        </FormField>
        <FormField label="Credit line" error={errors.creditLine?.message}>
          <input {...inputProps(errors.creditLine)} {...register("creditLine")} />
        </FormField>
      </fieldset>

      <fieldset className="grid gap-4">
        <legend className="mb-2 font-serif text-xl">Description and reliability</legend>
        <FormField label="Description" error={errors.description?.message}>
          <textarea rows={4} {...inputProps(errors.description)} {...register("description")} />
        </FormField>
        <FormField label="Reliability note" hint="Copied from another work? Allegorical? Overpainted? Say what a reader should weigh." error={errors.reliabilityNote?.message}>
          <textarea rows={3} {...inputProps(errors.reliabilityNote)} {...register("reliabilityNote")} />
        </FormField>
      </fieldset>

      <fieldset className="grid gap-3">
        <legend className="mb-2 font-serif text-xl">Bibliography</legend>
        {references.fields.map((field, i) => {
          const e = errors.bibliography?.[i];
          return (
            <div key={field.id} className="grid gap-2 rounded border border-rule bg-card p-3 sm:grid-cols-[2fr_3fr_1fr_1fr]">
              <FormField label={`Reference ${i + 1}: author`} error={e?.author?.message}>
                <input {...inputProps(e?.author)} {...register(`bibliography.${i}.author`)} />
              </FormField>
              <FormField label="Title" error={e?.title?.message}>
                <input {...inputProps(e?.title)} {...register(`bibliography.${i}.title`)} />
              </FormField>
              <FormField label="Year" error={e?.year?.message}>
                <input {...inputProps(e?.year, "font-mono")} {...register(`bibliography.${i}.year`)} />
              </FormField>
              <FormField label="Pages" error={e?.pages?.message}>
                <input {...inputProps(e?.pages, "font-mono")} {...register(`bibliography.${i}.pages`)} />
              </FormField>
              <FormField label="Link" error={e?.link?.message} className="sm:col-span-3">
                <input type="url" {...inputProps(e?.link)} {...register(`bibliography.${i}.link`)} />
              </FormField>
              <Button type="button" variant="quiet" className="self-end" onClick={() => references.remove(i)}>
                Remove reference {i + 1}
              </Button>
            </div>
          );
        })}
        <div>
          <Button type="button" variant="quiet" onClick={() => references.append({ author: "", title: "", year: "", pages: "", link: "" })}>
            Add a reference
          </Button>
        </div>
      </fieldset>

      <fieldset>
        <legend className="mb-2 font-serif text-xl">Visibility</legend>
        <label className="mr-6 inline-flex items-center gap-2">
          <input type="radio" value="draft" {...register("state")} /> Draft: only you and the editors see it
        </label>
        <label className="inline-flex items-center gap-2">
          <input type="radio" value="published" {...register("state")} /> Published: everyone sees it
        </label>
      </fieldset>

      <div className="flex gap-3 border-t border-rule pt-4">
        <Button type="submit" disabled={formState.isSubmitting}>
          {formState.isSubmitting ? "Saving…" : existing ? "Save changes" : "Save the source"}
        </Button>
      </div>
    </form>
  );
}

function describe(value: unknown): string {
  if (Array.isArray(value)) return value.map((b) => [b.author, b.title, b.year].filter(Boolean).join(", ")).join("; ");
  return value === null || value === undefined ? "" : String(value);
}
