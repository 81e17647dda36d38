import { expect, test } from "@playwright/test";
import { lightTableHref } from "@/lib/light-table/links";
import { DEMO, signedIn, unique } from "../support/app";
import { photographedSource, vocabulary } from "../support/evidence";
import { regionAt } from "../support/light-table";
import { LightTablePage, type Geometry } from "./pages/light-table-page";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

// Four vetted regions of different proportions on one photograph, laid out for a visitor.
const boxes = {
  pegbox: { x: 100, y: 100, w: 300, h: 400 },
  fingerboard: { x: 500, y: 100, w: 600, h: 200 },
  rose: { x: 900, y: 500, w: 240, h: 240 },
  hand: { x: 200, y: 700, w: 500, h: 250 },
};
type Name = keyof typeof boxes;
// Tall enough that a drag from one place to another needs no scrolling.
test.use({ viewport: { width: 1280, height: 1400 } });
const labels = Object.fromEntries(Object.keys(boxes).map((k) => [k, unique(k)])) as Record<Name, string>;
const ids = {} as Record<Name, number>;
const pending = { label: unique("pending"), id: 0 };

test.beforeAll(async () => {
  test.setTimeout(120_000);
  const [contributor, editor] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor)]);
  const vocab = await vocabulary();
  const { imageId } = await photographedSource(contributor, 1600, 1200);
  const strumming = { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "probable" };
  for (const name of Object.keys(boxes) as Name[]) {
    const region = await regionAt({ author: contributor, editor }, imageId, "vetted", { box: boxes[name], label: labels[name], observations: [strumming] });
    ids[name] = region.id;
  }
  const proposed = await regionAt({ author: contributor, editor }, imageId, "proposed", { box: { x: 10, y: 10, w: 80, h: 80 }, label: pending.label, observations: [strumming] });
  pending.id = proposed.id;
});

/** Every crop shows the same zoom and the same relative window: the picture's scale and offset as shares of the crop agree. */
function expectTogether(geometry: Geometry[], zoom: number) {
  const offsets = geometry.map(({ crop, picture }) => {
    expect(picture.width / crop.width).toBeCloseTo(zoom, 2);
    expect(picture.height / crop.height).toBeCloseTo(zoom, 2);
    return { x: (crop.x - picture.x) / picture.width, y: (crop.y - picture.y) / picture.height };
  });
  for (const o of offsets) {
    expect(o.x).toBeCloseTo(offsets[0].x, 3);
    expect(o.y).toBeCloseTo(offsets[0].y, 3);
  }
  return offsets[0];
}

test("lays regions side by side at one height, zooms and pans them together, reorders, removes and prints", async ({ page }) => {
  test.setTimeout(60_000);
  const table = new LightTablePage(page);
  await table.open(lightTableHref([ids.pegbox, ids.fingerboard, ids.rose, ids.hand]), 4);
  expect(await table.order()).toEqual([labels.pegbox, labels.fingerboard, labels.rose, labels.hand]);

  // One common height; each crop keeps its region's proportions.
  for (const [i, g] of (await table.geometry()).entries()) {
    const box = Object.values(boxes)[i];
    expect(g.crop.height).toBeCloseTo(360, 0);
    expect(g.crop.width).toBeCloseTo((360 * box.w) / box.h, 0);
  }
  await table.controls.getByText("Large").click();
  await expect(table.controls.getByRole("radio", { name: /Large/ })).toBeChecked();
  await expect(page).toHaveURL(/size=large/);
  await expect.poll(async () => (await table.geometry()).map((g) => Math.round(g.crop.height))).toEqual([520, 520, 520, 520]);
  expectTogether(await table.geometry(), 1);

  // One zoom for all: two steps of 1.5 from the controls.
  await table.controls.getByRole("button", { name: "Zoom in" }).click();
  await table.controls.getByRole("button", { name: "Zoom in" }).click();
  const centred = expectTogether(await table.geometry(), 2.25);
  expect(centred.x).toBeCloseTo(0.5 - 0.5 / 2.25, 3);

  // A drag over one crop moves the window of every crop by the same share.
  const first = (await table.geometry())[0].crop;
  await page.mouse.move(first.x + first.width / 2, first.y + first.height / 2);
  await page.mouse.down();
  await page.mouse.move(first.x + first.width / 2 + 60, first.y + first.height / 2 + 40, { steps: 5 });
  await page.mouse.up();
  const panned = expectTogether(await table.geometry(), 2.25);
  expect(panned.x).toBeLessThan(centred.x);
  expect(panned.y).toBeLessThan(centred.y);

  // The keyboard on a crop: 0 shows the whole crops, + zooms, arrows move, for all of them.
  const crop = page.getByTestId("crop").nth(2);
  await crop.focus();
  await page.keyboard.press("0");
  expectTogether(await table.geometry(), 1);
  await page.keyboard.press("+");
  await page.keyboard.press("ArrowRight");
  const moved = expectTogether(await table.geometry(), 1.5);
  expect(moved.x).toBeGreaterThan(0.5 - 0.5 / 1.5);
  await table.controls.getByRole("button", { name: "Reset" }).click();
  expectTogether(await table.geometry(), 1);

  // Reorder by dragging the first place's handle onto the third (small crops, so both are on screen): the link follows.
  await table.controls.getByText("Small").click();
  await expect.poll(async () => (await table.geometry()).map((g) => Math.round(g.crop.height))).toEqual([240, 240, 240, 240]);
  await table.drag(labels.pegbox, labels.rose);
  await expect.poll(() => table.regionIdsInUrl()).toEqual([ids.fingerboard, ids.rose, ids.pegbox, ids.hand]);
  expect(await table.order()).toEqual([labels.fingerboard, labels.rose, labels.pegbox, labels.hand]);
  await expect(page).toHaveURL(/size=small/);

  // And by keyboard: the Move buttons keep the focus, so a second press moves the same region again.
  const right = page.getByRole("button", { name: `Move “${labels.fingerboard}” right` });
  await right.focus();
  await page.keyboard.press("Enter");
  await expect.poll(() => table.regionIdsInUrl()).toEqual([ids.rose, ids.fingerboard, ids.pegbox, ids.hand]);
  await expect(right).toBeFocused();
  await page.keyboard.press("Enter");
  await expect.poll(() => table.regionIdsInUrl()).toEqual([ids.rose, ids.pegbox, ids.fingerboard, ids.hand]);
  await page.getByRole("button", { name: `Move “${labels.hand}” left` }).click();
  await expect.poll(() => table.regionIdsInUrl()).toEqual([ids.rose, ids.pegbox, ids.hand, ids.fingerboard]);

  // Remove one.
  await page.getByRole("button", { name: `Remove “${labels.pegbox}” from the table` }).click();
  await expect(table.items).toHaveCount(3);
  await expect.poll(() => table.regionIdsInUrl()).toEqual([ids.rose, ids.hand, ids.fingerboard]);

  // The link reopens the same table.
  const link = page.url();
  await page.reload();
  expect(page.url()).toBe(link);
  await expect(table.items).toHaveCount(3);
  expect(await table.order()).toEqual([labels.rose, labels.hand, labels.fingerboard]);

  // Print: no controls, captions under the crops, no page break inside a place.
  await page.emulateMedia({ media: "print" });
  await expect(table.controls).toBeHidden();
  await expect(page.getByRole("button", { name: /Move .* right/ }).first()).toBeHidden();
  await expect(page.getByRole("button", { name: /Remove/ }).first()).toBeHidden();
  await expect(page.getByRole("navigation", { name: "Main" })).toBeHidden();
  for (const item of await table.items.all()) {
    await expect(item.getByTestId("crop")).toBeVisible();
    await expect(item.getByTestId("review-state")).toHaveText("Vetted");
    const [cropBox, captionBox] = [await item.getByTestId("crop").boundingBox(), await item.locator("figcaption").boundingBox()];
    expect(captionBox!.y).toBeGreaterThanOrEqual(cropBox!.y + cropBox!.height - 1);
    expect(await item.evaluate((e) => getComputedStyle(e).breakInside)).toBe("avoid");
  }
});

test("copies the table's link", async ({ page, context }) => {
  await context.grantPermissions(["clipboard-read", "clipboard-write"]);
  const table = new LightTablePage(page);
  await table.open(lightTableHref([ids.hand, ids.rose]), 2);
  await table.controls.getByRole("button", { name: "Copy link" }).click();
  await expect(table.controls.getByText("Link copied.")).toBeVisible();
  expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(page.url());
});

test("keeps the table as the regions gathered in this browser, and opens them again from an empty table", async ({ page }) => {
  const table = new LightTablePage(page);
  await table.open(lightTableHref([ids.rose, ids.hand]), 2);
  await table.controls.getByRole("button", { name: "Keep as my selection" }).click();
  await expect(table.controls.getByRole("button", { name: "This is your selection" })).toBeDisabled();
  await page.goto("/light-table");
  await expect(page.getByText("No regions on the table yet")).toBeVisible();
  await page.getByRole("link", { name: "Lay out your gathered regions (2)" }).click();
  await expect(table.items).toHaveCount(2);
  expect(table.regionIdsInUrl()).toEqual([ids.rose, ids.hand]);
});

test("a reader saves the table as a dossier in its order; proposed work is left out and named", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.reader);
  await expectSignedIn(page, "reader");
  const table = new LightTablePage(page);
  await table.open(lightTableHref([ids.hand, pending.id, ids.rose, ids.pegbox], { proposed: true }), 4);
  await expect(table.item(pending.label).getByTestId("review-state")).toHaveText("Proposed, not yet reviewed");

  const title = unique("Right hands compared");
  await table.controls.getByRole("button", { name: "Save as dossier" }).click();
  const form = page.getByRole("form", { name: "Save the table as a dossier" });
  await form.getByRole("button", { name: "Save" }).click();
  await expect(form.getByText("Give the dossier a title.")).toBeVisible();
  await form.getByLabel("Title of the dossier").fill(title);
  await form.getByRole("button", { name: "Save" }).click();
  await expect(form.getByText("Saved with 3 regions.")).toBeVisible();
  await expect(form.getByText(`“${pending.label}”`)).toBeVisible();
  await form.getByRole("link", { name: `Open “${title}”` }).click();
  await expect(page).toHaveURL(/\/dossiers\/\d+$/);
  const dossierId = Number(new URL(page.url()).pathname.split("/").pop());
  const res = await page.request.get(`/api/dossiers/${dossierId}`);
  const { dossier } = (await res.json()) as { dossier: { title: string; items: { kind: string; region?: { id: number } }[] } };
  expect(dossier.title).toBe(title);
  expect(dossier.items.map((i) => i.region?.id)).toEqual([ids.hand, ids.rose, ids.pegbox]);
});

test("a visitor's rearranged table keeps the regions it cannot show at the end of the link, until asked to leave them out", async ({ page }) => {
  const table = new LightTablePage(page);
  await table.open(lightTableHref([ids.rose, pending.id, ids.hand]), 2);
  await expect(page.getByText("1 region is not shown: it does not exist or you may not see it.")).toBeVisible();
  await page.getByRole("button", { name: `Move “${labels.hand}” left` }).click();
  await expect.poll(() => table.regionIdsInUrl()).toEqual([ids.hand, ids.rose, pending.id]);
  await page.getByRole("link", { name: "Leave them out of the link" }).click();
  await expect.poll(() => table.regionIdsInUrl()).toEqual([ids.hand, ids.rose]);
  await expect(page.getByText(/not shown/)).toHaveCount(0);
});
