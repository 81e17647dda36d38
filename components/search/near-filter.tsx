"use client";
// Evidence near a place: a gazetteer place chosen by type-ahead (the shared PlacePicker) and a distance.
// Applying puts `near=<place id>&km=<n>` in the address; the server page then narrows the results,
// facet counts and charts, reading the place's coordinates from the gazetteer itself.
import { useRouter, useSearchParams } from "next/navigation";
import { useId, useState, useTransition, type FormEvent } from "react";
import { PlacePicker, type PlaceChoice } from "@/components/places/place-picker";
import { withParams } from "@/lib/search/page/url";

/** Distances offered, in km: a town's surroundings up to a region of a country. */
export const NEAR_CHOICES = [25, 50, 100, 250, 500];

export function NearFilter({ place, km }: { place: PlaceChoice | null; km: number }) {
  const id = useId();
  const router = useRouter();
  const params = useSearchParams();
  const [chosen, setChosen] = useState<PlaceChoice | null>(place);
  const [distance, setDistance] = useState(String(km));
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  // A distance typed into the address stays choosable beside the usual ones.
  const choices = NEAR_CHOICES.includes(km) ? NEAR_CHOICES : [...NEAR_CHOICES, km].sort((a, b) => a - b);

  function apply(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const current = new URLSearchParams(params.toString());
    // With the place cleared, applying takes the distance filter away, as the chip's × does.
    if (!chosen && current.has("near")) {
      const href = withParams(current, { near: null, km: null, ...(current.get("sort") === "distance" ? { sort: null } : {}) });
      setError(null);
      startTransition(() => router.push(href, { scroll: false }));
      return;
    }
    if (!chosen) {
      setError("Choose a place from the list first.");
      return;
    }
    setError(null);
    const href = withParams(current, { near: String(chosen.id), km: distance });
    startTransition(() => router.push(href, { scroll: false }));
  }

  return (
    <form onSubmit={apply} className="space-y-2" aria-labelledby={`${id}-title`} data-testid="near-filter">
      <h3 id={`${id}-title`} className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Near a place</h3>
      <PlacePicker
        label="Near the place"
        value={chosen}
        onChange={(p) => {
          setChosen(p);
          if (p) setError(null);
        }}
        errors={error ? [error] : undefined}
      />
      <div className="flex items-end gap-2">
        <div className="text-sm">
          <label htmlFor={`${id}-km`}>Within</label>
          <select id={`${id}-km`} value={distance} onChange={(e) => setDistance(e.target.value)} className="block rounded border border-rule bg-card px-2 py-1">
            {choices.map((n) => (
              <option key={n} value={n}>
                {n} km
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className="rounded border border-rule bg-card px-3 py-1 text-sm font-semibold hover:bg-paper-deep" aria-busy={pending}>
          Apply distance
        </button>
      </div>
      <p className="text-xs text-ink-faint">Measured in a straight line (great circle) to where each work was made; works without a place are left out.</p>
    </form>
  );
}
