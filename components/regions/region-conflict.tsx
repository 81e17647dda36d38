"use client";

// A region someone else saved first (409): their stored fields beside the ones being saved, through
// the same panel the catalogue forms use. Only the fields of the pending edit are compared.
import { ConflictPanel, type Comparison } from "@/components/forms/conflict-panel";
import type { ObservationInput } from "@/lib/regions/types";
import { observationInputs } from "./region-api";
import { describeShape } from "./region-shapes";
import type { Conflict } from "./use-region-saver";
import { describeObservation, type Vocabulary } from "./use-vocabulary";

const sentences = (list: ObservationInput[], vocabulary: Vocabulary) => list.map((o) => describeObservation(o, vocabulary)).join("; ");

export function RegionConflict({ conflict, vocabulary, onLoadTheirs, onKeepMine }: { conflict: Conflict; vocabulary: Vocabulary; onLoadTheirs(): void; onKeepMine(): void }) {
  const { theirs, mine } = conflict;
  const rows: Comparison = [];
  if (mine.shape) rows.push({ field: "shape", label: "Outline", theirs: describeShape(theirs.shape), yours: describeShape(mine.shape) });
  if (mine.label !== undefined) rows.push({ field: "label", label: "Label", theirs: theirs.label ?? "", yours: mine.label ?? "" });
  if (mine.observations) {
    rows.push({ field: "observations", label: "Observations", theirs: sentences(observationInputs(theirs), vocabulary), yours: sentences(mine.observations, vocabulary) });
  }
  return <ConflictPanel what="region" rows={rows.filter((r) => r.theirs !== r.yours)} onLoadTheirs={onLoadTheirs} onKeepMine={onKeepMine} />;
}
