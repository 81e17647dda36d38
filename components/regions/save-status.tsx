"use client";

// Whether the person's edits are on the server: "saving…" while any is pending or on its way, "saved"
// once the last one arrived, and what went wrong otherwise.
import type { RegionDraft } from "./use-region-workspace";

export function SaveStatus({ drafts, onRetry }: { drafts: RegionDraft[]; onRetry(id: number): void }) {
  const states = drafts.map((d) => d.saveState);
  const failed = drafts.find((d) => d.saveState === "failed");
  let text: string | null = null;
  if (states.includes("conflict")) text = "not saved: someone else saved first";
  else if (failed) text = `not saved: ${failed.failure ?? "the server refused the change"}`;
  else if (states.includes("pending") || states.includes("saving")) text = "saving…";
  else if (states.includes("saved")) text = "saved";
  const warn = text?.startsWith("not saved");
  return (
    <p role="status" aria-live="polite" data-testid="save-status" className={`text-sm ${warn ? "text-warn" : "text-ink-faint"}`}>
      {text ?? " "}
      {failed && (
        <button type="button" onClick={() => onRetry(failed.view.id)} className="ml-2 text-accent underline underline-offset-2">
          Try again
        </button>
      )}
    </p>
  );
}
