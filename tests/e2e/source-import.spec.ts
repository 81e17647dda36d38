import { expect, test, type Page } from "@playwright/test";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

// Invented sources; the collection is one of the demo scenario's, the places are gazetteer cities.
function csvFor(tag: string, extra = "") {
  return [
    "title,object_type,attribution,artist,collection,accession_number,dating,place,country",
    `${tag} Cittern Player,Painting,attributed to,Aldo Vessanti,Galleria Vellastri,${tag}-1,1650~,Verona,IT`,
    `"${tag} Lute Player, with a Dog",print,workshop_of,Hendrick Oudeboom,,,165X,Haarlem,NL`,
    `${tag} Tile with a Guitar,tile,,,,,1620/1630,,`,
    extra,
  ].join("\r\n");
}

async function openImport(page: Page, email = "contributor@cordarium.test", role = "contributor") {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(email);
  await expectSignedIn(page, role);
  await page.goto("/sources/import");
}

const upload = (page: Page, name: string, csv: string) =>
  page.getByLabel("CSV file").setInputFiles({ name, mimeType: "text/csv", buffer: Buffer.from(csv, "utf8") });

test("a contributor uploads a CSV, checks the preview, imports it and finds the sources in the list", async ({ page }) => {
  const tag = `Imp${Date.now().toString(36)}`;
  await openImport(page);
  await expect(page.getByRole("heading", { name: "Import sources from CSV" })).toBeVisible();
  await expect(page.getByRole("link", { name: "Download the template" })).toHaveAttribute("href", "/api/sources/import/template");

  await upload(page, "three-sources.csv", csvFor(tag));
  await expect(page.getByTestId("import-summary")).toContainText("3 rows: 3 ready, 0 with errors, 0 possible duplicates");
  const table = page.getByRole("table", { name: "Rows of the file" });
  await expect(table.getByRole("row").filter({ hasText: `${tag} Cittern Player` })).toContainText("about 1650");
  await expect(table.getByRole("row").filter({ hasText: "with a Dog" })).toContainText("the 1650s");
  await expect(table.getByRole("row").filter({ hasText: "with a Dog" })).toContainText("Haarlem (NL)");

  await page.getByRole("button", { name: "Import 3 sources" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Imported 3 sources" })).toBeVisible();
  await expect(page.getByRole("list", { name: "Imported sources" }).getByRole("link")).toHaveCount(3);

  await page.getByRole("link", { name: "See your sources in the list" }).click();
  await expect(page).toHaveURL(/\/sources\?creator=\d+/);
  for (const title of [`${tag} Cittern Player`, `${tag} Lute Player, with a Dog`, `${tag} Tile with a Guitar`]) {
    await expect(page.getByRole("link", { name: title })).toBeVisible();
  }
});

test("a file with a bad row shows the error under its line and cannot be imported", async ({ page }) => {
  const tag = `Bad${Date.now().toString(36)}`;
  await openImport(page);
  await page.getByLabel("Or paste the CSV").fill(csvFor(tag, `${tag} Fresco,fresco,,,,,1650-13,,`));
  await page.getByRole("button", { name: "Check the file" }).click();
  await expect(page.getByTestId("import-summary")).toContainText("4 rows: 3 ready, 1 with errors");
  const problems = page.getByRole("list", { name: "Problems on line 5" });
  await expect(problems).toContainText('object_type: Unknown object type "fresco"');
  await expect(problems).toContainText("dating: ‘1650-13’ is not a valid EDTF date");
  await expect(page.getByRole("button", { name: /^Import \d+ sources?$/ })).toBeDisabled();

  // A file that cannot be read at all gets one message naming the line.
  await upload(page, "broken.csv", 'title,object_type\r\nA,painting\r\n"B,print\r\n');
  await expect(page.getByRole("main").getByRole("alert")).toContainText("Line 3: a quoted field is never closed");
});

test("a reader is told that importing needs the contributor role", async ({ page }) => {
  await openImport(page, "reader@cordarium.test", "reader");
  await expect(page.getByRole("main").getByRole("alert")).toContainText("Importing sources needs the contributor role");
});

test("a visitor who opens the import page is sent to sign in", async ({ page }) => {
  await page.goto("/sources/import");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fsources%2Fimport|\/sign-in\?callbackUrl=\/sources\/import/);
});
