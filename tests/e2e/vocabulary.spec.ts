import { expect, test, type Page } from "@playwright/test";
import { call, DEMO, signedIn, unique } from "../support/app";
import { picture, settled, upload } from "../support/images";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

type Term = { id: number; key: string; version: number };
const key = (prefix: string) => `${prefix}_${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

async function signInAsEditor(page: Page) {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.editor);
  await expectSignedIn(page, "editor");
}

// An aspect of its own with three terms, and one region whose observation names the first.
async function arrange() {
  const [editor, contributor] = await Promise.all([signedIn(DEMO.editor), signedIn(DEMO.contributor)]);
  const label = unique("Fret material");
  const created = await call("/api/vocabulary", { jar: editor, json: { key: key("e2e"), label, kind: "terms", section: "instrument", description: "What the frets are made of." } });
  const { aspect } = (await created.json()) as { aspect: { id: number } };
  const terms: Record<string, Term> = {};
  for (const word of ["gut", "brass", "catgut"]) {
    const res = await call(`/api/vocabulary/aspects/${aspect.id}/terms`, { jar: editor, json: { key: word, label: word } });
    terms[word] = ((await res.json()) as { term: Term }).term;
  }
  const source = await call("/api/sources", { jar: contributor, json: { title: unique("Vocabulary page"), objectType: "painting" } });
  const sourceId = ((await source.json()) as { source: { id: number } }).source.id;
  const up = await upload(contributor, sourceId, "frets.jpg", await picture(91, 640, 480));
  await settled(contributor, sourceId, up.imageId!);
  const region = await call(`/api/images/${up.imageId}/regions`, {
    jar: contributor,
    json: { shape: { kind: "rectangle", x: 10, y: 10, w: 100, h: 80 }, observations: [{ aspectId: aspect.id, termId: terms.catgut.id, confidence: "certain" }] },
  });
  const { id: regionId } = (await region.json()) as { id: number };
  return { label, terms, regionId, contributor };
}

test("an editor adds a term, deprecates another and merges one into another through the page", async ({ page }) => {
  // The arrangement uploads and processes a photograph for the region.
  test.setTimeout(90_000);
  const { label, regionId, contributor } = await arrange();
  await signInAsEditor(page);
  await page.getByRole("banner").getByRole("link", { name: "Vocabulary" }).click();
  await expect(page.getByRole("heading", { name: "Vocabulary", level: 1 })).toBeVisible();
  const aspect = page.getByRole("article", { name: label });
  const terms = aspect.getByRole("list", { name: `Terms of ${label}` });
  const term = (word: string) => terms.getByRole("listitem").filter({ has: page.getByText(word, { exact: true }) });
  await expect(term("catgut")).toContainText("used in 1 observation");

  // A new term: the key follows the label.
  await aspect.getByRole("button", { name: "Add a term" }).click();
  const add = aspect.getByRole("form", { name: `Add a term to ${label}` });
  await add.getByLabel("Label").fill("Bone inlay");
  await expect(add.getByLabel("Key")).toHaveValue("bone_inlay");
  await add.getByLabel("Description").fill("Frets of bone set into the fingerboard.");
  await add.getByRole("button", { name: "Add term" }).click();
  await expect(add.getByText(`Added Bone inlay to ${label}.`)).toBeVisible();
  await expect(term("Bone inlay")).toContainText("Frets of bone set into the fingerboard.");

  // The same label again is refused on its field; what was typed stays.
  await add.getByLabel("Label").fill("bone inlay");
  await add.getByLabel("Key").fill("bone_again");
  await add.getByRole("button", { name: "Add term" }).click();
  await expect(add.getByText("Another term of this aspect has this label.")).toBeVisible();
  await expect(add.getByLabel("Key")).toHaveValue("bone_again");

  // Deprecate brass: it stays listed, flagged, and can be reinstated.
  await term("brass").getByRole("button", { name: "Deprecate brass" }).click();
  await expect(term("brass").getByText("deprecated", { exact: true })).toBeVisible();
  await expect(term("brass").getByRole("button", { name: "Reinstate brass" })).toBeVisible();

  // Merge catgut into gut: deprecated brass is not offered.
  await term("catgut").getByRole("button", { name: "Merge catgut" }).click();
  const merge = term("catgut").getByRole("form", { name: "Merge catgut" });
  const target = merge.getByLabel("Merge catgut into");
  await expect(target.locator("option")).toHaveText(["Choose a term…", "gut", "Bone inlay"]);
  await target.selectOption({ label: "gut" });
  await expect(merge).toContainText("The 1 observation naming catgut will name gut instead");
  await merge.getByRole("button", { name: "Merge" }).click();
  await expect(term("catgut").getByText("Merged catgut into gut: 1 observation rewritten.")).toBeVisible();
  await expect(term("catgut").getByText("merged into gut")).toBeVisible();
  await expect(term("gut")).toContainText("used in 1 observation");
  await expect(term("catgut")).toContainText("unused");

  // The region's observation now names gut.
  const region = (await (await call(`/api/regions/${regionId}`, { jar: contributor })).json()) as { observations: { termLabel: string }[] };
  expect(region.observations.map((o) => o.termLabel)).toEqual(["gut"]);
});

test("a visitor reads the vocabulary without any edit control", async ({ page }) => {
  await page.goto("/vocabulary");
  await expect(page.getByRole("heading", { name: "Instrument", level: 2 })).toBeVisible();
  const rose = page.getByRole("article", { name: "Rose", exact: true });
  await expect(rose.getByRole("list", { name: "Terms of Rose" })).toContainText("recessed multi-layer");
  await expect(page.getByRole("article", { name: "Left hand" })).toContainText("barré");
  await expect(page.getByRole("button", { name: /^(Edit|Deprecate|Merge|Delete)/ })).toHaveCount(0);
  await expect(page.getByText("Add an aspect")).toHaveCount(0);
  await expect(page.getByText(/used in \d+ observation|unused/)).toHaveCount(0);
});
