import { readFile, rm, writeFile } from "node:fs/promises";
import path from "node:path";
import { expect, test, type Page } from "@playwright/test";
import sharp from "sharp";
import { call, DEMO, signedIn, unique } from "../support/app";
import { fixtureDir, writeNoisePng, writePhotographs, writeRenamedPdf } from "../fixtures/photographs";
import { ImageViewerPage, SourceImagesSection } from "./pages/images-page";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

// Processing runs in the app's background worker; five 2000×1500 photographs take a few seconds here.
const PROCESSING = 60_000;
const SHOTS = ".data/shots";

let dir: string;
let sourceId: number;
let sourceTitle: string;

test.beforeAll(async () => {
  dir = await fixtureDir();
  const jar = await signedIn(DEMO.contributor);
  sourceTitle = unique("A lutenist by a window");
  const res = await call("/api/sources", { jar, json: { title: sourceTitle, objectType: "painting" } });
  expect(res.status).toBe(200);
  sourceId = ((await res.json()) as { source: { id: number } }).source.id;
});

test.afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

async function signInAsContributor(page: Page) {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.contributor);
  await expectSignedIn(page, "contributor");
}

type Listed = { id: number; originalFilename: string; state: string };
async function listed(page: Page): Promise<Listed[]> {
  const res = await page.request.get(`/api/sources/${sourceId}/images`);
  expect(res.status()).toBe(200);
  return ((await res.json()) as { images: Listed[] }).images;
}

test("a contributor drops five photographs, watches them become ready, and studies one in the viewer", async ({ page }) => {
  test.setTimeout(PROCESSING + 60_000);
  const files = await writePhotographs(dir, 5, "window");
  await signInAsContributor(page);
  const section = new SourceImagesSection(page);
  await section.open(sourceId);
  await page.getByLabel("Caption").fill("The whole panel");
  await page.getByLabel("Photo credit").fill("Photo: the museum's studio");
  await page.getByLabel("Rights of the photograph").selectOption({ label: "CC BY 4.0" });
  await section.drop(files);

  for (const name of ["window-1.jpg", "window-2.png", "window-3.jpg", "window-4.png", "window-5.jpg"]) {
    await expect(section.row(name)).toBeVisible();
  }
  await page.screenshot({ path: `${SHOTS}/images-uploading.png`, fullPage: true });
  for (const name of ["window-1.jpg", "window-2.png", "window-3.jpg", "window-4.png", "window-5.jpg"]) {
    await expect(section.state(name)).toHaveText("ready · 2,000 × 1,500 px", { timeout: PROCESSING });
    await expect(section.row(name).getByRole("link", { name: `Open ${name} in the viewer` })).toBeVisible();
  }
  await expect(page.getByText("5 of 5 ready")).toBeVisible();
  await expect(section.readyThumbnails).toHaveCount(5);
  // Five different pictures: none is taken for another photograph of the same work.
  await expect(page.getByTestId("near-duplicate")).toHaveCount(0);
  await page.screenshot({ path: `${SHOTS}/images-ready.png`, fullPage: true });

  // The viewer: tiles arrive from the IIIF service, and the readouts follow every way of steering.
  const tile = page.waitForResponse((r) => /\/iiif\/3\/\d+\/[^/]+\/[^/]+\/0\/default\.jpg$/.test(new URL(r.url()).pathname) && r.status() === 200);
  await section.readyThumbnails.first().getByRole("link", { name: /open in the viewer$/ }).click();
  await expect(page.getByRole("heading", { level: 1, name: sourceTitle })).toBeVisible();
  const viewer = new ImageViewerPage(page);
  await viewer.waitUntilOpen();
  await tile;
  await expect(page.getByRole("complementary", { name: "About this photograph" })).toContainText("2,000 × 1,500 px");
  await expect(page.getByRole("complementary", { name: "About this photograph" })).toContainText("CC BY 4.0");
  await expect(page.getByRole("navigation", { name: "Other photographs of this source" }).getByRole("link")).toHaveCount(5);
  const home = await viewer.settledZoom();

  await viewer.button("Zoom in").click();
  const zoomedIn = await viewer.settledZoom();
  expect(zoomedIn).toBeGreaterThan(home * 1.5);

  await viewer.canvas.focus();
  await page.keyboard.press("-");
  const keyedOut = await viewer.settledZoom();
  expect(keyedOut).toBeLessThan(zoomedIn);

  const box = (await viewer.canvas.boundingBox())!;
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
  await page.mouse.wheel(0, -400);
  expect(await viewer.settledZoom()).toBeGreaterThan(keyedOut);

  await viewer.button("Rotate right").click();
  await expect(viewer.rotation()).toHaveText("90°");
  await viewer.button("Rotate left").click();
  await viewer.button("Rotate left").click();
  await expect(viewer.rotation()).toHaveText("270°");
  await page.screenshot({ path: `${SHOTS}/viewer-rotated.png`, fullPage: true });

  await viewer.button("Reset view").click();
  await expect(viewer.rotation()).toHaveText("0°");
  expect(Math.abs((await viewer.settledZoom()) - home)).toBeLessThan(home * 0.02);
  await page.screenshot({ path: `${SHOTS}/viewer-home.png`, fullPage: true });

  await page.getByRole("link", { name: `← Back to “${sourceTitle}”` }).click();
  await expect(section.readyThumbnails).toHaveCount(5);
});

test("a PDF renamed photo.jpg is refused as a PDF, and nothing of it stays", async ({ page }) => {
  const pdf = await writeRenamedPdf(dir, "photo.jpg");
  await signInAsContributor(page);
  const section = new SourceImagesSection(page);
  await section.open(sourceId);
  await section.choose([pdf]);
  await expect(section.state("photo.jpg")).toContainText("refused: “photo.jpg” is a PDF file (application/pdf), whatever its name says");
  await expect(section.row("photo.jpg").getByRole("button", { name: /Retry/ })).toHaveCount(0);
  await page.screenshot({ path: `${SHOTS}/images-refused-pdf.png`, fullPage: true });
  expect((await listed(page)).filter((i) => i.originalFilename === "photo.jpg")).toEqual([]);
});

test("the same file uploaded twice is refused the second time with a link to the first; a re-encoded copy is flagged", async ({ page }) => {
  test.setTimeout(2 * PROCESSING + 30_000);
  const [twice] = await writePhotographs(dir, 1, "twice");
  await signInAsContributor(page);
  const section = new SourceImagesSection(page);
  await section.open(sourceId);
  await section.choose([twice]);
  await expect(section.state("twice-1.jpg")).toHaveText(/waiting for processing|processing|ready/, { timeout: PROCESSING });
  const first = (await listed(page)).find((i) => i.originalFilename === "twice-1.jpg")!;

  await section.choose([twice]);
  const refusal = section.state("twice-1.jpg");
  await expect(refusal).toContainText("refused: This exact file is already in the archive");
  await expect(refusal).toContainText(sourceTitle);
  await page.screenshot({ path: `${SHOTS}/images-refused-duplicate.png`, fullPage: true });
  expect((await listed(page)).filter((i) => i.originalFilename === "twice-1.jpg")).toHaveLength(1);
  await expect(section.row("twice-1.jpg").getByRole("link", { name: "See the image already in the archive" })).toHaveAttribute(
    "href",
    `/sources/${sourceId}/images/${first.id}`,
  );

  // The same picture in other bytes is let in, with a warning that names the first.
  const copy = path.join(dir, "twice-copy.png");
  await writeFile(copy, await sharp(await readFile(twice)).png().toBuffer());
  await section.choose([copy]);
  await expect(section.state("twice-copy.png")).toHaveText(/^ready/, { timeout: PROCESSING });
  await expect(section.row("twice-copy.png").getByTestId("near-duplicate")).toContainText(`This may be another photograph of image ${first.id}`);
  await page.screenshot({ path: `${SHOTS}/images-near-duplicate.png`, fullPage: true });
});

test("cancelling a large upload midway leaves no image behind; retried, it goes up in parts", async ({ page }) => {
  test.setTimeout(PROCESSING + 60_000);
  const big = await writeNoisePng(dir, 30, "big-scan.png");
  await signInAsContributor(page);
  // Hold the bytes on their way to storage, as a slow line would, so there is time to cancel.
  const storage = (url: URL) => url.port === new URL(process.env.S3_ENDPOINT ?? "http://127.0.0.1:4579").port;
  await page.route(storage, async (route) => {
    if (route.request().method() === "PUT") await new Promise((r) => setTimeout(r, 20_000));
    await route.continue().catch(() => undefined);
  });
  const section = new SourceImagesSection(page);
  await section.open(sourceId);
  const started = page.waitForResponse((r) => r.url().endsWith(`/api/sources/${sourceId}/images`) && r.request().method() === "POST");
  await section.choose([big]);
  const { image } = (await (await started).json()) as { image: { id: number }; upload: { kind: string } };
  await expect(section.state("big-scan.png")).toHaveText(/uploading \d+ %/);
  await expect(page.getByRole("progressbar", { name: "big-scan.png" })).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/images-big-uploading.png`, fullPage: true });

  const withdrawn = page.waitForResponse((r) => r.url().endsWith(`/api/images/${image.id}/upload`) && r.request().method() === "DELETE");
  await section.row("big-scan.png").getByRole("button", { name: "Cancel upload of big-scan.png" }).click();
  expect((await withdrawn).status()).toBe(200);
  await expect(section.state("big-scan.png")).toHaveText("cancelled; nothing was kept");
  expect((await listed(page)).map((i) => i.id)).not.toContain(image.id);
  expect((await page.request.get(`/api/images/${image.id}`)).status()).toBe(404);

  // At full speed again: the retry sends the file in parts (their ETags read through CORS) and it is processed.
  await page.unroute(storage);
  const restarted = page.waitForResponse((r) => r.url().endsWith(`/api/sources/${sourceId}/images`) && r.request().method() === "POST");
  await section.row("big-scan.png").getByRole("button", { name: "Retry upload of big-scan.png" }).click();
  expect(((await (await restarted).json()) as { upload: { kind: string } }).upload.kind).toBe("multipart");
  await expect(section.state("big-scan.png")).toHaveText(/^ready · /, { timeout: PROCESSING });
});
