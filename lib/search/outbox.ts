import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import type { OutboxEntity } from "@/db/schema";

// The write side of the search outbox: every change that alters search documents calls one of these
// inside its own transaction, so the row exists exactly when the change does. One pending row per
// entity (a unique index on the generated `pending` column); a later change bumps its revision, which
// tells a delivery in progress that its documents are already stale.

const UPSERT = sql`ON DUPLICATE KEY UPDATE revision = search_outbox.revision + 1, next_attempt_at = LEAST(search_outbox.next_attempt_at, NOW(3))`;

/** Queues one or more entities for (re)indexing, or for removal from the index if they are gone. */
export async function outbox(tx: Executor, type: OutboxEntity, ids: number | number[]): Promise<void> {
  const list = [...new Set(Array.isArray(ids) ? ids : [ids])];
  if (list.length === 0) return;
  const rows = sql.join(
    list.map((id) => sql`(${type}, ${id}, NOW(3))`),
    sql`, `,
  );
  await tx.execute(sql`INSERT INTO search_outbox (entity_type, entity_id, next_attempt_at) VALUES ${rows} ${UPSERT}`);
}

/** Queues every entity a query selects (one `id` column), in one statement: many rows, no round trips. */
export async function outboxSelected(tx: Executor, type: OutboxEntity, selectIds: SQL): Promise<void> {
  await tx.execute(sql`INSERT INTO search_outbox (entity_type, entity_id, next_attempt_at) SELECT ${type}, picked.id, NOW(3) FROM (${selectIds}) AS picked ${UPSERT}`);
}

/**
 * The regions with a version that names a term (a label change or a merge alters their documents).
 * Older versions count too: re-indexing a region that did not change costs little, and the query
 * stays on indexes.
 */
export const outboxRegionsUsingTerm = (tx: Executor, termId: number) =>
  outboxSelected(
    tx,
    "region",
    sql`SELECT DISTINCT v.region_id AS id FROM observations o JOIN region_versions v ON v.id = o.region_version_id WHERE o.term_id = ${termId}`,
  );

/** The sources of a collection (its name is in their documents and their regions'). */
export const outboxSourcesOfCollection = (tx: Executor, collectionId: number) =>
  outboxSelected(tx, "source", sql`SELECT id FROM sources WHERE collection_id = ${collectionId}`);

/** The sources made at a place (its name and point are in their documents and their regions'). */
export const outboxSourcesOfPlace = (tx: Executor, placeId: number) =>
  outboxSelected(tx, "source", sql`SELECT id FROM sources WHERE place_id = ${placeId}`);

export type OutboxBacklog = { pending: number; failing: number; oldestPendingSeconds: number | null; lastError: string | null };

/** What has not reached the index yet: for the health report and the admin. */
export async function outboxBacklog(ex: Executor = db()): Promise<OutboxBacklog> {
  const [rows] = (await ex.execute(
    sql`SELECT COUNT(*) AS pending, COALESCE(SUM(last_error IS NOT NULL), 0) AS failing,
          TIMESTAMPDIFF(SECOND, MIN(created_at), NOW(3)) AS oldest,
          (SELECT last_error FROM search_outbox WHERE delivered_at IS NULL AND last_error IS NOT NULL ORDER BY id DESC LIMIT 1) AS lastError
        FROM search_outbox WHERE delivered_at IS NULL`,
  )) as unknown as [{ pending: number | string; failing: number | string; oldest: number | string | null; lastError: string | null }[]];
  const row = rows[0];
  return {
    pending: Number(row.pending),
    failing: Number(row.failing),
    oldestPendingSeconds: row.oldest === null ? null : Number(row.oldest),
    lastError: row.lastError,
  };
}
