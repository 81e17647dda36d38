import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { mailHealth } from "@/lib/mail/transport";
import { searchHealth } from "@/lib/search/client";
import { outboxBacklog, type OutboxBacklog } from "@/lib/search/outbox";
import { storageHealth } from "@/lib/storage/s3";

export type HealthEntry = { status: "ok" } | { status: "error"; error: string };
export type Health = {
  ok: boolean;
  checks: Record<"database" | "storage" | "search" | "mail", HealthEntry>;
  /** Changes not yet in the search index (null when the database cannot say). */
  searchBacklog: OutboxBacklog | null;
};

/** Deliveries failing this long with the service up mean the index is falling behind. */
const STUCK_SECONDS = 300;

const TIMEOUT_MS = 4000;

async function probe(run: () => Promise<unknown>): Promise<HealthEntry> {
  let timer: NodeJS.Timeout | undefined;
  try {
    await Promise.race([
      run(),
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error(`no answer within ${TIMEOUT_MS} ms`)), TIMEOUT_MS);
      }),
    ]);
    return { status: "ok" };
  } catch (error) {
    const message = error instanceof Error ? error.message || error.name : String(error);
    return { status: "error", error: message };
  } finally {
    clearTimeout(timer);
  }
}

export async function checkHealth(): Promise<Health> {
  const [database, storage, searchService, mail, searchBacklog] = await Promise.all([
    probe(() => db().execute(sql`SELECT 1`)),
    probe(storageHealth),
    probe(searchHealth),
    probe(mailHealth),
    backlogWithin(),
  ]);
  const checks = { database, storage, search: searchEntry(searchService, searchBacklog), mail };
  return { ok: Object.values(checks).every((c) => c.status === "ok"), checks, searchBacklog };
}

async function backlogWithin(): Promise<OutboxBacklog | null> {
  let backlog: OutboxBacklog | null = null;
  const entry = await probe(async () => {
    backlog = await outboxBacklog();
  });
  return entry.status === "ok" ? backlog : null;
}

// Writes go on while search is away; the entry says how far behind the index is.
function searchEntry(service: HealthEntry, backlog: OutboxBacklog | null): HealthEntry {
  const behind = backlog && backlog.pending > 0 ? `${backlog.pending} change${backlog.pending === 1 ? "" : "s"} waiting for the index` : null;
  if (service.status === "error") return { status: "error", error: behind ? `${service.error}; ${behind}` : service.error };
  if (backlog && backlog.failing > 0 && (backlog.oldestPendingSeconds ?? 0) > STUCK_SECONDS) {
    return { status: "error", error: `${behind}, failing for over ${STUCK_SECONDS / 60} minutes: ${backlog.lastError ?? "no reason recorded"}` };
  }
  return service;
}
