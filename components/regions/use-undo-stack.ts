"use client";

// What was done to the regions of this photograph, most recent last, so that it can be undone: an
// edit (with the fields as they were), a region drawn, a region deleted. It lives as long as the page.
import { useCallback, useReducer, useRef } from "react";
import type { RegionChange } from "./region-api";

export type UndoEntry =
  | { kind: "edit"; id: number; before: RegionChange }
  | { kind: "create"; id: number }
  /** `version`: the deleted region's, which the restore names. */
  | { kind: "delete"; id: number; version: number };

const LIMIT = 100;

export function useUndoStack() {
  const [, rerender] = useReducer((n: number) => n + 1, 0);
  const stack = useRef<UndoEntry[]>([]);

  const record = useCallback((entry: UndoEntry) => {
    stack.current = [...stack.current.slice(-(LIMIT - 1)), entry];
    rerender();
  }, []);

  const pop = useCallback((): UndoEntry | undefined => {
    const entry = stack.current.at(-1);
    stack.current = stack.current.slice(0, -1);
    rerender();
    return entry;
  }, []);

  /** Puts an entry back when its undo could not be done, so that it can be tried again. */
  const restore = useCallback((entry: UndoEntry) => {
    stack.current = [...stack.current, entry];
    rerender();
  }, []);

  /** A region gone for good (deleted elsewhere) takes its entries with it. */
  const forget = useCallback((id: number) => {
    stack.current = stack.current.filter((e) => e.id !== id);
    rerender();
  }, []);

  return { record, pop, restore, forget, size: stack.current.length };
}

export type UndoStack = ReturnType<typeof useUndoStack>;
