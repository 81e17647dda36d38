// Notifications as each person chose: their own preference with its version, one letter per notice,
// one daily digest with every notice (never two, even when two runs meet), or none at all.
import { beforeAll, describe, expect, it } from "vitest";
import { call, countMail, DEMO, invitedUser, signedIn, waitForMail, type Jar, type Mail } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";
import { chooseNotifications as choose, json, markRegion, propose, since } from "../support/review";

let contributor: Jar, editor: Jar, admin: Jar;
let vocab: Vocabulary;
let imageId: number;

const technique = (term: string, confidence = "probable") => ({ aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", term), confidence });
const pegs = (n: number) => ({ aspectId: vocab.aspect("peg_count"), count: n, confidence: "certain" });
const region = (jar: Jar, body: Record<string, unknown>) => markRegion(jar, imageId, body);

beforeAll(async () => {
  [contributor, editor, admin] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.admin)]);
  vocab = await vocabulary();
  ({ imageId } = await photographedSource(contributor, 1200, 900));
}, 120_000);

describe("notification preferences", () => {
  it("are each person's own, default to each notice at once, and change only with the version read", async () => {
    const person = await invitedUser("reader", admin);
    const jar = await signedIn(person.email, person.password);
    const first = await json<{ notify: string; version: number; waiting: number }>(await call("/api/account/notifications", { jar }));
    expect(first).toMatchObject({ notify: "immediate", waiting: 0 });

    const changed = await call("/api/account/notifications", { jar, method: "PATCH", json: { version: first.version, notify: "daily" } });
    expect(await json(changed)).toMatchObject({ notify: "daily", version: first.version + 1 });

    const stale = await call("/api/account/notifications", { jar, method: "PATCH", json: { version: first.version, notify: "off" } });
    expect(stale.status).toBe(409);
    expect(await json(stale)).toMatchObject({ error: { code: "version_conflict", current: { notify: "daily" } } });

    const bad = await call("/api/account/notifications", { jar, method: "PATCH", json: { version: first.version + 1, notify: "hourly" } });
    expect(bad.status).toBe(400);
    expect(await json(bad)).toMatchObject({ error: { code: "invalid_input", fields: { notify: [expect.any(String)] } } });
    expect(await json(await call("/api/account/notifications", { jar }))).toMatchObject({ notify: "daily" });

    const { events } = await json<{ events: { action: string; before: { notify: string }; after: { notify: string } }[] }>(
      await call(`/api/admin/audit?entityType=user&entityId=${person.id}`, { jar: admin }),
    );
    expect(events.find((e) => e.action === "user.notifications_changed")).toMatchObject({ before: { notify: "immediate" }, after: { notify: "daily" } });
  });
});

describe("notices by the daily digest, or none", () => {
  it("gathers one letter with every notice for a daily reader, sends nothing to one who chose none", async () => {
    const daily = await invitedUser("editor", admin);
    const off = await invitedUser("editor", admin);
    await choose(await signedIn(daily.email, daily.password), "daily");
    await choose(await signedIn(off.email, off.password), "off");
    const start = since();
    const first = await propose(contributor, await region(contributor, { observations: [technique("strumming")] }));
    const second = await propose(contributor, await region(contributor, { observations: [pegs(12)] }));
    // The immediate editor's letters show that the proposals went out; the daily one only gets a digest.
    await waitForMail(DEMO.editor, new RegExp(`awaits review`), start);
    expect(await countMail(daily.email)).toBe(1); // the invitation

    // Two runs at once (as two app instances at 06:00 would) claim rows with SKIP LOCKED: one letter, not two.
    const runs = await Promise.all([1, 2].map(() => call("/api/admin/notifications/digest", { jar: admin, json: {} })));
    expect(runs.map((r) => r.status)).toEqual([200, 200]);
    const counted = await Promise.all(runs.map((r) => json<{ letters: number; notifications: number; failed: number }>(r)));
    expect(counted.every((c) => c.failed === 0)).toBe(true);
    expect(counted.reduce((n, c) => n + c.notifications, 0)).toBeGreaterThanOrEqual(2);
    const digest: Mail = await waitForMail(daily.email, /^Cordarium digest: 2 notices$/, start);
    expect(digest.text).toContain(`region ${first.id}`);
    expect(digest.text).toContain(`region ${second.id}`);
    expect(digest.text.indexOf(`region ${first.id}`)).toBeLessThan(digest.text.indexOf(`region ${second.id}`));

    // A second run finds nothing waiting: no second letter.
    expect((await call("/api/admin/notifications/digest", { jar: admin, json: {} })).status).toBe(200);
    expect(await countMail(daily.email)).toBe(2);
    expect(await countMail(off.email)).toBe(1);
    expect((await call("/api/admin/notifications/digest", { jar: editor, json: {} })).status).toBe(403);
  });

  it("sends what was waiting for the digest at once when the person switches to each notice at once", async () => {
    const person = await invitedUser("editor", admin);
    const jar = await signedIn(person.email, person.password);
    await choose(jar, "daily");
    const start = since();
    const waiting = await propose(contributor, await region(contributor, { observations: [pegs(6)] }));
    expect(await choose(jar, "immediate")).toMatchObject({ notify: "immediate", waiting: 1 });
    const mail = await waitForMail(person.email, /awaits review/, start);
    expect(mail.text).toContain(`region ${waiting.id}`);
  });
});
