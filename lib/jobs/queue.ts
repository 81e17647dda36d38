import "server-only";
import { and, eq, lt, sql } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { jobs, type Job } from "@/db/schema";

export type JobKind = "image.process" | "storage.sweep" | "notification.send" | "notification.digest" | "search.reindex";

/** Adds a job inside the caller's transaction, so the job exists exactly when the change does. */
export async function enqueue(tx: Executor, kind: JobKind, payload: Record<string, unknown>, opts: { runAt?: Date; maxAttempts?: number } = {}) {
  const [{ id }] = await tx
    .insert(jobs)
    .values({ kind, payload, runAt: opts.runAt ?? new Date(), maxAttempts: opts.maxAttempts ?? 4 })
    .$returningId();
  return id;
}

/**
 * Claims the next due job. SKIP LOCKED lets every app instance poll at once: each one skips the rows
 * another has locked instead of waiting for them, so no job is taken twice.
 */
export async function claimNext(workerId: string, kinds: JobKind[]): Promise<Job | null> {
  return db().transaction(async (tx) => {
    const [rows] = (await tx.execute(
      sql`SELECT id FROM jobs WHERE state = 'queued' AND run_at <= NOW(3) AND kind IN (${sql.join(
        kinds.map((k) => sql`${k}`),
        sql`, `,
      )}) ORDER BY run_at, id LIMIT 1 FOR UPDATE SKIP LOCKED`,
    )) as unknown as [{ id: number }[]];
    const next = rows[0];
    if (!next) return null;
    await tx
      .update(jobs)
      .set({ state: "running", lockedBy: workerId, lockedAt: new Date(), attempts: sql`${jobs.attempts} + 1` })
      .where(eq(jobs.id, next.id));
    const [job] = await tx.select().from(jobs).where(eq(jobs.id, next.id));
    return job;
  });
}

export async function markDone(jobId: number): Promise<void> {
  await db().update(jobs).set({ state: "done", finishedAt: new Date(), lockedBy: null, lastError: null }).where(eq(jobs.id, jobId));
}

/** Exponential backoff: 5 s, 20 s, 80 s … capped at an hour. */
export const backoffMs = (attempt: number) => Math.min(3_600_000, 5_000 * 4 ** Math.max(0, attempt - 1));

/** Requeues with backoff while attempts remain; otherwise the job fails for good. Returns true if final. */
export async function markFailed(job: Job, error: string, retryable = true): Promise<boolean> {
  const final = !retryable || job.attempts >= job.maxAttempts;
  await db()
    .update(jobs)
    .set(
      final
        ? { state: "failed", lastError: error.slice(0, 5000), finishedAt: new Date(), lockedBy: null }
        : { state: "queued", lastError: error.slice(0, 5000), runAt: new Date(Date.now() + backoffMs(job.attempts)), lockedBy: null },
    )
    .where(eq(jobs.id, job.id));
  return final;
}

/** Jobs whose worker died mid-run go back to the queue after a grace period. */
export async function requeueStale(olderThanMs = 10 * 60_000): Promise<number> {
  const [result] = (await db()
    .update(jobs)
    .set({ state: "queued", lockedBy: null, lastError: "the worker stopped while running this job" })
    .where(and(eq(jobs.state, "running"), lt(jobs.lockedAt, new Date(Date.now() - olderThanMs))))) as unknown as [{ affectedRows: number }];
  return result.affectedRows;
}
