import "server-only";
import { config } from "@/lib/config";
import { imageProcessingHandler } from "@/lib/images/process";
import { scheduleSweep, storageSweepHandler } from "@/lib/images/sweep";
import { startWorker } from "./worker";

export async function startJobWorker(): Promise<void> {
  if (config().CORDARIUM_WORKER === "off") return;
  startWorker({ "image.process": imageProcessingHandler, "storage.sweep": storageSweepHandler }, { idleMs: 500 });
  await scheduleSweep().catch((e) => console.error("could not schedule the storage sweep:", e instanceof Error ? e.message : e));
}
