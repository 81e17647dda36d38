import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import Papa from "papaparse";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

// Twenty-odd saves and page loads in one story: on a busy machine it takes close to the default 30 s.
test.describe.configure({ timeout: 90_000 });

test("a reader starts a dossier, adds sources from their pages, reorders and annotates them, downloads the CSV and opens the print page", async ({ page }) => {
  const title = `Plucking hands ${Date.now().toString(36)}`;
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword("reader@cordarium.test");
  await expectSignedIn(page, "reader");

  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Dossiers" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Dossiers" })).toBeVisible();
  await page.getByLabel("Title").fill(title);
  await page.getByLabel("Description").fill("Right-hand positions, for a lesson.");
  await page.getByRole("button", { name: "Start the dossier" }).click();
  await expect(page.getByRole("heading", { level: 1, name: title })).toBeVisible();
  const dossierUrl = page.url();

  // Two published demo sources, added from their own pages.
  const listed = await (await page.request.get("/api/sources?state=published&limit=2&sort=title")).json();
  const [first, second] = listed.sources as { id: number; title: string }[];
  for (const source of [first, second]) {
    await page.goto(`/sources/${source.id}`);
    await page.getByRole("button", { name: "Add to dossier" }).click();
    await page.getByRole("combobox", { name: "Dossier", exact: true }).selectOption({ label: title });
    await page.getByRole("button", { name: "Add this source" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Added to" })).toContainText(title);
  }

  await page.goto(dossierUrl);
  const items = page.getByRole("list", { name: "Items of the dossier" });
  const headings = items.getByRole("heading", { level: 3 });
  await expect(headings).toHaveText([first.title, second.title]);

  // Reorder with the keyboard-reachable buttons, then back by dragging.
  const saved = page.getByRole("status").filter({ hasText: /^Saved:/ });
  await page.getByRole("button", { name: `Move “${second.title}” up` }).click();
  await expect(headings).toHaveText([second.title, first.title]);
  await expect(saved).toContainText("in place 1 of 2");
  await page.reload();
  await expect(headings).toHaveText([second.title, first.title]);
  await items.getByRole("listitem").nth(1).dragTo(items.getByRole("listitem").nth(0));
  await expect(headings).toHaveText([first.title, second.title]);
  await expect(saved).toContainText("in place 1 of 2");
  await page.reload();
  await expect(headings).toHaveText([first.title, second.title]);

  const note = 'Thumb under, "as in the lesson", then index';
  await page.getByRole("button", { name: `Add a note to “${second.title}”` }).click();
  await page.getByLabel(`Note on “${second.title}”`).fill(note);
  await page.getByRole("button", { name: "Save the note" }).click();
  await expect(items.getByLabel("Note", { exact: true })).toHaveText(note);

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download as CSV" }).click()]);
  expect(download.suggestedFilename()).toMatch(/^plucking-hands-[a-z0-9-]+\.csv$/);
  const csv = readFileSync((await download.path())!, "utf8");
  const rows = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true }).data;
  expect(rows.map((r) => r.title)).toEqual([first.title, second.title]);
  expect(rows[1].note).toBe(note);
  expect(rows[0].citation).toContain(`accessed ${new Date().toISOString().slice(0, 10)}`);

  await page.getByRole("link", { name: "Printable page" }).click();
  await expect(page.getByRole("heading", { level: 1, name: title })).toBeVisible();
  await expect(page.getByRole("heading", { level: 3 })).toHaveText([first.title, second.title]);
  await expect(page.getByText(note)).toBeVisible();
  await expect(page.getByRole("button", { name: "Print" })).toBeVisible();
  // On paper the site's header and the page's own links are left out.
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("banner").first()).toBeHidden();
  await expect(page.getByRole("button", { name: "Print" })).toBeHidden();
  await expect(page.getByRole("heading", { level: 1, name: title })).toBeVisible();
});
