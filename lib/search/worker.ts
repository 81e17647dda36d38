import "server-only";
import { hostname } from "node:os";
import { sql } from "drizzle-orm";
import { db } from "@/db/client";
import { claimDue, deliver, purgeDelivered } from "./delivery";
import { ensureIndexes } from "./indexes";
import { outboxSelected } from "./outbox";

type Delivery = { stop(): Promise<void> };
const holder = globalThis as unknown as { __cordariumSearchDelivery?: Delivery };

/**
 * The polling loop every app instance runs beside the job worker. It first makes sure both indexes
 * exist with their settings (idempotent); an index that had to be created is filled by queueing every
 * live source, which brings its regions along. Until that succeeds nothing is delivered, so documents
 * never land in an index without its settings.
 */
export function startSearchDelivery(opts: { idleMs?: number } = {}): Delivery {
  if (holder.__cordariumSearchDelivery) return holder.__cordariumSearchDelivery;
  const workerId = `${hostname()}:${process.pid}:search`;
  let running = true;
  let ready = false;
  let lastPurge = 0;
  let lastComplaint = "";
  let current: Promise<unknown> = Promise.resolve();

  // An outage would otherwise print the same line twice a second.
  const complain = (what: string, error: unknown) => {
    const message = `${what}: ${error instanceof Error ? error.message : String(error)}`;
    if (message !== lastComplaint) console.error(`search delivery: ${message}`);
    lastComplaint = message;
  };

  async function step(): Promise<boolean> {
    if (!ready) {
      if (await ensureIndexes()) await outboxSelected(db(), "source", sql`SELECT id FROM sources WHERE deleted_at IS NULL`);
      ready = true;
      lastComplaint = "";
    }
    if (Date.now() - lastPurge > 600_000) {
      lastPurge = Date.now();
      await purgeDelivered();
    }
    const rows = await claimDue(workerId);
    if (rows.length === 0) return false;
    const result = await deliver(workerId, rows);
    if (result.failed) complain("delivery failed", new Error(`${result.failed} of ${rows.length} waiting for the next attempt`));
    else lastComplaint = "";
    return true;
  }

  async function loop() {
    while (running) {
      let busy = false;
      try {
        current = step();
        busy = (await current) === true;
      } catch (error) {
        complain(ready ? "outbox" : "preparing the indexes", error);
      }
      if (!busy) await new Promise((r) => setTimeout(r, opts.idleMs ?? 500));
    }
  }

  void loop();
  const delivery = {
    async stop() {
      running = false;
      await current.catch(() => undefined);
      holder.__cordariumSearchDelivery = undefined;
    },
  };
  holder.__cordariumSearchDelivery = delivery;
  return delivery;
}
