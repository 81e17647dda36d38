// The evidence vocabulary through its API: the public list, editors' changes with versions, refusals
// that change nothing, deletion only while unused, and merges that rewrite the observations of real
// regions (made through the regions API on a processed photograph).
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { beforeAll, describe, expect, it } from "vitest";
import { VOCABULARY } from "@/lib/vocabulary/definition";
import type { AspectView, TermView } from "@/lib/vocabulary/types";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";
import { picture, settled, upload } from "../support/images";

let editor: Jar, contributor: Jar, reader: Jar, admin: Jar;
let imageId: number;

// Keys allow only [a-z0-9_]; a fresh one per record keeps reruns on one database apart.
const freshKey = (prefix: string) => `${prefix}_${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

async function list(jar?: Jar, all = false): Promise<AspectView[]> {
  const res = await call(`/api/vocabulary${all ? "?all=1" : ""}`, { jar });
  expect(res.status).toBe(200);
  return ((await res.json()) as { aspects: AspectView[] }).aspects;
}
const findAspect = async (id: number) => (await list(editor, true)).find((a) => a.id === id);

async function newAspect(fields: Record<string, unknown> = {}): Promise<AspectView> {
  const res = await call("/api/vocabulary", { jar: editor, json: { key: freshKey("test_aspect"), label: unique("Test aspect"), kind: "terms", section: "instrument", ...fields } });
  expect(res.status).toBe(200);
  return ((await res.json()) as { aspect: AspectView }).aspect;
}

async function newTerm(aspectId: number, label: string): Promise<TermView> {
  const res = await call(`/api/vocabulary/aspects/${aspectId}/terms`, { jar: editor, json: { key: freshKey("t"), label, description: `${label}, for the test` } });
  expect(res.status).toBe(200);
  return ((await res.json()) as { term: TermView }).term;
}

type Region = { id: number; version: number; observations: { aspectId: number; termId: number | null; termKey: string | null }[] };

async function regionWith(observations: Record<string, unknown>[]): Promise<Region> {
  const res = await call(`/api/images/${imageId}/regions`, { jar: contributor, json: { shape: { kind: "rectangle", x: 20, y: 20, w: 200, h: 150 }, observations } });
  expect(res.status, await res.clone().text()).toBe(201);
  return (await res.json()) as Region;
}
const region = async (id: number) => (await (await call(`/api/regions/${id}`, { jar: contributor })).json()) as Region;

async function auditOf(entityType: string, entityId: number) {
  const res = await call(`/api/admin/audit?entityType=${entityType}&entityId=${entityId}`, { jar: admin });
  return ((await res.json()) as { events: { action: string; before: unknown; after: Record<string, unknown> }[] }).events;
}

beforeAll(async () => {
  [editor, contributor, reader, admin] = await Promise.all([signedIn(DEMO.editor), signedIn(DEMO.contributor), signedIn(DEMO.reader), signedIn(DEMO.admin)]);
  const res = await call("/api/sources", { jar: contributor, json: { title: unique("Vocabulary evidence"), objectType: "painting" } });
  const sourceId = ((await res.json()) as { source: { id: number } }).source.id;
  const up = await upload(contributor, sourceId, "vocabulary.jpg", await picture(77, 800, 600));
  expect((await settled(contributor, sourceId, up.imageId!))?.state).toBe("ready");
  imageId = up.imageId!;
});

describe("reading the vocabulary", () => {
  it("anyone gets every seeded aspect, by section and then position, terms in order, without usage counts", async () => {
    const aspects = await list();
    const seeded = aspects.filter((a) => VOCABULARY.some((d) => d.key === a.key));
    expect(seeded.map((a) => a.key)).toEqual(VOCABULARY.map((d) => d.key));
    const sections = aspects.map((a) => a.section);
    const rank = ["instrument", "player", "context", "reliability"];
    expect(sections.map((s) => rank.indexOf(s))).toEqual([...sections.map((s) => rank.indexOf(s))].sort((a, b) => a - b));
    const fretKind = aspects.find((a) => a.key === "fret_kind")!;
    expect(fretKind).toMatchObject({ kind: "terms", section: "instrument", deprecated: false });
    expect(fretKind.terms.map((t) => t.label)).toEqual(["tied gut", "fixed", "not visible"]);
    expect(aspects.find((a) => a.key === "peg_count")).toMatchObject({ kind: "count", terms: [] });
    expect(fretKind.usage).toBeUndefined();
  });

  it("usage counts are for editors: a visitor must sign in, a reader is refused", async () => {
    expect((await call("/api/vocabulary?all=1")).status).toBe(401);
    expect((await call("/api/vocabulary?all=1", { jar: reader })).status).toBe(403);
    const aspects = await list(editor, true);
    expect(aspects.every((a) => typeof a.usage === "number" && a.terms.every((t) => typeof t.usage === "number"))).toBe(true);
  });
});

describe("editing the vocabulary", () => {
  it("an editor adds an aspect and a term, then rewords the aspect; versions move and the audit trail records it", async () => {
    const aspect = await newAspect({ label: "Nail or flesh", description: "How the strings are struck." });
    expect(aspect).toMatchObject({ version: 1, deprecated: false, terms: [], usage: 0 });
    const term = await newTerm(aspect.id, "with the nails");
    expect(term).toMatchObject({ aspectId: aspect.id, position: 1, version: 1, deprecated: false });

    const res = await call(`/api/vocabulary/aspects/${aspect.id}`, { jar: editor, method: "PATCH", json: { version: 1, label: "Nails or flesh", section: "player" } });
    expect(res.status).toBe(200);
    const changed = ((await res.json()) as { aspect: AspectView }).aspect;
    expect(changed).toMatchObject({ label: "Nails or flesh", section: "player", key: aspect.key, version: 2 });
    const everyone = (await list()).find((a) => a.id === aspect.id)!;
    expect(everyone.terms.map((t) => t.label)).toEqual(["with the nails"]);

    expect((await auditOf("aspect", aspect.id)).map((e) => e.action)).toEqual(["aspect.updated", "aspect.created"]);
    expect((await auditOf("aspect_term", term.id)).map((e) => e.action)).toEqual(["term.created"]);
  });

  it("a contributor may not change it, and nothing is created", async () => {
    const key = freshKey("refused");
    const res = await call("/api/vocabulary", { jar: contributor, json: { key, label: "Refused", kind: "text", section: "context" } });
    expect(res.status).toBe(403);
    const aspect = await newAspect();
    expect((await call(`/api/vocabulary/aspects/${aspect.id}/terms`, { jar: contributor, json: { key: "x", label: "x" } })).status).toBe(403);
    expect((await call(`/api/vocabulary/aspects/${aspect.id}`, { jar: contributor, method: "PATCH", json: { version: 1, label: "Mine" } })).status).toBe(403);
    const now = (await list()).find((a) => a.id === aspect.id)!;
    expect(now).toMatchObject({ label: aspect.label, version: 1, terms: [] });
    expect((await list()).some((a) => a.key === key)).toBe(false);
  });

  it("refuses bad keys and labels with 400, naming the fields, and changes nothing", async () => {
    const bad = await call("/api/vocabulary", { jar: editor, json: { key: "Fret Slant!", label: "  ", kind: "terms", section: "instrument" } });
    expect(bad.status).toBe(400);
    const { error } = (await bad.json()) as { error: { code: string; fields: Record<string, string[]> } };
    expect(error.code).toBe("invalid_input");
    expect(error.fields.key.join(" ")).toMatch(/lowercase letters/);
    expect(error.fields.label.join(" ")).toMatch(/Give a label/);
    expect((await list()).some((a) => a.label === "  " || a.key === "Fret Slant!")).toBe(false);

    const taken = await call("/api/vocabulary", { jar: editor, json: { key: "fret_slant", label: "Fret slant again", kind: "terms", section: "instrument" } });
    expect(taken.status).toBe(400);
    expect(((await taken.json()) as { error: { fields: Record<string, string[]> } }).error.fields.key).toBeTruthy();

    const aspect = await newAspect();
    const term = await newTerm(aspect.id, "first");
    const badTerm = await call(`/api/vocabulary/aspects/${aspect.id}/terms`, { jar: editor, json: { key: term.key, label: "First" } });
    expect(badTerm.status).toBe(400);
    expect(((await badTerm.json()) as { error: { fields: Record<string, string[]> } }).error.fields.key).toBeTruthy();
    const sameLabel = await call(`/api/vocabulary/aspects/${aspect.id}/terms`, { jar: editor, json: { key: freshKey("second"), label: "FIRST" } });
    expect(sameLabel.status).toBe(400);
    expect(((await sameLabel.json()) as { error: { fields: Record<string, string[]> } }).error.fields.label).toBeTruthy();

    const blank = await call(`/api/vocabulary/terms/${term.id}`, { jar: editor, method: "PATCH", json: { version: 1, label: "" } });
    expect(blank.status).toBe(400);
    const after = (await findAspect(aspect.id))!;
    expect(after.terms).toEqual([expect.objectContaining({ id: term.id, label: "first", version: 1 })]);
  });

  it("a change made from a stale version is refused with 409 and the current record", async () => {
    const aspect = await newAspect({ label: "Stale test" });
    const term = await newTerm(aspect.id, "original");
    expect((await call(`/api/vocabulary/terms/${term.id}`, { jar: editor, method: "PATCH", json: { version: 1, label: "first edit" } })).status).toBe(200);
    const stale = await call(`/api/vocabulary/terms/${term.id}`, { jar: editor, method: "PATCH", json: { version: 1, label: "second edit" } });
    expect(stale.status).toBe(409);
    expect(await stale.json()).toMatchObject({ error: { code: "version_conflict", current: { id: term.id, label: "first edit", version: 2 } } });

    expect((await call(`/api/vocabulary/aspects/${aspect.id}`, { jar: editor, method: "PATCH", json: { version: 1, deprecated: true } })).status).toBe(200);
    const staleAspect = await call(`/api/vocabulary/aspects/${aspect.id}`, { jar: editor, method: "PATCH", json: { version: 1, label: "Overwritten?" } });
    expect(staleAspect.status).toBe(409);
    expect(await staleAspect.json()).toMatchObject({ error: { current: { label: "Stale test", deprecated: true, version: 2 } } });
    const staleDelete = await call(`/api/vocabulary/terms/${term.id}`, { jar: editor, method: "DELETE", json: { version: 1 } });
    expect(staleDelete.status).toBe(409);
    expect((await findAspect(aspect.id))!).toMatchObject({ label: "Stale test", terms: [expect.objectContaining({ label: "first edit" })] });
  });

  it("reorders an aspect's terms when given the whole list as read, and refuses an outdated list", async () => {
    const aspect = await newAspect();
    const [a, b, c] = [await newTerm(aspect.id, "alpha"), await newTerm(aspect.id, "beta"), await newTerm(aspect.id, "gamma")];
    const order = [c, a, b].map((t) => ({ id: t.id, version: t.version }));
    const res = await call(`/api/vocabulary/aspects/${aspect.id}/order`, { jar: editor, json: { terms: order } });
    expect(res.status).toBe(200);
    expect((await findAspect(aspect.id))!.terms.map((t) => t.label)).toEqual(["gamma", "alpha", "beta"]);
    // The same list again names versions that moving has since bumped.
    const again = await call(`/api/vocabulary/aspects/${aspect.id}/order`, { jar: editor, json: { terms: [b, c, a].map((t) => ({ id: t.id, version: t.version })) } });
    expect(again.status).toBe(409);
    const missing = await call(`/api/vocabulary/aspects/${aspect.id}/order`, { jar: editor, json: { terms: [{ id: a.id, version: 1 }] } });
    expect(missing.status).toBe(409);
    expect((await findAspect(aspect.id))!.terms.map((t) => t.label)).toEqual(["gamma", "alpha", "beta"]);
  });
});

describe("vocabulary in use", () => {
  it("deletes an unused term but refuses one observations use, saying how many", async () => {
    const aspect = await newAspect({ label: "Delete test" });
    const used = await newTerm(aspect.id, "used");
    const unused = await newTerm(aspect.id, "unused");
    await regionWith([{ aspectId: aspect.id, termId: used.id, confidence: "probable" }]);

    const refused = await call(`/api/vocabulary/terms/${used.id}`, { jar: editor, method: "DELETE", json: { version: used.version } });
    expect(refused.status).toBe(409);
    expect(await refused.json()).toMatchObject({ error: { code: "in_use", usage: 1, message: `"used" is in use by 1 observation; deprecate or merge it instead.` } });
    const refusedAspect = await call(`/api/vocabulary/aspects/${aspect.id}`, { jar: editor, method: "DELETE", json: { version: aspect.version } });
    expect(refusedAspect.status).toBe(409);
    expect(((await refusedAspect.json()) as { error: { message: string } }).error.message).toMatch(/in use by 1 observation; deprecate it instead/);

    expect((await call(`/api/vocabulary/terms/${unused.id}`, { jar: editor, method: "DELETE", json: { version: unused.version } })).status).toBe(200);
    const now = (await findAspect(aspect.id))!;
    expect(now.usage).toBe(1);
    expect(now.terms.map((t) => [t.label, t.usage])).toEqual([["used", 1]]);
    expect((await auditOf("aspect_term", unused.id))[0]).toMatchObject({ action: "term.deleted", before: { key: unused.key, aspectKey: aspect.key } });

    const empty = await newAspect({ kind: "text" });
    expect((await call(`/api/vocabulary/aspects/${empty.id}`, { jar: editor, method: "DELETE", json: { version: 1 } })).status).toBe(200);
    expect(await findAspect(empty.id)).toBeUndefined();
  });

  it("a deprecated term stays listed and readable but the regions API refuses it for a new observation", async () => {
    const aspect = await newAspect();
    const old = await newTerm(aspect.id, "old word");
    const res = await call(`/api/vocabulary/terms/${old.id}`, { jar: editor, method: "PATCH", json: { version: old.version, deprecated: true } });
    expect(((await res.json()) as { term: TermView }).term).toMatchObject({ deprecated: true, version: old.version + 1 });
    expect((await list()).find((a) => a.id === aspect.id)!.terms[0]).toMatchObject({ label: "old word", deprecated: true });
    const refused = await call(`/api/images/${imageId}/regions`, { jar: contributor, json: { shape: { kind: "rectangle", x: 1, y: 1, w: 50, h: 50 }, observations: [{ aspectId: aspect.id, termId: old.id, confidence: "certain" }] } });
    expect(refused.status).toBe(400);
    const back = await call(`/api/vocabulary/terms/${old.id}`, { jar: editor, method: "PATCH", json: { version: old.version + 1, deprecated: false } });
    expect(((await back.json()) as { term: TermView }).term.deprecated).toBe(false);
    expect((await auditOf("aspect_term", old.id)).map((e) => e.action)).toEqual(["term.reinstated", "term.deprecated", "term.created"]);
  });

  it("refuses to change an aspect's kind once observations use it", async () => {
    const aspect = await newAspect({ kind: "count", label: "Rib count" });
    await regionWith([{ aspectId: aspect.id, count: 7, confidence: "possible" }]);
    const res = await call(`/api/vocabulary/aspects/${aspect.id}`, { jar: editor, method: "PATCH", json: { version: aspect.version, kind: "text" } });
    expect(res.status).toBe(400);
    const { error } = (await res.json()) as { error: { message: string; fields: Record<string, string[]> } };
    expect(error.message).toMatch(/cannot change: 1 observation record this aspect as a count/);
    expect(error.fields.kind).toBeTruthy();
    expect((await findAspect(aspect.id))!).toMatchObject({ kind: "count", version: aspect.version });
    // Without observations the kind may change; terms cannot be added to a count.
    const unused = await newAspect({ kind: "count" });
    expect((await call(`/api/vocabulary/aspects/${unused.id}/terms`, { jar: editor, json: { key: "a", label: "a" } })).status).toBe(400);
    const ok = await call(`/api/vocabulary/aspects/${unused.id}`, { jar: editor, method: "PATCH", json: { version: 1, kind: "terms" } });
    expect(((await ok.json()) as { aspect: AspectView }).aspect.kind).toBe("terms");
  });

  it("merging term A into B rewrites every observation of A in one step, deprecates A and audits the counts", async () => {
    const aspect = await newAspect({ label: "Merge test" });
    const a = await newTerm(aspect.id, "gut frets");
    const b = await newTerm(aspect.id, "tied frets");
    const other = await newAspect();
    const foreign = await newTerm(other.id, "elsewhere");
    const r1 = await regionWith([{ aspectId: aspect.id, termId: a.id, confidence: "certain" }]);
    const r2 = await regionWith([{ aspectId: aspect.id, termId: a.id, confidence: "probable", note: "two loops visible" }]);
    const r3 = await regionWith([{ aspectId: aspect.id, termId: b.id, confidence: "certain" }]);

    const wrongAspect = await call(`/api/vocabulary/terms/${a.id}/merge`, { jar: editor, json: { intoTermId: foreign.id, version: a.version } });
    expect(wrongAspect.status).toBe(400);
    expect(((await wrongAspect.json()) as { error: { fields: Record<string, string[]> } }).error.fields.intoTermId).toBeTruthy();
    const stale = await call(`/api/vocabulary/terms/${a.id}/merge`, { jar: editor, json: { intoTermId: b.id, version: a.version + 5 } });
    expect(stale.status).toBe(409);
    expect((await region(r1.id)).observations[0].termId).toBe(a.id);
    expect((await call(`/api/vocabulary/terms/${a.id}/merge`, { jar: contributor, json: { intoTermId: b.id, version: a.version } })).status).toBe(403);

    const res = await call(`/api/vocabulary/terms/${a.id}/merge`, { jar: editor, json: { intoTermId: b.id, version: a.version } });
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ observations: 2, regionVersions: 2, term: { id: a.id, deprecated: true, mergedIntoId: b.id }, into: { id: b.id, usage: 3 } });

    for (const r of [r1, r2, r3]) expect((await region(r.id)).observations.map((o) => o.termKey)).toEqual([b.key]);
    const now = (await findAspect(aspect.id))!;
    expect(now.terms.map((t) => [t.label, t.usage, t.deprecated, t.mergedIntoId])).toEqual([
      ["gut frets", 0, true, b.id],
      ["tied frets", 3, false, null],
    ]);
    const [event] = await auditOf("aspect_term", a.id);
    expect(event).toMatchObject({ action: "term.merged", after: { observations: 2, regionVersions: 2, into: { id: b.id, key: b.key } } });

    // A merged term cannot come back, nor be merged again.
    const current = now.terms[0];
    expect((await call(`/api/vocabulary/terms/${a.id}`, { jar: editor, method: "PATCH", json: { version: current.version, deprecated: false } })).status).toBe(400);
    expect((await call(`/api/vocabulary/terms/${a.id}/merge`, { jar: editor, json: { intoTermId: b.id, version: current.version } })).status).toBe(400);
  });
});

describe("seeding again", () => {
  // The seed runs at every start: it must add what is missing and nothing else.
  // Run without blocking this process: a seed of more than five seconds would otherwise outlast the
  // app's keep-alive, and the next request would go out on a socket the app has closed.
  const seed = () => promisify(execFile)("node", ["--import", "tsx", "db/seed/index.ts"], { env: { ...process.env, CORDARIUM_SEED_IMAGES: "0" } });

  it("keeps editors' wording and order, and does not bring back a term an editor deleted", async () => {
    const support = (await list(editor, true)).find((a) => a.key === "support")!;
    const table = support.terms.find((t) => t.key === "table")!;
    const knee = support.terms.find((t) => t.key === "knee")!;
    expect(table.usage).toBe(0);
    const reworded = await call(`/api/vocabulary/terms/${knee.id}`, { jar: editor, method: "PATCH", json: { version: knee.version, label: "knee or thigh" } });
    expect(reworded.status).toBe(200);
    expect((await call(`/api/vocabulary/terms/${table.id}`, { jar: editor, method: "DELETE", json: { version: table.version } })).status).toBe(200);

    await seed();
    const after = (await list(editor, true)).find((a) => a.key === "support")!;
    expect(after.terms.map((t) => t.key)).toEqual(support.terms.filter((t) => t.key !== "table").map((t) => t.key));
    expect(after.terms.find((t) => t.key === "knee")!.label).toBe("knee or thigh");
    expect((await list()).filter((a) => a.key === "support")).toHaveLength(1);

    // Put the demo vocabulary back as it was for the tests that follow.
    const restoredKnee = after.terms.find((t) => t.key === "knee")!;
    await call(`/api/vocabulary/terms/${restoredKnee.id}`, { jar: editor, method: "PATCH", json: { version: restoredKnee.version, label: knee.label } });
    await call(`/api/vocabulary/aspects/${support.id}/terms`, { jar: editor, json: { key: "table", label: table.label, description: table.description } });
  });
});
