"use client";

// The one-off actions on regions (draw, delete, propose, withdraw, propose all, undo), each a TanStack
// Query mutation whose answer goes into the photograph's cached list. Refusals become a notice.
import { useMutation } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import type { RegionShape, RegionView } from "@/lib/regions/types";
import { conflictCurrent, createRegion, deleteRegion, proposeAllRegions, proposeRegion, restoreRegion, withdrawRegion } from "./region-api";
import type { RegionList } from "./use-region-list";
import type { RegionSaver } from "./use-region-saver";
import type { UndoStack } from "./use-undo-stack";

export type RegionNotice = { tone: "ok" | "warn" | "info"; text: string } | null;

const message = (error: unknown) => (error instanceof Error ? error.message : "The server did not answer.");

export function useRegionActions(opts: { imageId: number; list: RegionList; saver: RegionSaver; undo: UndoStack; select(id: number | null): void }) {
  const { imageId, list, saver, undo, select } = opts;
  const [notice, setNotice] = useState<RegionNotice>(null);
  const [drawing, setDrawing] = useState<RegionShape | null>(null);

  // A refusal because someone changed the region first: take in what is stored and say so.
  const refused = (error: unknown, what: string) => {
    const current = conflictCurrent(error);
    if (current) list.put(current);
    setNotice({ tone: "warn", text: current ? `Someone changed this region first; look at it again before you ${what}.` : message(error) });
  };

  const create = useMutation({ mutationFn: (shape: RegionShape) => createRegion(imageId, shape) });
  const remove = useMutation({ mutationFn: (r: RegionView) => deleteRegion(r.id, r.version) });
  const restore = useMutation({ mutationFn: (v: { id: number; version: number }) => restoreRegion(v.id, v.version) });
  const propose = useMutation({ mutationFn: (r: RegionView) => proposeRegion(r.id, r.version) });
  const withdraw = useMutation({ mutationFn: (r: RegionView) => withdrawRegion(r.id, r.version) });
  const proposeAll = useMutation({ mutationFn: () => proposeAllRegions(imageId) });

  const draw = useCallback(
    (shape: RegionShape) => {
      setDrawing(shape);
      create.mutate(shape, {
        onSuccess: (view) => {
          list.put(view);
          undo.record({ kind: "create", id: view.id });
          select(view.id);
          setNotice(null);
        },
        onError: (e) => setNotice({ tone: "warn", text: `The region was not kept: ${message(e)}` }),
        onSettled: () => setDrawing(null),
      });
    },
    [create, list, undo, select],
  );

  const deleteOne = useCallback(
    async (id: number, opts: { undoable?: boolean } = {}) => {
      const region = list.current(id);
      if (!region) return;
      if (!region.can.delete) {
        setNotice({ tone: "warn", text: region.hasVetted ? "A vetted region stays; edit it to start a new version instead." : "You can delete only regions you marked." });
        return;
      }
      saver.forget(id);
      try {
        const { version } = await remove.mutateAsync(list.current(id) ?? region);
        list.drop(id);
        select(null);
        if (opts.undoable ?? true) undo.record({ kind: "delete", id, version });
        setNotice({ tone: "info", text: "Region deleted. Undo brings it back." });
      } catch (e) {
        refused(e, "delete it");
      }
    },
    [list, saver, remove, select, undo],
  );

  /** Saves what is pending first, so that the version proposed is the one on the screen. */
  const stateChange = useCallback(
    async (id: number, how: "propose" | "withdraw") => {
      if (!(await saver.flush(id))) return;
      const region = list.current(id);
      if (!region) return;
      try {
        list.put(await (how === "propose" ? propose : withdraw).mutateAsync(region));
        setNotice({ tone: "ok", text: how === "propose" ? "Proposed for review." : "Withdrawn from review." });
      } catch (e) {
        refused(e, how);
      }
    },
    [saver, list, propose, withdraw],
  );

  const proposeMine = useCallback(async () => {
    if (!(await saver.flushAll())) return;
    try {
      const { proposed, skipped } = await proposeAll.mutateAsync();
      await list.refresh();
      const regions = (n: number) => `${n} ${n === 1 ? "region" : "regions"}`;
      const done = proposed.length === 0 ? "None of your regions here was proposed." : `${regions(proposed.length)} proposed for review.`;
      // The server says why it left a region out (no observation yet, say): pass that on, once per reason.
      const reasons = [...new Set(skipped.map((s) => s.reason))].join(" ");
      setNotice({ tone: skipped.length ? "warn" : "ok", text: skipped.length ? `${done} ${regions(skipped.length)} not: ${reasons}` : done });
    } catch (e) {
      setNotice({ tone: "warn", text: message(e) });
    }
  }, [saver, proposeAll, list]);

  const undoLast = useCallback(async () => {
    if (saver.discardLatest()) {
      setNotice({ tone: "info", text: "Your last change had not been saved yet; it is undone." });
      return;
    }
    const entry = undo.pop();
    if (!entry) return;
    if (entry.kind === "edit") {
      if (!list.current(entry.id)) return;
      saver.edit(entry.id, entry.before, { undoable: false, now: true });
      select(entry.id);
      setNotice({ tone: "info", text: "Your last change is undone." });
    } else if (entry.kind === "create") {
      await deleteOne(entry.id, { undoable: false });
    } else {
      try {
        const view = await restore.mutateAsync(entry);
        list.put(view);
        select(view.id);
        setNotice({ tone: "info", text: "The deleted region is back." });
      } catch (e) {
        undo.restore(entry);
        setNotice({ tone: "warn", text: `The region could not be brought back: ${message(e)}` });
      }
    }
  }, [saver, undo, list, select, deleteOne, restore]);

  return {
    notice,
    setNotice,
    drawing,
    draw,
    deleteOne,
    propose: (id: number) => stateChange(id, "propose"),
    withdraw: (id: number) => stateChange(id, "withdraw"),
    proposeMine,
    undoLast,
    working: create.isPending || remove.isPending || restore.isPending || propose.isPending || withdraw.isPending || proposeAll.isPending,
  };
}

export type RegionActions = ReturnType<typeof useRegionActions>;
