"use client";

import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import type { RegionView } from "@/lib/regions/types";

type Decision = "vetted" | "returned";

const STATE_WORDS: Record<string, string> = { vetted: "vetted it", returned: "returned it to its author", withdrawn: "it was withdrawn by its author", draft: "its author is editing it again" };

/**
 * Vet or return the version shown. A return needs a comment: the author has to know what to look at.
 * When someone decided first (409), say so and what they decided; nothing is sent again on its own.
 */
export function DecisionPanel({ regionId, version, nextHref }: { regionId: number; version: number; nextHref: string }) {
  const router = useRouter();
  const commentId = useId();
  const [comment, setComment] = useState("");
  const [busy, setBusy] = useState<Decision | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [overtaken, setOvertaken] = useState<RegionView | null>(null);

  async function decide(decision: Decision) {
    setError(null);
    if (decision === "returned" && comment.trim() === "") {
      setError(new ApiError(400, "invalid_input", "Say why the region goes back to its author.", { comment: ["Say why the region goes back to its author."] }));
      return;
    }
    setBusy(decision);
    try {
      await api<RegionView>(`/api/regions/${regionId}/review`, { body: { version, decision, comment: comment.trim() || null } });
      router.push(nextHref);
      router.refresh();
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) setOvertaken((err.body.current as RegionView | undefined) ?? null);
      setError(err instanceof ApiError ? err : new ApiError(0, "network", "The server could not be reached; nothing was decided."));
      setBusy(null);
    }
  }

  if (error?.status === 409) {
    return (
      <Notice tone="warn">
        Someone else decided on this region first
        {overtaken ? ` (${overtaken.state === "proposed" ? "it is proposed again, in a newer form" : STATE_WORDS[overtaken.state] ?? overtaken.state})` : ""}. Your decision was not recorded.{" "}
        <button type="button" className="font-semibold underline" onClick={() => router.refresh()}>
          Reload the region
        </button>{" "}
        or{" "}
        <a href={nextHref} className="font-semibold">
          go to the next one
        </a>
        .
      </Notice>
    );
  }

  return (
    <section aria-label="Decision" className="flex flex-col gap-3 rounded border border-rule bg-card p-4">
      <label htmlFor={commentId} className="text-sm font-semibold text-ink-soft">
        Comment for the author (needed to return the region)
      </label>
      <textarea
        id={commentId}
        rows={4}
        maxLength={4000}
        value={comment}
        onChange={(e) => setComment(e.target.value)}
        aria-invalid={error?.fields.comment ? true : undefined}
        aria-describedby={error ? `${commentId}-error` : undefined}
        className={inputClass}
      />
      {error && (
        <p id={`${commentId}-error`} role="alert" className="text-sm text-warn">
          {error.fields.comment?.join(" ") ?? error.message}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="button" disabled={busy !== null} onClick={() => decide("vetted")}>
          {busy === "vetted" ? "Vetting…" : "Vet"}
        </Button>
        <Button type="button" variant="danger" disabled={busy !== null} onClick={() => decide("returned")}>
          {busy === "returned" ? "Returning…" : "Return to author"}
        </Button>
      </div>
    </section>
  );
}
