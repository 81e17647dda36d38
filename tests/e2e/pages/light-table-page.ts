import { expect, type Locator, type Page } from "@playwright/test";

export type Geometry = { crop: { x: number; y: number; width: number; height: number }; picture: { x: number; y: number; width: number; height: number } };

/** The light table: its controls, its places (one per region) and each crop's geometry on screen. */
export class LightTablePage {
  constructor(readonly page: Page) {}

  async open(href: string, count: number) {
    await this.page.goto(href);
    await expect(this.page.getByRole("heading", { name: "Light table", level: 1 })).toBeVisible();
    await expect(this.items).toHaveCount(count);
    // Every crop has arrived from the IIIF service and been decoded.
    await expect.poll(() => this.page.locator("[data-testid=crop] img").evaluateAll((imgs) => imgs.every((i) => (i as HTMLImageElement).complete && (i as HTMLImageElement).naturalWidth > 0))).toBe(true);
  }

  get controls(): Locator {
    return this.page.getByRole("toolbar", { name: "Light table controls" });
  }
  get items(): Locator {
    return this.page.getByRole("list", { name: "Regions on the table" }).getByRole("listitem").filter({ has: this.page.getByTestId("crop") });
  }
  item(label: string): Locator {
    return this.items.filter({ has: this.page.getByRole("application", { name: new RegExp(`Crop of “${label}”`) }) });
  }

  /**
   * Drags one place by its handle onto another with the mouse, in steps: the browser's own drag and
   * drop (a single jump, as locator.dragTo makes, did not always start a drag here).
   */
  async drag(label: string, onto: string) {
    const from = (await this.item(label).getByTestId("drag-handle").boundingBox())!;
    const to = (await this.item(onto).getByTestId("crop").boundingBox())!;
    await this.page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await this.page.mouse.down();
    await this.page.mouse.move(to.x + to.width / 2, to.y + to.height / 2, { steps: 8 });
    await this.page.mouse.up();
  }

  /** The labels in the order on screen. */
  async order(): Promise<string[]> {
    const names = await this.page.getByTestId("crop").evaluateAll((els) => els.map((e) => e.getAttribute("aria-label") ?? ""));
    return names.map((n) => /“(.+?)”/.exec(n)?.[1] ?? n);
  }

  /** Each crop's frame and its (transformed) picture, in screen pixels. */
  async geometry(): Promise<Geometry[]> {
    return this.page.getByTestId("crop").evaluateAll((els) =>
      els.map((e) => {
        const box = (r: DOMRect) => ({ x: r.x, y: r.y, width: r.width, height: r.height });
        return { crop: box(e.getBoundingClientRect()), picture: box(e.querySelector("[data-testid=crop-picture]")!.getBoundingClientRect()) };
      }),
    );
  }

  regionIdsInUrl(): number[] {
    return (new URL(this.page.url()).searchParams.get("r") ?? "").split(",").filter(Boolean).map(Number);
  }
}
