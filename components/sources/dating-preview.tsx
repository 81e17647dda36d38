"use client";

import { readDating } from "@/lib/dating";

// How Cordarium reads the EDTF string, shown while it is typed.
export function DatingPreview({ edtf, margins }: { edtf: string; margins: { approximateMarginYears: number; uncertainMarginYears: number } }) {
  if (!edtf.trim()) return <p className="text-sm text-ink-faint">Leave empty if the work is undated.</p>;
  const reading = readDating(edtf, margins);
  if (!reading.ok) {
    return (
      <p className="text-sm text-warn" aria-live="polite">
        {reading.error}
      </p>
    );
  }
  return (
    <p className="text-sm text-ink-soft" aria-live="polite" data-testid="dating-reading">
      Read as <strong className="text-ink">{reading.words}</strong>: earliest <span className="font-mono">{reading.earliest ?? "open"}</span>, latest{" "}
      <span className="font-mono">{reading.latest ?? "open"}</span>
      {(reading.approximate || reading.uncertain) && (
        <>
          ; searched as <span className="font-mono">{reading.widenedEarliest ?? "open"}</span> to <span className="font-mono">{reading.widenedLatest ?? "open"}</span>
        </>
      )}
      .
    </p>
  );
}
