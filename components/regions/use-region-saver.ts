"use client";

// Edits save themselves: each change is held as the region's pending edit (shown at once, over the
// stored region) and sent a moment after the person stops, as a PATCH naming the version read. One
// save per region is in flight at a time, so a save never names a version its own predecessor has
// just replaced. A 409 keeps the pending edit and holds the stored region beside it until the person
// chooses: load theirs, or save theirs over with mine. Nothing is overwritten without that choice.
import { useMutation } from "@tanstack/react-query";
import { useCallback, useReducer, useRef } from "react";
import type { RegionView } from "@/lib/regions/types";
import { conflictCurrent, fieldsOf, updateRegion, type RegionChange } from "./region-api";
import type { RegionList } from "./use-region-list";
import type { UndoEntry } from "./use-undo-stack";

export type SaveState = "pending" | "saving" | "saved" | "failed" | "conflict";
export type Conflict = { theirs: RegionView; mine: RegionChange };

const QUIET_MS = 700;

const pick = (from: Required<RegionChange>, keys: RegionChange): RegionChange =>
  Object.fromEntries(Object.keys(keys).map((k) => [k, from[k as keyof RegionChange]])) as RegionChange;

export function useRegionSaver(list: RegionList, record: (entry: UndoEntry) => void) {
  const [, rerender] = useReducer((n: number) => n + 1, 0);
  const pending = useRef(new Map<number, RegionChange>());
  // The stored fields before the edits now pending: what an undo of them goes back to.
  const before = useRef(new Map<number, { fields: Required<RegionChange>; undoable: boolean }>());
  const states = useRef(new Map<number, SaveState>());
  const failures = useRef(new Map<number, string>());
  const conflicts = useRef(new Map<number, Conflict>());
  const timers = useRef(new Map<number, ReturnType<typeof setTimeout>>());
  const inFlight = useRef(new Map<number, Promise<boolean>>());
  const edited = useRef<number[]>([]);
  const save = useMutation({ mutationFn: (v: { id: number; version: number; change: RegionChange }) => updateRegion(v.id, v.version, v.change) });

  const set = (id: number, state: SaveState | undefined) => {
    if (state) states.current.set(id, state);
    else states.current.delete(id);
    rerender();
  };

  const flush = useCallback(
    (id: number): Promise<boolean> => {
      clearTimeout(timers.current.get(id));
      // After the save on its way, with the version it brings back.
      const running = inFlight.current.get(id);
      if (running) return running.then(() => flush(id));
      const sent = pending.current.get(id);
      const stored = list.current(id);
      if (!sent || conflicts.current.has(id)) return Promise.resolve(!sent);
      if (!stored) return Promise.resolve(false);
      set(id, "saving");
      const done = save
        .mutateAsync({ id, version: stored.version, change: sent })
        .then((view) => {
          list.put(view);
          const prior = before.current.get(id);
          if (prior?.undoable) record({ kind: "edit", id, before: pick(prior.fields, sent) });
          if (pending.current.get(id) === sent) {
            pending.current.delete(id);
            before.current.delete(id);
            set(id, "saved");
          } else {
            // Edited again while this save was out: those edits undo to what this save stored, and
            // go once the person pauses (their timer is running) or when a chained flush comes.
            before.current.set(id, { fields: fieldsOf(view), undoable: true });
            set(id, "pending");
          }
          failures.current.delete(id);
          return true;
        })
        .catch((error: unknown) => {
          const theirs = conflictCurrent(error);
          if (theirs) {
            conflicts.current.set(id, { theirs, mine: pending.current.get(id) ?? sent });
            set(id, "conflict");
          } else {
            failures.current.set(id, error instanceof Error ? error.message : "The change could not be saved.");
            set(id, "failed");
          }
          return false;
        })
        .finally(() => inFlight.current.delete(id));
      inFlight.current.set(id, done);
      return done;
    },
    [list, record, save],
  );

  /** Merges a change into the region's pending edit and saves it once the person pauses (or now). */
  const edit = useCallback(
    (id: number, change: RegionChange, opts: { undoable?: boolean; now?: boolean } = {}) => {
      const stored = list.current(id);
      if (!stored) return;
      if (!pending.current.has(id) && !before.current.has(id)) before.current.set(id, { fields: fieldsOf(stored), undoable: opts.undoable ?? true });
      pending.current.set(id, { ...pending.current.get(id), ...change });
      edited.current = [...edited.current.filter((e) => e !== id), id];
      if (conflicts.current.has(id)) {
        conflicts.current.set(id, { ...conflicts.current.get(id)!, mine: pending.current.get(id)! });
        rerender();
        return;
      }
      set(id, "pending");
      clearTimeout(timers.current.get(id));
      if (opts.now) void flush(id);
      else timers.current.set(id, setTimeout(() => void flush(id), QUIET_MS));
    },
    [list, flush],
  );

  /** Drops the most recent edit not yet sent; false when every edit has gone to the server. */
  const discardLatest = useCallback((): boolean => {
    const id = [...edited.current].reverse().find((e) => pending.current.has(e) && !inFlight.current.has(e) && !conflicts.current.has(e));
    if (id === undefined) return false;
    clearTimeout(timers.current.get(id));
    pending.current.delete(id);
    before.current.delete(id);
    set(id, undefined);
    return true;
  }, []);

  const forget = useCallback((id: number) => {
    clearTimeout(timers.current.get(id));
    for (const m of [pending, before, states, failures, conflicts]) m.current.delete(id);
    rerender();
  }, []);

  const loadTheirs = useCallback((id: number) => {
    const c = conflicts.current.get(id);
    if (c) list.put(c.theirs);
    forget(id);
  }, [list, forget]);

  const keepMine = useCallback(
    (id: number) => {
      const c = conflicts.current.get(id);
      if (!c) return;
      // Theirs becomes the version mine is saved over, and what an undo would bring back.
      list.put(c.theirs);
      conflicts.current.delete(id);
      before.current.set(id, { fields: fieldsOf(c.theirs), undoable: true });
      void flush(id);
    },
    [list, flush],
  );

  const flushAll = useCallback(async () => (await Promise.all([...pending.current.keys()].map((id) => flush(id)))).every(Boolean), [flush]);

  return {
    edit,
    flush,
    flushAll,
    discardLatest,
    forget,
    loadTheirs,
    keepMine,
    retry: flush,
    overlay: (id: number) => pending.current.get(id),
    state: (id: number) => states.current.get(id),
    failure: (id: number) => failures.current.get(id),
    conflict: (id: number) => conflicts.current.get(id),
    busy: () => pending.current.size > 0 || inFlight.current.size > 0,
  };
}

export type RegionSaver = ReturnType<typeof useRegionSaver>;
