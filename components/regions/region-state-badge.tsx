import { STATE_WORDS, type RegionState } from "@/lib/regions/types";

// The review state of a region in our words, as a small badge: vetted in the accent green, work that
// awaits or needs a decision in vermilion, the author's own drafts plain.

const LOOK: Record<RegionState, string> = {
  draft: "border-rule bg-card text-ink-soft",
  proposed: "border-warn bg-card text-warn",
  vetted: "border-accent bg-accent-wash text-accent-deep",
  returned: "border-warn bg-warn-wash text-warn",
  withdrawn: "border-dashed border-rule bg-card text-ink-faint",
};

export function RegionStateBadge({ state, unreviewed = false }: { state: RegionState; unreviewed?: boolean }) {
  return (
    <span data-testid="region-state" className={`inline-block rounded-full border px-2 py-0.5 text-xs font-semibold ${LOOK[state]}`}>
      {STATE_WORDS[state]}
      {unreviewed && state === "proposed" ? " · not yet reviewed" : ""}
    </span>
  );
}
