"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useId, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { inputClass } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { api, ApiError } from "@/lib/client/api";
import { COMMENT_MAX, type ThreadEntry } from "@/lib/regions/discussion-schema";

const when = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 16)} UTC`;

const DECISION_WORDS = { vetted: "vetted", returned: "returned to its author" } as const;

function Entry({ entry }: { entry: ThreadEntry }) {
  const decision = entry.kind === "review";
  return (
    <li className={`rounded border p-3 ${decision ? "border-accent bg-accent-wash" : "border-rule bg-card"}`}>
      <p className="text-sm text-ink-soft">
        <span className="font-semibold text-ink">{entry.authorName}</span>
        {decision ? ` ${DECISION_WORDS[entry.decision]} version ${entry.versionNumber}` : " wrote"} · <time dateTime={entry.createdAt}>{when(entry.createdAt)}</time>
      </p>
      {entry.body && <p className="mt-1 whitespace-pre-wrap">{entry.body}</p>}
    </li>
  );
}

/** The discussion of one region: decisions and comments in time order, and a box to add to it. */
export function RegionThread({ regionId, canWrite }: { regionId: number; canWrite: boolean }) {
  const queryClient = useQueryClient();
  const key = ["region-thread", regionId];
  const textId = useId();
  const [body, setBody] = useState("");
  const thread = useQuery({ queryKey: key, queryFn: () => api<{ entries: ThreadEntry[] }>(`/api/regions/${regionId}/comments`) });
  const send = useMutation({
    mutationFn: (text: string) => api<ThreadEntry>(`/api/regions/${regionId}/comments`, { body: { body: text } }),
    onSuccess: async () => {
      setBody("");
      await queryClient.invalidateQueries({ queryKey: key });
    },
  });

  function submit(e: FormEvent) {
    e.preventDefault();
    send.mutate(body);
  }

  const error = send.error instanceof ApiError ? send.error : send.error ? new ApiError(0, "network", "The server could not be reached; the comment was not sent.") : null;
  const entries = thread.data?.entries ?? [];
  return (
    <section aria-labelledby={`${textId}-heading`} className="flex flex-col gap-3">
      <h2 id={`${textId}-heading`} className="text-2xl">
        Discussion
      </h2>
      {thread.isPending && <p className="text-ink-soft">Fetching the discussion…</p>}
      {thread.isError && <Notice tone="warn">The discussion could not be fetched. {thread.error.message}</Notice>}
      {thread.isSuccess && entries.length === 0 && <p className="text-ink-soft">Nobody has written about this region yet.</p>}
      {entries.length > 0 && (
        <ol aria-label="Comments and decisions" className="flex flex-col gap-2">
          {entries.map((e) => (
            <Entry key={`${e.kind}-${e.id}`} entry={e} />
          ))}
        </ol>
      )}
      {canWrite && (
        <form onSubmit={submit} className="flex flex-col gap-2">
          <label htmlFor={textId} className="text-sm font-semibold text-ink-soft">
            Add to the discussion
          </label>
          <textarea
            id={textId}
            rows={3}
            maxLength={COMMENT_MAX}
            value={body}
            onChange={(e) => setBody(e.target.value)}
            aria-invalid={error?.fields.body ? true : undefined}
            className={inputClass}
          />
          {error && <Notice tone="warn">{error.fields.body?.join(" ") ?? error.message}</Notice>}
          <div>
            <Button type="submit" variant="quiet" disabled={send.isPending || body.trim() === ""}>
              {send.isPending ? "Sending…" : "Send the comment"}
            </Button>
          </div>
        </form>
      )}
    </section>
  );
}
