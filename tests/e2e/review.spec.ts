import { expect, test } from "@playwright/test";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, signedIn } from "../support/app";
import { photographedSource, vocabulary } from "../support/evidence";
import { ReviewDesk, ReviewRegion } from "./pages/review-page";
import { expectSignedIn, SignInPage } from "./pages/sign-in-page";

const SHOTS = ".data/shots";

let sourceTitle: string;
let first: RegionView;
let second: RegionView;

// A contributor marks two regions on a new photograph and proposes them, through the API.
test.beforeAll(async () => {
  test.setTimeout(120_000);
  const contributor = await signedIn(DEMO.contributor);
  const vocab = await vocabulary(contributor);
  const { sourceId, imageId } = await photographedSource(contributor, 1600, 1200);
  sourceTitle = ((await (await call(`/api/sources/${sourceId}`, { jar: contributor })).json()) as { source: { title: string } }).source.title;
  const mark = async (shape: Record<string, number>, observations: Record<string, unknown>[]) => {
    const created = (await (await call(`/api/images/${imageId}/regions`, { jar: contributor, json: { shape: { kind: "rectangle", ...shape }, observations } })).json()) as RegionView;
    const res = await call(`/api/regions/${created.id}/propose`, { jar: contributor, json: { version: created.version } });
    expect(res.status).toBe(200);
    return (await res.json()) as RegionView;
  };
  first = await mark({ x: 100, y: 100, w: 500, h: 400 }, [
    { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "possible" },
  ]);
  second = await mark({ x: 800, y: 500, w: 300, h: 300 }, [
    { aspectId: vocab.aspect("rose"), termId: vocab.term("rose", "recessed_multi_layer"), confidence: "probable" },
    { aspectId: vocab.aspect("peg_count"), count: 10, confidence: "certain" },
  ]);
});

test("an editor returns one proposed region with a comment and vets the next from the review desk", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.editor);
  await expectSignedIn(page, "editor");

  const desk = new ReviewDesk(page);
  await desk.openFromHeader();
  await desk.filterBySource(sourceTitle);
  await expect(desk.entries).toHaveCount(2);
  await expect(desk.entry(first.id)).toContainText("first review");
  await expect(desk.entry(second.id)).toContainText("Rose: recessed multi-layer (probable)");
  await page.screenshot({ path: `${SHOTS}/review-desk.png`, fullPage: true });

  await desk.open(first.id);
  const review = new ReviewRegion(page);
  await review.expectRegion(first.id);
  await expect(page.getByRole("heading", { name: "First review" })).toBeVisible();
  await expect(page.getByRole("img", { name: /The region, version 1/ })).toBeVisible();

  // A return needs a comment: without one, nothing is sent and the field says why.
  await page.getByRole("button", { name: "Return to author" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "Say why the region goes back to its author." })).toBeVisible();
  await expect(review.comment).toHaveAttribute("aria-invalid", "true");
  await page.screenshot({ path: `${SHOTS}/review-region.png`, fullPage: true });
  await review.returnToAuthor("The hand is blurred here; mark only the fingers and say possible.");

  // After deciding, the desk's next region under the same filter opens.
  await review.expectRegion(second.id);
  await expect(page).toHaveURL(/source=/);
  await review.discuss("The rose looks recessed; the peg count fits five courses.");
  await review.vet();

  // Nothing else waits under the filter: back on the desk, which says so.
  await expect(page.getByRole("heading", { level: 1, name: "Review desk" })).toBeVisible();
  await expect(page.getByText(/Nothing else by others waits for review under these filters/)).toBeVisible();

  const editor = await signedIn(DEMO.editor);
  const state = async (id: number) => ((await (await call(`/api/regions/${id}`, { jar: editor })).json()) as RegionView).state;
  expect(await state(first.id)).toBe("returned");
  expect(await state(second.id)).toBe("vetted");
  const thread = (await (await call(`/api/regions/${first.id}/comments`, { jar: editor })).json()) as { entries: { kind: string; body: string | null }[] };
  expect(thread.entries).toEqual([expect.objectContaining({ kind: "review", body: "The hand is blurred here; mark only the fingers and say possible." })]);
});

test("a contributor sees no review desk and is told why at its address", async ({ page }) => {
  const signIn = new SignInPage(page);
  await signIn.open();
  await signIn.withPassword(DEMO.contributor);
  await expectSignedIn(page, "contributor");
  await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Review desk" })).toHaveCount(0);
  await page.goto("/review");
  await expect(page.getByText("The review desk is for editors.")).toBeVisible();
});
