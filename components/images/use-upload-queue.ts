"use client";

// The uploader's queue: each file is announced to the API, sent to storage, then checked by the API.
// Two files travel at once; the rest wait their turn. A cancelled or broken upload is withdrawn on the
// server too, so nothing half-uploaded is left behind.
import { useCallback, useEffect, useRef, useState } from "react";
import { api, ApiError } from "@/lib/client/api";
import type { ImageKind } from "./image-types";
import { sendFile, TransferAborted, TransferError, type StartedUpload } from "./upload-transfer";

export const PARALLEL_UPLOADS = 2;

export type BatchDetails = { kind: ImageKind; caption: string; photoCredit: string; rightsUri: string };

export type UploadPhase = "queued" | "starting" | "uploading" | "checking" | "accepted" | "refused" | "broken" | "cancelled";

export type UploadItem = {
  key: string;
  file: File;
  details: BatchDetails;
  phase: UploadPhase;
  sent: number;
  imageId: number | null;
  message: string | null;
  duplicateUrl: string | null;
  retryable: boolean;
};

export const CANCELLABLE: readonly UploadPhase[] = ["queued", "starting", "uploading"];

/** A refusal the same bytes would meet again is final; a broken line or an expired session is not. */
function failure(error: unknown): Pick<UploadItem, "phase" | "message" | "duplicateUrl" | "retryable"> {
  if (error instanceof ApiError) {
    const duplicate = (error.body.duplicateOf as { url?: string } | undefined)?.url ?? null;
    if (error.status === 401) return { phase: "refused", message: "You are no longer signed in. Sign in again in another tab, then retry.", duplicateUrl: null, retryable: true };
    if (error.status >= 500) return { phase: "broken", message: `${error.message} Try again in a moment.`, duplicateUrl: null, retryable: true };
    return { phase: "refused", message: error.message, duplicateUrl: duplicate, retryable: !duplicate && /try again/i.test(error.message) };
  }
  if (error instanceof TransferError) return { phase: "broken", message: error.message, duplicateUrl: null, retryable: true };
  return { phase: "broken", message: "The server could not be reached; check the connection and try again.", duplicateUrl: null, retryable: true };
}

/** Best effort: the server also drops uploads that never finish, but it should not have to. */
const withdraw = (imageId: number) => api(`/api/images/${imageId}/upload`, { method: "DELETE" }).catch(() => undefined);

export function useUploadQueue(sourceId: number, onAccepted: (imageId: number) => void) {
  const [items, setItems] = useState<UploadItem[]>([]);
  const controllers = useRef(new Map<string, AbortController>());
  const counter = useRef(0);
  const accepted = useRef(onAccepted);
  useEffect(() => {
    accepted.current = onAccepted;
  }, [onAccepted]);

  const patch = useCallback((key: string, change: Partial<UploadItem>) => {
    setItems((all) => all.map((item) => (item.key === key ? { ...item, ...change } : item)));
  }, []);

  const run = useCallback(
    async (item: UploadItem) => {
      const control = new AbortController();
      controllers.current.set(item.key, control);
      patch(item.key, { phase: "starting", sent: 0, message: null, duplicateUrl: null, retryable: false, imageId: null });
      let imageId: number | null = null;
      try {
        const { file, details } = item;
        const started = await api<StartedUpload>(`/api/sources/${sourceId}/images`, {
          body: { filename: file.name, size: file.size, contentType: file.type || "application/octet-stream", ...details },
        });
        imageId = started.image.id;
        if (control.signal.aborted) throw new TransferAborted();
        patch(item.key, { phase: "uploading", imageId });
        const parts = await sendFile(file, started.upload, (sent) => patch(item.key, { sent }), control.signal);
        patch(item.key, { phase: "checking", sent: file.size });
        await api(`/api/images/${imageId}/complete`, { body: parts ? { parts } : {} });
        patch(item.key, { phase: "accepted" });
        accepted.current(imageId);
      } catch (error) {
        if (error instanceof TransferAborted || control.signal.aborted) {
          if (imageId !== null) await withdraw(imageId);
          patch(item.key, { phase: "cancelled", message: null, imageId: null });
        } else {
          // Most refusals have removed the upload already; the rest, and a broken line, may have left it half-done.
          if (imageId !== null) await withdraw(imageId);
          patch(item.key, { ...failure(error), imageId: null });
        }
      } finally {
        controllers.current.delete(item.key);
      }
    },
    [patch, sourceId],
  );

  // Starts queued files whenever fewer than PARALLEL_UPLOADS are moving.
  useEffect(() => {
    // Counted by open controllers, not phases: a file just started has not re-rendered yet.
    const moving = controllers.current.size;
    const next = items.filter((i) => i.phase === "queued" && !controllers.current.has(i.key));
    for (const item of next.slice(0, Math.max(0, PARALLEL_UPLOADS - moving))) void run(item);
  }, [items, run]);

  const add = useCallback((files: File[], details: BatchDetails) => {
    const fresh = files.map((file) => ({
      key: `upload-${++counter.current}`,
      file,
      details,
      phase: "queued" as const,
      sent: 0,
      imageId: null,
      message: null,
      duplicateUrl: null,
      retryable: false,
    }));
    setItems((all) => [...all, ...fresh]);
  }, []);

  const cancel = useCallback(
    (key: string) => {
      const control = controllers.current.get(key);
      if (control) control.abort();
      else patch(key, { phase: "cancelled" });
    },
    [patch],
  );

  const retry = useCallback((key: string) => patch(key, { phase: "queued", sent: 0, message: null, duplicateUrl: null }), [patch]);
  const dismiss = useCallback((key: string) => setItems((all) => all.filter((i) => i.key !== key)), []);

  // Leaving the page stops transfers in flight; the server forgets uploads that never complete.
  useEffect(() => {
    const running = controllers.current;
    return () => running.forEach((c) => c.abort());
  }, []);

  return { items, add, cancel, retry, dismiss };
}
