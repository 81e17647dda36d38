// `npm run reindex`: rebuilds both search indexes from the database (every live source and its regions),
// swaps them in, and clears the search outbox of what the rebuild covered. Reads the same environment
// as the app (DATABASE_URL, MEILI_HOST, MEILI_API_KEY, SEARCH_INDEX_PREFIX, …).
// Run with the "react-server" condition (see package.json) so that the server-only marker resolves.
import { closeDb } from "./client";
import { rebuildIndexes, type ReindexProgress } from "../lib/search/reindex";

const tty = process.stdout.isTTY;
const started = Date.now();
let lastLine = 0;

function bar({ done, total, regions }: ReindexProgress): string {
  const width = 30;
  const share = total === 0 ? 1 : done / total;
  const filled = Math.round(share * width);
  return `[${"#".repeat(filled)}${"-".repeat(width - filled)}] ${String(Math.round(share * 100)).padStart(3)}%  ${done}/${total} sources, ${regions} region documents`;
}

// On a terminal one line redraws itself; in a log, a line every few seconds and the last one.
function show(p: ReindexProgress) {
  if (tty) process.stdout.write(`\r${bar(p)}`);
  else if (Date.now() - lastLine > 5000 || p.done === p.total) {
    lastLine = Date.now();
    console.log(bar(p));
  }
}

try {
  const result = await rebuildIndexes(show);
  if (tty) process.stdout.write("\n");
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  console.log(`Rebuilt in ${seconds} s: ${result.sources} sources and ${result.regions} region documents.`);
  console.log(`Search outbox: ${result.cleared} pending changes covered by the rebuild, ${result.requeued} delivered meanwhile and queued again.`);
} catch (error) {
  if (tty) process.stdout.write("\n");
  console.error(`The rebuild failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exitCode = 1;
} finally {
  await closeDb();
}
