import { expect, test } from "@playwright/test";

test("the archive shows the demo collections to a visitor", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("heading", { name: "The archive" })).toBeVisible();
  await expect(page.getByText("Galleria Vellastri")).toBeVisible();
  await expect(page.getByRole("banner").getByRole("link", { name: "Sign in" })).toBeVisible();
});

test("an unknown address gets the archive's own not-found page", async ({ page }) => {
  const res = await page.goto("/no/such/page");
  expect(res?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "Not in the archive" })).toBeVisible();
});

test("on a phone the header and navigation fit the screen", async ({ browser }) => {
  const context = await browser.newContext({ viewport: { width: 375, height: 740 } });
  const page = await context.newPage();
  await page.goto("/");
  const nav = page.getByRole("navigation", { name: "Main" });
  await expect(nav).toBeVisible();
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(375);
  await context.close();
});

test("keyboard users can skip to the content", async ({ page }) => {
  await page.goto("/");
  await page.keyboard.press("Tab");
  const skip = page.getByRole("link", { name: "Skip to content" });
  await expect(skip).toBeFocused();
});
