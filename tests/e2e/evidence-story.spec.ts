// The whole evidence story as people would live it: a contributor marks the right hand and the rose on
// a photograph, records what they show and the peg and string counts, sees the stringing check and
// proposes the regions; an editor returns one (the contributor is told by e-mail) and vets the other; a
// reader then sees only the vetted one, and the open-standard exports carry it.
import { rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect as baseExpect, test } from "@playwright/test";
import { DEMO, signedIn, waitForMail, type Jar } from "../support/app";
import { photographedSource } from "../support/evidence";
import { RegionsPage, saveSession } from "./pages/regions-page";
import { ReviewRegion } from "./pages/review-page";

const CONTRIBUTOR = path.join(tmpdir(), `cordarium-story-contributor-${process.pid}.json`);
const EDITOR = path.join(tmpdir(), `cordarium-story-editor-${process.pid}.json`);
const READER = path.join(tmpdir(), `cordarium-story-reader-${process.pid}.json`);
const IMAGE = { width: 2000, height: 1500 };
test.use({ viewport: { width: 1280, height: 1400 } });
test.describe.configure({ timeout: 240_000 });
const expect = baseExpect.configure({ timeout: 20_000 });

let contributor: Jar;

test.beforeAll(async ({ browser }) => {
  test.setTimeout(120_000);
  contributor = await signedIn(DEMO.contributor);
  await saveSession(browser, DEMO.contributor, "contributor", CONTRIBUTOR);
  await saveSession(browser, DEMO.editor, "editor", EDITOR);
  await saveSession(browser, DEMO.reader, "reader", READER);
});

test.afterAll(async () => {
  for (const file of [CONTRIBUTOR, EDITOR, READER]) await rm(file, { force: true });
});

test("marked, checked, proposed, reviewed, and seen by a reader only once vetted", async ({ browser }) => {
  const { sourceId, imageId } = await photographedSource(contributor, IMAGE.width, IMAGE.height);

  // The contributor marks the right hand (a rectangle by a pointer drag) and the rose (a polygon by clicks).
  const mine = await browser.newContext({ storageState: CONTRIBUTOR });
  const regions = new RegionsPage(await mine.newPage(), IMAGE);
  await regions.open(sourceId, imageId);
  await regions.tool("Rectangle").click();
  await regions.drag(await regions.toScreen([300, 600]), await regions.toScreen([700, 1000]));
  await expect(regions.items).toHaveCount(1);
  await regions.label.fill("right hand");
  await regions.addObservation("Right-hand technique", "strumming", "probable");
  await regions.expectSaved();
  const handId = Number(await regions.item(0).getAttribute("data-region-id"));

  await regions.tool("Polygon").click();
  const corners: [number, number][] = [[1100, 500], [1300, 450], [1450, 600], [1300, 780], [1100, 700]];
  for (const p of corners) await regions.clickAt(await regions.toScreen(p));
  await regions.clickAt(await regions.toScreen(corners[0]));
  await expect(regions.items).toHaveCount(2);
  // The new polygon is the selected region.
  const roseId = Number(await regions.selectedItem.getAttribute("data-region-id"));
  expect(roseId).not.toBe(handId);
  expect((await regions.listedShape(regions.selectedItem)).kind).toBe("polygon");
  await regions.label.fill("rose");
  await regions.addObservation("Rose", "recessed multi-layer", "certain");
  await regions.addObservation("Peg count", "10", "certain");
  await regions.addObservation("String count", "9", "probable");
  await regions.expectSaved();

  // The stringing check reads the counts: ten pegs, nine strings.
  await expect(regions.page.getByRole("heading", { name: "Stringing: pegs, strings and courses" })).toBeVisible();
  await expect(regions.page.getByText(/nine strings on ten pegs|ten pegs/i).first()).toBeVisible();

  await regions.page.getByRole("button", { name: "Propose all my regions on this photograph" }).click();
  await expect(regions.byId(handId)).toContainText("proposed");
  await expect(regions.byId(roseId)).toContainText("proposed");

  // The editor returns the rose with a comment, then vets the right hand.
  const since = new Date(Date.now() - 1000);
  const editorContext = await browser.newContext({ storageState: EDITOR });
  const editorPage = await editorContext.newPage();
  const review = new ReviewRegion(editorPage);
  await editorPage.goto(`/review/${roseId}`);
  await review.expectRegion(roseId);
  await review.returnToAuthor("The rose is painted flat here; say probable, not certain.");
  await editorPage.goto(`/review/${handId}`);
  await review.expectRegion(handId);
  await review.vet();
  await expect(editorPage.getByText(new RegExp(`^Region ${handId} · proposed`))).toHaveCount(0);

  // The contributor is told of the return by e-mail, with the comment.
  const letter = await waitForMail(DEMO.contributor, /returned/, since, 30_000);
  expect(letter.text).toContain("The rose is painted flat here");

  // A reader sees the vetted right hand and not the returned rose.
  const readerContext = await browser.newContext({ storageState: READER });
  const readerView = new RegionsPage(await readerContext.newPage(), IMAGE);
  await readerView.open(sourceId, imageId);
  await expect(readerView.items).toHaveCount(1);
  await expect(readerView.byId(handId)).toContainText("Right-hand technique: strumming (probable)");
  await expect(readerView.byId(roseId)).toHaveCount(0);

  // The exports carry what the reader may see: one annotation, and a manifest linking its page.
  const page = await (await readerView.page.request.get(`/api/images/${imageId}/annotations`)).json();
  expect(page.type).toBe("AnnotationPage");
  expect(page.items).toHaveLength(1);
  // The rectangle drawn from (300, 600) to (700, 1000) in image pixels, within a few pixels of the pointer.
  const [x, y, w, h] = /^xywh=(\d+),(\d+),(\d+),(\d+)$/.exec(page.items[0].target.selector.value)!.slice(1).map(Number);
  for (const [got, want] of [[x, 300], [y, 600], [w, 400], [h, 400]]) expect(Math.abs(got - want)).toBeLessThanOrEqual(8);
  const manifest = await (await readerView.page.request.get(`/iiif/3/manifests/${sourceId}`)).json();
  expect(manifest.type).toBe("Manifest");
  expect(manifest.items[0].annotations[0].id).toMatch(new RegExp(`/api/images/${imageId}/annotations$`));

  for (const context of [mine, editorContext, readerContext]) await context.close();
});
