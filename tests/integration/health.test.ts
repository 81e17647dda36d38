// GET /api/health reports database, storage, search and mail; a stopped search service turns it to 503
// while pages that need no search still render, and it recovers when the service returns.
import { afterAll, describe, expect, it } from "vitest";
import { call, service } from "../support/app";

type Health = { ok: boolean; checks: Record<string, { status: string; error?: string }>; searchBacklog: { pending: number } | null };

describe("health", () => {
  afterAll(() => service("start", "search"));

  it("is 200 with four entries, all ok, when every service runs", async () => {
    const res = await call("/api/health");
    const body = (await res.json()) as Health;
    expect(res.status).toBe(200);
    expect(body).toEqual({
      ok: true,
      checks: { database: { status: "ok" }, storage: { status: "ok" }, search: { status: "ok" }, mail: { status: "ok" } },
      searchBacklog: { pending: expect.any(Number), failing: expect.any(Number), oldestPendingSeconds: expect.toBeOneOf([null, expect.any(Number)]), lastError: expect.toBeOneOf([null, expect.any(String)]) },
    });
  });

  it("is 503 naming search when the search service is down, and the archive still renders", async () => {
    service("stop", "search");
    const res = await call("/api/health");
    const body = (await res.json()) as Health;
    expect(res.status).toBe(503);
    expect(body.ok).toBe(false);
    expect(body.checks.search.status).toBe("error");
    expect(body.checks.search.error).toBeTruthy();
    expect(body.checks.database.status).toBe("ok");
    const page = await call("/");
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Holding collections");
    expect((await call("/sign-in")).status).toBe(200);

    service("start", "search");
    const back = await call("/api/health");
    expect(back.status).toBe(200);
  });

  it("is 503 naming mail when the mail relay is down", async () => {
    service("stop", "mail");
    try {
      const body = (await (await call("/api/health")).json()) as Health;
      expect(body.checks.mail.status).toBe("error");
      expect(body.checks.search.status).toBe("ok");
    } finally {
      service("start", "mail");
    }
  });
});
