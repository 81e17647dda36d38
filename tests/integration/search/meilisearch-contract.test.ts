// Contract suite for the search backend, driven only through the official
// `meilisearch` client. It runs against the local fake and, when
// MEILI_CONTRACT_URL (+ MEILI_CONTRACT_KEY) is set, against a real Meilisearch,
// so the fake's behaviour is checked against the real thing.

import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe } from "vitest";
import { startSearchFake, type SearchFake } from "../../../fakes/search/server";
import { adminContract } from "./contract-admin";
import { searchContract } from "./contract-search";
import type { ContractTarget } from "./contract-support";

/** The whole contract against one target; `getTarget` is read lazily (the fake's url changes on restart). */
function describeContract(name: string, getTarget: () => ContractTarget): void {
  describe(name, () => {
    adminContract(getTarget);
    searchContract(getTarget);
  });
}

describe("Meilisearch contract: local fake", () => {
  const masterKey = "contract-master-key";
  let dataDir = "";
  let fake: SearchFake | null = null;
  beforeAll(async () => {
    dataDir = await mkdtemp(path.join(tmpdir(), "search-fake-"));
    fake = await startSearchFake({ port: 0, dataDir, masterKey });
  });
  afterAll(async () => {
    await fake?.close();
    await rm(dataDir, { recursive: true, force: true });
  });
  describeContract("fake", () => ({
    url: fake!.url,
    apiKey: masterKey,
    restart: async () => {
      await fake!.close();
      fake = await startSearchFake({ port: 0, dataDir, masterKey });
    },
  }));
});

describe.skipIf(!process.env.MEILI_CONTRACT_URL)("Meilisearch contract: real server", () => {
  describeContract("real", () => ({ url: process.env.MEILI_CONTRACT_URL!, apiKey: process.env.MEILI_CONTRACT_KEY || undefined }));
});
