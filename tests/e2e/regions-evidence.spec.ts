// The regions panel beside the photograph: observations that save themselves and survive a reload,
// undo (of an edit, of a delete), the 409 comparison when another window saved first, the keys, and
// what readers see (vetted evidence, and proposed work only when they ask, marked as unreviewed).
import { rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect as baseExpect, test } from "@playwright/test";
import { call, DEMO, signedIn, type Jar } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";
import { RegionsPage, saveSession } from "./pages/regions-page";

const SESSION = path.join(tmpdir(), `cordarium-evidence-contributor-${process.pid}.json`);
const READER = path.join(tmpdir(), `cordarium-evidence-reader-${process.pid}.json`);
const IMAGE = { width: 2000, height: 1500 };
test.use({ viewport: { width: 1280, height: 1400 }, storageState: SESSION });
test.describe.configure({ timeout: 120_000 });
// Each step waits for a save or a load: allow for a busy machine.
const expect = baseExpect.configure({ timeout: 20_000 });

let contributor: Jar;
let vocab: Vocabulary;

type Stored = { id: number; version: number; label: string | null; state: string; observations: { aspectKey: string; termKey: string | null; confidence: string }[] };

async function stored(regionId: number): Promise<Stored> {
  return (await (await call(`/api/regions/${regionId}`, { jar: contributor })).json()) as Stored;
}

async function regionOn(imageId: number, body: Record<string, unknown>): Promise<Stored> {
  const res = await call(`/api/images/${imageId}/regions`, { jar: contributor, json: body });
  expect(res.status).toBe(201);
  return (await res.json()) as Stored;
}

test.beforeAll(async ({ browser }) => {
  test.setTimeout(120_000);
  contributor = await signedIn(DEMO.contributor);
  vocab = await vocabulary();
  await saveSession(browser, DEMO.contributor, "contributor", SESSION);
  await saveSession(browser, DEMO.reader, "reader", READER);
});

test.afterAll(async () => {
  await rm(SESSION, { force: true });
  await rm(READER, { force: true });
});

test("an observation added after drawing is saved, is there after a reload, and changes can be undone", async ({ page }) => {
  const { sourceId, imageId } = await photographedSource(contributor, IMAGE.width, IMAGE.height);
  const regions = new RegionsPage(page, IMAGE);
  await regions.open(sourceId, imageId);
  await regions.tool("Rectangle").click();
  await regions.drag(await regions.toScreen([700, 500]), await regions.toScreen([1100, 900]));
  await expect(regions.items).toHaveCount(1);
  await expect(regions.editor).toBeVisible();

  await regions.addObservation("Right-hand technique", "strumming", "probable");
  await regions.expectSaved();
  await expect(regions.item(0).getByTestId("region-observation")).toHaveText(["Right-hand technique: strumming (probable)"]);
  const id = Number(await regions.item(0).getAttribute("data-region-id"));
  expect((await stored(id)).observations).toEqual([expect.objectContaining({ aspectKey: "right_hand_technique", termKey: "strumming", confidence: "probable" })]);

  await page.reload();
  await regions.viewer.waitUntilOpen();
  await expect(regions.item(0).getByTestId("region-observation")).toHaveText(["Right-hand technique: strumming (probable)"]);
  await page.screenshot({ path: ".data/shots/regions-observation.png", fullPage: true });

  // Undo of an edit: the change is saved, then Ctrl+Z (outside a text field) saves the value before it.
  await regions.item(0).getByRole("button").click();
  await regions.observationRow("Right-hand technique").getByRole("radio", { name: "certain" }).check();
  await regions.expectSaved();
  expect((await stored(id)).observations[0].confidence).toBe("certain");
  await page.keyboard.press("Control+z");
  await expect(regions.item(0).getByTestId("region-observation")).toHaveText(["Right-hand technique: strumming (probable)"]);
  await regions.expectSaved();
  expect((await stored(id)).observations[0].confidence).toBe("probable");

  // A label typed and undone with the button.
  await regions.label.fill("right hand");
  await regions.expectSaved();
  expect((await stored(id)).label).toBe("right hand");
  await page.getByRole("button", { name: "Undo", exact: true }).click();
  await expect(regions.label).toHaveValue("");
  await regions.expectSaved();
  expect((await stored(id)).label).toBeNull();

  // Undo of a delete brings the region back, observations and all.
  await page.keyboard.press("Delete");
  await expect(regions.items).toHaveCount(0);
  expect((await call(`/api/regions/${id}`, { jar: contributor })).status).toBe(404);
  await page.keyboard.press("Control+z");
  await expect(regions.items).toHaveCount(1);
  await expect(regions.item(0).getByTestId("region-observation")).toHaveText(["Right-hand technique: strumming (probable)"]);
  expect((await stored(id)).observations).toHaveLength(1);
});

test("when another window saved first, the 409 shows both versions and the person chooses", async ({ page, browser }) => {
  const { sourceId, imageId } = await photographedSource(contributor, IMAGE.width, IMAGE.height);
  const region = await regionOn(imageId, { shape: { kind: "rectangle", x: 300, y: 300, w: 400, h: 300 }, label: "pegbox" });
  const mine = new RegionsPage(page, IMAGE);
  await mine.open(sourceId, imageId, `?region=${region.id}`);
  await expect(mine.label).toHaveValue("pegbox");

  const other = await browser.newContext({ storageState: SESSION, viewport: { width: 1280, height: 1400 } });
  const theirs = new RegionsPage(await other.newPage(), IMAGE);
  await theirs.open(sourceId, imageId, `?region=${region.id}`);
  await theirs.label.fill("pegbox, seen from the side");
  await theirs.expectSaved();

  await mine.label.fill("pegbox with nine pegs");
  const conflict = page.getByRole("alert").filter({ hasText: "Someone else saved this region while you were editing" });
  await expect(conflict).toBeVisible({ timeout: 15_000 });
  await expect(mine.saveStatus).toHaveText("not saved: someone else saved first");
  await expect(conflict.getByRole("row", { name: /Label/ })).toContainText("pegbox, seen from the side");
  await expect(conflict.getByRole("row", { name: /Label/ })).toContainText("pegbox with nine pegs");
  expect((await stored(region.id)).label).toBe("pegbox, seen from the side");
  await page.screenshot({ path: ".data/shots/regions-conflict.png", fullPage: true });

  await conflict.getByRole("button", { name: "Save mine over theirs" }).click();
  await mine.expectSaved();
  expect((await stored(region.id)).label).toBe("pegbox with nine pegs");

  // The other way: their newer save is loaded over what was typed here.
  await theirs.page.reload();
  await theirs.viewer.waitUntilOpen();
  await theirs.label.fill("pegbox, nine pegs and a scroll");
  await theirs.expectSaved();
  await mine.label.fill("pegbox, ten pegs");
  await expect(conflict).toBeVisible({ timeout: 15_000 });
  await conflict.getByRole("button", { name: "Load their version (discard mine)" }).click();
  await expect(mine.label).toHaveValue("pegbox, nine pegs and a scroll");
  await expect(conflict).toHaveCount(0);
  expect((await stored(region.id)).label).toBe("pegbox, nine pegs and a scroll");
  await other.close();
});

test("the keys choose tools, walk through the regions and delete; readers see vetted evidence and, when they ask, proposed work marked as such", async ({ page, browser }) => {
  const { sourceId, imageId } = await photographedSource(contributor, IMAGE.width, IMAGE.height);
  const strumming = { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "probable" };
  const top = await regionOn(imageId, { shape: { kind: "rectangle", x: 100, y: 100, w: 300, h: 200 }, label: "rose", observations: [strumming] });
  const middle = await regionOn(imageId, { shape: { kind: "rectangle", x: 500, y: 600, w: 300, h: 200 }, label: "right hand", observations: [strumming] });
  await regionOn(imageId, { shape: { kind: "rectangle", x: 1500, y: 800, w: 200, h: 200 }, label: "left hand" });
  const bottom = await regionOn(imageId, { shape: { kind: "polygon", points: [[900, 1100], [1300, 1150], [1000, 1400]] }, label: "bridge" });
  const regions = new RegionsPage(page, IMAGE);
  await regions.open(sourceId, imageId);
  await expect(regions.items).toHaveCount(4);

  // With the canvas focused OpenSeadragon would turn the photograph on R: here R is the rectangle.
  await regions.viewer.canvas.focus();
  await page.keyboard.press("r");
  await expect(regions.tool("Rectangle")).toHaveAttribute("aria-pressed", "true");
  await expect(regions.viewer.rotation()).toHaveText("0°");
  await page.keyboard.press("p");
  await expect(regions.tool("Polygon")).toHaveAttribute("aria-pressed", "true");
  await page.keyboard.press("Escape");
  await expect(regions.tool("Select/move")).toHaveAttribute("aria-pressed", "true");
  await page.keyboard.press("]");
  await expect(regions.viewer.rotation()).toHaveText("90°");
  await page.keyboard.press("[");
  await expect(regions.viewer.rotation()).toHaveText("0°");

  // N and J go down the list (top to bottom on the photograph), K and Shift N back up, both wrapping round.
  await page.keyboard.press("n");
  await expect(regions.editor.getByRole("heading", { name: "rose" })).toBeVisible();
  await page.keyboard.press("j");
  await expect(regions.editor.getByRole("heading", { name: "right hand" })).toBeVisible();
  await page.keyboard.press("k");
  await expect(regions.editor.getByRole("heading", { name: "rose" })).toBeVisible();
  await page.keyboard.press("Shift+N");
  await expect(regions.editor.getByRole("heading", { name: "bridge" })).toBeVisible();
  await page.keyboard.press("Backspace");
  await expect(regions.items).toHaveCount(3);
  expect((await call(`/api/regions/${bottom.id}`, { jar: contributor })).status).toBe(404);

  // Propose one, then all the rest; an editor vets the first.
  await regions.items.filter({ hasText: "rose" }).getByRole("button").click();
  await regions.editor.getByRole("button", { name: "Propose" }).click();
  await expect(regions.items.filter({ hasText: "rose" }).getByTestId("region-state")).toHaveText("proposed");
  await page.getByRole("button", { name: "Propose all my regions on this photograph" }).click();
  await expect(regions.items.filter({ hasText: "right hand" }).getByTestId("region-state")).toHaveText("proposed");
  // One without observations stays a draft, and the page says why.
  await expect(regions.items.filter({ hasText: "left hand" }).getByTestId("region-state")).toHaveText("draft");
  await expect(page.getByRole("alert").filter({ hasText: "1 region proposed for review. 1 region not: Record at least one observation" })).toBeVisible();
  const editor = await signedIn(DEMO.editor);
  const vetted = await call(`/api/regions/${top.id}/review`, { jar: editor, json: { version: (await stored(top.id)).version, decision: "vetted" } });
  expect(vetted.status).toBe(200);

  // A visitor sees the vetted region only, and is told that signing in shows more.
  const visitor = await browser.newContext({ storageState: { cookies: [], origins: [] }, viewport: { width: 1280, height: 1400 } });
  const outsider = new RegionsPage(await visitor.newPage(), IMAGE);
  await outsider.open(sourceId, imageId);
  await expect(outsider.items).toHaveCount(1);
  await expect(outsider.item(0)).toContainText("rose");
  await expect(outsider.item(0).getByTestId("region-state")).toHaveText("vetted");
  await expect(outsider.page.getByRole("toolbar", { name: "Drawing tools" })).toHaveCount(0);
  await expect(outsider.page.getByText("Sign in to see evidence proposed but not yet reviewed.")).toBeVisible();
  await visitor.close();

  // A reader the same, then proposed work on request, marked as not yet reviewed.
  const readerContext = await browser.newContext({ storageState: READER, viewport: { width: 1280, height: 1400 } });
  const reader = new RegionsPage(await readerContext.newPage(), IMAGE);
  await reader.open(sourceId, imageId);
  await expect(reader.items).toHaveCount(1);
  await expect(reader.item(0).getByTestId("region-state")).toHaveText("vetted");
  await reader.page.getByLabel("Show proposed evidence (not yet reviewed)").check();
  await expect(reader.items).toHaveCount(2);
  await expect(reader.items.filter({ hasText: "right hand" }).getByTestId("region-state")).toHaveText("proposed · not yet reviewed");
  await expect(reader.items.filter({ hasText: "left hand" })).toHaveCount(0);
  await reader.page.screenshot({ path: ".data/shots/regions-reader-proposed.png", fullPage: true });
  await readerContext.close();

  // Withdrawn, the region leaves what readers may ask to see.
  await regions.items.filter({ hasText: "right hand" }).getByRole("button").click();
  await regions.editor.getByRole("button", { name: "Withdraw" }).click();
  await expect(regions.items.filter({ hasText: "right hand" }).getByTestId("region-state")).toHaveText("withdrawn");
  expect((await stored(middle.id)).state).toBe("withdrawn");
});
