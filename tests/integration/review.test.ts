// Peer review through the API as the demo accounts: a contributor proposes a region, editors are told by
// e-mail, an editor returns it with a comment, the author revises it, the desk and the review page show
// what changed, an editor vets it and readers see it; nobody decides on their own work, stale versions
// are refused, and each region has a discussion whose earlier participants are told of new comments.
import { beforeAll, describe, expect, it } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import type { ThreadEntry } from "@/lib/regions/discussion-schema";
import type { DeskPage } from "@/lib/review/desk-schema";
import { call, DEMO, invitedUser, MAILBOX, signedIn, waitForMail, type Jar, type Mail } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";
import { json, markRegion, pageText, propose, since } from "../support/review";

let contributor: Jar, editor: Jar, reader: Jar, admin: Jar;
let vocab: Vocabulary;
let sourceId: number, imageId: number, sourceTitle: string;

const technique = (term: string, confidence = "probable") => ({ aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", term), confidence });
const pegs = (n: number) => ({ aspectId: vocab.aspect("peg_count"), count: n, confidence: "certain" });
const region = (jar: Jar, body: Record<string, unknown>) => markRegion(jar, imageId, body);
const review = (jar: Jar, id: number, body: Record<string, unknown>) => call(`/api/regions/${id}/review`, { jar, json: body });
const get = async (jar: Jar, id: number) => json(await call(`/api/regions/${id}`, { jar }));
const desk = async (jar: Jar, query = "") => json<DeskPage>(await call(`/api/review/desk?source=${sourceId}${query}`, { jar }));

beforeAll(async () => {
  [contributor, editor, reader, admin] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.reader), signedIn(DEMO.admin)]);
  vocab = await vocabulary();
  ({ sourceId, imageId } = await photographedSource(contributor, 1600, 1200));
  sourceTitle = (await json<{ source: { title: string } }>(await call(`/api/sources/${sourceId}`, { jar: contributor }))).source.title;
}, 120_000);

describe("the review cycle", () => {
  let proposed: RegionView;

  it("tells the editors at once when a region is proposed, and puts it on their desk as a first review", async () => {
    const start = since();
    const draft = await region(contributor, { label: "right hand", observations: [technique("strumming", "possible")] });
    proposed = await propose(contributor, draft);
    const mail = await waitForMail(DEMO.editor, new RegExp(`awaits review`), start);
    expect(mail.subject).toContain(sourceTitle);
    expect(mail.text).toContain(`region ${proposed.id}`);
    expect(mail.text).toContain("/review");

    const page = await desk(editor);
    const entry = page.entries.find((e) => e.regionId === proposed.id);
    expect(entry).toMatchObject({ reviewedBefore: false, versionNumber: 1, authorName: expect.any(String), sourceTitle, own: false });
    expect(entry!.observations.map((o) => o.termKey)).toEqual(["strumming"]);
    expect((await call(`/api/review/desk`, { jar: contributor })).status).toBe(403);
  });

  it("filters the desk by aspect, by source and by contributor", async () => {
    const ids = (p: DeskPage) => p.entries.map((e) => e.regionId);
    expect(ids(await desk(editor, "&aspect=right_hand_technique"))).toContain(proposed.id);
    expect(ids(await desk(editor, "&aspect=rose"))).not.toContain(proposed.id);
    expect(ids(await desk(editor, `&contributor=${proposed.authorId}`))).toContain(proposed.id);
    const byTitle = await json<DeskPage>(await call(`/api/review/desk?source=${encodeURIComponent(sourceTitle)}`, { jar: editor }));
    expect(ids(byTitle)).toContain(proposed.id);
    const bad = await call(`/api/review/desk?aspect=${encodeURIComponent("no such aspect!")}`, { jar: editor });
    expect(bad.status).toBe(400);
  });

  it("refuses a return without a comment and changes nothing", async () => {
    const res = await review(editor, proposed.id, { version: proposed.version, decision: "returned" });
    expect(res.status).toBe(400);
    expect(await json(res)).toMatchObject({ error: { code: "invalid_input", fields: { comment: [expect.stringMatching(/why/i)] } } });
    expect(await get(editor, proposed.id)).toMatchObject({ state: "proposed", version: proposed.version });
  });

  it("returns the region with a comment, which reaches the author by e-mail", async () => {
    const start = since();
    const comment = "The thumb rests on the soundboard and the fingers pluck: this is not strumming.";
    const res = await review(editor, proposed.id, { version: proposed.version, decision: "returned", comment });
    expect(res.status, await res.clone().text()).toBe(200);
    expect(await json(res)).toMatchObject({ state: "returned" });
    const mail = await waitForMail(DEMO.contributor, /returned to you/, start);
    expect(mail.subject).toContain(sourceTitle);
    expect(mail.text).toContain(comment);
  });

  it("refuses a decision made on a version that has changed since (409, with what is stored now)", async () => {
    const res = await review(editor, proposed.id, { version: proposed.version, decision: "vetted" });
    expect(res.status).toBe(409);
    expect(await json(res)).toMatchObject({ error: { code: "version_conflict", current: { id: proposed.id, state: "returned" } } });
  });

  it("shows the editor what changed when the author revises and proposes again", async () => {
    const returned = await get(contributor, proposed.id);
    const edited = await call(`/api/regions/${proposed.id}`, {
      jar: contributor,
      method: "PATCH",
      json: { version: returned.version, shape: { kind: "rectangle", x: 240, y: 300, w: 400, h: 320 }, observations: [technique("plucking"), pegs(10)] },
    });
    expect(edited.status, await edited.clone().text()).toBe(200);
    proposed = await propose(contributor, await json(edited));
    expect(proposed).toMatchObject({ state: "proposed", versionNumber: 2 });

    const entry = (await desk(editor)).entries.find((e) => e.regionId === proposed.id);
    expect(entry).toMatchObject({ reviewedBefore: true, versionNumber: 2 });

    const { status, text } = await pageText(editor, `/review/${proposed.id}`);
    expect(status).toBe(200);
    expect(text).toContain("What changed since the last review");
    expect(text).toContain("moved 40 px right; resized from 400 × 300 to 400 × 320 px");
    expect(text).toContain("The thumb rests on the soundboard");
    expect(text).toMatch(/Right-hand technique strumming \(possible\) plucking \(probable\) changed value, confidence/);
    expect(text).toMatch(/Peg count — 10 \(certain\) added/);
    expect(text).toContain("Return to author");
  });

  it("says first review for a region no editor has decided on, and shows no decision to a reader", async () => {
    const other = await propose(contributor, await region(contributor, { observations: [pegs(9)] }));
    const { text } = await pageText(editor, `/review/${other.id}`);
    expect(text).toContain("First review");
    expect(text).not.toContain("What changed since the last review");
    const asReader = await pageText(reader, `/review/${other.id}`);
    expect(asReader.text).toContain("Reviewing is for editors");
    expect(asReader.text).not.toContain("Peg count");
  });

  it("vets the revised region: its author is told and readers see it", async () => {
    const start = since();
    expect((await call(`/api/images/${imageId}/regions`, { jar: reader }).then((r) => json<{ regions: RegionView[] }>(r))).regions.map((r) => r.id)).not.toContain(proposed.id);
    const res = await review(editor, proposed.id, { version: proposed.version, decision: "vetted", comment: "Agreed: plucking, ten pegs." });
    expect(res.status, await res.clone().text()).toBe(200);
    await waitForMail(DEMO.contributor, /was vetted/, start);
    const seen = (await json<{ regions: RegionView[] }>(await call(`/api/images/${imageId}/regions`, { jar: reader }))).regions.find((r) => r.id === proposed.id);
    expect(seen).toMatchObject({ state: "vetted", versionNumber: 2, shown: "vetted" });
    expect(seen!.observations.map((o) => o.termKey ?? o.count)).toEqual(["plucking", 10]);
    expect((await desk(editor)).entries.map((e) => e.regionId)).not.toContain(proposed.id);
  });

  it("lets nobody decide on their own region (403), and marks it as theirs on the desk", async () => {
    const own = await propose(editor, await region(editor, { observations: [technique("both")] }));
    const res = await review(editor, own.id, { version: own.version, decision: "vetted" });
    expect(res.status).toBe(403);
    expect(await json(res)).toMatchObject({ error: { code: "forbidden", message: expect.stringMatching(/own work/) } });
    expect(await get(editor, own.id)).toMatchObject({ state: "proposed", version: own.version });
    expect((await desk(editor)).entries.find((e) => e.regionId === own.id)).toMatchObject({ own: true });
    const { text } = await pageText(editor, `/review/${own.id}`);
    expect(text).toContain("Nobody reviews their own work");
    expect(text).not.toContain("Return to author");
  });
});

describe("the desk's pages", () => {
  it("walks every proposed region of the source oldest first, a page at a time, with the same total", async () => {
    const all = await json<DeskPage>(await call(`/api/review/desk?source=${sourceId}&limit=100`, { jar: editor }));
    expect(all.entries.length).toBeGreaterThanOrEqual(2);
    expect(all.total).toBe(all.entries.length);
    const times = all.entries.map((e) => e.proposedAt);
    expect([...times].sort()).toEqual(times);
    const walked: number[] = [];
    let after: string | null = null;
    do {
      const page: DeskPage = await json<DeskPage>(await call(`/api/review/desk?source=${sourceId}&limit=1${after ? `&after=${after}` : ""}`, { jar: editor }));
      expect(page.entries.length).toBe(1);
      expect(page.total).toBe(all.total);
      walked.push(page.entries[0].regionId);
      after = page.next;
    } while (after);
    expect(walked).toEqual(all.entries.map((e) => e.regionId));
    expect((await call(`/api/review/desk?after=damaged`, { jar: editor })).status).toBe(400);
    // The page starts again from the first page under the same filters.
    const damaged = await call(`/review?source=${sourceId}&after=damaged`, { jar: editor });
    expect(damaged.status).toBe(307);
    expect(damaged.headers.get("location")).toMatch(new RegExp(`/review\\?source=${sourceId}$`));
  });
});

describe("the discussion of a region", () => {
  let subject: RegionView;

  beforeAll(async () => {
    subject = await propose(contributor, await region(contributor, { label: "rose", observations: [technique("unclear", "possible")] }));
    const res = await review(editor, subject.id, { version: subject.version, decision: "returned", comment: "Is the rose carved or a hole?" });
    expect(res.status).toBe(200);
  });

  it("tells earlier participants of a new comment, never the writer, and lists comments and decisions in time order", async () => {
    const start = since();
    const asked = await call(`/api/regions/${subject.id}/comments`, { jar: contributor, json: { body: "Carved, I think: see the shadow on the left." } });
    expect(asked.status, await asked.clone().text()).toBe(201);
    const toEditor = await waitForMail(DEMO.editor, new RegExp(`wrote about region ${subject.id}`), start);
    expect(toEditor.text).toContain("Carved, I think");
    expect(toEditor.text).toContain(`/review/${subject.id}`);

    const replyStart = since();
    const reply = await call(`/api/regions/${subject.id}/comments`, { jar: editor, json: { body: "Then say so with the rose aspect, please." } });
    expect(reply.status).toBe(201);
    const toAuthor = await waitForMail(DEMO.contributor, new RegExp(`wrote about region ${subject.id}`), replyStart);
    expect(toAuthor.text).toContain("Then say so with the rose aspect");
    // One worker sends in the order recorded: had the author been told of their own comment, it would be here by now.
    const { messages } = (await (await fetch(`${MAILBOX}/messages?to=${encodeURIComponent(DEMO.contributor)}`)).json()) as { messages: Mail[] };
    const aboutThread = messages.filter((m) => m.subject.includes(`wrote about region ${subject.id}`));
    expect(aboutThread.map((m) => m.text.includes("Then say so"))).toEqual([true]);

    const { entries } = await json<{ entries: ThreadEntry[] }>(await call(`/api/regions/${subject.id}/comments`, { jar: editor }));
    expect(entries.map((e) => [e.kind, e.kind === "review" ? e.decision : null, e.body])).toEqual([
      ["review", "returned", "Is the rose carved or a hole?"],
      ["comment", null, "Carved, I think: see the shadow on the left."],
      ["comment", null, "Then say so with the rose aspect, please."],
    ]);
    expect(entries.every((e) => e.authorName.length > 0)).toBe(true);
    const times = entries.map((e) => e.createdAt);
    expect([...times].sort()).toEqual(times);
  });

  it("refuses empty and overlong comments, readers writing, and regions the writer may not see", async () => {
    const before = (await json<{ entries: ThreadEntry[] }>(await call(`/api/regions/${subject.id}/comments`, { jar: contributor }))).entries.length;
    for (const body of ["", "   ", "x".repeat(4001)]) {
      const res = await call(`/api/regions/${subject.id}/comments`, { jar: contributor, json: { body } });
      expect(res.status, JSON.stringify(body.slice(0, 5))).toBe(400);
      expect(await json(res)).toMatchObject({ error: { fields: { body: [expect.any(String)] } } });
    }
    expect((await call(`/api/regions/${subject.id}/comments`, { jar: reader, json: { body: "May I?" } })).status).toBe(403);
    expect((await call(`/api/regions/${subject.id}/comments`, { json: { body: "Anyone?" } })).status).toBe(401);

    // A returned region is its author's work in progress: another contributor cannot see it, so cannot write.
    const stranger = await invitedUser("contributor", admin);
    const strangerJar = await signedIn(stranger.email, stranger.password);
    expect((await call(`/api/regions/${subject.id}/comments`, { jar: strangerJar, json: { body: "Hello" } })).status).toBe(404);
    expect((await call(`/api/regions/${subject.id}/comments`, { jar: strangerJar })).status).toBe(404);
    const after = (await json<{ entries: ThreadEntry[] }>(await call(`/api/regions/${subject.id}/comments`, { jar: contributor }))).entries.length;
    expect(after).toBe(before);
  });
});
