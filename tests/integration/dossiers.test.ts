// Dossiers against the running app: the owner's writes with versions, sharing with named people who may
// read but not change, 404 for everyone else, public dossiers for visitors, items a viewer may not see
// left out (in the query), soft delete and restore, the audit trail, and the CSV parsed back (RFC 4180).
import Papa from "papaparse";
import { beforeAll, describe, expect, it } from "vitest";
import type { DossierView } from "@/lib/dossiers/types";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, invitedUser, signedIn, unique, type Jar } from "../support/app";
import { photographedSource, vocabulary } from "../support/evidence";

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
let owner: Jar, friend: Jar, stranger: Jar, contributor: Jar, editor: Jar, admin: Jar;
let friendEmail: string;
let sourceId: number, imageId: number;
let vetted: RegionView, draft: RegionView;

async function send(path: string, jar: Jar | undefined, method: string, json?: unknown) {
  const res = await call(path, { jar, method, json: json ?? (method === "GET" ? undefined : {}) });
  const body = (await res.json().catch(() => null)) as Json | null;
  return { status: res.status, body };
}
const dossierOf = (r: { body: Json | null }) => r.body!.dossier as DossierView;

beforeAll(async () => {
  [owner, contributor, editor, admin] = await Promise.all([signedIn(DEMO.reader), signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.admin)]);
  const made = await invitedUser("reader", admin);
  friendEmail = made.email;
  friend = await signedIn(made.email, made.password);
  const other = await invitedUser("reader", admin);
  stranger = await signedIn(other.email, other.password);

  const vocab = await vocabulary();
  ({ sourceId, imageId } = await photographedSource(contributor, 1200, 900));
  const mark = async (shape: unknown, label: string) =>
    (await (await call(`/api/images/${imageId}/regions`, { jar: contributor, json: { shape, label, observations: [
      { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "probable", note: "thumb down the strings" },
    ] } })).json()) as RegionView;
  const hand = await mark({ kind: "rectangle", x: 100, y: 200, w: 300, h: 400 }, "Right hand, vetted");
  draft = await mark({ kind: "rectangle", x: 600, y: 100, w: 200, h: 200 }, "Unvetted rose");
  const proposed = (await (await call(`/api/regions/${hand.id}/propose`, { jar: contributor, json: { version: hand.version } })).json()) as RegionView;
  vetted = (await (await call(`/api/regions/${hand.id}/review`, { jar: editor, json: { version: proposed.version, decision: "vetted" } })).json()) as RegionView;
  expect(vetted.state).toBe("vetted");
}, 180_000);

describe("a reader's private dossier", () => {
  let d: DossierView;
  const note = 'Thumb, "under" the index;\ncompare the second photograph';

  it("is created private by a reader (201), and invalid input is a 400 with the field", async () => {
    const bad = await send("/api/dossiers", owner, "POST", { title: "  " });
    expect(bad.status).toBe(400);
    expect(bad.body!.error.fields.title).toBeDefined();
    const res = await send("/api/dossiers", owner, "POST", { title: unique("Right hands"), description: "Strumming in Italian pictures" });
    expect(res.status).toBe(201);
    d = dossierOf(res);
    expect(d).toMatchObject({ visibility: "private", version: 1, items: [], withheld: 0, mine: true });
  });

  it("takes a vetted region and a source the owner may see, and refuses a draft the owner may not see, or a repeat", async () => {
    const region = await send(`/api/dossiers/${d.id}/items`, owner, "POST", { kind: "region", regionId: vetted.id });
    expect(region.status).toBe(201);
    const source = await send(`/api/dossiers/${d.id}/items`, owner, "POST", { kind: "source", sourceId });
    expect(source.status).toBe(201);
    const hidden = await send(`/api/dossiers/${d.id}/items`, owner, "POST", { kind: "region", regionId: draft.id });
    expect(hidden.status).toBe(400);
    expect(hidden.body!.error.fields.regionId).toBeDefined();
    const again = await send(`/api/dossiers/${d.id}/items`, owner, "POST", { kind: "source", sourceId });
    expect(again.status).toBe(400);
    expect(again.body!.error.message).toMatch(/already/);
    d = dossierOf(source);
    expect(d.items.map((i) => i.kind)).toEqual(["region", "source"]);
    const [first] = d.items;
    expect(first.kind === "region" && first.region.observations[0].termLabel).toBe("strumming");
    expect(first.source.id).toBe(sourceId);
    expect(d.items[1].source.imageId).toBe(imageId);
  });

  it("is reordered with the whole order and its versions; a stale or partial order is a 409 with the order now", async () => {
    const [a, b] = d.items;
    const res = await send(`/api/dossiers/${d.id}/order`, owner, "POST", { items: [b, a].map((i) => ({ id: i.id, version: i.version })) });
    expect(res.status).toBe(200);
    const after = dossierOf(res);
    expect(after.items.map((i) => i.id)).toEqual([b.id, a.id]);
    // The same move sent again from a window that still holds the old versions.
    const stale = await send(`/api/dossiers/${d.id}/order`, owner, "POST", { items: [a, b].map((i) => ({ id: i.id, version: i.version })) });
    expect(stale.status).toBe(409);
    expect(stale.body!.error.code).toBe("version_conflict");
    expect((stale.body!.error.current as DossierView).items.map((i) => i.id)).toEqual([b.id, a.id]);
    const partial = await send(`/api/dossiers/${d.id}/order`, owner, "POST", { items: [{ id: after.items[0].id, version: after.items[0].version }] });
    expect(partial.status).toBe(409);
    d = after;
  });

  it("keeps the owner's note on an item, with a 409 for a stale version", async () => {
    const item = d.items.find((i) => i.kind === "region")!;
    const res = await send(`/api/dossiers/${d.id}/items/${item.id}`, owner, "PATCH", { version: item.version, note });
    expect(res.status).toBe(200);
    d = dossierOf(res);
    expect(d.items.find((i) => i.id === item.id)!.note).toBe(note);
    const stale = await send(`/api/dossiers/${d.id}/items/${item.id}`, owner, "PATCH", { version: item.version, note: "overwrite" });
    expect(stale.status).toBe(409);
    expect((stale.body!.error.current as DossierView).items.find((i) => i.id === item.id)!.note).toBe(note);
  });

  it("is a 404 for anyone but the owner while private, visitors included", async () => {
    for (const jar of [friend, stranger, undefined]) expect((await send(`/api/dossiers/${d.id}`, jar, "GET")).status).toBe(404);
    expect((await send(`/api/dossiers/${d.id}`, stranger, "PATCH", { version: d.version, title: "Mine now" })).status).toBe(404);
    expect((await send(`/api/dossiers/${d.id}/export.csv`, undefined, "GET")).status).toBe(404);
  });

  it("refuses to share with an e-mail no account uses (400 naming it), changing nothing", async () => {
    const res = await send(`/api/dossiers/${d.id}/shares`, owner, "PUT", { version: d.version, emails: [friendEmail, "nobody-here@example.test"], visibility: "shared" });
    expect(res.status).toBe(400);
    expect(res.body!.error.message).toContain("nobody-here@example.test");
    expect(res.body!.error.fields["emails.1"]).toBeDefined();
    const now = dossierOf(await send(`/api/dossiers/${d.id}`, owner, "GET"));
    expect(now).toMatchObject({ version: d.version, visibility: "private", shares: [] });
  });

  it("is shared with a named person who may read it but not change it; a third person still gets 404", async () => {
    const res = await send(`/api/dossiers/${d.id}/shares`, owner, "PUT", { version: d.version, emails: [friendEmail.toUpperCase()], visibility: "shared" });
    expect(res.status).toBe(200);
    d = dossierOf(res);
    expect(d.visibility).toBe("shared");
    expect(d.shares.map((s) => s.email)).toEqual([friendEmail]);

    const seen = await send(`/api/dossiers/${d.id}`, friend, "GET");
    expect(seen.status).toBe(200);
    expect(dossierOf(seen)).toMatchObject({ mine: false, shares: [], withheld: 0 });
    expect(dossierOf(seen).items).toHaveLength(2);
    const list = await send("/api/dossiers", friend, "GET");
    expect((list.body!.shared as { id: number }[]).map((x) => x.id)).toContain(d.id);

    const item = d.items[0];
    expect((await send(`/api/dossiers/${d.id}`, friend, "PATCH", { version: d.version, title: "Changed" })).status).toBe(403);
    expect((await send(`/api/dossiers/${d.id}/items`, friend, "POST", { kind: "source", sourceId })).status).toBe(403);
    expect((await send(`/api/dossiers/${d.id}/items/${item.id}`, friend, "PATCH", { version: item.version, note: "mine" })).status).toBe(403);
    expect((await send(`/api/dossiers/${d.id}/items/${item.id}`, friend, "DELETE", { version: item.version })).status).toBe(403);
    expect((await send(`/api/dossiers/${d.id}`, friend, "DELETE", { version: d.version })).status).toBe(403);
    expect((await send(`/api/dossiers/${d.id}/shares`, friend, "PUT", { version: d.version, emails: [] })).status).toBe(403);
    expect((await send(`/api/dossiers/${d.id}`, stranger, "GET")).status).toBe(404);
  });

  it("is readable by visitors once public, through the API and the CSV", async () => {
    const res = await send(`/api/dossiers/${d.id}`, owner, "PATCH", { version: d.version, visibility: "public" });
    expect(res.status).toBe(200);
    d = dossierOf(res);
    const seen = await send(`/api/dossiers/${d.id}`, undefined, "GET");
    expect(seen.status).toBe(200);
    expect(dossierOf(seen).items).toHaveLength(2);
    expect((await send(`/api/dossiers/${d.id}`, stranger, "GET")).status).toBe(200);
    const page = await call(`/dossiers/${d.id}`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain(d.title);
  });

  it("exports CSV that parses back (RFC 4180) with a citation accessed today", async () => {
    const res = await call(`/api/dossiers/${d.id}/export.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename=".+\.csv"$/);
    const text = await res.text();
    expect(text).toContain("\r\n");
    const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data.map((r) => r.kind)).toEqual(d.items.map((i) => i.kind));
    const region = parsed.data.find((r) => r.kind === "region")!;
    expect(region.note).toBe(note);
    expect(region.region_id).toBe(String(vetted.id));
    expect(region.observations).toContain("Right-hand technique: strumming (probable)");
    expect(region.permalink).toMatch(new RegExp(`/sources/${sourceId}/images/${imageId}\\?region=${vetted.id}$`));
    const today = new Date().toISOString().slice(0, 10);
    expect(region.accessed).toBe(today);
    expect(region.citation).toContain(`accessed ${today}`);
    expect(region.citation).toContain(`detail, region ${vetted.id}`);
  });

  it("is soft-deleted and restored by its owner with the version read", async () => {
    expect((await send(`/api/dossiers/${d.id}`, owner, "DELETE", { version: d.version - 1 })).status).toBe(409);
    const gone = await send(`/api/dossiers/${d.id}`, owner, "DELETE", { version: d.version });
    expect(gone.status).toBe(200);
    d = dossierOf(gone);
    expect(d.deletedAt).not.toBeNull();
    for (const jar of [friend, undefined]) expect((await send(`/api/dossiers/${d.id}`, jar, "GET")).status).toBe(404);
    expect((await send(`/api/dossiers/${d.id}`, owner, "PATCH", { version: d.version, title: "While deleted" })).status).toBe(400);
    const list = await send("/api/dossiers", owner, "GET");
    expect((list.body!.deleted as { id: number }[]).map((x) => x.id)).toContain(d.id);
    expect((list.body!.mine as { id: number }[]).map((x) => x.id)).not.toContain(d.id);
    const back = await send(`/api/dossiers/${d.id}/restore`, owner, "POST", { version: d.version });
    expect(back.status).toBe(200);
    d = dossierOf(back);
    expect(d.deletedAt).toBeNull();
    expect((await send(`/api/dossiers/${d.id}`, friend, "GET")).status).toBe(200);
  });

  it("left every change in the audit trail", async () => {
    const res = await send(`/api/admin/audit?entityType=dossier&entityId=${d.id}&limit=100`, admin, "GET");
    const actions = (res.body!.events as { action: string }[]).map((e) => e.action);
    for (const action of ["dossier.created", "dossier.item_added", "dossier.reordered", "dossier.item_annotated", "dossier.shares_changed", "dossier.updated", "dossier.deleted", "dossier.restored"]) {
      expect(actions).toContain(action);
    }
    // The refused share with an unknown address left nothing behind.
    expect(actions.filter((a) => a === "dossier.shares_changed")).toHaveLength(1);
  });
});

describe("items a viewer may not see", () => {
  let d: DossierView;

  beforeAll(async () => {
    d = dossierOf(await send("/api/dossiers", contributor, "POST", { title: unique("Work in progress") }));
    for (const regionId of [draft.id, vetted.id]) expect((await send(`/api/dossiers/${d.id}/items`, contributor, "POST", { kind: "region", regionId })).status).toBe(201);
    // A revision of the vetted region is in progress: readers keep the vetted version.
    const edited = await send(`/api/regions/${vetted.id}`, contributor, "PATCH", { version: vetted.version, label: "Right hand, revised draft" });
    expect(edited.status).toBe(200);
    d = dossierOf(await send(`/api/dossiers/${d.id}/shares`, contributor, "PUT", { version: d.version, emails: [DEMO.reader], visibility: "shared" }));
  });

  it("shows the author their own draft region", async () => {
    const mine = dossierOf(await send(`/api/dossiers/${d.id}`, contributor, "GET"));
    expect(mine.items.map((i) => i.kind === "region" && i.region.id)).toEqual([draft.id, vetted.id]);
  });

  it("never shows a reader an unvetted region through a shared dossier, only a count, and the vetted version of a revised one", async () => {
    const res = await call(`/api/dossiers/${d.id}`, { jar: owner });
    const text = await res.text();
    const seen = (JSON.parse(text) as { dossier: DossierView }).dossier;
    expect(seen.items).toHaveLength(1);
    expect(seen.withheld).toBe(1);
    expect(seen.withheldItems).toEqual([]);
    const [only] = seen.items;
    expect(only.kind === "region" && only.region).toMatchObject({ id: vetted.id, label: "Right hand, vetted", shown: "vetted" });
    expect(text).not.toContain("Unvetted rose");
    expect(text).not.toContain("revised draft");
    const csv = await (await call(`/api/dossiers/${d.id}/export.csv`, { jar: owner })).text();
    expect(csv).not.toContain("Unvetted rose");
    expect(Papa.parse(csv, { header: true, skipEmptyLines: true }).data).toHaveLength(1);
    const page = await (await call(`/dossiers/${d.id}`, { jar: owner })).text();
    expect(page).not.toContain("Unvetted rose");
    expect(page).toContain("One item of this dossier is");
    const print = await (await call(`/dossiers/${d.id}/print`, { jar: owner })).text();
    expect(print).not.toContain("Unvetted rose");
    expect(print).toContain("Right hand, vetted");
  });
});
