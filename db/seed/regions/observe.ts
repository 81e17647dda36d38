// What a careful contributor would record about each part of a demo picture, read from the evidence
// the drawing code kept (so counts, rose, bridge and hands match what is drawn). Pure.
import { HOLDS } from "../images/player";
import type { SceneSpec, Stop } from "../images/types";
import type { Confidence } from "../../schema/regions";

export type PlannedObservation = { aspect: string; term?: string; count?: number; text?: string; confidence: Confidence; note?: string };

const WORDS = ["no", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten", "eleven", "twelve", "thirteen", "fourteen"];
const word = (n: number) => WORDS[n] ?? String(n);
const ORDINALS = ["", "first", "second", "third", "fourth", "fifth", "sixth", "seventh"];
const FINGERS = ["", "index", "middle", "ring", "little finger"];

/** How far a count can be trusted in this medium: paint and fine lines show strings; tiles and weaving do not. */
export function legibility(scene: SceneSpec): Confidence {
  if (scene.medium === "tile" || scene.medium === "tapestry") return "possible";
  if (scene.medium === "etching") return "probable";
  return "certain";
}

const INSTRUMENT_TERMS = { guitar: "five_course_guitar", vihuela: "vihuela", lute: "lute", theorbo: "theorbo", cittern: "cittern" } as const;

function stringingNote(scene: SceneSpec): string | undefined {
  const i = scene.evidence.instrument;
  if (scene.medium === "tile") return "Drawn by formula on a tile: the painter need not have counted.";
  if (i.kind === "guitar") return `${word(i.strings)} strings: a single first course and four pairs.`.replace(/^./, (c) => c.toUpperCase());
  if (i.kind === "vihuela") return "Single first course and five pairs, as far as the weave shows them.";
  if (i.kind === "lute") return "A single chanterelle and six pairs.";
  if (i.kind === "theorbo") return `Six stopped courses on the fingerboard and ${word(i.courses - 6)} open diapasons, all single.`;
  return `Courses of ${i.stringsPerCourse.map(word).join(", ")} wires: the third course is triple.`;
}

export function instrumentObservations(scene: SceneSpec): PlannedObservation[] {
  const i = scene.evidence.instrument;
  const sure = legibility(scene);
  const kindSure: Confidence = scene.medium === "tile" || i.kind === "vihuela" ? "probable" : "certain";
  const out: PlannedObservation[] = [
    {
      aspect: "instrument_type",
      term: INSTRUMENT_TERMS[i.kind],
      confidence: kindSure,
      note: i.kind === "vihuela" ? "Waisted like a guitar but with six courses: a vihuela, by the stringing." : undefined,
    },
    { aspect: "course_count", count: i.courses, confidence: sure, note: i.kind === "cittern" || i.kind === "theorbo" ? stringingNote(scene) : undefined },
    { aspect: "string_count", count: i.strings, confidence: sure, note: i.kind === "cittern" || i.kind === "theorbo" ? undefined : stringingNote(scene) },
  ];
  if (i.stringsPerCourse[0] === 1 && i.stringsPerCourse.slice(1).every((n) => n === 2)) {
    out.push({ aspect: "course_arrangement", term: "single_first", confidence: sure === "certain" ? "probable" : "possible" });
  }
  out.push(
    { aspect: "fret_count", count: i.frets, confidence: sure },
    { aspect: "fret_kind", term: i.fretKind === "fixed-metal" ? "fixed" : "tied_gut", confidence: sure === "certain" ? "probable" : "possible" },
    i.fretSlant === 0
      ? { aspect: "fret_slant", term: "parallel", confidence: sure === "certain" ? "probable" : "possible" }
      : {
          aspect: "fret_slant",
          term: "slanted",
          confidence: i.fretSlant >= 5 ? "probable" : "possible",
          note: i.fretSlant >= 5 ? "The frets nearest the body run at an angle to the others." : "A slight slant near the body; it may be the painter's perspective.",
        },
  );
  return [...out, ...heldObservations(scene)];
}

/** How the player holds the instrument (nothing for an instrument hung on a garland). */
function heldObservations(scene: SceneSpec): PlannedObservation[] {
  const fig = scene.player;
  if (!fig) return [];
  const kind = scene.instrument.kind;
  const hold = kind === "theorbo" ? HOLDS.theorbo : kind === "lute" && fig.posture === "seated" ? HOLDS.lute : HOLDS[fig.posture];
  const degrees = Math.round(hold.angle / 5) * 5;
  const side = scene.mirrored ? "the head to the player's right: the print reverses the painting, so he seems to play left-handed" : "the head to the player's left";
  const support =
    fig.posture === "standing" ? "strap" : fig.crossedLeg ? "crossed_legs" : "knee";
  return [
    { aspect: "posture", term: fig.posture, confidence: "certain" },
    { aspect: "instrument_angle", text: `Neck raised about ${degrees}° above the horizontal, ${side}.`, confidence: "probable" },
    {
      aspect: "support",
      term: support,
      confidence: support === "knee" && kind !== "theorbo" ? "probable" : "certain",
      note: support === "strap" ? "A ribbon from the heel of the neck over the left shoulder." : support === "crossed_legs" ? "The lower bout rests on the crossed right leg." : undefined,
    },
  ];
}

export function headObservations(scene: SceneSpec): PlannedObservation[] {
  const i = scene.evidence.instrument;
  const pegs = scene.evidence.head.pegs;
  const spare =
    i.unusedPegs > 0
      ? i.unusedPegVisible
        ? `The peg at the treble end has an empty string hole: ${word(pegs)} pegs for ${word(i.strings)} strings.`
        : `One peg seems to hold only a cut string end: ${word(i.strings)} strings in use.`
      : undefined;
  const head =
    i.kind === "lute"
      ? `Pegbox bent back at the nut, ${word(pegs)} side pegs with the knobs on alternate sides.`
      : i.kind === "theorbo"
        ? `Two pegboxes: six pegs at the first nut, ${word(pegs - 6)} at the end of the extended neck for the diapasons.`
        : i.kind === "cittern"
          ? `Sickle-shaped head sweeping back to a carved knob, ${word(pegs)} pegs entering from behind.`
          : `Flat head with ${word(pegs)} pegs entering from behind, in two staggered rows of ${word(Math.ceil(pegs / 2))}.`;
  return [
    { aspect: "peg_count", count: pegs, confidence: legibility(scene), note: spare },
    { aspect: "head_and_pegs", text: head, confidence: "certain" },
  ];
}

const ROSE_TERMS = { open: "open_hole", "flat-rosette": "flat_carved", "wedding-cake": "recessed_multi_layer", "carved-lute": "flat_carved" } as const;

export function roseObservations(scene: SceneSpec): PlannedObservation[] {
  const kind = scene.evidence.rose.kind;
  const out: PlannedObservation[] = [
    {
      aspect: "rose",
      term: ROSE_TERMS[kind],
      confidence: scene.medium === "tile" ? "probable" : "certain",
      note: kind === "wedding-cake" ? "Several tiers at full zoom; the deepest carries a star-shaped boss." : kind === "open" ? "A plain hole ringed with inlay." : undefined,
    },
  ];
  if (kind === "wedding-cake") out.push({ aspect: "rose_material", text: "Parchment, cut in tiers and sunk below the top.", confidence: "probable" });
  if (kind === "carved-lute") out.push({ aspect: "rose_material", text: "Cut in the wood of the soundboard itself.", confidence: "probable" });
  if (kind === "flat-rosette") out.push({ aspect: "rose_material", text: "Pierced parchment or thin wood set flush with the top.", confidence: "possible" });
  return out;
}

export function bridgeObservations(scene: SceneSpec): PlannedObservation[] {
  const moustache = scene.evidence.bridge.kind === "moustache";
  return [
    {
      aspect: "bridge_shape",
      term: moustache ? "moustache" : "rectangular",
      confidence: scene.medium === "tile" || scene.medium === "tapestry" ? "probable" : "certain",
      note: moustache ? "Curling ends swept out from the bar on both sides." : undefined,
    },
  ];
}

export function rightHandObservations(scene: SceneSpec): PlannedObservation[] {
  const rh = scene.evidence.rightHand;
  if (!rh) return [];
  const strum = rh.action === "strum";
  return [
    {
      aspect: "right_hand_technique",
      term: strum ? "strumming" : "plucking",
      confidence: strum && rh.fingers === "curled" ? "possible" : "probable",
      note: strum && rh.fingers === "curled" ? "The curled fingers could also be picking; a still picture cannot show the stroke." : undefined,
    },
    { aspect: "right_hand_position", term: rh.over === "rose" ? "over_rose" : "near_bridge", confidence: "certain" },
    { aspect: "little_finger_rest", term: rh.littleFingerOnSoundboard ? "yes" : "no", confidence: "probable" },
    {
      aspect: "right_hand_fingers",
      text: rh.fingers === "extended" ? "Fingers extended and close together, the thumb alongside: a brushing stroke." : "Index and middle curled towards the strings, the thumb forward: picking single courses.",
      confidence: "probable",
    },
  ];
}

const stopWords = (s: Stop) => `${FINGERS[s.finger]} on the ${ORDINALS[s.course]} course at the ${ORDINALS[s.fret]} fret`;

export function leftHandObservations(scene: SceneSpec): PlannedObservation[] {
  const lh = scene.evidence.leftHand;
  if (!lh) return [];
  if (lh.action === "turn-peg") {
    return [{ aspect: "head_and_pegs", text: `Thumb and index turn the ${ORDINALS[lh.peg + 1]} peg from the nut in the bass row: she is tuning.`, confidence: "certain" }];
  }
  const shape = lh.stops.map(stopWords).join("; ");
  const out: PlannedObservation[] = [{ aspect: "left_hand", term: "chord_shape", confidence: "probable", note: `${shape.charAt(0).toUpperCase()}${shape.slice(1)}.` }];
  if (lh.thumbOverNeck) out.push({ aspect: "left_hand", term: "thumb_over_neck", confidence: "probable", note: "The thumb shows above the bass edge of the neck." });
  return out;
}

const OUTLINES = {
  guitar: "Waisted body, the lower bout a little wider than the upper, shallow ribs.",
  vihuela: "Long waisted body with broad bouts of nearly equal width.",
  lute: "Pear-shaped top over a rounded back of ribs.",
  theorbo: "Large pear-shaped top over a deep rounded back.",
  cittern: "Teardrop body tapering into the neck, flat back.",
} as const;

export function bodyObservations(scene: SceneSpec): PlannedObservation[] {
  return [{ aspect: "body_outline", text: OUTLINES[scene.instrument.kind], confidence: scene.medium === "tapestry" ? "probable" : "certain" }];
}
