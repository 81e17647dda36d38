"use client";

import { useEffect, useState } from "react";
import { inputClass } from "@/components/ui/field";
import { OBJECT_TYPES, OBJECT_TYPE_LABELS } from "@/lib/sources/vocab";

export type FilterOptions = {
  collections: { id: number; name: string }[];
  countries: { code: string; name: string }[];
  /** Set when the viewer is signed in as a contributor or above: offers "only mine" and drafts. */
  me: number | null;
  admin: boolean;
};

type Values = Record<string, string>;

const label = "flex flex-col gap-1 text-sm font-semibold text-ink-soft";

export function SourcesFilters({ options, values, onChange }: { options: FilterOptions; values: Values; onChange: (patch: Record<string, string | null>) => void }) {
  // Typed fields update the address after a pause, not on every key.
  const [text, setText] = useState({ q: values.q, from: values.from, to: values.to });
  useEffect(() => setText({ q: values.q, from: values.from, to: values.to }), [values.q, values.from, values.to]);
  useEffect(() => {
    if (text.q === values.q && text.from === values.from && text.to === values.to) return;
    const t = setTimeout(() => onChange(text), 350);
    return () => clearTimeout(t);
  }, [text, values.q, values.from, values.to, onChange]);

  return (
    <form role="search" aria-label="Filter sources" className="grid gap-3 rounded border border-rule bg-card p-3 sm:grid-cols-2 lg:grid-cols-4" onSubmit={(e) => e.preventDefault()}>
      <label className={`${label} sm:col-span-2`}>
        Title, artist or accession number
        <input type="search" className={inputClass} value={text.q} onChange={(e) => setText({ ...text, q: e.target.value })} />
      </label>
      <label className={label}>
        Object
        <select className={inputClass} value={values.objectType} onChange={(e) => onChange({ objectType: e.target.value })}>
          <option value="">Any object</option>
          {OBJECT_TYPES.map((t) => (
            <option key={t} value={t}>
              {OBJECT_TYPE_LABELS[t]}
            </option>
          ))}
        </select>
      </label>
      <label className={label}>
        Collection
        <select className={inputClass} value={values.collection} onChange={(e) => onChange({ collection: e.target.value })}>
          <option value="">Any collection</option>
          {options.collections.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
      </label>
      <label className={label}>
        Country of making
        <select className={inputClass} value={values.country} onChange={(e) => onChange({ country: e.target.value })}>
          <option value="">Any country</option>
          {options.countries.map((c) => (
            <option key={c.code} value={c.code}>
              {c.name}
            </option>
          ))}
        </select>
      </label>
      <fieldset className="flex gap-2">
        <legend className="mb-1 text-sm font-semibold text-ink-soft">Dated between (years, overlapping)</legend>
        <label className="sr-only" htmlFor="filter-from">
          From year
        </label>
        <input id="filter-from" inputMode="numeric" placeholder="from" className={`${inputClass} font-mono`} value={text.from} onChange={(e) => setText({ ...text, from: e.target.value })} />
        <label className="sr-only" htmlFor="filter-to">
          To year
        </label>
        <input id="filter-to" inputMode="numeric" placeholder="to" className={`${inputClass} font-mono`} value={text.to} onChange={(e) => setText({ ...text, to: e.target.value })} />
      </fieldset>
      {options.me !== null && (
        <>
          <label className={label}>
            State
            <select className={inputClass} value={values.state} onChange={(e) => onChange({ state: e.target.value })}>
              <option value="">Drafts and published</option>
              <option value="draft">Drafts</option>
              <option value="published">Published</option>
            </select>
          </label>
          <label className="flex items-center gap-2 self-end pb-2 text-sm font-semibold text-ink-soft">
            <input type="checkbox" checked={values.creator === String(options.me)} onChange={(e) => onChange({ creator: e.target.checked ? String(options.me) : null })} />
            Only sources I catalogued
          </label>
        </>
      )}
      {options.admin && (
        <label className="flex items-center gap-2 self-end pb-2 text-sm font-semibold text-ink-soft">
          <input type="checkbox" checked={values.deleted === "only"} onChange={(e) => onChange({ deleted: e.target.checked ? "only" : null })} />
          Deleted sources
        </label>
      )}
    </form>
  );
}
