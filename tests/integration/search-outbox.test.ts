// The search outbox under trouble and rebuilds: with the search service stopped every write still
// succeeds and the health report names the outage and the backlog; once it returns, the index catches
// up with every change. `npm run reindex` and an admin's job rebuild the indexes from the database.
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { call, service } from "../support/app";
import { eventually, ids, searchAs, searchBench, token, type Health, type SearchBench } from "../support/search";

let bench: SearchBench;
beforeAll(async () => {
  bench = await searchBench();
}, 120_000);

// Whatever happened, leave the search service running for the next test file.
afterAll(() => service("start", "search"));

describe("when the search service is away", () => {
  it("takes every change, reports the outage and the backlog, and catches up with no change lost", async () => {
    const { contributor, admin, saveSource, observe, region, act, vetted } = bench;
    const word = token();
    const kept = await vetted(`kept ${word}`, [observe("right_hand_technique", "strumming")]);
    const removed = await vetted(`removed ${word}`, [observe("right_hand_technique", "plucking")]);
    await eventually(() => searchAs(undefined, `q=${word}`), (a) => expect(ids(a)).toEqual([`${kept.id}:vetted`, `${removed.id}:vetted`].sort()));

    service("stop", "search");
    let fresh: RegionView, draft: RegionView;
    const title = `Tavern scene ${token()}`;
    try {
      fresh = await vetted(`fresh ${word}`, [observe("setting", "street")]);
      draft = await region(`draft ${word}`, [observe("setting", "court")]);
      await act(contributor, `/api/regions/${kept.id}`, { version: kept.version, label: `kept and edited ${word}` }, "PATCH");
      expect((await call(`/api/regions/${removed.id}`, { jar: admin, method: "DELETE", json: { version: removed.version } })).status).toBe(200);
      const saved = await saveSource(title);
      expect(saved.status).toBe(200);

      const health = await call("/api/health");
      const body = (await health.json()) as Health;
      expect(health.status).toBe(503);
      expect(body.checks.search.status).toBe("error");
      expect(body.checks.search.error).toMatch(/changes? waiting for the index/);
      expect(body.checks.database.status).toBe("ok");
      expect(body.searchBacklog!.pending).toBeGreaterThanOrEqual(5);
      const refused = await call(`/api/search?q=${word}`);
      expect(refused.status).toBe(503);
      expect(await refused.json()).toMatchObject({ error: { code: "search_unavailable" } });
    } finally {
      service("start", "search");
    }

    await eventually(() => searchAs(undefined, `q=${word}`), (a) => expect(ids(a)).toEqual([`${fresh.id}:vetted`, `${kept.id}:vetted`].sort()));
    await eventually(
      () => searchAs(contributor, `q=${word}`),
      (a) => expect(ids(a)).toEqual([`${fresh.id}:vetted`, `${kept.id}:working`, `${draft.id}:working`].sort()),
    );
    const author = await searchAs(contributor, `q=${word}`);
    expect(author.hits.find((h) => h.regionId === kept.id)!.label).toBe(`kept and edited ${word}`);
    // The source's new title reached the documents of its regions, including one made before the outage.
    await eventually(
      () => searchAs(undefined, `q=${title.split(" ").pop()}`),
      (a) => expect(a.hits.filter((h) => [fresh.id, kept.id].includes(h.regionId)).map((h) => h.sourceTitle)).toEqual([title, title]),
    );
    await eventually(
      () => call("/api/health").then(async (res) => ({ status: res.status, body: (await res.json()) as Health })),
      ({ status, body }) => {
        expect(status).toBe(200);
        expect(body.searchBacklog!.pending).toBe(0);
      },
    );
  }, 240_000);
});

describe("rebuilding the indexes", () => {
  it("npm run reindex rebuilds both from the database and swaps them in, each document for its audience", async () => {
    const { contributor, observe, region, vetted } = bench;
    const word = token();
    const r = await vetted(`rebuilt ${word}`, [observe("right_hand_technique", "strumming")]);
    const draft = await region(`rebuilt draft ${word}`, [observe("right_hand_technique", "plucking")]);
    const { stdout: output } = await promisify(execFile)("npm", ["run", "--silent", "reindex"], { encoding: "utf8" });
    expect(output).toMatch(/Rebuilt in [\d.]+ s: \d+ sources and \d+ region documents/);
    expect(output).toMatch(/Search outbox: \d+ pending changes covered by the rebuild/);
    // The swap has happened when the command returns: both regions are there at once, each for its audience.
    expect(ids(await searchAs(undefined, `q=${word}`))).toEqual([`${r.id}:vetted`]);
    expect(ids(await searchAs(contributor, `q=${word}`))).toEqual([`${r.id}:vetted`, `${draft.id}:working`].sort());
    const sources = await searchAs(undefined, `scope=sources&q=${word}`);
    expect(sources.total).toBe(0);
  }, 120_000);

  it("an admin queues the same rebuild as a job and reads how it went", async () => {
    const { reader, admin } = bench;
    const res = await call("/api/admin/reindex", { jar: admin, method: "POST" });
    expect(res.status).toBe(202);
    const { jobId } = (await res.json()) as { jobId: number };
    const status = await eventually(
      async () => (await (await call("/api/admin/reindex", { jar: admin })).json()) as { lastRebuild: { id: number; state: string } | null; backlog: { pending: number } },
      (s) => expect(s.lastRebuild).toMatchObject({ id: jobId, state: "done" }),
    );
    expect(status.backlog.pending).toBeGreaterThanOrEqual(0);
    const audit = (await (await call(`/api/admin/audit?entityType=search_index`, { jar: admin })).json()) as { events: { action: string }[] };
    expect(audit.events[0].action).toBe("search.reindex_requested");
    expect((await call("/api/admin/reindex", { jar: reader, method: "POST" })).status).toBe(403);
  }, 120_000);
});
