import "server-only";
import { Meilisearch } from "meilisearch";
import { config } from "@/lib/config";

// The one adapter for full-text search: the local fake here, a Meilisearch server or cloud elsewhere.
let client: Meilisearch | undefined;

export function search(): Meilisearch {
  client ??= new Meilisearch({
    host: config().MEILI_HOST,
    apiKey: config().MEILI_API_KEY,
    timeout: 5000,
  });
  return client;
}

export const indexName = (name: string) => `${config().SEARCH_INDEX_PREFIX}${name}`;

export async function searchHealth(): Promise<void> {
  const health = await search().health();
  if (health.status !== "available") throw new Error(`search service reports ${health.status}`);
  // health is public on Meilisearch: also prove that our key is accepted.
  await search().getIndexes({ limit: 1 });
}
