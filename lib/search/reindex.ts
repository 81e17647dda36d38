import "server-only";
import { and, asc, gt, isNull, sql } from "drizzle-orm";
import { db, pool } from "@/db/client";
import { sources } from "@/db/schema";
import { search } from "./client";
import { buildBatch, sendBatch } from "./delivery";
import { ensureIndex, INDEX_KINDS, liveIndex, succeeded, TASK_WAIT, type IndexKind } from "./indexes";

export type ReindexProgress = { done: number; total: number; regions: number; sources: number };
export type ReindexResult = ReindexProgress & { cleared: number; requeued: number };

const PAGE = 100;
const fresh = (kind: IndexKind) => `${liveIndex(kind)}__rebuild`;

/**
 * Rebuilds both indexes from the database without taking search away: every live source and its
 * regions go into fresh indexes, which are then swapped with the live ones in one task.
 *
 * The outbox is then cleared of what the rebuild covered: rows pending when it began (their changes
 * were committed before it read anything), unless a later change bumped them. What the worker
 * delivered to the old indexes while the rebuild ran, or is delivering now, is queued again, because
 * the rebuild may have read those entities before the change. So no update is lost to a rebuild.
 */
export async function rebuildIndexes(onProgress: (p: ReindexProgress) => void = () => {}): Promise<ReindexResult> {
  // Two rebuilds at once would delete each other's fresh indexes: a named lock held on one connection
  // keeps it to one across every app instance and the command line.
  const connection = await pool().getConnection();
  try {
    const [[{ got }]] = (await connection.query(`SELECT GET_LOCK('cordarium_search_rebuild', 0) AS got`)) as unknown as [[{ got: number }]];
    if (Number(got) !== 1) throw new RebuildRunningError();
    try {
      return await rebuild(onProgress);
    } finally {
      await connection.query(`DO RELEASE_LOCK('cordarium_search_rebuild')`);
    }
  } finally {
    connection.release();
  }
}

export class RebuildRunningError extends Error {
  constructor() {
    super("Another rebuild of the search indexes is running; wait for it to finish.");
  }
}

async function rebuild(onProgress: (p: ReindexProgress) => void): Promise<ReindexResult> {
  const [[{ startedAt }]] = (await db().execute(sql`SELECT NOW(3) AS startedAt`)) as unknown as [[{ startedAt: Date }]];
  const [snapshot] = (await db().execute(sql`SELECT id, revision FROM search_outbox WHERE delivered_at IS NULL`)) as unknown as [{ id: number; revision: number }[]];

  for (const kind of INDEX_KINDS) {
    // Left over from a rebuild that stopped halfway; deleting an index that is not there is a task
    // that fails with index_not_found, which is fine.
    const gone = await search().deleteIndex(fresh(kind)).waitTask(TASK_WAIT);
    if (gone.status !== "succeeded" && gone.error?.code !== "index_not_found") succeeded(gone);
    await ensureIndex(kind, fresh(kind));
  }
  const [{ total }] = await db().select({ total: sql<number>`COUNT(*)` }).from(sources).where(isNull(sources.deletedAt));
  const progress: ReindexProgress = { done: 0, total: Number(total), regions: 0, sources: 0 };
  onProgress({ ...progress });
  let after = 0;
  for (;;) {
    const page = await db()
      .select({ id: sources.id })
      .from(sources)
      .where(and(isNull(sources.deletedAt), gt(sources.id, after)))
      .orderBy(asc(sources.id))
      .limit(PAGE);
    if (page.length === 0) break;
    after = page[page.length - 1].id;
    const batch = await buildBatch(db(), page.map((p) => p.id), []);
    // A fresh index holds nothing to delete.
    await sendBatch({ ...batch, regionDeletes: [], sourceDeletes: [] }, { regions: fresh("regions"), sources: fresh("sources") });
    progress.done += page.length;
    progress.sources += batch.sources.length;
    progress.regions += batch.regions.length;
    onProgress({ ...progress });
  }

  for (const kind of INDEX_KINDS) await ensureIndex(kind);
  await search()
    .swapIndexes(INDEX_KINDS.map((kind) => ({ indexes: [liveIndex(kind), fresh(kind)] as [string, string], rename: false })))
    .waitTask(TASK_WAIT)
    .then(succeeded);
  for (const kind of INDEX_KINDS) await search().deleteIndex(fresh(kind)).waitTask(TASK_WAIT).then(succeeded);

  // First what the worker delivered to the old indexes meanwhile (before the clearing below marks rows
  // delivered too), then the rows the rebuild covered.
  const [requeue] = (await db().execute(
    sql`INSERT INTO search_outbox (entity_type, entity_id, next_attempt_at)
        SELECT DISTINCT done.entity_type, done.entity_id, NOW(3) FROM search_outbox AS done
        WHERE done.delivered_at >= ${startedAt} OR (done.delivered_at IS NULL AND done.locked_until > NOW(3))
        ON DUPLICATE KEY UPDATE revision = search_outbox.revision + 1, next_attempt_at = NOW(3)`,
  )) as unknown as [{ affectedRows: number }];
  let cleared = 0;
  for (let i = 0; i < snapshot.length; i += 500) {
    const pairs = sql.join(snapshot.slice(i, i + 500).map((r) => sql`(${r.id}, ${r.revision})`), sql`, `);
    const [res] = (await db().execute(
      sql`UPDATE search_outbox SET delivered_at = NOW(3), locked_by = NULL, locked_until = NULL, last_error = NULL
          WHERE (id, revision) IN (${pairs}) AND delivered_at IS NULL`,
    )) as unknown as [{ affectedRows: number }];
    cleared += res.affectedRows;
  }
  return { ...progress, cleared, requeued: requeue.affectedRows };
}
