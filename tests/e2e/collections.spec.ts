import { expect, test } from "@playwright/test";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

test("a contributor adds a collection, is told what is wrong first, and edits it", async ({ page }) => {
  const name = `Fondazione Armonici ${Date.now().toString(36)}`;
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword("contributor@cordarium.test");
  await expectSignedIn(page, "contributor");
  await page.goto("/collections");
  await page.getByRole("link", { name: "Add a collection" }).click();
  await page.getByLabel("Name").fill(name);
  await page.getByLabel("City").fill("Cremona");
  await page.getByLabel("Country").selectOption("IT");
  await page.getByLabel("Web address").fill("not a web address");
  await page.getByRole("button", { name: "Add the collection" }).click();
  await expect(page.getByText("Give a full web address")).toBeVisible();
  await expect(page.getByLabel("Name")).toHaveValue(name);
  await page.getByLabel("Web address").fill("https://armonici.example");
  await page.getByRole("button", { name: "Add the collection" }).click();
  await expect(page.getByRole("heading", { level: 1, name })).toBeVisible();
  await expect(page.getByText("Cremona, Italy")).toBeVisible();
  await expect(page.getByRole("link", { name: "0 sources" })).toBeVisible();

  await page.getByRole("link", { name: "Edit" }).click();
  await page.getByLabel("Notes").fill("Photography by appointment.");
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByText("Photography by appointment.")).toBeVisible();
});
