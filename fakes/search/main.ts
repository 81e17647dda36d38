// CLI for the search fake: `npx tsx fakes/search/main.ts`.
// Env: SEARCH_FAKE_HOST (127.0.0.1), SEARCH_FAKE_PORT (7700), SEARCH_FAKE_DIR (.data/search), MEILI_MASTER_KEY.

import { startSearchFake } from "./server.js";

async function main(): Promise<void> {
  const host = process.env.SEARCH_FAKE_HOST || "127.0.0.1";
  const port = Number(process.env.SEARCH_FAKE_PORT || 7700);
  if (!Number.isInteger(port) || port < 0 || port > 65535) throw new Error(`SEARCH_FAKE_PORT is not a port: ${process.env.SEARCH_FAKE_PORT}`);
  const dataDir = process.env.SEARCH_FAKE_DIR || ".data/search";
  const fake = await startSearchFake({ host, port, dataDir, masterKey: process.env.MEILI_MASTER_KEY || undefined });
  console.log(`search fake listening on ${fake.url}`);

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    fake
      .close()
      .then(() => process.exit(0))
      .catch((err: unknown) => {
        console.error(`search fake: error while stopping on ${signal}`, err);
        process.exit(1);
      });
  };
  process.on("SIGINT", () => stop("SIGINT"));
  process.on("SIGTERM", () => stop("SIGTERM"));
}

main().catch((err: unknown) => {
  console.error("search fake failed to start:", err);
  process.exit(1);
});
