"use client";

import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { api } from "@/lib/client/api";
import { useDossierCall } from "./use-dossier-call";

export function RestoreDossierButton({ id, version, title }: { id: number; version: number; title: string }) {
  const { busy, problem, run } = useDossierCall();
  return (
    <span className="flex flex-col items-end gap-1">
      <Button type="button" variant="quiet" className="px-3 py-1 text-xs" disabled={busy} aria-label={`Restore ${title}`} onClick={() => run(() => api(`/api/dossiers/${id}/restore`, { body: { version } }))}>
        Restore
      </Button>
      {problem && <Notice tone="warn">{problem}</Notice>}
    </span>
  );
}
