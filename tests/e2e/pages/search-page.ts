import { expect, type Page } from "@playwright/test";

/** The search page: the instant box, facets, dates, results and the charts. */
export class SearchPage {
  constructor(private readonly page: Page) {}

  async openFromHeader() {
    await this.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Search" }).click();
    await expect(this.page.getByRole("heading", { level: 1, name: "Search the evidence" })).toBeVisible();
  }

  get box() {
    return this.page.getByRole("searchbox", { name: "Search the evidence" });
  }

  get results() {
    return this.page.getByTestId("search-result");
  }

  /** Region ids shown, sorted. */
  async regionIds(): Promise<number[]> {
    return (await this.results.evaluateAll((els) => els.map((e) => Number(e.getAttribute("data-region"))))).sort((a, b) => a - b);
  }

  async expectRegions(ids: number[]) {
    await expect.poll(() => this.regionIds(), { timeout: 15_000 }).toEqual([...ids].sort((a, b) => a - b));
  }

  facet(group: string, value: string) {
    return this.page.getByRole("navigation", { name: "Narrow the results" }).getByRole("checkbox", { name: new RegExp(`^${value}\\b`) }).and(this.page.locator(`[data-facet="${group}"]`));
  }

  async toggleFacet(group: string, value: string, param: RegExp) {
    await this.facet(group, value).click();
    await expect(this.page).toHaveURL(param);
  }

  async setDates(from: string, to: string) {
    await this.page.getByRole("textbox", { name: "From year" }).fill(from);
    await this.page.getByRole("textbox", { name: "To year" }).fill(to);
    await this.page.getByRole("button", { name: "Apply dates" }).click();
    await expect(this.page).toHaveURL(new RegExp(`from=${from}.*to=${to}|to=${to}.*from=${from}`));
  }

  /** Chooses a gazetteer place by keyboard, as a person would: type, arrow down to it, Enter. */
  async chooseNearPlace(typed: string, option: RegExp) {
    const box = this.page.getByRole("combobox", { name: "Near the place" });
    await box.pressSequentially(typed, { delay: 30 });
    await expect(this.page.getByRole("option", { name: option })).toBeVisible();
    for (let i = 0; i < 10; i++) {
      await box.press("ArrowDown");
      if (await this.page.getByRole("option", { name: option, selected: true }).isVisible()) break;
    }
    await box.press("Enter");
    await expect(box).toHaveValue(typed);
  }

  async applyDistance(km: number) {
    await this.page.getByRole("combobox", { name: "Within", exact: true }).selectOption(String(km));
    await this.page.getByRole("button", { name: "Apply distance" }).click();
    await expect(this.page).toHaveURL(new RegExp(`near=\\d+&km=${km}`));
  }

  get nearChip() {
    return this.page.getByTestId("near-chip");
  }

  country(name: string) {
    return this.page.getByRole("link", { name: new RegExp(`^${name}: `) });
  }

  /** Clicks the country's shape on the map where no place circle covers it, as a person would. */
  async clickCountry(name: string) {
    const link = this.country(name);
    await expect(link).toBeVisible();
    await link.scrollIntoViewIfNeeded();
    const point = await link.evaluate((a) => {
      const shape = a.querySelector("path") as SVGPathElement;
      const box = shape.getBoundingClientRect();
      const matrix = shape.getScreenCTM()!.inverse();
      for (let i = 1; i < 40; i++) {
        for (let j = 1; j < 40; j++) {
          const x = box.left + (box.width * i) / 40;
          const y = box.top + (box.height * j) / 40;
          const local = new DOMPoint(x, y).matrixTransform(matrix);
          if (shape.isPointInFill(local) && document.elementFromPoint(x, y) === shape) return { x, y };
        }
      }
      return null;
    });
    if (!point) throw new Error(`no free point on ${name}`);
    await this.page.mouse.click(point.x, point.y);
  }
}
