// The light table page against the running app: regions from the link in the link's order, each with
// its caption in words; what a reader may not see is withheld and only counted; proposed work appears
// only on request, marked as not reviewed. Data is made through the API as the demo accounts.
import { beforeAll, describe, expect, it } from "vitest";
import { readDating } from "@/lib/dating";
import { observationSentence, type RegionView } from "@/lib/regions/types";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";
import { regionAt, visibleText } from "../support/light-table";

let contributor: Jar, editor: Jar, reader: Jar;
let vocab: Vocabulary;
let titles: { first: string; second: string };
let place: { name: string; line: RegExp };
let collectionName: string;
let hand: RegionView, rose: RegionView, proposed: RegionView, draft: RegionView;
const labels = { hand: unique("hand"), rose: unique("rose"), proposed: unique("pending"), draft: unique("unfinished") };
const NO_SUCH_REGION = 987_654_321;

async function page(jar: Jar | undefined, query: string) {
  const res = await call(`/light-table${query}`, { jar });
  const html = await res.text();
  return { status: res.status, html, text: visibleText(html) };
}

/** Where each region's place on the table starts in the HTML, by its id. */
const positionOf = (html: string, id: number) => html.indexOf(`data-region-id="${id}"`);

beforeAll(async () => {
  [contributor, editor, reader] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.reader)]);
  vocab = await vocabulary();
  collectionName = unique("Museum of Strings");
  const collection = await call("/api/collections", { jar: contributor, json: { name: collectionName, city: "Lyon", countryCode: "FR" } });
  const collectionId = ((await collection.json()) as { collection: { id: number } }).collection.id;
  const found = await call("/api/places?q=Lyon&country=FR", { jar: contributor });
  const lyon = ((await found.json()) as { places: { id: number; name: string }[] }).places[0];
  place = { name: lyon.name, line: new RegExp(`${lyon.name} — (?:[^,]+, )?France`) };
  titles = { first: unique("Guitar player"), second: unique("Concert") };
  const [one, two] = await Promise.all([
    photographedSource(contributor, 1200, 900, {
      title: titles.first,
      artist: "Anna Reiter",
      attributionQualifier: "workshop_of",
      datingEdtf: "1640/1660",
      placeId: lyon.id,
      collectionId,
      accessionNumber: "INV-2041",
    }),
    photographedSource(contributor, 1000, 800, { title: titles.second }),
  ]);
  const accounts = { author: contributor, editor };
  const strumming = { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "probable" };
  const pegs = { aspectId: vocab.aspect("peg_count"), count: 10, confidence: "certain" };
  hand = await regionAt(accounts, one.imageId, "vetted", { box: { x: 100, y: 100, w: 300, h: 400 }, label: labels.hand, observations: [strumming, pegs] });
  rose = await regionAt(accounts, two.imageId, "vetted", { box: { x: 400, y: 200, w: 200, h: 200 }, label: labels.rose, observations: [strumming] });
  proposed = await regionAt(accounts, one.imageId, "proposed", { box: { x: 600, y: 300, w: 250, h: 120 }, label: labels.proposed, observations: [strumming] });
  draft = await regionAt(accounts, two.imageId, "draft", { box: { x: 50, y: 50, w: 120, h: 160 }, label: labels.draft, observations: [strumming] });
}, 180_000);

describe("the light table for a reader", () => {
  it("shows the vetted regions with their captions: source, attribution, date in words, place, collection, observations, review state", async () => {
    const { status, html, text } = await page(reader, `?r=${hand.id},${rose.id}`);
    expect(status).toBe(200);
    expect(text).toContain("Light table");
    expect(positionOf(html, hand.id)).toBeGreaterThan(0);
    expect(html).toContain(`href="/sources/${hand.sourceId}"`);
    expect(text).toContain(titles.first);
    expect(text).toContain("Workshop of Anna Reiter");
    const dating = readDating("1640/1660");
    expect(dating.ok && dating.words).toBeTruthy();
    expect(text).toContain(dating.ok ? dating.words : "");
    expect(text).toMatch(place.line);
    expect(text).toContain(`${collectionName}, Lyon, INV-2041`);
    // The caption says the observations as the region API answers them, one sentence each.
    const seen = (await (await call(`/api/regions/${hand.id}`, { jar: reader })).json()) as RegionView;
    const sentences = seen.observations.map(observationSentence);
    expect(sentences).toHaveLength(2);
    for (const s of sentences) expect(text).toContain(s);
    expect(text).toContain("Right-hand technique: strumming (probable)");
    // The second source has no date, place or collection: the caption says so rather than leaving gaps.
    expect(text).toContain(titles.second);
    expect(text).toContain("Not dated");
    expect(text).toContain("Holding collection not recorded");
    expect(text.match(/Vetted/g)?.length).toBeGreaterThanOrEqual(2);
    expect(text).not.toMatch(/regions? (is|are) not shown/);
  });

  it("keeps the order of the link", async () => {
    const forward = (await page(reader, `?r=${hand.id},${rose.id}`)).html;
    expect(positionOf(forward, hand.id)).toBeLessThan(positionOf(forward, rose.id));
    const backward = (await page(reader, `?r=${rose.id},${hand.id}`)).html;
    expect(positionOf(backward, rose.id)).toBeGreaterThan(0);
    expect(positionOf(backward, rose.id)).toBeLessThan(positionOf(backward, hand.id));
  });

  it("withholds unvetted and unknown regions, saying only how many", async () => {
    const { html, text } = await page(reader, `?r=${rose.id},${proposed.id},${hand.id},${draft.id},${NO_SUCH_REGION}`);
    expect(text).toContain("3 regions are not shown: they do not exist or you may not see them.");
    expect(positionOf(html, rose.id)).toBeLessThan(positionOf(html, hand.id));
    // Nothing of the withheld regions reaches the page, not even in the data for the browser.
    for (const label of [labels.proposed, labels.draft]) expect(html).not.toContain(label);
    expect(positionOf(html, proposed.id)).toBe(-1);
    expect(positionOf(html, draft.id)).toBe(-1);
  });

  it("shows proposed work when the reader asks for it, marked as not yet reviewed; drafts stay private", async () => {
    const { html, text } = await page(reader, `?r=${proposed.id},${hand.id},${draft.id}&proposed=1`);
    expect(positionOf(html, proposed.id)).toBeGreaterThan(0);
    expect(positionOf(html, proposed.id)).toBeLessThan(positionOf(html, hand.id));
    expect(text).toContain(labels.proposed);
    expect(text).toContain("Proposed, not yet reviewed");
    expect(text).toContain("Proposed work is included");
    expect(text).toContain("1 region is not shown: it does not exist or you may not see it.");
    expect(html).not.toContain(labels.draft);
  });

  it("gives visitors vetted work only, even when the link asks for proposed work", async () => {
    const { html, text } = await page(undefined, `?r=${proposed.id},${hand.id}&proposed=1`);
    expect(positionOf(html, hand.id)).toBeGreaterThan(0);
    expect(html).not.toContain(labels.proposed);
    expect(text).toContain("Proposed work is shown to signed-in readers only");
    expect(text).toContain("1 region is not shown");
  });

  it("shows authors their own draft, marked as such", async () => {
    const { html, text } = await page(contributor, `?r=${draft.id}`);
    expect(positionOf(html, draft.id)).toBeGreaterThan(0);
    expect(text).toContain("Draft, not yet proposed for review");
  });

  it("counts entries of the link that are not region ids, and is an empty table without any", async () => {
    expect((await page(reader, `?r=${hand.id},abc`)).text).toContain("1 region is not shown");
    const empty = await page(undefined, "");
    expect(empty.status).toBe(200);
    expect(empty.text).toContain("No regions on the table yet");
  });

  it("is linked from the site header for everyone", async () => {
    const { html } = await page(undefined, "");
    expect(html).toMatch(/<a[^>]*href="\/light-table"[^>]*>Light table<\/a>/);
  });
});
