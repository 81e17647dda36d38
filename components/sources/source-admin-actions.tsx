"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { api, ApiError } from "@/lib/client/api";

// Soft delete and restore, for administrators.
export function SourceAdminActions({ id, version, deleted }: { id: number; version: number; deleted: boolean }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function act() {
    if (!deleted && !window.confirm("Delete this source? Administrators can restore it later.")) return;
    setBusy(true);
    setError(null);
    try {
      if (deleted) await api(`/api/sources/${id}/restore`, { body: { version } });
      else await api(`/api/sources/${id}`, { method: "DELETE", body: { version } });
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiError ? e.message : "The server could not be reached.");
    } finally {
      setBusy(false);
    }
  }

  return (
    <>
      <Button type="button" variant={deleted ? "quiet" : "danger"} disabled={busy} onClick={act}>
        {deleted ? "Restore" : "Delete"}
      </Button>
      {error && (
        <p role="alert" className="self-center text-sm text-warn">
          {error}
        </p>
      )}
    </>
  );
}
