import { expect, type Page } from "@playwright/test";

/** The review desk: the filters and the list of proposed regions. */
export class ReviewDesk {
  constructor(private readonly page: Page) {}

  async openFromHeader() {
    await this.page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Review desk" }).click();
    await expect(this.page.getByRole("heading", { level: 1, name: "Review desk" })).toBeVisible();
  }

  async filterBySource(words: string) {
    await this.page.getByLabel("Source (title or number)").fill(words);
    await this.page.getByRole("button", { name: "Filter" }).click();
    await expect(this.page).toHaveURL(/[?&]source=/);
  }

  get entries() {
    return this.page.getByRole("list", { name: "Proposed regions, longest waiting first" }).getByRole("listitem").filter({ has: this.page.getByRole("heading") });
  }

  entry(regionId: number) {
    return this.entries.filter({ has: this.page.getByRole("heading", { name: new RegExp(`^Region ${regionId}\\b`) }) });
  }

  async open(regionId: number) {
    await this.entry(regionId).getByRole("link", { name: new RegExp(`^Region ${regionId}\\b`) }).click();
    await expect(this.page).toHaveURL(new RegExp(`/review/${regionId}(\\?|$)`));
  }
}

/** One region under review: what changed, the decision, the discussion. */
export class ReviewRegion {
  constructor(private readonly page: Page) {}

  async expectRegion(regionId: number) {
    await expect(this.page).toHaveURL(new RegExp(`/review/${regionId}(\\?|$)`));
    await expect(this.page.getByText(new RegExp(`^Region ${regionId} · proposed`))).toBeVisible();
  }

  get comment() {
    return this.page.getByLabel("Comment for the author (needed to return the region)");
  }

  async returnToAuthor(comment: string) {
    await this.comment.fill(comment);
    await this.page.getByRole("button", { name: "Return to author" }).click();
  }

  async vet() {
    await this.page.getByRole("button", { name: "Vet", exact: true }).click();
  }

  async discuss(text: string) {
    await this.page.getByLabel("Add to the discussion").fill(text);
    await this.page.getByRole("button", { name: "Send the comment" }).click();
    await expect(this.page.getByRole("list", { name: "Comments and decisions" })).toContainText(text);
  }
}
