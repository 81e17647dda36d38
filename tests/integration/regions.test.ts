// Regions and their observations through the API, as the demo accounts: marking, validation against
// the vocabulary, optimistic versions, who sees what in each review state, versions after vetting,
// delete and undo, and the audit trail.
import { beforeAll, describe, expect, it } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, invitedUser, signedIn, type Jar } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";

let contributor: Jar, editor: Jar, reader: Jar, admin: Jar;
let vocab: Vocabulary;
let imageId: number;

const json = async <T = RegionView>(res: Response) => (await res.json()) as T;
const list = async (jar: Jar | undefined, proposed = false) =>
  (await json<{ regions: RegionView[] }>(await call(`/api/images/${imageId}/regions${proposed ? "?proposed=1" : ""}`, { jar }))).regions;

function strumming(confidence = "probable") {
  return { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence };
}

async function create(jar: Jar, body: Record<string, unknown> = {}): Promise<RegionView> {
  const res = await call(`/api/images/${imageId}/regions`, { jar, json: { shape: { kind: "rectangle", x: 100, y: 120, w: 300, h: 200 }, ...body } });
  expect(res.status, await res.clone().text()).toBe(201);
  return json(res);
}

beforeAll(async () => {
  [contributor, editor, reader, admin] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.reader), signedIn(DEMO.admin)]);
  vocab = await vocabulary();
  ({ imageId } = await photographedSource(contributor, 1600, 1200));
}, 120_000);

describe("marking regions", () => {
  it("stores a rectangle in full-image pixels with its observations, as a private draft", async () => {
    const region = await create(contributor, { label: "right hand", observations: [strumming()] });
    expect(region).toMatchObject({ state: "draft", versionNumber: 1, shape: { kind: "rectangle", x: 100, y: 120, w: 300, h: 200 }, box: { x: 100, y: 120, w: 300, h: 200 } });
    expect(region.observations).toEqual([expect.objectContaining({ aspectKey: "right_hand_technique", termKey: "strumming", confidence: "probable" })]);
    expect((await list(contributor)).map((r) => r.id)).toContain(region.id);
    expect((await list(reader)).map((r) => r.id)).not.toContain(region.id);
    expect((await list(reader, true)).map((r) => r.id)).not.toContain(region.id);
    expect((await list(undefined)).map((r) => r.id)).not.toContain(region.id);
  });

  it("clips a shape that spills past the edge, and keeps polygons as polygons with their bounding box", async () => {
    const spill = await create(contributor, { shape: { kind: "rectangle", x: 1500, y: -20, w: 300, h: 120 } });
    expect(spill.shape).toEqual({ kind: "rectangle", x: 1500, y: 0, w: 100, h: 100 });
    const rose = await create(contributor, { shape: { kind: "polygon", points: [[700, 500], [800, 450], [900, 500], [800, 620]] } });
    expect(rose.shape.kind).toBe("polygon");
    expect(rose.box).toEqual({ x: 700, y: 450, w: 200, h: 170 });
  });

  it("refuses bad input with a clear message per field and stores nothing", async () => {
    const before = (await list(contributor)).length;
    const cases: [unknown, RegExp][] = [
      [{ shape: { kind: "rectangle", x: 5000, y: 5000, w: 10, h: 10 } }, /outside the photograph/],
      [{ shape: { kind: "polygon", points: [[1, 1], [5, 5]] } }, /at least three points/],
      [{ shape: { kind: "rectangle", x: 1, y: 1, w: 0, h: 5 } }, /width/],
      [{ shape: { kind: "circle" } }, /./],
      [{ shape: { kind: "rectangle", x: 1, y: 1, w: 5, h: 5 }, observations: [{ aspectId: vocab.aspect("rose"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "certain" }] }, /not in the list/],
      [{ shape: { kind: "rectangle", x: 1, y: 1, w: 5, h: 5 }, observations: [{ aspectId: vocab.aspect("peg_count"), confidence: "certain" }] }, /Give a number/],
      [{ shape: { kind: "rectangle", x: 1, y: 1, w: 5, h: 5 }, observations: [{ aspectId: vocab.aspect("peg_count"), count: -1, confidence: "certain" }] }, /negative/],
      [{ shape: { kind: "rectangle", x: 1, y: 1, w: 5, h: 5 }, observations: [{ ...strumming(), confidence: "sure" }] }, /certain, probable or possible/],
    ];
    for (const [body, message] of cases) {
      const res = await call(`/api/images/${imageId}/regions`, { jar: contributor, json: body });
      expect(res.status, JSON.stringify(body)).toBe(400);
      const { error } = await json<{ error: { code: string; message: string; fields: Record<string, string[]> } }>(res);
      expect(error.code).toBe("invalid_input");
      expect(error.message + JSON.stringify(error.fields)).toMatch(message);
    }
    expect((await list(contributor)).length).toBe(before);
  });

  it("lets only contributors mark regions, and only authors change them", async () => {
    expect((await call(`/api/images/${imageId}/regions`, { jar: reader, json: { shape: { kind: "rectangle", x: 1, y: 1, w: 5, h: 5 } } })).status).toBe(403);
    const region = await create(contributor);
    const other = await invitedUser("contributor", admin);
    const otherJar = await signedIn(other.email, other.password);
    for (const jar of [otherJar, editor]) {
      const res = await call(`/api/regions/${region.id}`, { jar, method: "PATCH", json: { version: region.version, label: "not mine" } });
      expect(res.status).toBe(403);
    }
  });
});

describe("saving edits", () => {
  it("replaces the observations, bumps the version and refuses a stale save with the stored region", async () => {
    const region = await create(contributor);
    const pegs = { aspectId: vocab.aspect("peg_count"), count: 10, confidence: "certain" };
    const first = await call(`/api/regions/${region.id}`, { jar: contributor, method: "PATCH", json: { version: region.version, observations: [pegs, strumming()] } });
    expect(first.status).toBe(200);
    const saved = await json(first);
    expect(saved.version).toBe(region.version + 1);
    expect(saved.observations.map((o) => o.aspectKey)).toEqual(["peg_count", "right_hand_technique"]);
    const stale = await call(`/api/regions/${region.id}`, { jar: contributor, method: "PATCH", json: { version: region.version, observations: [] } });
    expect(stale.status).toBe(409);
    const { error } = await json<{ error: { code: string; current: RegionView } }>(stale);
    expect(error.code).toBe("version_conflict");
    expect(error.current.observations).toHaveLength(2);
    expect((await json(await call(`/api/regions/${region.id}`, { jar: contributor }))).observations).toHaveLength(2);
  });

  it("deletes a draft and undoes the deletion; a vetted region is not deleted by its author", async () => {
    const region = await create(contributor, { observations: [strumming()] });
    const del = await call(`/api/regions/${region.id}`, { jar: contributor, method: "DELETE", json: { version: region.version } });
    expect(del.status).toBe(200);
    const { version } = await json<{ version: number }>(del);
    expect((await call(`/api/regions/${region.id}`, { jar: contributor })).status).toBe(404);
    const restored = await call(`/api/regions/${region.id}/restore`, { jar: contributor, json: { version } });
    expect(restored.status).toBe(200);
    expect((await json(restored)).observations).toHaveLength(1);
  });
});

describe("review states and what each reader sees", () => {
  it("needs an observation before proposing; proposed work is shown to readers only when they ask", async () => {
    const empty = await create(contributor);
    const refused = await call(`/api/regions/${empty.id}/propose`, { jar: contributor, json: { version: empty.version } });
    expect(refused.status).toBe(400);
    const region = await create(contributor, { observations: [strumming()] });
    const proposed = await json(await call(`/api/regions/${region.id}/propose`, { jar: contributor, json: { version: region.version } }));
    expect(proposed.state).toBe("proposed");
    expect((await list(reader)).map((r) => r.id)).not.toContain(region.id);
    const optIn = (await list(reader, true)).find((r) => r.id === region.id);
    expect(optIn).toMatchObject({ state: "proposed", shown: "working", can: { edit: false, decide: false } });
    const withdrawn = await json(await call(`/api/regions/${region.id}/withdraw`, { jar: contributor, json: { version: proposed.version } }));
    expect(withdrawn.state).toBe("withdrawn");
    expect((await list(reader, true)).map((r) => r.id)).not.toContain(region.id);
  });

  it("keeps the vetted version visible while a revision is in progress, and shows the revision once vetted", async () => {
    const region = await create(contributor, { observations: [strumming("possible")] });
    const proposed = await json(await call(`/api/regions/${region.id}/propose`, { jar: contributor, json: { version: region.version } }));
    const ownByEditor = await call(`/api/regions/${region.id}/review`, { jar: reader, json: { version: proposed.version, decision: "vetted" } });
    expect(ownByEditor.status).toBe(403);
    const vetted = await json(await call(`/api/regions/${region.id}/review`, { jar: editor, json: { version: proposed.version, decision: "vetted" } }));
    expect(vetted).toMatchObject({ state: "vetted", hasVetted: true, versionNumber: 1 });
    expect((await list(reader)).find((r) => r.id === region.id)).toMatchObject({ state: "vetted", shown: "vetted" });

    // The author's change starts version 2; readers keep seeing version 1.
    const revised = await json(
      await call(`/api/regions/${region.id}`, { jar: contributor, method: "PATCH", json: { version: vetted.version, observations: [strumming("certain")] } }),
    );
    expect(revised).toMatchObject({ state: "draft", versionNumber: 2, pendingRevision: true });
    const seen = (await list(reader)).find((r) => r.id === region.id)!;
    expect(seen).toMatchObject({ versionNumber: 1, state: "vetted", pendingRevision: true });
    expect(seen.observations[0].confidence).toBe("possible");
    const deleteVetted = await call(`/api/regions/${region.id}`, { jar: contributor, method: "DELETE", json: { version: revised.version } });
    expect(deleteVetted.status).toBe(400);

    const again = await json(await call(`/api/regions/${region.id}/propose`, { jar: contributor, json: { version: revised.version } }));
    await call(`/api/regions/${region.id}/review`, { jar: editor, json: { version: again.version, decision: "vetted" } });
    const now = (await list(reader)).find((r) => r.id === region.id)!;
    expect(now).toMatchObject({ versionNumber: 2, pendingRevision: false });
    expect(now.observations[0].confidence).toBe("certain");
  });

  it("returns with a required comment; nobody reviews their own work", async () => {
    const region = await create(contributor, { observations: [strumming()] });
    const proposed = await json(await call(`/api/regions/${region.id}/propose`, { jar: contributor, json: { version: region.version } }));
    const bare = await call(`/api/regions/${region.id}/review`, { jar: editor, json: { version: proposed.version, decision: "returned" } });
    expect(bare.status).toBe(400);
    expect((await json(await call(`/api/regions/${region.id}`, { jar: contributor }))).state).toBe("proposed");
    const returned = await call(`/api/regions/${region.id}/review`, { jar: editor, json: { version: proposed.version, decision: "returned", comment: "The hand is cut off; mark it whole." } });
    expect((await json(returned)).state).toBe("returned");

    const mine = await create(editor, { observations: [strumming()] });
    const mineProposed = await json(await call(`/api/regions/${mine.id}/propose`, { jar: editor, json: { version: mine.version } }));
    const own = await call(`/api/regions/${mine.id}/review`, { jar: editor, json: { version: mineProposed.version, decision: "vetted" } });
    expect(own.status).toBe(403);
    expect((await json<{ error: { message: string } }>(own)).error.message).toMatch(/own work/);
    // Another editor (here the admin) may.
    const byAdmin = await call(`/api/regions/${mine.id}/review`, { jar: admin, json: { version: mineProposed.version, decision: "vetted" } });
    expect(byAdmin.status).toBe(200);
  });

  it("proposes all of the caller's regions on the photograph at once, skipping those without observations", async () => {
    const { imageId: other } = await photographedSource(contributor, 900, 700);
    const make = (observations: unknown[]) =>
      call(`/api/images/${other}/regions`, { jar: contributor, json: { shape: { kind: "rectangle", x: 10, y: 10, w: 50, h: 50 }, observations } }).then((r) => json(r));
    const [a, b, empty] = [await make([strumming()]), await make([strumming()]), await make([])];
    const res = await json<{ proposed: number[]; skipped: { id: number }[] }>(await call(`/api/images/${other}/regions/propose`, { jar: contributor, json: {} }));
    expect(res.proposed.sort()).toEqual([a.id, b.id].sort());
    expect(res.skipped.map((s) => s.id)).toEqual([empty.id]);
  });

  it("records every change in the audit trail with before and after", async () => {
    const region = await create(contributor, { observations: [strumming()] });
    await call(`/api/regions/${region.id}/propose`, { jar: contributor, json: { version: region.version } });
    const res = await call(`/api/admin/audit?entityType=region&entityId=${region.id}`, { jar: admin });
    const { events } = await json<{ events: { action: string; before: unknown; after: unknown }[] }>(res);
    expect(events.map((e) => e.action).sort()).toEqual(["region.created", "region.proposed"]);
    expect(events.find((e) => e.action === "region.proposed")!.before).toBeTruthy();
  });
});

describe("the stringing check over a source's regions", () => {
  it("reads ten pegs and nine strings as five courses with a single first course (common practice)", async () => {
    const { sourceId: sid, imageId: iid } = await photographedSource(contributor, 1000, 800);
    const count = (key: string, value: number) => ({ aspectId: vocab.aspect(key), count: value, confidence: "certain" });
    const mark = (observations: unknown[]) =>
      call(`/api/images/${iid}/regions`, { jar: contributor, json: { shape: { kind: "rectangle", x: 10, y: 10, w: 80, h: 80 }, observations } });
    await mark([count("peg_count", 10)]);
    await mark([count("string_count", 9), count("course_count", 5)]);
    const report = await json<{ status: string; summary: string; interpretations: { singleCourses: number; doubleCourses: number; unusedPegs: number }[] }>(
      await call(`/api/sources/${sid}/stringing`, { jar: contributor }),
    );
    expect(report.status).toBe("fits");
    expect(report.interpretations[0]).toMatchObject({ singleCourses: 1, doubleCourses: 4, unusedPegs: 1 });
    // Readers see only vetted work: nothing is vetted here yet.
    expect((await json<{ status: string }>(await call(`/api/sources/${sid}/stringing`, { jar: reader }))).status).toBe("empty");
  });
});
