import "server-only";
import { config } from "@/lib/config";
import { imageProcessingHandler } from "@/lib/images/process";
import { scheduleSweep, storageSweepHandler } from "@/lib/images/sweep";
import { notificationSendHandler } from "@/lib/notifications/deliver";
import { notificationDigestHandler, scheduleDigest } from "@/lib/notifications/digest";
import { searchReindexHandler } from "@/lib/search/reindex-job";
import { startSearchDelivery } from "@/lib/search/worker";
import { startWorker } from "./worker";

export async function startJobWorker(): Promise<void> {
  if (config().CORDARIUM_WORKER === "off") return;
  startWorker(
    {
      "image.process": imageProcessingHandler,
      "storage.sweep": storageSweepHandler,
      "notification.send": notificationSendHandler,
      "notification.digest": notificationDigestHandler,
      "search.reindex": searchReindexHandler,
    },
    { idleMs: 500 },
  );
  startSearchDelivery();
  await scheduleSweep().catch((e) => console.error("could not schedule the storage sweep:", e instanceof Error ? e.message : e));
  await scheduleDigest().catch((e) => console.error("could not schedule the daily digest:", e instanceof Error ? e.message : e));
}
