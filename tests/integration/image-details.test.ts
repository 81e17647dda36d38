// An image's caption, credit, rights and kind after upload: PATCH /api/images/:id with the version read.
import { beforeAll, describe, expect, it } from "vitest";
import { call, DEMO, invitedUser, signedIn, unique, type Jar } from "../support/app";
import { picture, settled, upload } from "../support/images";

type Image = { id: number; version: number; caption: string | null; rightsUri: string | null; kind: string };
let contributor: Jar, editor: Jar;
let image: Image;

beforeAll(async () => {
  [contributor, editor] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor)]);
  const res = await call("/api/sources", { jar: contributor, json: { title: unique("Details"), objectType: "painting" } });
  const sourceId = ((await res.json()) as { source: { id: number } }).source.id;
  const up = await upload(contributor, sourceId, "detail.jpg", await picture(41, 900, 700));
  await settled(contributor, sourceId, up.imageId!);
  image = ((await (await call(`/api/images/${up.imageId}`, { jar: contributor })).json()) as { image: Image }).image;
});

const patch = (jar: Jar, json: Record<string, unknown>) => call(`/api/images/${image.id}`, { jar, method: "PATCH", json });

describe("image details", () => {
  it("the uploader edits them; the answer carries no storage key", async () => {
    const res = await patch(contributor, { version: image.version, kind: "detail", caption: "Right hand over the rose", rightsUri: "http://rightsstatements.org/vocab/InC-EDU/1.0/" });
    expect(res.status).toBe(200);
    const body = (await res.json()) as { image: Image & { storageKey?: string } };
    expect(body.image).toMatchObject({ kind: "detail", caption: "Right hand over the rose", version: image.version + 1 });
    expect(body.image.storageKey).toBeUndefined();
    image = body.image;
  });

  it("refuses an unknown rights statement and a stale version, changing nothing", async () => {
    const bad = await patch(contributor, { version: image.version, rightsUri: "http://example.org/free" });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields.rightsUri).toBeTruthy();
    const stale = await patch(editor, { version: image.version - 1, caption: "Overwritten?" });
    expect(stale.status).toBe(409);
    const now = ((await (await call(`/api/images/${image.id}`, { jar: contributor })).json()) as { image: Image }).image;
    expect(now.caption).toBe("Right hand over the rose");
  });

  it("another contributor and a reader may not edit them", async () => {
    const other = await invitedUser("contributor");
    const otherJar = await signedIn(other.email, other.password);
    expect((await patch(otherJar, { version: image.version, caption: "x" })).status).toBe(403);
    expect((await patch(await signedIn(DEMO.reader), { version: image.version, caption: "x" })).status).toBe(403);
  });
});
