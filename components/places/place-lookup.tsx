"use client";

// Looks up any place the archive knows and shows what the gazetteer holds for it: useful before
// defining a historical area, or to check which of several places of one name a source points to.
import { useState } from "react";
import { SelectField } from "@/components/ui/field";
import { COUNTRIES } from "@/lib/catalogue/countries";
import { formatCoordinates } from "@/lib/places/format";
import { PlacePicker, type PlaceChoice } from "./place-picker";

export function PlaceLookup() {
  const [place, setPlace] = useState<PlaceChoice | null>(null);
  const [country, setCountry] = useState("");

  return (
    <div className="grid gap-4 md:grid-cols-[2fr_1fr]">
      <PlacePicker label="Look up a place" value={place} onChange={setPlace} country={country || undefined} />
      <SelectField label="Only in country" value={country} onChange={(e) => setCountry(e.target.value)}>
        <option value="">Any country</option>
        {COUNTRIES.map((c) => (
          <option key={c.code} value={c.code}>
            {c.name}
          </option>
        ))}
      </SelectField>
      {place && (
        <section aria-labelledby="lookup-result" className="rounded border border-rule bg-card p-4 md:col-span-2">
          <h3 id="lookup-result" className="font-serif text-xl">
            {place.name}
            {place.kind === "area" && (
              <span className="ml-2 rounded border border-accent px-1.5 align-middle font-sans text-xs font-semibold text-accent-deep">area</span>
            )}
          </h3>
          <dl className="mt-2 grid grid-cols-[max-content_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="font-semibold text-ink-soft">Kind</dt>
            <dd>{place.kind === "area" ? "Historical area, defined by an editor" : "City, from the GeoNames gazetteer"}</dd>
            <dt className="font-semibold text-ink-soft">Country</dt>
            <dd>
              {place.country ?? "None recorded"}
              {place.countryCode && <span className="ml-2 font-mono text-xs text-ink-faint">{place.countryCode}</span>}
            </dd>
            <dt className="font-semibold text-ink-soft">Subdivision code</dt>
            <dd className="font-mono">{place.subdivisionCode ?? "—"}</dd>
            <dt className="font-semibold text-ink-soft">Coordinates</dt>
            <dd className="font-mono">{formatCoordinates(place.latitude, place.longitude)}</dd>
          </dl>
        </section>
      )}
    </div>
  );
}
