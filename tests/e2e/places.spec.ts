import { expect, test, type Page } from "@playwright/test";
import { call, DEMO, signedIn, unique } from "../support/app";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

async function signInAsEditor(page: Page) {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.editor);
  await expectSignedIn(page, "editor");
}

const addForm = (page: Page) => page.getByRole("form", { name: "Add a historical area" });

test("an editor adds a historical area through the page and sees it listed", async ({ page }) => {
  const name = `Republic of Venice ${unique("e2e")}`;
  await signInAsEditor(page);
  await page.getByRole("banner").getByRole("link", { name: "Places" }).click();
  await expect(page.getByRole("heading", { name: "Places", level: 1 })).toBeVisible();

  const form = addForm(page);
  await form.getByLabel("Name").fill(name);
  await form.getByLabel("Country (today's)").selectOption({ label: "Italy" });
  await form.getByLabel("Latitude").fill("95");
  await form.getByLabel("Longitude").fill("12.3327");
  await form.getByLabel("Description").fill("The Serenissima's mainland and overseas dominions.");
  await form.getByRole("button", { name: "Add area" }).click();
  // Refused with the reason under the field; what was typed stays.
  await expect(form.getByText("Latitude runs from -90 (south) to 90 (north).")).toBeVisible();
  await expect(form.getByLabel("Name")).toHaveValue(name);
  await expect(form.getByLabel("Longitude")).toHaveValue("12.3327");

  await form.getByLabel("Latitude").fill("45.4371");
  await form.getByRole("button", { name: "Add area" }).click();
  await expect(form.getByText(`Added ${name}.`)).toBeVisible();
  const item = page.getByRole("list", { name: "Historical areas" }).getByRole("listitem").filter({ hasText: name });
  await expect(item).toContainText("Italy");
  await expect(item).toContainText("45.43710° N, 12.33270° E");
  await expect(item).toContainText("The Serenissima's mainland");
});

test("an editor whose area was changed meanwhile is shown the current version and can reload it", async ({ page }) => {
  const name = `Duchy of Mantua ${unique("e2e")}`;
  const admin = await signedIn(DEMO.admin);
  const created = await call("/api/places", { jar: admin, json: { name, countryCode: "IT", latitude: 45.1564, longitude: 10.7914 } });
  const { place } = (await created.json()) as { place: { id: number } };

  await signInAsEditor(page);
  await page.goto("/places");
  const item = page.getByRole("list", { name: "Historical areas" }).getByRole("listitem").filter({ hasText: name });
  await item.getByRole("button", { name: `Edit ${name}` }).click();
  const form = page.getByRole("form", { name: `Edit ${name}` });
  await form.getByLabel("Description").fill("Ruled by the Gonzaga.");

  // Someone else saves first.
  await call(`/api/places/${place.id}`, { jar: admin, method: "PATCH", json: { version: 1, description: "Gonzaga seat until 1708." } });
  await form.getByRole("button", { name: "Save changes" }).click();
  const conflict = form.getByRole("alert");
  await expect(conflict).toContainText("Someone changed this area since you opened it");
  await expect(conflict).toContainText("Gonzaga seat until 1708.");
  await expect(form.getByLabel("Description")).toHaveValue("Ruled by the Gonzaga.");

  await conflict.getByRole("button", { name: "Reload the current version" }).click();
  await expect(form.getByLabel("Description")).toHaveValue("Gonzaga seat until 1708.");
  await form.getByLabel("Description").fill("Gonzaga seat until 1708; then Habsburg.");
  await form.getByRole("button", { name: "Save changes" }).click();
  await expect(item).toContainText("Gonzaga seat until 1708; then Habsburg.");
  await expect(item.getByText(`Saved ${name}.`)).toBeVisible();
});

test("a visitor looks up Köln by typing koln with the keyboard and sees its country and coordinates", async ({ page }) => {
  await page.goto("/places");
  await expect(page.getByRole("list", { name: "Historical areas" })).toContainText("Kingdom of Naples");
  // Visitors see the list and the lookup, never the forms.
  await expect(addForm(page)).toHaveCount(0);
  await expect(page.getByRole("button", { name: /^Edit / })).toHaveCount(0);

  const box = page.getByRole("combobox", { name: "Look up a place" });
  await box.focus();
  await page.keyboard.type("koln");
  const option = page.getByRole("option", { name: /^Köln — 07, Germany/ });
  await expect(option).toBeVisible();
  await expect(box).toHaveAttribute("aria-expanded", "true");
  await page.keyboard.press("ArrowDown");
  await expect(option).toHaveAttribute("aria-selected", "true");
  await expect(box).toHaveAttribute("aria-activedescendant", (await option.getAttribute("id"))!);
  await page.keyboard.press("Enter");

  await expect(box).toHaveValue("Köln");
  await expect(box).toHaveAttribute("aria-expanded", "false");
  const result = page.getByRole("region", { name: "Köln" });
  await expect(result).toContainText("Germany");
  await expect(result).toContainText("DE");
  await expect(result).toContainText("07");
  await expect(result).toContainText("50.93333° N, 6.95000° E");

  // Escape closes the suggestions; the clear button empties the box.
  await box.fill("sevill");
  await expect(page.getByRole("option").first()).toBeVisible();
  await page.keyboard.press("Escape");
  await expect(box).toHaveAttribute("aria-expanded", "false");
  await page.getByRole("button", { name: "Clear Look up a place" }).click();
  await expect(box).toHaveValue("");
  await expect(box).toBeFocused();
});
