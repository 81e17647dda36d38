import { expect, test } from "@playwright/test";
import { followMailedLink } from "./pages/mailbox-page";
import { expectSignedIn, SignInPage, signOut } from "./pages/sign-in-page";

const ACCOUNTS = [
  ["admin@cordarium.test", "admin"],
  ["editor@cordarium.test", "editor"],
  ["contributor@cordarium.test", "contributor"],
  ["reader@cordarium.test", "reader"],
] as const;

for (const [email, role] of ACCOUNTS) {
  test(`the demo ${role} signs in with the password form and signs out`, async ({ page }) => {
    const signIn = new SignInPage(page);
    await signIn.open();
    await signIn.withPassword(email);
    await expectSignedIn(page, role);
    await expect(page.getByRole("link", { name: "Users" })).toHaveCount(role === "admin" ? 1 : 0);
    await signOut(page);
  });
}

test("a wrong password is refused with a message and the form keeps the address", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword("editor@cordarium.test", "wrong password");
  await expect(page.getByRole("main").getByRole("alert")).toContainText("do not match an account");
  await expect(page.locator('form input[name="email"]').first()).toHaveValue("editor@cordarium.test");
});

test("the demo reader signs in by a link from the mailbox", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.askForLink("reader@cordarium.test");
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  await followMailedLink(page, "reader@cordarium.test", /sign-in link/, "/api/auth/callback/email");
  await expectSignedIn(page, "reader");
});

test("a forgotten password can be reset from the e-mailed link", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByRole("link", { name: "Forgotten your password?" }).click();
  await expect(page.getByRole("heading", { name: "Forgotten password" })).toBeVisible();
  await page.getByLabel("E-mail address").fill("contributor@cordarium.test");
  await page.getByRole("button", { name: "Send me a reset link" }).click();
  await expect(page.getByRole("main").getByRole("status")).toContainText("is on its way");
  await followMailedLink(page, "contributor@cordarium.test", /Reset your Cordarium password/, "/reset-password/");
  // Keep the demo password so that the other tests and the demo still work.
  await page.getByLabel("New password").fill("cordarium-demo");
  await page.getByLabel("The same password again").fill("cordarium-demo");
  await page.getByRole("button", { name: "Set the new password" }).click();
  await expect(page.getByRole("main").getByRole("status")).toContainText("Your new password is set");
});
