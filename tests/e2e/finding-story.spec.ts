// Finding and comparing evidence, as one person does it from start to end: a scholar new to the
// archive (invited, signs in through the page) finds every vetted region showing strumming on a
// five-course guitar dated 1620–1700, narrows to one country on the map, lays four of them on the
// light table, saves them as a dossier and exports it; unvetted work appears only when asked for; and
// a region vetted while the search service is down reaches the search once the service is back.
import { readFileSync } from "node:fs";
import { expect, test } from "@playwright/test";
import Papa from "papaparse";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, invitedUser, service, signedIn, unique, type Jar } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";
import { LightTablePage } from "./pages/light-table-page";
import { SearchPage } from "./pages/search-page";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

// A word only this run writes: the scholar's search finds this story's regions and no others.
const WORD = `vihuelo${Math.random().toString(36).slice(2, 8)}`;
const TODAY = new Date().toISOString().slice(0, 10);

let scholar: { email: string; password: string };
let editor: Jar;
const r: Record<string, number> = {};
let lateVersion: number;

async function place(query: string, country: string): Promise<number> {
  const res = await call(`/api/places?q=${encodeURIComponent(query)}`);
  const found = ((await res.json()) as { places: { id: number; countryCode: string }[] }).places.find((p) => p.countryCode === country);
  if (!found) throw new Error(`no ${query} in ${country} in the gazetteer`);
  return found.id;
}

async function step(jar: Jar, path: string, json: Record<string, unknown>): Promise<RegionView> {
  const res = await call(path, { jar, json });
  expect(res.status, await res.clone().text()).toBeLessThan(300);
  return (await res.json()) as RegionView;
}

// Through the API, the archive as the scholar finds it: five dated paintings in Spain and Italy with
// regions marked by a contributor and vetted by an editor, some that must not match, and two still
// proposed (one of them is vetted later, while the search service is down).
test.beforeAll(async () => {
  test.setTimeout(240_000);
  const contributor = await signedIn(DEMO.contributor);
  editor = await signedIn(DEMO.editor);
  scholar = await invitedUser("reader");
  const vocab: Vocabulary = await vocabulary(contributor);
  const [sevilla, madrid, naples] = await Promise.all([place("Sevilla", "ES"), place("Madrid", "ES"), place("Naples", "IT")]);
  const coll = await call("/api/collections", { jar: contributor, json: { name: unique("Casa de los Tañedores"), city: "Sevilla" } });
  const collectionId = ((await coll.json()) as { collection: { id: number } }).collection.id;
  const painting = (datingEdtf: string, placeId: number, n: number) =>
    photographedSource(contributor, 800, 600, { title: `Music party ${n} ${WORD}`, datingEdtf, placeId, collectionId, accessionNumber: `CT-${n}` });
  const s1625 = await painting("1625", sevilla, 1);
  const s1650 = await painting("1640/1660", madrid, 2);
  const s1680 = await painting("1680~", sevilla, 3);
  const s1660 = await painting("1660", naples, 4);
  const s1710 = await painting("1710", sevilla, 5);

  const seen = (technique: string, instrument = "five_course_guitar") => [
    { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", technique), confidence: "certain" },
    { aspectId: vocab.aspect("instrument_type"), termId: vocab.term("instrument_type", instrument), confidence: "probable" },
  ];
  const mark = async (key: string, imageId: number, observations: unknown[], vet: boolean) => {
    const created = await step(contributor, `/api/images/${imageId}/regions`, { shape: { kind: "rectangle", x: 40, y: 30, w: 300, h: 240 }, label: `${key} ${WORD}`, observations });
    const proposed = await step(contributor, `/api/regions/${created.id}/propose`, { version: created.version });
    if (vet) await step(editor, `/api/regions/${created.id}/review`, { version: proposed.version, decision: "vetted" });
    r[key] = created.id;
    return proposed;
  };
  await mark("Seville strummer", s1625.imageId, seen("strumming"), true);
  await mark("Unreviewed strummer", s1625.imageId, seen("strumming"), false);
  await mark("Madrid strummer left", s1650.imageId, seen("strumming"), true);
  await mark("Madrid strummer right", s1650.imageId, seen("strumming"), true);
  await mark("Madrid plucker", s1650.imageId, seen("plucking"), true);
  await mark("Madrid cittern", s1650.imageId, seen("strumming", "cittern"), true);
  await mark("Late Seville strummer", s1680.imageId, seen("strumming"), true);
  lateVersion = (await mark("Seville strummer at the back", s1680.imageId, seen("strumming"), false)).version;
  await mark("Naples strummer", s1660.imageId, seen("strumming"), true);
  await mark("Eighteenth-century strummer", s1710.imageId, seen("strumming"), true);

  // The outbox delivers within seconds; wait until the index shows the eight vetted regions.
  await expect
    .poll(async () => ((await (await call(`/api/search?q=${WORD}&perPage=50`)).json()) as { total: number }).total, { timeout: 90_000, intervals: [500] })
    .toBe(8);
});

test.afterAll(() => {
  // Whatever happened in the test, the next one finds the search service running.
  service("start", "search");
});

test("a new scholar finds, narrows, compares, keeps and exports the evidence; the index outlives an outage", async ({ page }) => {
  test.setTimeout(240_000);
  const spain = ["Seville strummer", "Madrid strummer left", "Madrid strummer right", "Late Seville strummer"].map((k) => r[k]);

  // Signs in through the page like anyone invited.
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(scholar.email, scholar.password);
  await expectSignedIn(page, "reader");

  // Finds: words, the two aspects as facets, the dates.
  const search = new SearchPage(page);
  await search.openFromHeader();
  await search.box.pressSequentially(WORD, { delay: 20 });
  await expect(page).toHaveURL(new RegExp(`q=${WORD}`));
  await search.toggleFacet("t_right_hand_technique", "strumming", /t_right_hand_technique=strumming/);
  await search.toggleFacet("t_instrument_type", "five-course guitar", /t_instrument_type=five_course_guitar/);
  await search.setDates("1620", "1700");
  // Every vetted one and only those: not the plucker, the cittern, the 1710 painting or the proposed two.
  await search.expectRegions([...spain, r["Naples strummer"]]);

  // Narrows to Spain on the map.
  await search.clickCountry("Spain");
  await expect(page).toHaveURL(/country=ES/);
  await search.expectRegions(spain);

  // Lays four of them on the light table.
  for (const id of spain) {
    await page.locator(`[data-testid=search-result][data-region="${id}"]`).getByRole("button", { name: "Add to light table" }).click();
  }
  await page.getByRole("link", { name: "Open the regions you gathered (4)" }).click();
  const table = new LightTablePage(page);
  await expect(page.getByRole("heading", { name: "Light table", level: 1 })).toBeVisible();
  await expect(table.items).toHaveCount(4);
  expect(table.regionIdsInUrl()).toEqual(spain);

  // Saves them as a dossier and opens it.
  const title = unique("Strumming in Spain");
  await table.controls.getByRole("button", { name: "Save as dossier" }).click();
  const form = page.getByRole("form", { name: "Save the table as a dossier" });
  await form.getByLabel("Title of the dossier").fill(title);
  await form.getByRole("button", { name: "Save" }).click();
  await expect(form.getByText("Saved with 4 regions.")).toBeVisible();
  await form.getByRole("link", { name: `Open “${title}”` }).click();
  await expect(page.getByRole("heading", { level: 1, name: title })).toBeVisible();

  // The dossier lays its regions on the light table again, in its order, and offers each to gather.
  await expect(page.getByRole("link", { name: "Lay its 4 regions on the light table" })).toHaveAttribute("href", `/light-table?r=${spain.join(",")}`);
  await expect(page.getByRole("button", { name: "On the light table ✓" })).toHaveCount(4);

  // Exports it: the CSV (read back by an RFC 4180 parser) and the printable page, a citation per item.
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download as CSV" }).click()]);
  const rows = Papa.parse<Record<string, string>>(readFileSync((await download.path())!, "utf8"), { header: true, skipEmptyLines: true }).data;
  expect(rows.map((row) => Number(row.region_id))).toEqual(spain);
  for (const row of rows) {
    expect(row.collection).toMatch(/^Casa de los Tañedores/);
    expect(row.accession_number).toMatch(/^CT-[123]$/);
    expect(row.permalink).toMatch(new RegExp(`/sources/\\d+/images/\\d+\\?region=${row.region_id}$`));
    expect(row.citation).toContain(`accessed ${TODAY}`);
  }
  await page.getByRole("link", { name: "Printable page" }).click();
  await expect(page.getByRole("heading", { level: 3 })).toHaveCount(4);
  await expect(page.getByRole("heading", { level: 3 }).first()).toContainText("Seville strummer");

  // Unvetted work stays out of the scholar's search until asked for, and is then marked as such.
  await page.goto(`/search?q=${WORD}&view=table`);
  await search.expectRegions(Object.entries(r).filter(([k]) => !["Unreviewed strummer", "Seville strummer at the back"].includes(k)).map(([, id]) => id));
  await page.getByRole("checkbox", { name: /Include proposed work/ }).click();
  await expect(page).toHaveURL(/proposed=1/);
  await search.expectRegions(Object.values(r));
  await expect(page.locator(`[data-testid=search-result][data-region="${r["Unreviewed strummer"]}"]`)).toContainText("proposed");

  // The search service goes down: the editor's decision is still taken, health reports the outage…
  service("stop", "search");
  await step(editor, `/api/regions/${r["Seville strummer at the back"]}/review`, { version: lateVersion, decision: "vetted" });
  const health = (await (await call("/api/health")).json()) as { checks: Record<string, { status: string }>; searchBacklog: { pending: number } | null };
  expect(health.checks.search.status).not.toBe("ok");
  expect(health.searchBacklog?.pending).toBeGreaterThan(0);
  await page.goto(`/search?q=${WORD}`);
  await expect(page.getByRole("alert").filter({ hasText: "Search is not available at the moment" })).toBeVisible();

  // …and once it is back, the vetted region reaches the scholar's search with nothing lost.
  service("start", "search");
  await expect
    .poll(async () => {
      await page.goto(`/search?q=${WORD}&t_right_hand_technique=strumming&t_instrument_type=five_course_guitar&from=1620&to=1700&country=ES`);
      return search.regionIds();
    }, { timeout: 90_000, intervals: [1000] })
    .toEqual([...spain, r["Seville strummer at the back"]].sort((a, b) => a - b));
});
