import { expect, type Page } from "@playwright/test";

export const DEMO_PASSWORD = "cordarium-demo";

export class SignInPage {
  constructor(private readonly page: Page) {}

  async open() {
    await this.page.goto("/sign-in");
    await expect(this.page.getByRole("heading", { name: "Sign in to Cordarium" })).toBeVisible();
  }

  private get passwordForm() {
    return this.page.locator("form", { has: this.page.getByRole("heading", { name: "With your password" }) });
  }

  async withPassword(email: string, password = DEMO_PASSWORD) {
    // The credentials form's fields are named email and password.
    await this.passwordForm.locator('input[name="email"]').fill(email);
    await this.passwordForm.locator('input[name="password"]').fill(password);
    await this.passwordForm.getByRole("button", { name: "Sign in" }).click();
  }

  async askForLink(email: string) {
    const form = this.page.locator("form", { has: this.page.getByRole("heading", { name: "With a link by e-mail" }) });
    await form.getByLabel("E-mail address").fill(email);
    await form.getByRole("button", { name: "Send me a sign-in link" }).click();
  }
}

/** The account menu in the header shows the signed-in person's name and role. */
export async function expectSignedIn(page: Page, role: string) {
  await expect(page.locator("header summary")).toContainText(role, { timeout: 10_000 });
}

export async function signOut(page: Page) {
  await page.locator("header summary").click();
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("banner").getByRole("link", { name: "Sign in" })).toBeVisible();
}
