import { expect, type Locator } from "@playwright/test";

/**
 * The panel a form shows when the server refused a save because someone else saved first (409):
 * one row per field that differs, their saved value beside what was typed, and the two ways on.
 */
export class ConflictPanel {
  readonly panel: Locator;

  /** `within` is the form's surroundings; `what` the record as the heading names it ("aspect", "dossier"…). */
  constructor(within: Locator, what: string) {
    this.panel = within.getByRole("alert").filter({ hasText: `Someone else saved this ${what} while you were editing` });
  }

  async expectShown() {
    await expect(this.panel).toBeVisible();
    await expect(this.panel).toContainText("Your changes are still in the form.");
  }

  /** Exactly these fields differ, in this order. */
  async expectFields(labels: string[]) {
    await expect(this.panel.getByRole("rowheader")).toHaveText(labels);
  }

  /** One field's row: their saved value, then yours ("—" for nothing). */
  async expectRow(label: string, theirs: string, yours: string) {
    const row = this.panel.getByRole("row").filter({ has: this.panel.page().getByRole("rowheader", { name: label, exact: true }) });
    await expect(row.getByRole("cell")).toHaveText([theirs, yours]);
  }

  async loadTheirs() {
    await this.panel.getByRole("button", { name: "Load their version (discard mine)" }).click();
  }

  async saveMine() {
    await this.panel.getByRole("button", { name: "Save mine over theirs" }).click();
  }

  async expectGone() {
    await expect(this.panel).toHaveCount(0);
  }
}
