import { expect, type Browser, type Locator, type Page } from "@playwright/test";
import { ImageViewerPage } from "./images-page";
import { expectSignedIn, SignInPage } from "./sign-in-page";

/** Signs in once through the sign-in page and keeps the session in `file`, for test.use({ storageState }). */
export async function saveSession(browser: Browser, email: string, role: string, file: string) {
  const page = await browser.newPage({ storageState: undefined });
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(email);
  await expectSignedIn(page, role);
  await page.context().storageState({ path: file });
  await page.close();
}

export type Point = [number, number];
export type ListedShape = { kind: "rectangle" | "polygon"; x: number; y: number; w: number; h: number; points?: number };

/** The evidence viewer of one photograph: the drawing tools, the canvas and the regions panel. */
export class RegionsPage {
  readonly viewer: ImageViewerPage;

  constructor(
    readonly page: Page,
    /** The photograph's size in pixels (OpenSeadragon fits it to the canvas at "home"). */
    private readonly image: { width: number; height: number },
  ) {
    this.viewer = new ImageViewerPage(page);
  }

  async open(sourceId: number, imageId: number, query = "") {
    await this.page.goto(`/sources/${sourceId}/images/${imageId}${query}`);
    await this.viewer.waitUntilOpen();
    await this.viewer.settledZoom();
    await expect(this.page.getByText("Loading the regions…")).toHaveCount(0);
  }

  tool(name: "Select/move" | "Rectangle" | "Polygon"): Locator {
    return this.page.getByRole("toolbar", { name: "Drawing tools" }).getByRole("button", { name: new RegExp(`^${name.replace("/", "\\/")}`) });
  }

  get items(): Locator {
    return this.page.getByRole("list", { name: "Regions" }).getByTestId("region-item");
  }

  get editor(): Locator {
    return this.page.getByTestId("region-editor");
  }

  get saveStatus(): Locator {
    return this.page.getByTestId("save-status");
  }

  /**
   * Where an image pixel is on the screen, worked out from the canvas box alone: at zoom `factor`
   * times "home" (where the whole photograph fits the canvas, centred) and unrotated, the middle of
   * the photograph is in the middle of the canvas and one image pixel is scale × factor screen pixels.
   */
  async toScreen([x, y]: Point, factor = 1): Promise<Point> {
    const box = (await this.viewer.canvas.boundingBox())!;
    const scale = Math.min(box.width / this.image.width, box.height / this.image.height) * factor;
    return [box.x + box.width / 2 + (x - this.image.width / 2) * scale, box.y + box.height / 2 + (y - this.image.height / 2) * scale];
  }

  /** A real pointer drag: press, move in steps, release. */
  async drag(from: Point, to: Point) {
    await this.page.mouse.move(from[0], from[1]);
    await this.page.mouse.down();
    await this.page.mouse.move(to[0], to[1], { steps: 12 });
    await this.page.mouse.up();
  }

  /**
   * One click as a person makes it: the pointer arrives, the page draws what hovering there shows (on
   * the first corner of a polygon, the handle that closes it), then the button goes down and up. The
   * drawing layer ignores a click whose press and release land on different elements, which a press at
   * the very moment of arrival can do. Playwright sends each click with a click count of one: two in a
   * row are not a double-click.
   */
  async clickAt([x, y]: Point) {
    await this.page.mouse.move(x, y);
    await this.page.evaluate(() => new Promise<void>((done) => requestAnimationFrame(() => requestAnimationFrame(() => done()))));
    await this.page.mouse.down();
    await this.page.mouse.up();
  }

  /** The shape a list item describes: "rectangle at 120, 340, 200 × 150 px" or "polygon of 4 points within …". */
  async listedShape(item: Locator): Promise<ListedShape> {
    const text = (await item.getByTestId("region-shape").textContent()) ?? "";
    const m = /^(rectangle) at|^polygon of (\d+) points within/.exec(text);
    const [x, y, w, h] = (/(\d+), (\d+), (\d+) × (\d+) px/.exec(text) ?? []).slice(1).map(Number);
    expect(m, `a shape description, got “${text}”`).not.toBeNull();
    return { kind: m![1] ? "rectangle" : "polygon", x, y, w, h, points: m![2] ? Number(m![2]) : undefined };
  }

  item(index: number): Locator {
    return this.items.nth(index);
  }

  byId(id: number): Locator {
    return this.page.locator(`[data-testid="region-item"][data-region-id="${id}"]`);
  }

  /** The list item of the selected region. */
  get selectedItem(): Locator {
    return this.items.filter({ has: this.page.getByRole("button", { pressed: true }) });
  }

  get label(): Locator {
    return this.editor.getByLabel("Label", { exact: true });
  }

  /** Puts an observation together in the editor's "Add an observation" box and adds it. */
  async addObservation(aspect: string, value: string, confidence: "certain" | "probable" | "possible") {
    const box = this.editor.getByRole("group", { name: "Add an observation" });
    await box.getByLabel("Aspect").selectOption({ label: aspect });
    const control = box.getByLabel(/^(Value|Number|What you see)$/);
    if ((await control.evaluate((el) => el.tagName)) === "SELECT") await control.selectOption({ label: value });
    else await control.fill(value);
    await box.getByRole("radio", { name: confidence }).check();
    await box.getByRole("button", { name: "Add observation" }).click();
  }

  /** The editor's row of a recorded observation, by its aspect. */
  observationRow(aspect: string): Locator {
    return this.editor.getByTestId("observation-row").filter({ hasText: aspect });
  }

  async expectSaved() {
    await expect(this.saveStatus).toHaveText("saved", { timeout: 15_000 });
  }
}
