// Shared steps of the review and notification tests: marking and proposing regions through the API,
// choosing how to be told, and reading a server-rendered page as its visible text.
import { expect } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { call, type Jar } from "./app";

export const json = async <T = RegionView>(res: Response) => (await res.json()) as T;

/** A moment just before now, for "mail received since". */
export const since = () => new Date(Date.now() - 50);

export async function markRegion(jar: Jar, imageId: number, body: Record<string, unknown>): Promise<RegionView> {
  const res = await call(`/api/images/${imageId}/regions`, { jar, json: { shape: { kind: "rectangle", x: 200, y: 300, w: 400, h: 300 }, ...body } });
  expect(res.status, await res.clone().text()).toBe(201);
  return json(res);
}

export async function propose(jar: Jar, r: RegionView): Promise<RegionView> {
  const res = await call(`/api/regions/${r.id}/propose`, { jar, json: { version: r.version } });
  expect(res.status, await res.clone().text()).toBe(200);
  return json(res);
}

export async function chooseNotifications(jar: Jar, notify: "immediate" | "daily" | "off") {
  const { version } = await json<{ version: number }>(await call("/api/account/notifications", { jar }));
  const res = await call("/api/account/notifications", { jar, method: "PATCH", json: { version, notify } });
  expect(res.status, await res.clone().text()).toBe(200);
  return json<{ notify: string; version: number; waiting: number }>(res);
}

/** The text a browser shows for a server-rendered page, for checks of what a page says. */
export async function pageText(jar: Jar, path: string): Promise<{ status: number; text: string }> {
  const res = await call(path, { jar });
  const html = await res.text();
  const body = html.replace(/<script[\s\S]*?<\/script>/g, " ").replace(/<!-- -->/g, "").replace(/<[^>]+>/g, " ");
  return { status: res.status, text: body.replace(/&quot;/g, '"').replace(/&#x27;/g, "'").replace(/&amp;/g, "&").replace(/\s+/g, " ") };
}
