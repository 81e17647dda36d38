// What changed between the version an editor last decided on and the one proposed now: the shape, the
// label and each observation. Pure, so the review page and its tests share one answer.
import type { Box, ObservationView, RegionShape } from "@/lib/regions/types";

export type ComparableVersion = { shape: RegionShape; box: Box; label: string | null; observations: ObservationView[] };

export type ObservationField = "value" | "confidence" | "note";

export type ObservationChange = {
  aspectId: number;
  aspectLabel: string;
  status: "added" | "removed" | "changed" | "unchanged";
  before: ObservationView | null;
  after: ObservationView | null;
  /** For "changed": which parts differ. */
  fields: ObservationField[];
};

export type ShapeChange = {
  changed: boolean;
  /** Rectangle became polygon or the reverse. */
  redrawn: boolean;
  moved: { dx: number; dy: number } | null;
  resized: { from: { w: number; h: number }; to: { w: number; h: number } } | null;
  /** A polygon kept its bounding box but not its points. */
  reshaped: boolean;
  words: string;
};

export type VersionChanges = {
  shape: ShapeChange;
  label: { changed: boolean; before: string | null; after: string | null };
  observations: ObservationChange[];
  /** Observations added, removed or changed. */
  observationsChanged: number;
  anything: boolean;
};

const valueKey = (o: ObservationView) => `${o.termId ?? ""}|${o.count ?? ""}|${o.text ?? ""}`;

function samePoints(a: RegionShape, b: RegionShape): boolean {
  return JSON.stringify(a) === JSON.stringify(b);
}

function px(n: number, positive: string, negative: string) {
  return `${Math.abs(n)} px ${n > 0 ? positive : negative}`;
}

export function compareShapes(before: { shape: RegionShape; box: Box }, after: { shape: RegionShape; box: Box }): ShapeChange {
  const redrawn = before.shape.kind !== after.shape.kind;
  const dx = after.box.x - before.box.x;
  const dy = after.box.y - before.box.y;
  const moved = dx !== 0 || dy !== 0 ? { dx, dy } : null;
  const resized =
    after.box.w !== before.box.w || after.box.h !== before.box.h ? { from: { w: before.box.w, h: before.box.h }, to: { w: after.box.w, h: after.box.h } } : null;
  const changed = !samePoints(before.shape, after.shape);
  const reshaped = changed && !redrawn && !moved && !resized;
  const parts: string[] = [];
  if (redrawn) parts.push(`redrawn as a ${after.shape.kind}`);
  if (moved) parts.push(`moved ${[dx ? px(dx, "right", "left") : "", dy ? px(dy, "down", "up") : ""].filter(Boolean).join(" and ")}`);
  if (resized) parts.push(`resized from ${resized.from.w} × ${resized.from.h} to ${resized.to.w} × ${resized.to.h} px`);
  if (reshaped) parts.push("outline redrawn within the same bounds");
  if (changed && parts.length === 0) parts.push("outline changed");
  return { changed, redrawn, moved, resized, reshaped, words: changed ? parts.join("; ") : "unchanged" };
}

function pairWithin(before: ObservationView[], after: ObservationView[]): ObservationChange[] {
  const out: ObservationChange[] = [];
  const left = [...before];
  const unmatched: ObservationView[] = [];
  // First the observations that still say the same thing (perhaps with another confidence or note)…
  for (const a of after) {
    const i = left.findIndex((b) => valueKey(b) === valueKey(a));
    if (i < 0) {
      unmatched.push(a);
      continue;
    }
    const [b] = left.splice(i, 1);
    const fields: ObservationField[] = [];
    if (b.confidence !== a.confidence) fields.push("confidence");
    if ((b.note ?? "") !== (a.note ?? "")) fields.push("note");
    out.push({ aspectId: a.aspectId, aspectLabel: a.aspectLabel, status: fields.length ? "changed" : "unchanged", before: b, after: a, fields });
  }
  // …then, in order, a new value for the same aspect counts as a change of the old one.
  for (const a of unmatched) {
    const b = left.shift();
    if (!b) {
      out.push({ aspectId: a.aspectId, aspectLabel: a.aspectLabel, status: "added", before: null, after: a, fields: [] });
      continue;
    }
    const fields: ObservationField[] = ["value"];
    if (b.confidence !== a.confidence) fields.push("confidence");
    if ((b.note ?? "") !== (a.note ?? "")) fields.push("note");
    out.push({ aspectId: a.aspectId, aspectLabel: a.aspectLabel, status: "changed", before: b, after: a, fields });
  }
  for (const b of left) out.push({ aspectId: b.aspectId, aspectLabel: b.aspectLabel, status: "removed", before: b, after: null, fields: [] });
  return out;
}

/** Observations are matched by aspect; the result follows the new version's order, removed ones last in their aspect. */
export function compareObservations(before: ObservationView[], after: ObservationView[]): ObservationChange[] {
  const order: number[] = [];
  for (const o of [...after, ...before]) if (!order.includes(o.aspectId)) order.push(o.aspectId);
  return order.flatMap((aspectId) =>
    pairWithin(
      before.filter((o) => o.aspectId === aspectId),
      after.filter((o) => o.aspectId === aspectId),
    ),
  );
}

export function compareVersions(before: ComparableVersion, after: ComparableVersion): VersionChanges {
  const shape = compareShapes(before, after);
  const label = { changed: (before.label ?? "") !== (after.label ?? ""), before: before.label, after: after.label };
  const observations = compareObservations(before.observations, after.observations);
  const observationsChanged = observations.filter((o) => o.status !== "unchanged").length;
  return { shape, label, observations, observationsChanged, anything: shape.changed || label.changed || observationsChanged > 0 };
}
