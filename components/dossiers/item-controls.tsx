"use client";

// The owner's controls on one item: write or change its note, take it out of the dossier.
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { useDossierCall } from "./use-dossier-call";

const small = "px-3 py-1 text-xs";

export function ItemControls({ dossierId, itemId, version, note, label }: { dossierId: number; itemId: number; version: number; note: string | null; label: string }) {
  const { busy, problem, run } = useDossierCall();
  const noteId = useId();
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);
  const [text, setText] = useState(note ?? "");
  const url = `/api/dossiers/${dossierId}/items/${itemId}`;

  async function saveNote(event: React.FormEvent) {
    event.preventDefault();
    const ok = await run(() => api(url, { method: "PATCH", body: { version, note: text } }));
    if (ok) setEditing(false);
  }

  return (
    <div className="mt-2 print:hidden">
      {editing ? (
        <form onSubmit={saveNote} className="grid gap-2">
          <label htmlFor={noteId} className="text-sm font-semibold text-ink-soft">
            Note on {label}
          </label>
          <textarea id={noteId} rows={3} value={text} onChange={(e) => setText(e.target.value)} className={inputClass} />
          <div className="flex gap-2">
            <Button type="submit" className={small} disabled={busy}>
              Save the note
            </Button>
            <Button type="button" variant="quiet" className={small} onClick={() => (setEditing(false), setText(note ?? ""))}>
              Cancel
            </Button>
          </div>
        </form>
      ) : confirming ? (
        <div role="group" aria-label={`Remove ${label}?`} className="flex flex-wrap items-center gap-2 text-sm">
          <span>Take {label} out of the dossier?</span>
          <Button type="button" variant="danger" className={small} disabled={busy} onClick={() => run(() => api(url, { method: "DELETE", body: { version } }))}>
            Yes, remove it
          </Button>
          <Button type="button" variant="quiet" className={small} onClick={() => setConfirming(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="quiet" className={small} onClick={() => setEditing(true)} aria-label={`${note ? "Edit the note on" : "Add a note to"} ${label}`}>
            {note ? "Edit note" : "Add a note"}
          </Button>
          <Button type="button" variant="quiet" className={small} onClick={() => setConfirming(true)} aria-label={`Remove ${label}`}>
            Remove
          </Button>
        </div>
      )}
      {problem && (
        <div className="mt-2">
          <Notice tone="warn">{problem}</Notice>
        </div>
      )}
    </div>
  );
}
