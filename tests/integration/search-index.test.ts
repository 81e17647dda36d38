// The search index fed through the outbox, seen through GET /api/search as each role sees it: vetted
// regions reach it after the change, drafts only their author, proposed work only on request, facet
// counts, revisions of vetted regions, renames of places and collections, a rebuild, and an outage of
// the search service during which writes go on and after which the index catches up with every change.
// The index is eventually consistent by design, so each check polls until it holds (no timings).
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, service, signedIn, unique, type Jar } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";

type Hit = { id: string; regionId: number; copy: "vetted" | "working"; state: string; label: string | null; sourceTitle: string; place: string | null; collection: string | null; t_right_hand_technique?: string[] };
type Answer = { hits: Hit[]; facetDistribution: Record<string, Record<string, number>>; total: number; labels: { placeId: Record<string, string> } };
type Health = { ok: boolean; checks: Record<string, { status: string; error?: string }>; searchBacklog: { pending: number } | null };

let contributor: Jar, editor: Jar, reader: Jar, admin: Jar;
let vocab: Vocabulary;
let imageId: number, sourceId: number, areaId: number, collectionId: number;

/** A word no other test writes, so that a query finds only this test's regions. */
const token = () => `zq${Math.random().toString(36).slice(2, 10)}`;

async function searchAs(jar: Jar | undefined, query: string): Promise<Answer> {
  const res = await call(`/api/search?${query}`, { jar });
  expect(res.status, await res.clone().text()).toBe(200);
  return (await res.json()) as Answer;
}

/** Polls until the check holds; the last failure is reported if it never does. */
async function eventually<T>(read: () => Promise<T>, check: (value: T) => void, timeoutMs = 90_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    try {
      check(value);
      return value;
    } catch (error) {
      if (Date.now() > end) throw error;
    }
    await new Promise((r) => setTimeout(r, 300));
  }
}

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
const decide = (r: RegionView, decision: "vetted" | "returned") => act(editor, `/api/regions/${r.id}/review`, { version: r.version, decision, comment: decision === "returned" ? "Look again at the hand." : undefined });
const vetted = async (label: string, observations: unknown[]) => decide(await propose(await region(label, observations)), "vetted");

const ids = (a: Answer) => a.hits.map((h) => `${h.regionId}:${h.copy}`).sort();

beforeAll(async () => {
  [contributor, editor, reader, admin] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.reader), signedIn(DEMO.admin)]);
  vocab = await vocabulary();
  const area = await call("/api/places", { jar: editor, json: { name: unique("Search test area"), countryCode: "ES", latitude: 37.39, longitude: -5.98 } });
  areaId = ((await area.json()) as { place: { id: number } }).place.id;
  const coll = await call("/api/collections", { jar: contributor, json: { name: unique("Search test collection"), city: "Sevilla" } });
  collectionId = ((await coll.json()) as { collection: { id: number } }).collection.id;
  ({ sourceId, imageId } = await photographedSource(contributor, 1200, 900));
  const source = ((await (await call(`/api/sources/${sourceId}`, { jar: contributor })).json()) as { source: { title: string; version: number } }).source;
  const res = await call(`/api/sources/${sourceId}`, {
    jar: contributor,
    method: "PATCH",
    json: { title: source.title, objectType: "painting", state: "published", datingEdtf: "1650~", placeId: areaId, collectionId, version: source.version },
  });
  expect(res.status, await res.clone().text()).toBe(200);
}, 120_000);

// Whatever happened, leave the search service running for the next test file.
afterAll(() => service("start", "search"));

describe("what reaches the index, and who finds it", { timeout: 120_000 }, () => {
  it("finds a vetted region, with its source's facets, for a visitor within a few seconds", async () => {
    const word = token();
    const r = await vetted(`right hand ${word}`, [observe("right_hand_technique", "strumming"), observe("instrument_type", "five_course_guitar"), courses(5)]);
    const answer = await eventually(() => searchAs(undefined, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    expect(answer.hits[0]).toMatchObject({ state: "vetted", label: `right hand ${word}`, t_right_hand_technique: ["strumming"] });
    // "Strumming on a five-course guitar dated between 1620 and 1700 in Spain": the source is 1650~.
    const wanted = `q=${word}&t_right_hand_technique=strumming&t_instrument_type=five_course_guitar&n_course_count=5&from=1620&to=1700&country=ES&type=painting`;
    expect(ids(await searchAs(undefined, wanted))).toEqual([`${r.id}:vetted`]);
    expect(ids(await searchAs(undefined, `q=${word}&to=1640`))).toEqual([]);
    expect(ids(await searchAs(undefined, `q=${word}&t_right_hand_technique=plucking`))).toEqual([]);
    expect(ids(await searchAs(undefined, `q=${word}&country=IT`))).toEqual([]);
    expect(ids(await searchAs(undefined, `q=${word}&place=${areaId}&collection=${collectionId}&decade=1650`))).toEqual([`${r.id}:vetted`]);
  });

  it("finds a draft only for its author, and forgets it once deleted", async () => {
    const word = token();
    const draft = await region(`draft ${word}`, [observe("right_hand_technique", "plucking")]);
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(ids(a)).toEqual([`${draft.id}:working`]));
    for (const jar of [undefined, reader, editor]) expect(ids(await searchAs(jar, `q=${word}`))).toEqual([]);
    expect(ids(await searchAs(reader, `q=${word}&proposed=1`))).toEqual([]);
    expect(ids(await searchAs(admin, `q=${word}`))).toEqual([`${draft.id}:working`]);
    await call(`/api/regions/${draft.id}`, { jar: contributor, method: "DELETE", json: { version: draft.version } });
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(ids(a)).toEqual([]));
  });

  it("shows readers proposed work only when they ask for it, and then only proposed work", async () => {
    const word = token();
    const proposed = await propose(await region(`proposed ${word}`, [observe("posture", "seated")]));
    const returned = await decide(await propose(await region(`returned ${word}`, [observe("posture", "standing")])), "returned");
    const draft = await region(`draft ${word}`, [observe("posture", "walking")]);
    const accepted = await vetted(`vetted ${word}`, [observe("posture", "seated")]);
    await eventually(
      () => searchAs(contributor, `q=${word}`),
      (a) => expect(ids(a)).toEqual([`${proposed.id}:working`, `${returned.id}:working`, `${draft.id}:working`, `${accepted.id}:vetted`].sort()),
    );
    expect(ids(await searchAs(reader, `q=${word}`))).toEqual([`${accepted.id}:vetted`]);
    const opted = await searchAs(reader, `q=${word}&proposed=1`);
    expect(ids(opted)).toEqual([`${proposed.id}:working`, `${accepted.id}:vetted`].sort());
    expect(opted.hits.find((h) => h.regionId === proposed.id)!.state).toBe("proposed");
    expect(ids(await searchAs(reader, `q=${word}&proposed=1&state=proposed`))).toEqual([`${proposed.id}:working`]);
    // Editors see work in review, not others' drafts.
    expect(ids(await searchAs(editor, `q=${word}`))).toEqual([`${proposed.id}:working`, `${returned.id}:working`, `${accepted.id}:vetted`].sort());
    expect((await call(`/api/search?q=${word}&proposed=1`)).status).toBe(401);
  });

  it("counts facets over what the caller may see", async () => {
    const word = token();
    await vetted(`a ${word}`, [observe("right_hand_technique", "strumming"), observe("instrument_type", "five_course_guitar"), courses(5)]);
    await vetted(`b ${word}`, [observe("right_hand_technique", "strumming", "possible"), observe("instrument_type", "lute")]);
    await vetted(`c ${word}`, [observe("right_hand_technique", "plucking"), observe("instrument_type", "lute")]);
    await propose(await region(`d ${word}`, [observe("right_hand_technique", "plucking"), observe("instrument_type", "vihuela")]));
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(a.total).toBe(4));
    const { facetDistribution: f, total, labels } = await searchAs(reader, `q=${word}`);
    expect(total).toBe(3);
    expect(f.t_right_hand_technique).toEqual({ strumming: 2, plucking: 1 });
    expect(f.t_instrument_type).toEqual({ lute: 2, five_course_guitar: 1 });
    expect(f.n_course_count).toEqual({ 5: 1 });
    // a: certain, certain, probable (the count); b: possible, certain; c: certain. A region counts once per value.
    expect(f.confidence).toEqual({ certain: 3, probable: 1, possible: 1 });
    // 1650~ is 1645–1655 widened: two decades, one century.
    expect(f.decade).toEqual({ 1640: 3, 1650: 3 });
    expect(f.century).toEqual({ 1600: 3 });
    expect(f.country).toEqual({ ES: 3 });
    expect(f.state).toEqual({ vetted: 3 });
    expect(f.placeId).toEqual({ [areaId]: 3 });
    expect(labels.placeId[areaId]).toMatch(/^Search test area/);
    expect(f).not.toHaveProperty("authorId");
    expect(f).not.toHaveProperty("isWorking");
    const narrowed = await searchAs(reader, `q=${word}&t_right_hand_technique=strumming`);
    expect(narrowed.total).toBe(2);
    expect(narrowed.facetDistribution.t_instrument_type).toEqual({ five_course_guitar: 1, lute: 1 });
    const opted = await searchAs(reader, `q=${word}&proposed=1`);
    expect(opted.facetDistribution.state).toEqual({ vetted: 3, proposed: 1 });
  });

  it("keeps the vetted version for readers while its author revises it", async () => {
    const word = token();
    const r = await vetted(`revised ${word}`, [observe("right_hand_technique", "strumming")]);
    await eventually(() => searchAs(reader, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const edited = await act(contributor, `/api/regions/${r.id}`, { version: r.version, observations: [observe("right_hand_technique", "plucking")] }, "PATCH");
    expect(edited.state).toBe("draft");
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:working`]));
    const forReader = await searchAs(reader, `q=${word}`);
    expect(ids(forReader)).toEqual([`${r.id}:vetted`]);
    expect(forReader.hits[0].t_right_hand_technique).toEqual(["strumming"]);
    expect(ids(await searchAs(reader, `q=${word}&t_right_hand_technique=plucking`))).toEqual([]);
    expect(ids(await searchAs(editor, `q=${word}`))).toEqual([`${r.id}:vetted`]);
    await propose(edited);
    await eventually(() => searchAs(editor, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:working`]));
    // Proposed on top of a vetted version: readers asking for proposed work still get the vetted one.
    expect(ids(await searchAs(reader, `q=${word}&proposed=1`))).toEqual([`${r.id}:vetted`]);
  });

  it("follows a term's new label, and a merge of terms, into the documents that name it", async () => {
    const word = token();
    const aspectId = vocab.aspect("right_hand_technique");
    const created = await call(`/api/vocabulary/aspects/${aspectId}/terms`, { jar: editor, json: { key: word, label: `thumb brush ${word}` } });
    expect(created.status, await created.clone().text()).toBe(200);
    const { term } = (await created.json()) as { term: { id: number; version: number } };
    const r = await vetted(`term ${word}`, [{ aspectId, termId: term.id, confidence: "certain" }]);
    await eventually(() => searchAs(undefined, `q=${word}&t_right_hand_technique=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const relabel = token();
    const renamed = await call(`/api/vocabulary/terms/${term.id}`, { jar: editor, method: "PATCH", json: { version: term.version, label: `thumb stroke ${relabel}` } });
    expect(renamed.status).toBe(200);
    await eventually(() => searchAs(undefined, `q=${relabel}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const merged = await call(`/api/vocabulary/terms/${term.id}/merge`, {
      jar: editor,
      json: { intoTermId: vocab.term("right_hand_technique", "strumming"), version: ((await renamed.json()) as { term: { version: number } }).term.version },
    });
    expect(merged.status, await merged.clone().text()).toBe(200);
    await eventually(() => searchAs(undefined, `q=${word}&t_right_hand_technique=strumming`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    expect(ids(await searchAs(undefined, `q=${relabel}`))).toEqual([]);
  });

  it("carries renames of the place and the collection into the documents of their sources' regions", async () => {
    const word = token();
    const r = await vetted(`renamed ${word}`, [observe("setting", "tavern")]);
    await eventually(() => searchAs(undefined, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const place = ((await (await call(`/api/places/${areaId}`)).json()) as { place: { version: number } }).place;
    const placeName = `Renamed area ${word}`;
    expect((await call(`/api/places/${areaId}`, { jar: editor, method: "PATCH", json: { version: place.version, name: placeName } })).status).toBe(200);
    const coll = ((await (await call(`/api/collections/${collectionId}`)).json()) as { collection: { name: string; version: number } }).collection;
    const collName = `Renamed collection ${word}`;
    const renamed = await call(`/api/collections/${collectionId}`, { jar: contributor, method: "PATCH", json: { name: collName, city: "Sevilla", version: coll.version } });
    expect(renamed.status, await renamed.clone().text()).toBe(200);
    await eventually(
      () => searchAs(undefined, `q=${word}`),
      (a) => expect(a.hits.filter((h) => h.regionId === r.id).map((h) => [h.place, h.collection])).toEqual([[placeName, `${collName}, Sevilla`]]),
    );
  });
});

describe("when the search service is away", () => {
  it("takes every change, reports the outage and the backlog, and catches up with no change lost", async () => {
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
      const source = ((await (await call(`/api/sources/${sourceId}`, { jar: contributor })).json()) as { source: { version: number } }).source;
      const saved = await call(`/api/sources/${sourceId}`, {
        jar: contributor,
        method: "PATCH",
        json: { title, objectType: "painting", state: "published", datingEdtf: "1650~", placeId: areaId, collectionId, version: source.version },
      });
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
  it("npm run reindex rebuilds both from the database, swaps them in and clears the outbox", async () => {
    const word = token();
    const r = await vetted(`rebuilt ${word}`, [observe("right_hand_technique", "strumming")]);
    const draft = await region(`rebuilt draft ${word}`, [observe("right_hand_technique", "plucking")]);
    const { stdout: output } = await promisify(execFile)("npm", ["run", "--silent", "reindex"], { encoding: "utf8" });
    expect(output).toMatch(/Rebuilt in [\d.]+ s: \d+ sources and \d+ region documents/);
    // The swap has happened when the command returns: both regions are there at once, each for its audience.
    expect(ids(await searchAs(undefined, `q=${word}`))).toEqual([`${r.id}:vetted`]);
    expect(ids(await searchAs(contributor, `q=${word}`))).toEqual([`${r.id}:vetted`, `${draft.id}:working`].sort());
    const sources = await searchAs(undefined, `scope=sources&q=${word}`);
    expect(sources.total).toBe(0);
  }, 120_000);

  it("an admin queues the same rebuild as a job and reads how it went", async () => {
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
