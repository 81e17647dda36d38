import { expect, test } from "@playwright/test";
import { invitedUser } from "../support/app";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

test("a reader chooses one letter a day on their account page, and the choice stays", async ({ page }) => {
  const person = await invitedUser("reader");
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(person.email, person.password);
  await expectSignedIn(page, "reader");

  await page.locator("header summary").click();
  await page.getByRole("link", { name: "Your account" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Your account" })).toBeVisible();
  await expect(page.getByRole("radio", { name: /Each notice at once/ })).toBeChecked();

  await page.getByRole("radio", { name: /One letter a day/ }).check();
  await page.getByRole("button", { name: "Save the choice" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Saved: one letter a day." })).toBeVisible();

  await page.reload();
  await expect(page.getByRole("radio", { name: /One letter a day/ })).toBeChecked();
});
