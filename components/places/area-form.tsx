"use client";

// Adds a historical area, or edits one (with the version it was opened at). On refusal the typed
// values stay; a stale edit shows what is stored now and offers to reload it. Nothing is overwritten.
import { useRouter } from "next/navigation";
import { useId, useState, type FormEvent } from "react";
import { SaveButtons } from "@/components/forms/save-buttons";
import { Button } from "@/components/ui/button";
import { inputClass, SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { COUNTRIES } from "@/lib/catalogue/countries";
import { api, ApiError } from "@/lib/client/api";
import { formatCoordinates } from "@/lib/places/format";
import type { PlaceRecord } from "@/lib/places/schemas";

const FIELDS = ["name", "countryCode", "latitude", "longitude", "description"];

// Many of our users write "40,85" for 40.85; anything else unreadable goes as null and the
// server names the field.
function degrees(raw: FormDataEntryValue | null): number | null {
  const text = String(raw ?? "").trim().replace(",", ".");
  if (text === "") return null;
  const n = Number(text);
  return Number.isFinite(n) ? n : null;
}

function readForm(form: FormData) {
  const text = (key: string) => String(form.get(key) ?? "").trim();
  return {
    name: text("name"),
    countryCode: text("countryCode") || null,
    latitude: degrees(form.get("latitude")),
    longitude: degrees(form.get("longitude")),
    description: text("description") || null,
  };
}

export function AreaForm({ area, onSaved, onCancel }: { area?: PlaceRecord; onSaved?: (place: PlaceRecord) => void; onCancel?: () => void }) {
  const router = useRouter();
  const descriptionId = useId();
  // The version this edit is based on; replaced when the editor reloads after a conflict.
  const [base, setBase] = useState(area);
  const [formKey, setFormKey] = useState(0);
  const [error, setError] = useState<ApiError | null>(null);
  const [conflict, setConflict] = useState<PlaceRecord | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const formElement = e.currentTarget;
    const body = readForm(new FormData(formElement));
    setBusy(true);
    setError(null);
    setConflict(null);
    setSaved(null);
    try {
      if (base) {
        const { place } = await api<{ place: PlaceRecord }>(`/api/places/${base.id}`, { method: "PATCH", body: { ...body, version: base.version } });
        setBase(place);
        setSaved(`Saved ${place.name}.`);
        onSaved?.(place);
      } else {
        const { place } = await api<{ place: PlaceRecord }>("/api/places", { body });
        formElement.reset();
        setSaved(`Added ${place.name}.`);
        onSaved?.(place);
      }
      router.refresh();
    } catch (err) {
      const failure = err instanceof ApiError ? err : new ApiError(0, "network", "The server could not be reached.");
      if (failure.status === 409 && failure.body.current) setConflict(failure.body.current as PlaceRecord);
      setError(failure);
    } finally {
      setBusy(false);
    }
  }

  function reload(current: PlaceRecord) {
    setBase(current);
    setConflict(null);
    setError(null);
    setFormKey((k) => k + 1);
    router.refresh();
  }

  const fields = error?.fields ?? {};
  const fieldErrors = FIELDS.some((f) => fields[f]?.length);
  const label = base ? `Edit ${base.name}` : "Add a historical area";

  return (
    <form key={formKey} onSubmit={submit} aria-label={label} className="grid gap-3 sm:grid-cols-2" noValidate>
      <TextField label="Name" name="name" required maxLength={200} defaultValue={base?.name} errors={fields.name} />
      <SelectField label="Country (today's)" name="countryCode" defaultValue={base?.countryCode ?? ""} errors={fields.countryCode}>
        <option value="">None, or several</option>
        {COUNTRIES.map((c) => (
          <option key={c.code} value={c.code}>
            {c.name}
          </option>
        ))}
      </SelectField>
      <TextField label="Latitude" name="latitude" inputMode="decimal" hint="Decimal degrees, north positive, e.g. 40.8518" defaultValue={base?.latitude} errors={fields.latitude} />
      <TextField label="Longitude" name="longitude" inputMode="decimal" hint="Decimal degrees, east positive, e.g. 14.2681" defaultValue={base?.longitude} errors={fields.longitude} />
      <div className="flex flex-col gap-1 sm:col-span-2">
        <label htmlFor={descriptionId} className="text-sm font-semibold text-ink-soft">
          Description
        </label>
        <textarea
          id={descriptionId}
          name="description"
          rows={2}
          maxLength={2000}
          defaultValue={base?.description ?? ""}
          aria-invalid={fields.description?.length ? true : undefined}
          className={inputClass}
        />
        {fields.description?.length ? <p className="text-sm text-warn">{fields.description.join(" ")}</p> : null}
      </div>
      <SaveButtons label={base ? "Save changes" : "Add area"} busy={busy} onCancel={onCancel} className="flex flex-wrap gap-2 sm:col-span-2" />
      <div className="sm:col-span-2" aria-live="polite">
        {conflict ? (
          <AreaConflict current={conflict} onReload={() => reload(conflict)} />
        ) : (
          error && !fieldErrors && <Notice tone="warn">{error.message}</Notice>
        )}
        {saved && <Notice tone="ok">{saved}</Notice>}
      </div>
    </form>
  );
}

// What the archive holds now, after someone else saved the area first.
function AreaConflict({ current, onReload }: { current: PlaceRecord; onReload: () => void }) {
  return (
    <div role="alert" className="rounded border border-warn bg-warn-wash px-4 py-3 text-sm text-ink">
      <p className="font-semibold text-warn">Someone changed this area since you opened it.</p>
      <p className="mt-1">Your changes were not saved. This is what the archive holds now:</p>
      <dl className="mt-2 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1">
        <dt className="font-semibold">Name</dt>
        <dd>{current.name}</dd>
        <dt className="font-semibold">Country</dt>
        <dd>{current.country ?? "None, or several"}</dd>
        <dt className="font-semibold">Coordinates</dt>
        <dd className="font-mono">{formatCoordinates(current.latitude, current.longitude)}</dd>
        <dt className="font-semibold">Description</dt>
        <dd>{current.description ?? "—"}</dd>
      </dl>
      <Button type="button" variant="quiet" className="mt-3" onClick={onReload}>
        Reload the current version
      </Button>
    </div>
  );
}

// The edit control under one area in the list: closed by default, so the list stays readable.
export function AreaEditor({ area }: { area: PlaceRecord }) {
  const [open, setOpen] = useState(false);
  const [saved, setSaved] = useState<string | null>(null);
  if (!open) {
    return (
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <Button
          type="button"
          variant="quiet"
          className="px-3 py-1 text-xs"
          aria-label={`Edit ${area.name}`}
          onClick={() => {
            setSaved(null);
            setOpen(true);
          }}
        >
          Edit
        </Button>
        {saved && <Notice tone="ok">{saved}</Notice>}
      </div>
    );
  }
  return (
    <div className="mt-3 border-t border-rule pt-3">
      <AreaForm
        area={area}
        onSaved={(place) => {
          setSaved(`Saved ${place.name}.`);
          setOpen(false);
        }}
        onCancel={() => setOpen(false)}
      />
    </div>
  );
}
