"use client";

// The dossier's items in order. For the owner, each can be dragged to a new place (native drag and
// drop) or moved with the up and down buttons (keyboard); the whole order is sent with the versions
// read, and a 409 shows the order as it is stored now.
import { Children, useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { useDossierCall } from "./use-dossier-call";

export type OrderEntry = { id: number; version: number; label: string };

const small = "px-3 py-1 text-xs";

function moved<T>(list: T[], from: number, to: number): T[] {
  const next = [...list];
  const [one] = next.splice(from, 1);
  next.splice(to, 0, one);
  return next;
}

export function OrderedItems({ dossierId, entries, editable, children }: { dossierId: number; entries: OrderEntry[]; editable: boolean; children: ReactNode }) {
  const cards = Children.toArray(children);
  const { busy, problem, run } = useDossierCall();
  // Optimistic order while the server saves: indices into entries; reset whenever the server's order changes.
  const signature = entries.map((e) => `${e.id}:${e.version}`).join(",");
  const [pending, setPending] = useState<{ signature: string; order: number[] } | null>(null);
  const order = pending?.signature === signature ? pending.order : entries.map((_, i) => i);
  const [dragged, setDragged] = useState<number | null>(null);
  const [said, setSaid] = useState("");

  async function send(from: number, to: number) {
    if (from === to || to < 0 || to >= order.length) return;
    const next = moved(order, from, to);
    setPending({ signature, order: next });
    const what = entries[order[from]].label;
    setSaid(`Saving: ${what} to place ${to + 1}…`);
    const ok = await run(() => api(`/api/dossiers/${dossierId}/order`, { body: { items: next.map((i) => ({ id: entries[i].id, version: entries[i].version })) } }));
    if (ok) setSaid(`Saved: ${what} is now in place ${to + 1} of ${order.length}.`);
    else {
      setPending(null);
      setSaid("");
    }
  }

  return (
    <>
      <ol className="grid gap-4" aria-label="Items of the dossier">
        {order.map((i, place) => (
          <li
            key={entries[i].id}
            draggable={editable && !busy}
            onDragStart={(e) => {
              setDragged(place);
              e.dataTransfer.effectAllowed = "move";
              e.dataTransfer.setData("text/plain", String(entries[i].id));
            }}
            onDragOver={(e) => {
              if (dragged !== null) e.preventDefault();
            }}
            onDrop={(e) => {
              e.preventDefault();
              if (dragged !== null) void send(dragged, place);
              setDragged(null);
            }}
            onDragEnd={() => setDragged(null)}
            className={`break-inside-avoid rounded border bg-card p-4 ${dragged === place ? "border-accent opacity-60" : "border-rule"} ${editable ? "cursor-grab" : ""}`}
          >
            <div className="flex gap-4">
              {editable && (
                <div className="flex flex-col items-center gap-1 print:hidden">
                  <span aria-hidden="true" className="select-none text-ink-faint" title="Drag to move">
                    ⠿
                  </span>
                  <span className="font-mono text-xs text-ink-faint">{place + 1}</span>
                  <Button type="button" variant="quiet" className={small} aria-label={`Move ${entries[i].label} up`} disabled={busy || place === 0} onClick={() => send(place, place - 1)}>
                    ↑
                  </Button>
                  <Button
                    type="button"
                    variant="quiet"
                    className={small}
                    aria-label={`Move ${entries[i].label} down`}
                    disabled={busy || place === order.length - 1}
                    onClick={() => send(place, place + 1)}
                  >
                    ↓
                  </Button>
                </div>
              )}
              <div className="min-w-0 grow">{cards[i]}</div>
            </div>
          </li>
        ))}
      </ol>
      <p role="status" className="mt-2 text-sm text-ink-soft print:hidden">
        {said}
      </p>
      {problem && (
        <div className="mt-3">
          <Notice tone="warn">{problem}</Notice>
        </div>
      )}
    </>
  );
}
