import { expect, type Page } from "@playwright/test";

/** Opens the development mailbox for one address and follows the first link in its newest message. */
export async function followMailedLink(page: Page, to: string, subject: RegExp, linkPart: string) {
  await expect(async () => {
    await page.goto(`/dev/mail?to=${encodeURIComponent(to)}`);
    await expect(page.getByRole("listitem").filter({ hasText: subject }).first()).toBeVisible({ timeout: 1000 });
  }).toPass({ timeout: 10_000 });
  const message = page.getByRole("listitem").filter({ hasText: subject }).first();
  await message.locator(`a[href*="${linkPart}"]`).first().click();
}
