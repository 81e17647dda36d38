import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { mailHealth } from "@/lib/mail/transport";
import { searchHealth } from "@/lib/search/client";
import { storageHealth } from "@/lib/storage/s3";

export type HealthEntry = { status: "ok" } | { status: "error"; error: string };
export type Health = { ok: boolean; checks: Record<"database" | "storage" | "search" | "mail", HealthEntry> };

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
  const [database, storage, searchEntry, mail] = await Promise.all([
    probe(() => db().execute(sql`SELECT 1`)),
    probe(storageHealth),
    probe(searchHealth),
    probe(mailHealth),
  ]);
  const checks = { database, storage, search: searchEntry, mail };
  return { ok: Object.values(checks).every((c) => c.status === "ok"), checks };
}
