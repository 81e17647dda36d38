"use client";

// Everything the evidence viewer shares between the photograph and the panel beside it: the regions
// (stored, with the pending edits over them), which one is selected, the drawing tool, and what the
// keyboard commands do. The canvas and the panel only read this and call back.
import { useCallback, useEffect, useMemo, useState } from "react";
import type { ObservationInput, RegionShape, RegionView } from "@/lib/regions/types";
import type { AnnotatorRegion } from "./annotation-sync";
import { observationInputs, type RegionChange } from "./region-api";
import type { RegionCommand, RegionTool } from "./region-tools";
import { useRegionActions } from "./use-region-actions";
import { useRegionList } from "./use-region-list";
import { useRegionSaver, type Conflict, type SaveState } from "./use-region-saver";
import { useUndoStack } from "./use-undo-stack";

/** A region as the person sees it now: the stored view with their pending edit over it. */
export type RegionDraft = {
  view: RegionView;
  shape: RegionShape;
  label: string | null;
  observations: ObservationInput[];
  edited: boolean;
  saveState: SaveState | undefined;
  failure: string | undefined;
  conflict: Conflict | undefined;
};

type Options = { imageId: number; canDraw: boolean; initialRegionId: number | null; rotate(by: -90 | 90): void };

const look = (r: RegionView): AnnotatorRegion["look"] => (r.state === "vetted" ? "vetted" : r.state === "proposed" ? "proposed" : "draft");

export function useRegionWorkspace({ imageId, canDraw, initialRegionId, rotate }: Options) {
  const [proposed, setProposed] = useState(false);
  const [selectedId, select] = useState<number | null>(initialRegionId);
  const [tool, setTool] = useState<RegionTool>("select");
  const list = useRegionList(imageId, proposed);
  const undo = useUndoStack();
  const saver = useRegionSaver(list, undo.record);
  const actions = useRegionActions({ imageId, list, saver, undo, select });

  const drafts: RegionDraft[] = list.regions.map((view) => {
    const pending: RegionChange = saver.overlay(view.id) ?? {};
    return {
      view,
      shape: pending.shape ?? view.shape,
      label: pending.label !== undefined ? pending.label : view.label,
      observations: pending.observations ?? observationInputs(view),
      edited: Object.keys(pending).length > 0,
      saveState: saver.state(view.id),
      failure: saver.failure(view.id),
      conflict: saver.conflict(view.id),
    };
  });
  const selected = drafts.find((d) => d.view.id === selectedId) ?? null;

  const shapesKey = JSON.stringify(drafts.map((d) => [d.view.id, d.shape, d.view.state, d.view.can.edit]));
  const onImage = useMemo((): AnnotatorRegion[] => {
    const shown = drafts.map((d) => ({ id: d.view.id, shape: d.shape, look: look(d.view), editable: canDraw && d.view.can.edit }));
    // The shape just drawn stays on the photograph while the server makes it a region.
    return actions.drawing ? [...shown, { id: -1, shape: actions.drawing, look: "draft", editable: false }] : shown;
  }, [shapesKey, actions.drawing, canDraw]);

  // A region linked to (…?region=12) that this person cannot see here is not selected.
  useEffect(() => {
    if (!list.loading && selectedId !== null && selectedId > 0 && !list.regions.some((r) => r.id === selectedId)) select(null);
  }, [list.loading, list.regions, selectedId]);

  // Leaving with edits not yet saved asks first.
  useEffect(() => {
    const warn = (e: BeforeUnloadEvent) => {
      if (saver.busy()) e.preventDefault();
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [saver]);

  const step = useCallback(
    (by: 1 | -1) => {
      if (drafts.length === 0) return false;
      const at = drafts.findIndex((d) => d.view.id === selectedId);
      const next = at < 0 ? (by > 0 ? 0 : drafts.length - 1) : (at + by + drafts.length) % drafts.length;
      select(drafts[next].view.id);
      return true;
    },
    [drafts, selectedId],
  );

  /** Runs a keyboard command; false when it does not apply here (the key then goes on as usual). */
  const run = useCallback(
    (c: RegionCommand): boolean => {
      if (c.kind === "tool") setTool(c.tool);
      else if (c.kind === "escape") {
        if (tool !== "select") setTool("select");
        else if (selectedId !== null) select(null);
        else return false;
      } else if (c.kind === "next") return step(1);
      else if (c.kind === "previous") return step(-1);
      else if (c.kind === "rotate") rotate(c.by);
      else if (c.kind === "delete") {
        if (selectedId === null) return false;
        void actions.deleteOne(selectedId);
      } else if (c.kind === "undo") void actions.undoLast();
      return true;
    },
    [tool, selectedId, step, rotate, actions],
  );

  const onCreate = useCallback(
    (shape: RegionShape) => {
      // Back to Select/move: the new region is selected, ready for its observations.
      setTool("select");
      actions.draw(shape);
    },
    [actions],
  );
  const onShapeChange = useCallback((id: number, shape: RegionShape) => saver.edit(id, { shape }), [saver]);

  return { list, drafts, selected, selectedId, select, tool, setTool, proposed, setProposed, saver, undo, actions, onImage, onCreate, onShapeChange, run };
}

export type RegionWorkspace = ReturnType<typeof useRegionWorkspace>;
