import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { jobs, type Job } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { authorize, type Actor } from "@/lib/auth/policy";
import { enqueue } from "@/lib/jobs/queue";
import { PermanentJobError, type JobHandler } from "@/lib/jobs/worker";
import { outboxBacklog } from "./outbox";
import { rebuildIndexes, RebuildRunningError } from "./reindex";

/** An admin queues a rebuild of both search indexes (`npm run reindex` runs the same rebuild directly). */
export async function requestReindex(actor: Actor | null): Promise<{ jobId: number }> {
  authorize(actor, "system.reindex");
  return db().transaction(async (tx) => {
    const jobId = await enqueue(tx, "search.reindex", {}, { maxAttempts: 3 });
    await recordAudit(tx, { actorId: actor!.id, action: "search.reindex_requested", entityType: "search_index", entityId: "all", after: { jobId } });
    return { jobId };
  });
}

export const searchReindexHandler: JobHandler = {
  async run(job: Job) {
    try {
      const result = await rebuildIndexes();
      console.log(`search reindex (job ${job.id}): ${result.sources} sources, ${result.regions} region documents; outbox: ${result.cleared} cleared, ${result.requeued} queued again`);
    } catch (error) {
      // The rebuild already running covers what this one was asked for.
      if (error instanceof RebuildRunningError) throw new PermanentJobError(error.message);
      throw error;
    }
  },
};

/** The last rebuild asked for and what the index still waits for: for the admin. */
export async function reindexStatus(actor: Actor | null) {
  authorize(actor, "system.reindex");
  const [last] = await db()
    .select({ id: jobs.id, state: jobs.state, attempts: jobs.attempts, lastError: jobs.lastError, createdAt: jobs.createdAt, finishedAt: jobs.finishedAt })
    .from(jobs)
    .where(eq(jobs.kind, "search.reindex"))
    .orderBy(desc(jobs.id))
    .limit(1);
  return { lastRebuild: last ?? null, backlog: await outboxBacklog() };
}
