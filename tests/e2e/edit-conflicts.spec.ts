import { expect, test, type Page } from "@playwright/test";
import { DEMO, signedIn, unique } from "../support/app";
import { addCollection, aspectWithTerms, patch, startDossier, storedAspect, storedCollection, storedDossier, storedTerm } from "../support/versioned-records";
import { ConflictPanel } from "./pages/conflict-panel";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

// The aspect, term, collection and dossier forms save with the version they were opened at. Here the
// record changes underneath an open form: the save must be refused and shown (never applied), nothing
// stored may change until the person chooses, and either choice must then work. Also a refusal only
// the server can make, which must land on its field and keep what was typed.

// Each test signs in, opens a page and saves a few times; on a busy machine that nears the default 30 s.
test.describe.configure({ timeout: 60_000 });

async function signInAs(page: Page, email: string, role: string) {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(email);
  await expectSignedIn(page, role);
}

// An aspect's card on the vocabulary page, found by its key, which (unlike its label) no edit changes.
const card = (page: Page, aspectKey: string) => page.getByRole("article").filter({ has: page.getByText(aspectKey, { exact: true }) });

test("aspect: an editor's stale save shows both versions; loading theirs puts them in the form and the next save goes through", async ({ page }) => {
  const [editor, admin] = await Promise.all([signedIn(DEMO.editor), signedIn(DEMO.admin)]);
  const aspect = await aspectWithTerms(editor, []);
  await signInAs(page, DEMO.editor, "editor");
  await page.goto("/vocabulary");
  const entry = card(page, aspect.key);
  await entry.getByRole("button", { name: `Edit ${aspect.label}`, exact: true }).click();
  const form = entry.getByRole("form", { name: `Edit aspect ${aspect.label}` });
  await expect(form.getByLabel("Label")).toHaveValue(aspect.label);
  await form.getByLabel("Description").fill("Boxwood, from the X-ray.");
  await form.getByLabel("Section").selectOption("player");

  // Meanwhile an administrator renames and redescribes it.
  const theirLabel = unique("Peg wood");
  await patch(admin, `/api/vocabulary/aspects/${aspect.id}`, { version: aspect.version, label: theirLabel, description: "Plum or boxwood." });

  await form.getByRole("button", { name: "Save aspect" }).click();
  const conflict = new ConflictPanel(entry, "aspect");
  await conflict.expectShown();
  // The kind did not differ, so it has no row; the section reads as its label, not its code.
  await conflict.expectFields(["Label", "Description", "Section"]);
  await conflict.expectRow("Label", theirLabel, aspect.label);
  await conflict.expectRow("Description", "Plum or boxwood.", "Boxwood, from the X-ray.");
  await conflict.expectRow("Section", "Instrument", "Player");
  await expect(form.getByLabel("Description")).toHaveValue("Boxwood, from the X-ray.");
  expect(await storedAspect(editor, aspect.id)).toMatchObject({ label: theirLabel, description: "Plum or boxwood.", section: "instrument", version: aspect.version + 1 });

  await conflict.loadTheirs();
  await conflict.expectGone();
  const open = entry.getByRole("form", { name: /^Edit aspect / });
  await expect(open.getByLabel("Label")).toHaveValue(theirLabel);
  await expect(open.getByLabel("Description")).toHaveValue("Plum or boxwood.");
  await expect(open.getByLabel("Section")).toHaveValue("instrument");
  await expect(entry.getByRole("heading", { level: 3 })).toHaveText(theirLabel);

  // Saving from their version names their version, so it is accepted.
  await open.getByLabel("Description").fill("Plum or boxwood; one peg replaced in ebony.");
  await open.getByRole("button", { name: "Save aspect" }).click();
  await expect(entry.getByRole("form")).toHaveCount(0);
  await expect(entry).toContainText("Plum or boxwood; one peg replaced in ebony.");
  expect(await storedAspect(editor, aspect.id)).toMatchObject({
    label: theirLabel,
    description: "Plum or boxwood; one peg replaced in ebony.",
    section: "instrument",
    version: aspect.version + 2,
  });
});

test("term: after a stale save is refused, saving mine over theirs stores mine and advances the version", async ({ page }) => {
  const [editor, admin] = await Promise.all([signedIn(DEMO.editor), signedIn(DEMO.admin)]);
  const aspect = await aspectWithTerms(editor, [{ key: "boxwood", label: "Boxwood", description: "Pale, close-grained." }]);
  const term = aspect.terms[0];
  await signInAs(page, DEMO.editor, "editor");
  await page.goto("/vocabulary");
  const line = card(page, aspect.key).getByRole("listitem").filter({ has: page.getByText(term.key, { exact: true }) });
  await line.getByRole("button", { name: `Edit ${term.label}`, exact: true }).click();
  const form = line.getByRole("form", { name: `Edit term ${term.label}` });
  await form.getByLabel("Label").fill("Boxwood, stained");
  await form.getByLabel("Description").fill("Pale wood darkened to look like ebony.");

  await patch(admin, `/api/vocabulary/terms/${term.id}`, { version: term.version, label: "Box", description: "Buxus." });

  await form.getByRole("button", { name: "Save term" }).click();
  const conflict = new ConflictPanel(line, "term");
  await conflict.expectShown();
  await conflict.expectFields(["Label", "Description"]);
  await conflict.expectRow("Label", "Box", "Boxwood, stained");
  await conflict.expectRow("Description", "Buxus.", "Pale wood darkened to look like ebony.");
  expect(await storedTerm(editor, aspect.id, term.id)).toMatchObject({ label: "Box", description: "Buxus.", version: term.version + 1 });

  await conflict.saveMine();
  await expect(line.getByRole("form")).toHaveCount(0);
  await expect(line).toContainText("Boxwood, stained");
  await expect(line).toContainText("Pale wood darkened to look like ebony.");
  expect(await storedTerm(editor, aspect.id, term.id)).toMatchObject({
    label: "Boxwood, stained",
    description: "Pale wood darkened to look like ebony.",
    version: term.version + 2,
  });
});

test("term: a label another term of the aspect has (in other letter case) is refused on its field; what was typed stays and nothing is saved", async ({ page }) => {
  const editor = await signedIn(DEMO.editor);
  const aspect = await aspectWithTerms(editor, [
    { key: "ebony", label: "Ebony" },
    { key: "pearwood", label: "Pearwood", description: "Often blackened." },
  ]);
  const pear = aspect.terms.find((t) => t.key === "pearwood")!;
  await signInAs(page, DEMO.editor, "editor");
  await page.goto("/vocabulary");
  const line = card(page, aspect.key).getByRole("listitem").filter({ has: page.getByText("pearwood", { exact: true }) });
  await line.getByRole("button", { name: "Edit Pearwood", exact: true }).click();
  const form = line.getByRole("form", { name: "Edit term Pearwood" });
  // The browser's check passes: only the server knows the aspect's other labels, compared without case.
  await form.getByLabel("Label").fill("ebony");
  await form.getByLabel("Description").fill("Blackened to pass for ebony.");
  await form.getByRole("button", { name: "Save term" }).click();

  await expect(form.getByRole("alert")).toHaveText('This aspect has a term labelled "Ebony" already. Nothing was saved; your entries are still here.');
  await expect(form.getByLabel("Label")).toHaveAttribute("aria-invalid", "true");
  await expect(form.getByLabel("Label")).toHaveAccessibleDescription("Another term of this aspect has this label.");
  await expect(form.getByLabel("Label")).toHaveValue("ebony");
  await expect(form.getByLabel("Description")).toHaveValue("Blackened to pass for ebony.");
  await expect(line.getByText("Someone else saved this term")).toHaveCount(0);
  expect(await storedTerm(editor, aspect.id, pear.id)).toMatchObject({ label: "Pearwood", description: "Often blackened.", version: pear.version });

  // Corrected, the same open form saves.
  await form.getByLabel("Label").fill("Pearwood, blackened");
  await form.getByRole("button", { name: "Save term" }).click();
  await expect(line.getByRole("form")).toHaveCount(0);
  expect(await storedTerm(editor, aspect.id, pear.id)).toMatchObject({ label: "Pearwood, blackened", description: "Blackened to pass for ebony.", version: pear.version + 1 });
});

test("collection: a contributor's stale edit is refused and shown; saving mine over theirs stores mine", async ({ page }) => {
  const [contributor, editor] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor)]);
  const fields = { name: unique("Museo delle Corde"), city: "Bologna", countryCode: "IT", url: null, notes: "Open on Tuesdays." };
  const collection = await addCollection(contributor, fields);
  await signInAs(page, DEMO.contributor, "contributor");
  await page.goto(`/collections/${collection.id}/edit`);
  await expect(page.getByLabel("Name")).toHaveValue(fields.name);
  await page.getByLabel("Web address").fill("https://corde.example/visit");
  await page.getByLabel("Notes").fill("Photography without flash.");

  // An editor (who may edit any collection) saves first.
  await patch(editor, `/api/collections/${collection.id}`, { ...fields, countryCode: "FR", notes: "Closed for restoration.", version: collection.version });

  await page.getByRole("button", { name: "Save changes" }).click();
  const conflict = new ConflictPanel(page.getByRole("main"), "collection");
  await conflict.expectShown();
  await conflict.expectFields(["Country", "Web address", "Notes"]);
  // A country reads by its name (ISO 3166-1: FR France, IT Italy), as the form's list shows it.
  await conflict.expectRow("Country", "France", "Italy");
  await conflict.expectRow("Web address", "—", "https://corde.example/visit");
  await conflict.expectRow("Notes", "Closed for restoration.", "Photography without flash.");
  expect(await storedCollection(contributor, collection.id)).toMatchObject({ notes: "Closed for restoration.", url: null, version: collection.version + 1 });

  await conflict.saveMine();
  await expect(page).toHaveURL(new RegExp(`/collections/${collection.id}$`));
  await expect(page.getByRole("heading", { level: 1, name: fields.name })).toBeVisible();
  await expect(page.getByText("Photography without flash.")).toBeVisible();
  expect(await storedCollection(contributor, collection.id)).toMatchObject({
    name: fields.name,
    city: "Bologna",
    countryCode: "IT",
    url: "https://corde.example/visit",
    notes: "Photography without flash.",
    version: collection.version + 2,
  });
});

test("collection: the name of another collection in the same city is refused on the name field; the entries stay and nothing is saved", async ({ page }) => {
  const contributor = await signedIn(DEMO.contributor);
  const add = (name: string) => addCollection(contributor, { name, city: "Lucca", countryCode: null, url: null, notes: "Seen in 2024." });
  const taken = await add(unique("Raccolta Boccherini"));
  const mine = await add(unique("Raccolta Puccini"));
  await signInAs(page, DEMO.contributor, "contributor");
  await page.goto(`/collections/${mine.id}/edit`);
  await page.getByLabel("Name").fill(taken.name);
  await page.getByLabel("Notes").fill("Merged with the other one?");
  await page.getByRole("button", { name: "Save changes" }).click();

  await expect(page.getByRole("main").getByRole("alert")).toHaveText("A collection of that name in that city exists already. Nothing was saved; your entries are still here.");
  await expect(page.getByLabel("Name")).toHaveAttribute("aria-invalid", "true");
  await expect(page.getByLabel("Name")).toHaveAccessibleDescription("Already in the archive.");
  await expect(page.getByLabel("Name")).toHaveValue(taken.name);
  await expect(page.getByLabel("Notes")).toHaveValue("Merged with the other one?");
  await expect(page).toHaveURL(new RegExp(`/collections/${mine.id}/edit$`));
  expect(await storedCollection(contributor, mine.id)).toMatchObject({ name: mine.name, notes: "Seen in 2024.", version: mine.version });
});

test("dossier: the owner's second window saved first; loading their version shows it, and editing from there saves", async ({ page }) => {
  const owner = await signedIn(DEMO.reader);
  const started = { title: unique("Thumb-under studies"), description: "First notes." };
  const dossier = await startDossier(owner, started);
  await signInAs(page, DEMO.reader, "reader");
  const other = await page.context().newPage();
  for (const window of [page, other]) {
    await window.goto(`/dossiers/${dossier.id}`);
    await window.getByRole("button", { name: "Edit title and description" }).click();
  }

  const theirTitle = unique("Thumb-under, with sources");
  await other.getByLabel("Title").fill(theirTitle);
  await other.getByLabel("Description").fill("Sources gathered for the lesson.");
  await other.getByRole("button", { name: "Save title and description" }).click();
  await expect(other.getByRole("heading", { level: 1 })).toHaveText(theirTitle);

  await page.getByLabel("Description").fill("Right hand only.");
  await page.getByRole("button", { name: "Save title and description" }).click();
  const conflict = new ConflictPanel(page.getByRole("main"), "dossier");
  await conflict.expectShown();
  await conflict.expectFields(["Title", "Description"]);
  await conflict.expectRow("Title", theirTitle, started.title);
  await conflict.expectRow("Description", "Sources gathered for the lesson.", "Right hand only.");
  await expect(page.getByLabel("Description")).toHaveValue("Right hand only.");
  expect(await storedDossier(owner, dossier.id)).toMatchObject({ title: theirTitle, description: "Sources gathered for the lesson.", version: dossier.version + 1 });

  // Their version is the page reloaded: the heading and, reopened, the form show it.
  await conflict.loadTheirs();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText(theirTitle);
  await conflict.expectGone();
  await page.getByRole("button", { name: "Edit title and description" }).click();
  await expect(page.getByLabel("Title")).toHaveValue(theirTitle);
  await expect(page.getByLabel("Description")).toHaveValue("Sources gathered for the lesson.");
  await page.getByLabel("Description").fill("Sources gathered for the lesson; right hand only.");
  await page.getByRole("button", { name: "Save title and description" }).click();
  await expect(page.getByRole("button", { name: "Edit title and description" })).toBeVisible();
  await expect(page.getByRole("main")).toContainText("Sources gathered for the lesson; right hand only.");
  expect(await storedDossier(owner, dossier.id)).toMatchObject({
    title: theirTitle,
    description: "Sources gathered for the lesson; right hand only.",
    version: dossier.version + 2,
  });
  await other.close();
});
