// Plans the demo regions of one picture: which parts are marked, by whom, with what observations, and
// the review history of each (draft, proposed, vetted, returned, withdrawn, and revisions of vetted or
// returned work). Pure and deterministic: the same scene always gives the same plan; times are hours
// before the seed runs, so the review desk shows a believable past.
import type { SceneSpec } from "../images/types";
import type { RegionShape, RegionState } from "../../schema/regions";
import {
  bodyObservations,
  bridgeObservations,
  headObservations,
  instrumentObservations,
  leftHandObservations,
  rightHandObservations,
  roseObservations,
  type PlannedObservation,
} from "./observe";
import { bodyOutline, circleAround, rectAround, topBand, wholePicture } from "./shapes";
import { SCENE_CONTEXT, STORIES, type Part, type Step } from "./stories";

export type { Part, PlannedObservation };
export type Account = "contributor" | "editor" | "admin";

export type PlannedReview = { reviewer: Account; decision: "vetted" | "returned"; comment: string | null };

export type PlannedVersion = {
  number: number;
  state: RegionState;
  shape: RegionShape;
  label: string;
  observations: PlannedObservation[];
  createdAgo: number;
  proposedAgo: number | null;
  decidedAgo: number | null;
  /** When this version last changed (its decision, its withdrawal, or its creation). */
  changedAgo: number;
  review: PlannedReview | null;
};

export type PlannedRegion = { key: string; part: Part; author: Account; versions: PlannedVersion[] };

type Content = { shape: RegionShape; label: string; observations: PlannedObservation[] };

const INSTRUMENT_NAMES = { guitar: "Five-course guitar", vihuela: "Vihuela", lute: "Lute", theorbo: "Theorbo", cittern: "Cittern" } as const;

/** The part as the evidence shows it: its shape, a label a scholar would write, and what it shows. */
export function partContent(scene: SceneSpec, part: Part): Content {
  const e = scene.evidence;
  const image = e.image;
  const name = INSTRUMENT_NAMES[scene.instrument.kind];
  const other = (kind: string) => {
    const found = e.others.find((o) => o.kind === kind);
    if (!found) throw new Error(`scene ${scene.slug} shows no ${kind}`);
    return rectAround(found.rect, image, 0.03);
  };
  switch (part) {
    case "instrument":
      return { shape: rectAround(e.instrument.rect, image, 0.03), label: `${name}, whole instrument`, observations: instrumentObservations(scene) };
    case "body":
      return { shape: bodyOutline(scene), label: `${name}, outline of the soundboard`, observations: bodyObservations(scene) };
    case "head":
      return { shape: rectAround(e.head.rect, image), label: scene.instrument.kind === "lute" || scene.instrument.kind === "theorbo" ? "Pegbox" : "Head and pegs", observations: headObservations(scene) };
    case "rose":
      return { shape: circleAround(e.rose.rect), label: "Rose", observations: roseObservations(scene) };
    case "bridge":
      return { shape: rectAround(e.bridge.rect, image, 0.1), label: "Bridge", observations: bridgeObservations(scene) };
    case "rightHand":
      return { shape: rectAround(e.rightHand!.rect, image), label: e.rightHand!.action === "strum" ? "Right hand, strumming" : "Right hand, plucking", observations: rightHandObservations(scene) };
    case "leftHand":
      return { shape: rectAround(e.leftHand!.rect, image), label: e.leftHand!.action === "turn-peg" ? "Left hand turning a peg" : "Left hand on the neck", observations: leftHandObservations(scene) };
    case "scene":
      return { shape: wholePicture(image), label: "Whole picture: setting and company", observations: SCENE_CONTEXT[scene.slug] ?? [] };
    case "sky":
      return {
        shape: topBand(image, 0.055),
        label: "Sky above the wall",
        observations: [{ aspect: "condition", term: "overpainted", confidence: "probable", note: "Flatter paint with a different crack pattern across the band of sky." }],
      };
    case "tambourine":
      return {
        shape: other("tambourine"),
        label: "Boy with a tambourine",
        observations: [{ aspect: "ensemble", term: "with_other_instruments", confidence: "certain", note: "A boy beats a tambourine beside the guitarist." }],
      };
    case "viol":
      return {
        shape: other("viol"),
        label: "Bass viol on the garland",
        // Not an instrument type: the stringing check reads every type on a source as the same instrument.
        observations: [{ aspect: "depiction", term: "allegorical", confidence: "probable", note: "A bowed bass viol hung beside the cittern as its emblematic companion." }],
      };
  }
}

const reviewerOf = (author: Account): Account => (author === "editor" ? "admin" : "editor");

/** Turns a story of steps into versions with times: each step's version is frozen once decided. */
function versionsOf(content: Content, steps: Step[], author: Account, start: number): PlannedVersion[] {
  let clock = start;
  return steps.map((step, i): PlannedVersion => {
    const own = step.edit ? step.edit(content) : content;
    const createdAgo = clock;
    const proposedAgo = step.state === "draft" ? null : createdAgo - 6;
    const decided = step.state === "vetted" || step.state === "returned";
    const decidedAgo = decided ? proposedAgo! - 30 : null;
    const changedAgo = decidedAgo ?? (step.state === "withdrawn" ? proposedAgo! - 10 : (proposedAgo ?? createdAgo));
    clock = changedAgo - 20;
    return {
      number: i + 1,
      state: step.state,
      ...own,
      createdAgo,
      proposedAgo,
      decidedAgo,
      changedAgo,
      review: decided ? { reviewer: reviewerOf(author), decision: step.state as "vetted" | "returned", comment: step.comment ?? null } : null,
    };
  });
}

/** Every planned region of a demo picture (none for a scene the stories do not cover). */
export function planDemoRegions(scene: SceneSpec, sceneIndex: number): PlannedRegion[] {
  const stories = STORIES[scene.slug] ?? [];
  // Older pictures first: each picture's work starts two days after the previous one's.
  const base = 24 * (30 - 2 * sceneIndex);
  return stories.map((story, r) => {
    const author = story.author ?? "contributor";
    return {
      key: `${scene.slug}/${story.part}`,
      part: story.part,
      author,
      versions: versionsOf(partContent(scene, story.part), story.steps, author, base - 3 * r),
    };
  });
}

/** The region's own columns, as the regions API keeps them: the state of its working version. */
export function regionSummary(region: PlannedRegion) {
  const working = region.versions[region.versions.length - 1];
  const vetted = [...region.versions].reverse().find((v) => v.state === "vetted") ?? null;
  return {
    state: working.state,
    workingNumber: working.number,
    vettedNumber: vetted?.number ?? null,
    proposedAgo: working.state === "proposed" ? working.proposedAgo : null,
    createdAgo: region.versions[0].createdAgo,
    updatedAgo: working.changedAgo,
  };
}
