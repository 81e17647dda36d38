// Marking evidence on a photograph with the pointer: a rectangle by a real press-drag-release, a
// polygon by clicks, both stored in full-image pixel coordinates whatever the zoom they were drawn at.
// The expected pixels are worked out from the canvas box alone (the photograph fits the canvas at
// "home", centred), not from the viewer's own conversion, so a wrong conversion would show.
import { rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect as baseExpect, test } from "@playwright/test";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";
import { fixtureDir, writePhotographs } from "../fixtures/photographs";
import { SourceImagesSection } from "./pages/images-page";
import { RegionsPage, saveSession, type ListedShape, type Point } from "./pages/regions-page";

const PROCESSING = 60_000;
const IMAGE = { width: 2000, height: 1500 };
/** Screen pixels are rounded on the way in: at home one is about two image pixels here. */
const TOLERANCE = 4;

// The contributor signs in once, through the sign-in page; every test starts with that session.
const SESSION = path.join(tmpdir(), `cordarium-regions-contributor-${process.pid}.json`);
// Tall enough for the whole canvas (70 % of the window's height, below the page header) to be on screen.
test.use({ viewport: { width: 1280, height: 1400 }, storageState: SESSION });
// This machine is shared and slow at times: drawing tests wait for tiles and saves, not for a clock.
test.describe.configure({ timeout: 120_000 });
// Each step waits for a save or a load: allow for a busy machine.
const expect = baseExpect.configure({ timeout: 20_000 });

let dir: string;
let jar: Jar;
let sourceId: number;
let imageId: number;

test.beforeAll(async ({ browser }) => {
  test.setTimeout(PROCESSING + 60_000);
  dir = await fixtureDir();
  jar = await signedIn(DEMO.contributor);
  const res = await call("/api/sources", { jar, json: { title: unique("A cittern player under a tree"), objectType: "painting" } });
  expect(res.status).toBe(200);
  sourceId = ((await res.json()) as { source: { id: number } }).source.id;
  // Uploaded through the page, as a contributor does (the same steps as the images test).
  await saveSession(browser, DEMO.contributor, "contributor", SESSION);
  const page = await browser.newPage({ storageState: SESSION });
  const section = new SourceImagesSection(page);
  await section.open(sourceId);
  await section.drop(await writePhotographs(dir, 1, "cittern"));
  await expect(section.state("cittern-1.jpg")).toHaveText("ready · 2,000 × 1,500 px", { timeout: PROCESSING });
  const listed = (await (await page.request.get(`/api/sources/${sourceId}/images`)).json()) as { images: { id: number }[] };
  imageId = listed.images[0].id;
  await page.close();
});

test.afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
  await rm(SESSION, { force: true });
});

function expectNear(listed: ListedShape, want: { x: number; y: number; w: number; h: number }) {
  for (const k of ["x", "y", "w", "h"] as const) expect(Math.abs(listed[k] - want[k]), `${k}: ${listed[k]} vs ${want[k]}`).toBeLessThanOrEqual(TOLERANCE);
}

test("a real pointer drag with the Rectangle tool draws a region in image pixels, at home and zoomed in", async ({ page }) => {
  const regions = new RegionsPage(page, IMAGE);
  await regions.open(sourceId, imageId);
  await expect(regions.tool("Select/move")).toHaveAttribute("aria-pressed", "true");

  await regions.tool("Rectangle").click();
  await expect(regions.tool("Rectangle")).toHaveAttribute("aria-pressed", "true");
  const from: Point = [400, 300];
  const to: Point = [1000, 800];
  await regions.drag(await regions.toScreen(from), await regions.toScreen(to));

  await expect(regions.items).toHaveCount(1);
  expectNear(await regions.listedShape(regions.item(0)), { x: 400, y: 300, w: 600, h: 500 });
  // Drawing hands back to Select/move, with the new region selected.
  await expect(regions.tool("Select/move")).toHaveAttribute("aria-pressed", "true");
  await expect(regions.item(0).getByRole("button")).toHaveAttribute("aria-pressed", "true");
  const stored = (await (await page.request.get(`/api/images/${imageId}/regions`)).json()) as { regions: { shape: ListedShape }[] };
  expect(stored.regions).toHaveLength(1);
  expect(stored.regions[0].shape.kind).toBe("rectangle");
  expectNear(stored.regions[0].shape, { x: 400, y: 300, w: 600, h: 500 });
  await page.screenshot({ path: ".data/shots/regions-rectangle.png", fullPage: true });

  // Zoomed in twice as far (about the middle), the same drag covers half as many image pixels.
  await regions.viewer.button("Zoom in").click();
  await regions.viewer.settledZoom();
  await regions.tool("Rectangle").click();
  await regions.drag(await regions.toScreen([1100, 700], 2), await regions.toScreen([1300, 850], 2));
  await expect(regions.items).toHaveCount(2);
  const second = await regions.listedShape(regions.selectedItem);
  expectNear(second, { x: 1100, y: 700, w: 200, h: 150 });
});

test("with Select/move a drag pans the photograph and draws nothing", async ({ page }) => {
  const regions = new RegionsPage(page, IMAGE);
  await regions.open(sourceId, imageId);
  const before = await regions.items.count();
  await regions.viewer.button("Zoom in").click();
  const zoom = await regions.viewer.settledZoom();
  // Drag the photograph by 200 image pixels up and to the left (at twice "home", the canvas shows about
  // the middle thousand pixels across).
  await regions.drag(await regions.toScreen([1200, 1100], 2), await regions.toScreen([1000, 900], 2));
  await regions.viewer.settledZoom();
  expect(await regions.viewer.zoomPercent()).toBe(zoom);
  await expect(regions.items).toHaveCount(before);
  // A rectangle drawn now where 900,600–1100,750 used to be covers the pixels that moved there.
  await regions.tool("Rectangle").click();
  await regions.drag(await regions.toScreen([900, 600], 2), await regions.toScreen([1100, 750], 2));
  await expect(regions.items).toHaveCount(before + 1);
  expectNear(await regions.listedShape(regions.selectedItem), { x: 1100, y: 800, w: 200, h: 150 });
});

test("clicks with the Polygon tool add corners, and a click on the first point closes the polygon", async ({ page }) => {
  const regions = new RegionsPage(page, IMAGE);
  await regions.open(sourceId, imageId);
  const before = await regions.items.count();
  await regions.tool("Polygon").click();
  const corners: Point[] = [
    [300, 900],
    [700, 850],
    [800, 1300],
    [350, 1350],
  ];
  const scrolled = () => page.evaluate(() => window.scrollY);
  const scrollBefore = await scrolled();
  for (const c of corners) await regions.clickAt(await regions.toScreen(c));
  await regions.clickAt(await regions.toScreen(corners[0]));
  await expect(regions.items).toHaveCount(before + 1);
  // The viewer takes the keyboard focus on a click without scrolling the page under the pointer.
  expect(await scrolled()).toBe(scrollBefore);
  const polygon = await regions.listedShape(regions.selectedItem);
  expect(polygon.kind).toBe("polygon");
  expect(polygon.points).toBe(4);
  expectNear(polygon, { x: 300, y: 850, w: 500, h: 500 });
});

test("a region of one's own, once selected, is reshaped by dragging a corner and moved by dragging its inside", async ({ page }) => {
  // Placed where the other tests draw nothing.
  const res = await call(`/api/images/${imageId}/regions`, { jar, json: { shape: { kind: "rectangle", x: 1400, y: 150, w: 300, h: 250 } } });
  expect(res.status).toBe(201);
  const { id } = (await res.json()) as { id: number };
  const regions = new RegionsPage(page, IMAGE);
  await regions.open(sourceId, imageId, `?region=${id}`);
  const item = regions.byId(id);
  const outline = item.getByTestId("region-shape");
  await expect(item.getByRole("button")).toHaveAttribute("aria-pressed", "true");

  // The lower right corner, pulled 100 pixels further out each way.
  await regions.drag(await regions.toScreen([1700, 400]), await regions.toScreen([1800, 500]));
  await expect(outline).not.toHaveText("rectangle at 1400, 150, 300 × 250 px");
  await regions.expectSaved();
  expectNear(await regions.listedShape(item), { x: 1400, y: 150, w: 400, h: 350 });

  // The whole shape, moved 100 pixels left and down.
  const reshaped = (await outline.textContent())!;
  await regions.drag(await regions.toScreen([1600, 300]), await regions.toScreen([1500, 400]));
  await expect(outline).not.toHaveText(reshaped);
  await regions.expectSaved();
  expectNear(await regions.listedShape(item), { x: 1300, y: 250, w: 400, h: 350 });
  const stored = (await (await call(`/api/regions/${id}`, { jar })).json()) as { shape: ListedShape; version: number };
  expectNear(stored.shape, { x: 1300, y: 250, w: 400, h: 350 });
});
