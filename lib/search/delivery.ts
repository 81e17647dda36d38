import "server-only";
import { sql } from "drizzle-orm";
import { MeilisearchRequestError, MeilisearchRequestTimeOutError } from "meilisearch";
import { db, type Executor } from "@/db/client";
import type { OutboxEntity } from "@/db/schema";
import { search } from "./client";
import { regionDocumentIds, regionDocuments, sourceDocument, type RegionDocument, type SourceDocument } from "./documents";
import { liveIndex, succeeded, TASK_WAIT } from "./indexes";
import { loadRegions, loadSources, regionIdsOfSources } from "./load";

// The delivery side of the search outbox. A worker claims due rows with SELECT … FOR UPDATE SKIP
// LOCKED and leases them (so that several app instances share the work and never deliver one entity
// twice at once), builds the entities' documents from the database as it is now, sends them, and waits
// until the search service reports the tasks succeeded. Only then is a row marked delivered, and only
// if no change bumped its revision meanwhile. On any failure the row stays, with its error, and is
// retried with backoff: an update is never lost, only late.

export type Claimed = { id: number; entityType: OutboxEntity; entityId: number; revision: number; attempts: number };

const LEASE_SECONDS = 120;

export async function claimDue(workerId: string, limit = 50): Promise<Claimed[]> {
  return db().transaction(async (tx) => {
    const [rows] = (await tx.execute(
      sql`SELECT id, entity_type AS entityType, entity_id AS entityId, revision, attempts FROM search_outbox
          WHERE delivered_at IS NULL AND next_attempt_at <= NOW(3) AND (locked_until IS NULL OR locked_until < NOW(3))
          ORDER BY next_attempt_at, id LIMIT ${limit} FOR UPDATE SKIP LOCKED`,
    )) as unknown as [Claimed[]];
    if (rows.length === 0) return [];
    await tx.execute(
      sql`UPDATE search_outbox SET locked_by = ${workerId}, locked_until = NOW(3) + INTERVAL ${LEASE_SECONDS} SECOND, attempts = attempts + 1
          WHERE id IN (${sql.join(rows.map((r) => sql`${r.id}`), sql`, `)})`,
    );
    return rows.map((r) => ({ ...r, id: Number(r.id), entityId: Number(r.entityId), attempts: Number(r.attempts) + 1 }));
  });
}

export type Batch = { regions: RegionDocument[]; regionDeletes: string[]; sources: SourceDocument[]; sourceDeletes: string[] };

/** The documents of these entities as the database has them now; a source brings its regions along. */
export async function buildBatch(ex: Executor, sourceIds: number[], regionIds: number[]): Promise<Batch> {
  const allRegionIds = [...new Set([...regionIds, ...(await regionIdsOfSources(ex, sourceIds))])];
  const [sourceFacts, regionFacts] = await Promise.all([loadSources(ex, sourceIds), loadRegions(ex, allRegionIds)]);
  const batch: Batch = { regions: [], regionDeletes: [], sources: [], sourceDeletes: [] };
  for (const id of sourceIds) {
    const facts = sourceFacts.get(id);
    if (facts) batch.sources.push(sourceDocument(facts));
    else batch.sourceDeletes.push(String(id));
  }
  for (const id of allRegionIds) {
    const facts = regionFacts.get(id);
    const docs = facts ? regionDocuments(facts) : [];
    batch.regions.push(...docs);
    const kept = new Set(docs.map((d) => d.id));
    batch.regionDeletes.push(...regionDocumentIds(id).filter((d) => !kept.has(d)));
  }
  return batch;
}

/** Sends a batch to the given indexes and waits for every task to succeed. */
export async function sendBatch(batch: Batch, uids = { regions: liveIndex("regions"), sources: liveIndex("sources") }): Promise<void> {
  const pending = [];
  // Deletions first: a document that moves between ids is never missing and never doubled for long.
  if (batch.regionDeletes.length) pending.push(search().index(uids.regions).deleteDocuments(batch.regionDeletes));
  if (batch.sourceDeletes.length) pending.push(search().index(uids.sources).deleteDocuments(batch.sourceDeletes));
  if (batch.regions.length) pending.push(search().index(uids.regions).addDocuments(batch.regions, { primaryKey: "id" }));
  if (batch.sources.length) pending.push(search().index(uids.sources).addDocuments(batch.sources, { primaryKey: "id" }));
  const tasks = await Promise.all(pending);
  await Promise.all(tasks.map((t) => search().tasks.waitForTask(t.taskUid, TASK_WAIT).then(succeeded)));
}

const ids = (rows: Claimed[]) => sql.join(rows.map((r) => sql`${r.id}`), sql`, `);

/** Marks rows delivered unless a change arrived meanwhile; those are released to be delivered again. */
export async function markDelivered(workerId: string, rows: Claimed[]): Promise<void> {
  if (rows.length === 0) return;
  const pairs = sql.join(rows.map((r) => sql`(${r.id}, ${r.revision})`), sql`, `);
  await db().execute(
    sql`UPDATE search_outbox SET delivered_at = NOW(3), locked_by = NULL, locked_until = NULL, last_error = NULL
        WHERE (id, revision) IN (${pairs}) AND locked_by = ${workerId}`,
  );
  await db().execute(
    sql`UPDATE search_outbox SET locked_by = NULL, locked_until = NULL, next_attempt_at = NOW(3)
        WHERE id IN (${ids(rows)}) AND delivered_at IS NULL AND locked_by = ${workerId}`,
  );
}

/** Retries wait 1 s, 2 s, 4 s … at most 30 s, so the index catches up soon after an outage. */
export async function markFailed(workerId: string, rows: Claimed[], error: string): Promise<void> {
  if (rows.length === 0) return;
  await db().execute(
    sql`UPDATE search_outbox SET locked_by = NULL, locked_until = NULL, last_error = ${error.slice(0, 2000)},
          next_attempt_at = NOW(3) + INTERVAL LEAST(30, POW(2, GREATEST(attempts, 1) - 1)) SECOND
        WHERE id IN (${ids(rows)}) AND delivered_at IS NULL AND locked_by = ${workerId}`,
  );
}

/**
 * Delivers claimed rows: builds, sends, waits, marks. Throws nothing; failures stay in the rows. When
 * the service is reachable but refuses a batch, each row is tried alone, so that one document it
 * cannot take does not hold back the others.
 */
export async function deliver(workerId: string, rows: Claimed[]): Promise<{ delivered: number; failed: number }> {
  try {
    const batch = await buildBatch(
      db(),
      rows.filter((r) => r.entityType === "source").map((r) => r.entityId),
      rows.filter((r) => r.entityType === "region").map((r) => r.entityId),
    );
    await sendBatch(batch);
    await markDelivered(workerId, rows);
    return { delivered: rows.length, failed: 0 };
  } catch (error) {
    const unreachable = error instanceof MeilisearchRequestError || error instanceof MeilisearchRequestTimeOutError;
    if (rows.length > 1 && !unreachable) {
      let delivered = 0;
      for (const row of rows) delivered += (await deliver(workerId, [row])).delivered;
      return { delivered, failed: rows.length - delivered };
    }
    const message = error instanceof Error ? error.message || error.name : String(error);
    await markFailed(workerId, rows, message).catch((e) => console.error("search outbox: could not record a failed delivery:", e));
    return { delivered: 0, failed: rows.length };
  }
}

/** Delivered rows are kept a day for inspection, then removed. */
export async function purgeDelivered(): Promise<void> {
  await db().execute(sql`DELETE FROM search_outbox WHERE delivered_at < NOW(3) - INTERVAL 1 DAY LIMIT 5000`);
}
