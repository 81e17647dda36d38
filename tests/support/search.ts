// Shared steps of the search tests: a published source dated 1650~ at an area of its own in Spain,
// in a collection of its own, with one processed photograph; regions on it in any review state; and
// GET /api/search as any caller. The index is eventually consistent by design, so checks poll.
import { expect } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, signedIn, unique, type Jar } from "./app";
import { photographedSource, vocabulary, type Vocabulary } from "./evidence";

export type Hit = {
  id: string;
  regionId: number;
  copy: "vetted" | "working";
  state: string;
  label: string | null;
  sourceTitle: string;
  place: string | null;
  collection: string | null;
  t_right_hand_technique?: string[];
};
export type Answer = { hits: Hit[]; facetDistribution: Record<string, Record<string, number>>; total: number; labels: { placeId: Record<string, string> } };
export type Health = { ok: boolean; checks: Record<string, { status: string; error?: string }>; searchBacklog: { pending: number } | null };

/** A word no other test writes, so that a query finds only this test's regions. */
export const token = () => `zq${Math.random().toString(36).slice(2, 10)}`;

export async function searchAs(jar: Jar | undefined, query: string): Promise<Answer> {
  const res = await call(`/api/search?${query}`, { jar });
  expect(res.status, await res.clone().text()).toBe(200);
  return (await res.json()) as Answer;
}

/** Region ids with the version each hit shows, sorted: "12:vetted". */
export const ids = (a: Answer) => a.hits.map((h) => `${h.regionId}:${h.copy}`).sort();

/**
 * Polls until the check holds; the last failure is reported if it never does. A read that fails (a
 * keep-alive connection the app closed while a service restarted) counts as "not yet", like a failed check.
 */
export async function eventually<T>(read: () => Promise<T>, check: (value: T) => void, timeoutMs = 90_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    try {
      const value = await read();
      check(value);
      return value;
    } catch (error) {
      if (Date.now() > end) throw error;
    }
    await new Promise((r) => setTimeout(r, 300));
  }
}

export type SearchBench = Awaited<ReturnType<typeof searchBench>>;

export async function searchBench() {
  const [contributor, editor, reader, admin] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.reader), signedIn(DEMO.admin)]);
  const vocab: Vocabulary = await vocabulary();
  const area = await call("/api/places", { jar: editor, json: { name: unique("Search test area"), countryCode: "ES", latitude: 37.39, longitude: -5.98 } });
  const areaId = ((await area.json()) as { place: { id: number } }).place.id;
  const coll = await call("/api/collections", { jar: contributor, json: { name: unique("Search test collection"), city: "Sevilla" } });
  const collectionId = ((await coll.json()) as { collection: { id: number } }).collection.id;
  const { sourceId, imageId } = await photographedSource(contributor, 1200, 900);

  /** Saves the source's fields (its title, dated 1650~, the area, the collection, published). */
  async function saveSource(title?: string) {
    const source = ((await (await call(`/api/sources/${sourceId}`, { jar: contributor })).json()) as { source: { title: string; version: number } }).source;
    return call(`/api/sources/${sourceId}`, {
      jar: contributor,
      method: "PATCH",
      json: { title: title ?? source.title, objectType: "painting", state: "published", datingEdtf: "1650~", placeId: areaId, collectionId, version: source.version },
    });
  }
  const saved = await saveSource();
  expect(saved.status, await saved.clone().text()).toBe(200);

  const observe = (aspect: string, term: string, confidence = "certain") => ({ aspectId: vocab.aspect(aspect), termId: vocab.term(aspect, term), confidence });
  const courses = (n: number) => ({ aspectId: vocab.aspect("course_count"), count: n, confidence: "probable" });

  async function region(label: string, observations: unknown[]): Promise<RegionView> {
    const res = await call(`/api/images/${imageId}/regions`, { jar: contributor, json: { shape: { kind: "rectangle", x: 10, y: 10, w: 200, h: 150 }, label, observations } });
    expect(res.status, await res.clone().text()).toBe(201);
    return (await res.json()) as RegionView;
  }
  async function act(jar: Jar, path: string, body: Record<string, unknown>, method = "POST"): Promise<RegionView> {
    const res = await call(path, { jar, method, json: body });
    expect(res.status, await res.clone().text()).toBe(200);
    return (await res.json()) as RegionView;
  }
  const propose = (r: RegionView) => act(contributor, `/api/regions/${r.id}/propose`, { version: r.version });
  const decide = (r: RegionView, decision: "vetted" | "returned") =>
    act(editor, `/api/regions/${r.id}/review`, { version: r.version, decision, comment: decision === "returned" ? "Look again at the hand." : undefined });
  const vetted = async (label: string, observations: unknown[]) => decide(await propose(await region(label, observations)), "vetted");

  return { contributor, editor, reader, admin, vocab, areaId, collectionId, sourceId, imageId, saveSource, observe, courses, region, act, propose, decide, vetted };
}
