// The invented review histories of the demo regions, picture by picture, and what each whole picture
// says about setting, company and trustworthiness. A step before the last is always one an editor
// decided on (vetted or returned): only decided versions are frozen and followed by a new one.
import type { RegionShape, RegionState } from "../../schema/regions";
import type { PlannedObservation } from "./observe";

export type Part = "instrument" | "body" | "head" | "rose" | "bridge" | "rightHand" | "leftHand" | "scene" | "sky" | "tambourine" | "viol";

type Content = { shape: RegionShape; label: string; observations: PlannedObservation[] };
/** What this version said instead of the part's final content (an earlier, less careful reading). */
type Edit = (content: Content) => Content;
export type Step = { state: RegionState; comment?: string; edit?: Edit };
type Story = { part: Part; author?: "contributor" | "editor"; steps: Step[] };

const drop = (aspect: string, term?: string): Edit => (c) => ({ ...c, observations: c.observations.filter((o) => o.aspect !== aspect || (term !== undefined && o.term !== term)) });
const recount = (aspect: string, count: number): Edit => (c) => ({ ...c, observations: c.observations.map((o) => (o.aspect === aspect ? { ...o, count, note: undefined } : o)) });
const annotate = (aspect: string, note: string): Edit => (c) => ({ ...c, observations: c.observations.map((o) => (o.aspect === aspect ? { ...o, note } : o)) });
// A first rectangle drawn tight and a little off, before the author took in the wrist.
const tighter: Edit = (c) => ({ ...c, shape: c.shape.kind === "rectangle" ? { kind: "rectangle", x: c.shape.x + 40, y: c.shape.y + 30, w: c.shape.w - 90, h: c.shape.h - 70 } : c.shape });
const and = (...edits: Edit[]): Edit => (c) => edits.reduce((acc, e) => e(acc), c);

const draft: Step[] = [{ state: "draft" }];
const proposed: Step[] = [{ state: "proposed" }];
const vetted = (comment?: string): Step[] => [{ state: "vetted", comment }];
const returned = (comment: string): Step[] => [{ state: "returned", comment }];

export const STORIES: Record<string, Story[]> = {
  "guitarist-tavern-table": [
    { part: "instrument", steps: vetted("Counts agree with the head: ten pegs, nine strings.") },
    { part: "body", steps: vetted() },
    { part: "rose", steps: vetted() },
    { part: "head", steps: vetted() },
    // Vetted, then refined: the new version waits for review while readers still see the first.
    { part: "rightHand", steps: [{ state: "vetted", edit: and(tighter, drop("right_hand_fingers")) }, { state: "proposed" }] },
    { part: "leftHand", steps: vetted("The chord shape is clear at full zoom.") },
    { part: "bridge", steps: proposed },
    { part: "scene", steps: vetted() },
  ],
  "serenade-balcony": [
    { part: "instrument", steps: vetted() },
    { part: "rose", steps: vetted() },
    {
      part: "rightHand",
      steps: returned("Curled fingers over the rose read as picking to me as much as strumming. Record what decides it, or lower the confidence and add “both”."),
    },
    { part: "leftHand", steps: proposed },
    { part: "head", steps: draft },
    { part: "bridge", steps: vetted() },
    { part: "scene", steps: proposed },
  ],
  "lute-player-songbook": [
    { part: "instrument", steps: vetted() },
    { part: "body", steps: proposed },
    { part: "rightHand", steps: vetted("The little finger planted by the bridge is clear in the chalk.") },
    { part: "rose", steps: proposed },
    // Returned with a miscount, corrected and vetted.
    { part: "head", steps: [{ state: "returned", comment: "I count thirteen pegs, not twelve: look again at the far end of the pegbox.", edit: recount("peg_count", 12) }, { state: "vetted" }] },
    { part: "leftHand", steps: draft },
    { part: "scene", steps: vetted() },
  ],
  "title-page-cittern-viol": [
    { part: "instrument", steps: vetted() },
    { part: "head", steps: proposed },
    { part: "rose", steps: vetted() },
    { part: "bridge", steps: draft },
    { part: "viol", steps: [{ state: "withdrawn", edit: annotate("depiction", "A bowed bass viol: withdrawn, it is no evidence for plucked instruments.") }] },
    { part: "scene", steps: vetted() },
  ],
  "village-feast-dancers": [
    { part: "instrument", steps: proposed },
    {
      part: "rightHand",
      steps: [{ state: "withdrawn", edit: annotate("right_hand_fingers", "Withdrawn until the hand is checked against the painting this print reverses.") }],
    },
    { part: "leftHand", steps: proposed },
    { part: "rose", steps: proposed },
    { part: "scene", steps: proposed },
  ],
  "young-woman-tuning": [
    { part: "instrument", steps: vetted() },
    { part: "head", steps: vetted("Good: the empty string hole of the tenth peg shows at full zoom.") },
    { part: "leftHand", steps: vetted() },
    { part: "rightHand", steps: proposed },
    // Vetted, then reopened: a new draft the author has not proposed yet.
    { part: "rose", steps: [{ state: "vetted", edit: drop("rose_material") }, { state: "draft" }] },
    { part: "body", steps: draft },
    { part: "scene", steps: vetted() },
  ],
  "street-musicians-fountain": [
    { part: "instrument", steps: vetted("The slant of the frets near the body is convincing.") },
    { part: "rightHand", steps: vetted() },
    { part: "leftHand", steps: [{ state: "vetted", edit: drop("left_hand", "thumb_over_neck") }, { state: "proposed" }] },
    { part: "tambourine", steps: proposed },
    {
      part: "sky",
      steps: returned("Is the whole band of sky overpainted, or only the part over the wall on the left? Narrow the region or say so in the note."),
    },
    { part: "rose", steps: draft },
    { part: "scene", steps: vetted() },
  ],
  "tile-guitar-player": [
    { part: "instrument", steps: proposed },
    { part: "rose", steps: vetted() },
    { part: "rightHand", steps: [{ state: "withdrawn", edit: annotate("right_hand_fingers", "Withdrawn: on a tile the hand is the painter's formula, not an observation.") }] },
    { part: "scene", steps: draft },
  ],
  // The source itself is still a draft: its regions are work in progress too.
  "theorbo-music-room": [
    { part: "instrument", steps: draft },
    { part: "head", steps: draft },
    { part: "rose", steps: draft },
    { part: "rightHand", steps: draft },
    { part: "leftHand", steps: draft },
  ],
  "tapestry-vihuela": [
    { part: "instrument", steps: vetted() },
    { part: "body", steps: vetted() },
    {
      part: "rightHand",
      steps: returned("In a weaving the fingers follow the cartoon’s conventions: lower the technique to “possible” or say why you trust it."),
    },
    { part: "rose", steps: proposed },
    { part: "head", steps: vetted() },
    // The editor's own region: another editor (here the admin) must decide it.
    { part: "scene", author: "editor", steps: proposed },
  ],
};

const o = (aspect: string, term: string, confidence: PlannedObservation["confidence"], note?: string): PlannedObservation => ({ aspect, term, confidence, note });

export const SCENE_CONTEXT: Record<string, PlannedObservation[]> = {
  "guitarist-tavern-table": [
    o("setting", "tavern", "certain"),
    o("ensemble", "solo", "probable", "Two drinkers listen; neither sings."),
    o("depiction", "from_life", "probable", "The hands are observed closely; the frets are summary."),
    o("condition", "sound", "probable"),
  ],
  "serenade-balcony": [
    o("setting", "street", "certain"),
    o("ensemble", "with_voice", "possible", "He plays up to a woman at a window; whether he sings cannot be seen."),
    o("depiction", "copy", "probable", "A workshop replica of a lost composition."),
  ],
  "lute-player-songbook": [
    o("setting", "domestic", "probable"),
    o("ensemble", "with_voice", "possible", "An open songbook lies on the table."),
    o("depiction", "from_life", "probable"),
  ],
  "title-page-cittern-viol": [
    o("setting", "allegory", "certain"),
    o("depiction", "allegorical", "certain", "The instruments are emblems hung from a garland on a title page."),
  ],
  "village-feast-dancers": [
    o("setting", "street", "certain", "A village green with houses and a church tower."),
    o("ensemble", "with_dance", "certain"),
    o("depiction", "copy", "certain", "A print after a painting, reversed in the printing."),
  ],
  "young-woman-tuning": [
    o("setting", "domestic", "probable"),
    o("ensemble", "solo", "certain"),
    o("depiction", "from_life", "possible"),
  ],
  "street-musicians-fountain": [
    o("setting", "street", "certain"),
    o("ensemble", "with_other_instruments", "certain"),
    o("depiction", "from_life", "possible"),
    o("condition", "sound", "probable", "The figures are in good condition; only the sky is overpainted."),
  ],
  "tile-guitar-player": [o("ensemble", "solo", "probable"), o("depiction", "schematic", "certain", "Tile decoration: strings and frets drawn by formula.")],
  "theorbo-music-room": [o("setting", "domestic", "probable"), o("depiction", "copy", "probable")],
  "tapestry-vihuela": [
    o("setting", "court", "possible", "A millefleurs ground: a courtly convention rather than a place."),
    o("ensemble", "solo", "certain"),
    o("depiction", "schematic", "probable"),
    o("condition", "damaged", "probable", "Ragged edges: a fragment cut from a larger hanging."),
  ],
};
