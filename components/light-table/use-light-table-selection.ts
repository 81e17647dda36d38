"use client";

// The regions a reader is gathering for the light table, kept in this browser (localStorage) until they
// open the table; the table itself lives in its link. Every button on a page reads the same store and
// follows changes made in other tabs (the storage event) and on this page (our own event).
import { useCallback, useMemo, useSyncExternalStore } from "react";
import { MAX_REGIONS, readSelection } from "@/lib/light-table/links";

const KEY = "cordarium.light-table.selection";
const CHANGED = "cordarium:light-table-selection";

function subscribe(onChange: () => void) {
  window.addEventListener("storage", onChange);
  window.addEventListener(CHANGED, onChange);
  return () => {
    window.removeEventListener("storage", onChange);
    window.removeEventListener(CHANGED, onChange);
  };
}

function stored(): string {
  try {
    return window.localStorage.getItem(KEY) ?? "";
  } catch {
    // Storage refused (private mode, a policy): the selection is simply empty.
    return "";
  }
}

function store(ids: number[]) {
  try {
    window.localStorage.setItem(KEY, ids.join(","));
  } catch {
    return;
  }
  window.dispatchEvent(new Event(CHANGED));
}

export type LightTableSelection = {
  ids: number[];
  full: boolean;
  has(id: number): boolean;
  /** Adds at the end; false when the table is already full. */
  add(id: number): boolean;
  remove(id: number): void;
  replace(ids: number[]): void;
  clear(): void;
};

export function useLightTableSelection(): LightTableSelection {
  const raw = useSyncExternalStore(subscribe, stored, () => "");
  const ids = useMemo(() => readSelection(raw).ids, [raw]);
  const add = useCallback((id: number) => {
    const now = readSelection(stored()).ids;
    if (now.includes(id)) return true;
    if (now.length >= MAX_REGIONS) return false;
    store([...now, id]);
    return true;
  }, []);
  const remove = useCallback((id: number) => store(readSelection(stored()).ids.filter((x) => x !== id)), []);
  const replace = useCallback((next: number[]) => store(next.slice(0, MAX_REGIONS)), []);
  const clear = useCallback(() => store([]), []);
  return { ids, full: ids.length >= MAX_REGIONS, has: (id) => ids.includes(id), add, remove, replace, clear };
}
