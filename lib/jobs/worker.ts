import "server-only";
import { hostname } from "node:os";
import { claimNext, markDone, markFailed, requeueStale, type JobKind } from "./queue";
import type { Job } from "@/db/schema";

/** A handler throws PermanentJobError for failures that another attempt cannot fix (a corrupt file). */
export class PermanentJobError extends Error {}

export type JobHandler = {
  run(job: Job): Promise<void>;
  /** Called once, when the job has failed for good: leave nothing half-done. */
  onFinalFailure?(job: Job, error: string, permanent: boolean): Promise<void>;
};

type Worker = { stop(): Promise<void> };

const holder = globalThis as unknown as { __cordariumWorker?: Worker };

/** Polls the queue until stopped. Every app instance runs one; the queue keeps them from colliding. */
export function startWorker(handlers: Partial<Record<JobKind, JobHandler>>, opts: { idleMs?: number } = {}): Worker {
  if (holder.__cordariumWorker) return holder.__cordariumWorker;
  const id = `${hostname()}:${process.pid}`;
  const kinds = Object.keys(handlers) as JobKind[];
  let running = true;
  let current: Promise<void> = Promise.resolve();
  let lastStaleCheck = 0;

  async function runOne(job: Job) {
    const handler = handlers[job.kind as JobKind]!;
    try {
      await handler.run(job);
      await markDone(job.id);
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      const permanent = error instanceof PermanentJobError;
      const final = await markFailed(job, message, !permanent);
      if (final) await handler.onFinalFailure?.(job, message, permanent).catch((e) => console.error("job cleanup failed", job.id, e));
    }
  }

  async function loop() {
    while (running) {
      try {
        if (Date.now() - lastStaleCheck > 60_000) {
          lastStaleCheck = Date.now();
          await requeueStale();
        }
        const job = await claimNext(id, kinds);
        if (job) {
          current = runOne(job);
          await current;
          continue;
        }
      } catch (error) {
        // The database may be restarting; try again after the pause.
        console.error("job worker:", error instanceof Error ? error.message : error);
      }
      await new Promise((r) => setTimeout(r, opts.idleMs ?? 1000));
    }
  }

  void loop();
  const worker = {
    async stop() {
      running = false;
      await current;
      holder.__cordariumWorker = undefined;
    },
  };
  holder.__cordariumWorker = worker;
  return worker;
}
