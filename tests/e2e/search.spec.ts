import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import Papa from "papaparse";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, signedIn, type Jar } from "../support/app";
import { photographedSource, vocabulary } from "../support/evidence";
import { SearchPage } from "./pages/search-page";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

const SHOTS = ".data/shots";
// A word only this run writes, so the reader's search finds this test's regions and no others.
const WORD = `lute${Math.random().toString(36).slice(2, 9)}`;

let sevilleA: number;
let naples: number;
let sevilleLate: number;
let plucked: number;
let unvetted: number;

async function place(query: string, country: string): Promise<number> {
  const res = await call(`/api/places?q=${encodeURIComponent(query)}`);
  const places = ((await res.json()) as { places: { id: number; countryCode: string }[] }).places;
  const found = places.find((p) => p.countryCode === country);
  if (!found) throw new Error(`no ${query} in ${country} in the gazetteer`);
  return found.id;
}

async function datedSource(jar: Jar, datingEdtf: string, placeId: number) {
  const { sourceId, imageId } = await photographedSource(jar, 800, 600);
  const current = ((await (await call(`/api/sources/${sourceId}`, { jar })).json()) as { source: { title: string; version: number } }).source;
  const res = await call(`/api/sources/${sourceId}`, {
    jar,
    method: "PATCH",
    json: { title: current.title, objectType: "painting", state: "published", datingEdtf, placeId, version: current.version },
  });
  expect(res.status, await res.clone().text()).toBe(200);
  return imageId;
}

// Through the API: a contributor marks regions on three dated sources in Spain and Italy, an editor vets
// all but one, which stays proposed.
test.beforeAll(async () => {
  test.setTimeout(180_000);
  const [contributor, editor] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor)]);
  const vocab = await vocabulary(contributor);
  const [seville, napoli] = await Promise.all([place("Sevilla", "ES"), place("Naples", "IT")]);
  const [early, italian, late] = [await datedSource(contributor, "1625", seville), await datedSource(contributor, "1680", napoli), await datedSource(contributor, "1750", seville)];
  const seen = (technique: string) => [
    { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", technique), confidence: "certain" },
    { aspectId: vocab.aspect("instrument_type"), termId: vocab.term("instrument_type", "five_course_guitar"), confidence: "probable" },
  ];
  const step = async (jar: Jar, path: string, json: Record<string, unknown>) => {
    const res = await call(path, { jar, json });
    expect(res.status, await res.clone().text()).toBeLessThan(300);
    return (await res.json()) as RegionView;
  };
  const mark = async (imageId: number, label: string, technique: string, vet: boolean) => {
    const created = await step(contributor, `/api/images/${imageId}/regions`, { shape: { kind: "rectangle", x: 40, y: 30, w: 300, h: 240 }, label: `${label} ${WORD}`, observations: seen(technique) });
    const proposed = await step(contributor, `/api/regions/${created.id}/propose`, { version: created.version });
    if (vet) await step(editor, `/api/regions/${created.id}/review`, { version: proposed.version, decision: "vetted" });
    return created.id;
  };
  sevilleA = await mark(early, "Strummer in Seville", "strumming", true);
  naples = await mark(italian, "Strummer in Naples", "strumming", true);
  sevilleLate = await mark(late, "Late strummer", "strumming", true);
  plucked = await mark(italian, "Plucking player", "plucking", true);
  unvetted = await mark(early, "Unreviewed strummer", "strumming", false);

  // The outbox delivers within seconds; wait until the index shows every vetted region.
  await expect
    .poll(async () => ((await (await call(`/api/search?q=${WORD}&perPage=50`)).json()) as { total: number }).total, { timeout: 60_000, intervals: [500] })
    .toBe(4);
});

test("a reader searches, narrows by facets, dates and the map, and never sees unvetted work", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.reader);
  await expectSignedIn(page, "reader");

  const search = new SearchPage(page);
  await search.openFromHeader();
  await search.box.pressSequentially(WORD, { delay: 30 });
  await expect(page).toHaveURL(new RegExp(`q=${WORD}`));
  await search.expectRegions([sevilleA, naples, sevilleLate, plucked]);
  await expect(page.getByTestId("live-count")).toContainText("4 matches");

  await search.toggleFacet("t_right_hand_technique", "strumming", /t_right_hand_technique=strumming/);
  await search.expectRegions([sevilleA, naples, sevilleLate]);
  await search.toggleFacet("t_instrument_type", "five-course guitar", /t_instrument_type=five_course_guitar/);
  await search.expectRegions([sevilleA, naples, sevilleLate]);

  await search.setDates("1620", "1700");
  await search.expectRegions([sevilleA, naples]);
  await expect(page.getByRole("heading", { name: "When and where" })).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/search.png`, fullPage: true });
  // Arrow keys move the focus along the grid of results.
  await search.results.nth(0).getByRole("link").focus();
  await page.keyboard.press("ArrowRight");
  await expect(search.results.nth(1).getByRole("link")).toBeFocused();
  await page.keyboard.press("ArrowLeft");
  await expect(search.results.nth(0).getByRole("link")).toBeFocused();

  // A decade's bar narrows the dates to that decade; back again, a country on the map narrows the place.
  await page.getByRole("link", { name: /^1620s: / }).click();
  await expect(page).toHaveURL(/from=1620&to=1629/);
  await search.expectRegions([sevilleA]);
  await page.goBack();
  await search.expectRegions([sevilleA, naples]);

  await search.clickCountry("Italy");
  await expect(page).toHaveURL(/country=IT/);
  await search.expectRegions([naples]);
  // The other filters stay as they were.
  await expect(page).toHaveURL(/t_right_hand_technique=strumming/);
  await expect(page).toHaveURL(/from=1620/);
  await expect(page.getByRole("link", { name: "Open these on the light table" })).toHaveAttribute("href", `/light-table?r=${naples}`);

  // Arrow keys and Enter: the result opens in the viewer at its region.
  await search.results.first().getByRole("link").focus();
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(new RegExp(`/sources/\\d+/images/\\d+\\?region=${naples}`));

  // Proposed work never reaches a reader's ordinary search, with or without words.
  await page.goto(`/search?q=${WORD}&view=table`);
  await search.expectRegions([sevilleA, naples, sevilleLate, plucked]);
  expect(await search.regionIds()).not.toContain(unvetted);
});

// Rome to Naples is about 190 km in a straight line (from memory); Seville is some 1,900 km further west.
test("a visitor keeps the evidence within a distance of a place, sorts it nearest first and removes the filter", async ({ page }) => {
  const search = new SearchPage(page);
  await page.goto(`/search?q=${WORD}`);
  await search.expectRegions([sevilleA, naples, sevilleLate, plucked]);

  await search.chooseNearPlace("Rome", /^Rome — 07, Italy/);
  await search.applyDistance(100);
  await expect(search.nearChip).toHaveText(/Within 100 km of Rome, Italy/);
  await search.expectRegions([]);
  await expect(page.getByText("Nothing matches this search")).toBeVisible();

  // The place stays chosen; a wider distance reaches Naples but not Seville.
  await expect(page.getByRole("combobox", { name: "Near the place" })).toHaveValue("Rome");
  await search.applyDistance(250);
  await expect(search.nearChip).toHaveText(/Within 250 km of Rome, Italy/);
  await search.expectRegions([naples, plucked]);
  await expect(page.getByTestId("live-count")).toContainText("2 matches");
  // The map marks where the distance is measured from, with its ring.
  await expect(page.getByRole("img", { name: "Within 250 km of Rome, Italy" })).toBeVisible();

  await page.getByRole("link", { name: "Distance, nearest first" }).click();
  await expect(page).toHaveURL(/sort=distance/);
  // The grid says each one's distance too.
  await expect(page.getByTestId("result-distance")).toHaveText([/^1[89]\d km away$/, /^1[89]\d km away$/]);
  await page.getByRole("link", { name: "Table", exact: true }).click();
  await expect(page).toHaveURL(/view=table/);
  await search.expectRegions([naples, plucked]);
  const distances = await page.getByTestId("result-distance").allTextContents();
  expect(distances).toHaveLength(2);
  for (const text of distances) {
    const km = Number(/^(\d+) km$/.exec(text)?.[1]);
    expect(km).toBeGreaterThan(180);
    expect(km).toBeLessThan(195);
  }
  await page.screenshot({ path: `${SHOTS}/search-near.png`, fullPage: true });

  // Clearing the place and applying takes the filter away; back again, the chip's × does the same.
  await page.getByRole("button", { name: "Clear Near the place" }).click();
  await page.getByRole("button", { name: "Apply distance" }).click();
  await expect(page).not.toHaveURL(/near=|km=|sort=distance/);
  await expect(search.nearChip).toHaveCount(0);
  await page.goBack();
  await expect(search.nearChip).toHaveText(/Within 250 km of Rome, Italy/);
  await page.getByRole("link", { name: "Remove the filter within 250 km of Rome, Italy" }).click();
  await expect(page).not.toHaveURL(/near=|km=|sort=distance/);
  await expect(search.nearChip).toHaveCount(0);
  await search.expectRegions([sevilleA, naples, sevilleLate, plucked]);
  await expect(page.getByRole("link", { name: "Distance, nearest first" })).toHaveCount(0);
});

test("a reader downloads every result as CSV and opens the printable list, in the search's order", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.reader);
  await expectSignedIn(page, "reader");

  // The table view of page 1, sorted by date: the exports carry the search, not the page or the view.
  await page.goto(`/search?q=${WORD}&t_right_hand_technique=strumming&sort=date&view=table&perPage=2`);
  const search = new SearchPage(page);
  await expect(search.results).toHaveCount(2);
  const csvLink = page.getByRole("link", { name: "Download these results as CSV" });
  await expect(csvLink).toHaveAttribute("href", `/api/search/export.csv?q=${WORD}&t_right_hand_technique=strumming&sort=date`);

  const [download] = await Promise.all([page.waitForEvent("download"), csvLink.click()]);
  const today = new Date().toISOString().slice(0, 10);
  expect(download.suggestedFilename()).toBe(`search-${WORD}-${today}.csv`);
  const rows = Papa.parse<Record<string, string>>(readFileSync((await download.path())!, "utf8"), { header: true, skipEmptyLines: true }).data;
  // Every page of the results (three, though the page shows two), earliest first: 1625, 1680, 1750.
  expect(rows.map((r) => Number(r.region_id))).toEqual([sevilleA, naples, sevilleLate]);
  expect(rows.map((r) => r.region_label)).toEqual([`Strummer in Seville ${WORD}`, `Strummer in Naples ${WORD}`, `Late strummer ${WORD}`]);
  expect(rows.every((r) => r.review_state === "vetted" && r.citation.includes(`accessed ${today}`))).toBe(true);
  expect(rows.map((r) => Number(r.region_id))).not.toContain(unvetted);

  await page.getByRole("link", { name: "Printable list" }).click();
  await expect(page).toHaveURL(/\/search\/print\?/);
  const heading = page.getByRole("heading", { level: 1 });
  await expect(heading).toContainText(`Regions matching “${WORD}”`);
  await expect(heading).toContainText("Right-hand technique: strumming");
  await expect(page.getByText(`Sorted by date, earliest first · exported ${today}`)).toBeVisible();
  const printed = page.getByTestId("printed-region");
  await expect(printed).toHaveCount(3);
  expect(await printed.evaluateAll((els) => els.map((e) => Number(e.getAttribute("data-region"))))).toEqual([sevilleA, naples, sevilleLate]);
  await expect(printed.first().getByRole("img", { name: `Detail: Strummer in Seville ${WORD} of`, exact: false })).toBeVisible();
  await expect(printed.first().getByText("Cite as:")).toBeVisible();
  await expect(page.getByRole("button", { name: "Print" })).toBeVisible();
  await page.screenshot({ path: `${SHOTS}/search-print.png`, fullPage: true });
  // On paper the site's header and the page's own links are left out.
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("banner").first()).toBeHidden();
  await expect(page.getByRole("button", { name: "Print" })).toBeHidden();
  await expect(page.getByRole("link", { name: "Back to the search" })).toBeHidden();
  await expect(heading).toBeVisible();
  await page.emulateMedia({ media: "screen" });
  await page.getByRole("link", { name: "Back to the search" }).click();
  await expect(page).toHaveURL(new RegExp(`/search\\?q=${WORD}&t_right_hand_technique=strumming&sort=date$`));
});
