"use client";

// The owner's actions on the dossier as a whole: edit title and description, delete (undoable), restore.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { DossierForm } from "./dossier-form";
import { useDossierCall } from "./use-dossier-call";

type Props = { id: number; version: number; title: string; description: string | null; deleted: boolean };

export function DossierOwnerActions({ id, version, title, description, deleted }: Props) {
  const router = useRouter();
  const { busy, problem, run } = useDossierCall();
  const [editing, setEditing] = useState(false);
  const [confirming, setConfirming] = useState(false);

  if (deleted) {
    return (
      <div className="grid gap-2">
        <Notice tone="warn">You deleted this dossier. Nobody else can open it; you can restore it.</Notice>
        <div>
          <Button type="button" disabled={busy} onClick={() => run(() => api(`/api/dossiers/${id}/restore`, { body: { version } }))}>
            Restore the dossier
          </Button>
        </div>
        {problem && <Notice tone="warn">{problem}</Notice>}
      </div>
    );
  }

  return (
    <div className="grid gap-3 print:hidden">
      {editing ? (
        <DossierForm existing={{ id, version, title, description }} onDone={() => setEditing(false)} />
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="quiet" onClick={() => setEditing(true)}>
            Edit title and description
          </Button>
          {confirming ? (
            <span role="group" aria-label="Delete the dossier?" className="flex flex-wrap items-center gap-2 text-sm">
              Delete “{title}”? You can restore it from your list of dossiers.
              <Button
                type="button"
                variant="danger"
                disabled={busy}
                onClick={async () => {
                  if (await run(() => api(`/api/dossiers/${id}`, { method: "DELETE", body: { version } }))) router.push("/dossiers");
                }}
              >
                Yes, delete it
              </Button>
              <Button type="button" variant="quiet" onClick={() => setConfirming(false)}>
                Keep it
              </Button>
            </span>
          ) : (
            <Button type="button" variant="danger" onClick={() => setConfirming(true)}>
              Delete the dossier
            </Button>
          )}
        </div>
      )}
      {problem && <Notice tone="warn">{problem}</Notice>}
    </div>
  );
}
