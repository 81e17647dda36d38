"use client";

// Controls shared by aspects and terms: moving one place up or down in its list, and deleting after
// a second click (the server refuses while observations use the record, and says how many).
import { Button } from "@/components/ui/button";
import { api } from "@/lib/client/api";

export type OrderEntry = { id: number; version: number };

const small = "px-3 py-1 text-xs";

/** The whole list with one entry swapped with its neighbour: an order is always sent complete. */
export function moved(list: OrderEntry[], id: number, step: -1 | 1): OrderEntry[] {
  const i = list.findIndex((e) => e.id === id);
  const j = i + step;
  if (i < 0 || j < 0 || j >= list.length) return list;
  const next = [...list];
  [next[i], next[j]] = [next[j], next[i]];
  return next;
}

export function MoveButtons({ label, list, id, busy, send }: { label: string; list: OrderEntry[]; id: number; busy: boolean; send: (order: OrderEntry[]) => void }) {
  const i = list.findIndex((e) => e.id === id);
  return (
    <>
      <Button type="button" variant="quiet" className={small} aria-label={`Move ${label} up`} disabled={busy || i <= 0} onClick={() => send(moved(list, id, -1))}>
        ↑
      </Button>
      <Button type="button" variant="quiet" className={small} aria-label={`Move ${label} down`} disabled={busy || i < 0 || i >= list.length - 1} onClick={() => send(moved(list, id, 1))}>
        ↓
      </Button>
    </>
  );
}

export function DeleteConfirm({ label, busy, onConfirm, onCancel }: { label: string; busy: boolean; onConfirm: () => void; onCancel: () => void }) {
  return (
    <div role="group" aria-label={`Delete ${label}?`} className="flex flex-wrap items-center gap-2 text-sm">
      <span>Delete {label} for good?</span>
      <Button type="button" variant="danger" className={small} disabled={busy} onClick={onConfirm}>
        Yes, delete {label}
      </Button>
      <Button type="button" variant="quiet" className={small} onClick={onCancel}>
        Keep it
      </Button>
    </div>
  );
}

export const patchJson = (url: string, body: unknown) => api(url, { method: "PATCH", body });
export const deleteJson = (url: string, body: unknown) => api(url, { method: "DELETE", body });
export const smallButton = small;
