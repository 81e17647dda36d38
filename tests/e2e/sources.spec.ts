import { expect, test, type Page } from "@playwright/test";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

async function signInAs(page: Page, email: string, role: string) {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(email);
  await expectSignedIn(page, role);
}

test("a contributor catalogues a source with an uncertain date and a place, finds it by date and country, edits it and sees the history", async ({ page }) => {
  const title = `A cittern player at a window ${Date.now().toString(36)}`;
  await signInAs(page, "contributor@cordarium.test", "contributor");
  await page.goto("/sources/new");
  await page.getByLabel("Title").fill(title);
  await page.getByLabel("Object type").selectOption("painting");
  await page.getByLabel("Attribution").selectOption("circle_of");
  await page.getByLabel("Artist, as written").fill("Jacomo Verrandi");

  // The reading of the EDTF string appears while typing.
  const dating = page.getByLabel("Date (EDTF)");
  await dating.fill("1650-13");
  await expect(page.getByText("there is no month 13")).toBeVisible();
  await dating.fill("1655?");
  await expect(page.getByTestId("dating-reading")).toContainText("1655-01-01");
  await expect(page.getByTestId("dating-reading")).toContainText("1655-12-31");

  const place = page.getByRole("combobox", { name: "Place of making" });
  await place.fill("sevilla");
  await expect(page.getByRole("listbox", { name: "Place of making" }).getByRole("option").first()).toContainText("Spain");
  await place.press("ArrowDown");
  await place.press("Enter");
  await expect(place).toHaveValue(/Sevilla/);

  await page.getByLabel("Collection").selectOption({ label: "Colección Marqués de Albercón" });
  await page.getByLabel("Accession number").fill(`MA-${Date.now().toString(36)}`);
  await page.getByRole("button", { name: "Save the source" }).click();

  await expect(page.getByRole("heading", { level: 1, name: title })).toBeVisible();
  await expect(page.getByText("Circle of Jacomo Verrandi")).toBeVisible();
  await expect(page.getByText("37.3828° N, 5.9732° W")).toBeVisible();
  await expect(page.getByText("Spain").first()).toBeVisible();

  // Found again through the table's date-range and country filters.
  await page.goto("/sources");
  await page.getByLabel("Country of making").selectOption("ES");
  await page.getByLabel("From year").fill("1640");
  await page.getByLabel("To year").fill("1660");
  await expect(page).toHaveURL(/from=1640/);
  await expect(page).toHaveURL(/country=ES/);
  await page.getByRole("link", { name: title }).click();

  await page.getByRole("link", { name: "Edit" }).click();
  await page.getByLabel("Medium").fill("oil on panel");
  await page.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByText("oil on panel")).toBeVisible();
  const history = page.getByRole("region", { name: "History" });
  await expect(history.getByText(/edited: medium/)).toBeVisible();
  await expect(history.getByText(/catalogued/)).toBeVisible();

  // A date range that does not overlap leaves it out.
  await page.goto(`/sources?country=ES&from=1700&to=1720&q=${encodeURIComponent(title)}`);
  await expect(page.getByText("No source matches these filters.")).toBeVisible();
});

test("two people editing the same source: the second save is refused and shown, not silently applied", async ({ browser }) => {
  const first = await browser.newContext();
  const second = await browser.newContext();
  const a = await first.newPage();
  const b = await second.newPage();
  await signInAs(a, "editor@cordarium.test", "editor");
  await signInAs(b, "admin@cordarium.test", "admin");

  await a.goto("/sources/new");
  const title = `Two guitarists in a courtyard ${Date.now().toString(36)}`;
  await a.getByLabel("Title").fill(title);
  await a.getByRole("button", { name: "Save the source" }).click();
  await expect(a.getByRole("heading", { level: 1, name: title })).toBeVisible();
  const editUrl = `${new URL(a.url()).pathname}/edit`;

  await a.goto(editUrl);
  await b.goto(editUrl);
  await a.getByLabel("Medium").fill("red chalk");
  await a.getByRole("button", { name: "Save changes" }).click();
  await expect(a.getByText("red chalk")).toBeVisible();

  await b.getByLabel("Medium").fill("pen and ink");
  await b.getByRole("button", { name: "Save changes" }).click();
  const conflict = b.getByRole("alert").filter({ hasText: "Someone else saved this source" });
  await expect(conflict).toBeVisible();
  await expect(conflict.getByRole("row", { name: /medium/ })).toContainText("red chalk");
  await expect(conflict.getByRole("row", { name: /medium/ })).toContainText("pen and ink");
  await expect(b.getByLabel("Medium")).toHaveValue("pen and ink");

  await b.getByRole("button", { name: "Save mine over theirs" }).click();
  await expect(b.getByRole("heading", { level: 1, name: title })).toBeVisible();
  await expect(b.getByText("pen and ink")).toBeVisible();
  await first.close();
  await second.close();
});

test("a reader sees published sources but cannot catalogue", async ({ page }) => {
  await signInAs(page, "reader@cordarium.test", "reader");
  await page.goto("/sources");
  await expect(page.getByRole("link", { name: "Catalogue a source" })).toHaveCount(0);
  await page.goto("/sources/new");
  await expect(page.getByRole("main").getByRole("alert")).toContainText("needs the contributor role");
});
