// The ten invented demo pictures, one per invented demo source (db/seed/sources.ts), each with the
// evidence measured from its own drawing.
import { sceneEvidence } from "./draw";
import type { FigureSpec, InstrumentSpec, SceneParams, SceneSpec } from "./types";

const guitar = (o: Partial<InstrumentSpec>): InstrumentSpec => ({ kind: "guitar", rose: "wedding-cake", bridge: "moustache", frets: 9, fretSlant: 0, unusedPegVisible: true, ...o });
const man = (o: Partial<FigureSpec>): FigureSpec => ({ posture: "seated", sex: "man", headwear: "broad-hat", hair: "long", beard: true, cloak: false, crossedLeg: false, eyesClosed: false, ...o });

// An alfabeto-like chord shape: fingertips on three courses at the first frets.
const CHORD = { action: "chord", thumbOverNeck: false, stops: [{ finger: 1, course: 2, fret: 1 }, { finger: 2, course: 4, fret: 2 }, { finger: 3, course: 3, fret: 2 }] } as const;

const PARAMS: SceneParams[] = [
  {
    seed: 1652, slug: "guitarist-tavern-table", sourceTitle: "A Guitarist Strumming at a Tavern Table",
    orientation: "landscape", medium: "oil", palette: "umber", composition: "tavern-table", background: "interior-window",
    instrument: guitar({ rose: "wedding-cake", bridge: "moustache", frets: 9 }),
    player: man({ headwear: "beret", hair: "short" }),
    rightHand: { action: "strum", over: "rose", fingers: "extended", littleFingerOnSoundboard: false },
    leftHand: { ...CHORD, stops: [...CHORD.stops] },
    props: ["table", "jug", "glasses", "drinkers"], mirrored: false,
  },
  {
    seed: 1655, slug: "serenade-balcony", sourceTitle: "The Serenade under the Balcony",
    orientation: "portrait", medium: "oil", palette: "crimson", composition: "two-figures", background: "street-wall",
    instrument: guitar({ rose: "flat-rosette", bridge: "rectangular", frets: 8, fretSlant: 3, unusedPegVisible: false }),
    player: man({ posture: "standing", cloak: true }),
    rightHand: { action: "strum", over: "rose", fingers: "curled", littleFingerOnSoundboard: false },
    leftHand: { action: "chord", thumbOverNeck: true, stops: [{ finger: 1, course: 3, fret: 1 }, { finger: 2, course: 1, fret: 2 }, { finger: 3, course: 2, fret: 3 }] },
    props: ["balcony", "woman-at-window"], mirrored: false,
  },
  {
    seed: 1635, slug: "lute-player-songbook", sourceTitle: "Lute Player with a Songbook",
    orientation: "landscape", medium: "chalk", palette: "umber", composition: "seated", background: "paper",
    instrument: { kind: "lute", rose: "flat-rosette", bridge: "rectangular", frets: 8, fretSlant: 0, unusedPegVisible: false },
    player: man({ headwear: "cap", hair: "short", beard: false }),
    rightHand: { action: "pluck", over: "bridge", fingers: "curled", littleFingerOnSoundboard: true },
    leftHand: { action: "chord", thumbOverNeck: false, stops: [{ finger: 1, course: 2, fret: 1 }, { finger: 3, course: 4, fret: 3 }] },
    props: ["table", "songbook"], mirrored: false,
  },
  {
    seed: 1668, slug: "title-page-cittern-viol", sourceTitle: "Title page with a Cittern and a Viol",
    orientation: "portrait", medium: "engraving", palette: "umber", composition: "emblem", background: "paper",
    instrument: { kind: "cittern", rose: "flat-rosette", bridge: "rectangular", frets: 13, fretSlant: 0, unusedPegVisible: true },
    player: null, rightHand: null, leftHand: null,
    props: ["garland", "viol"], mirrored: false,
  },
  {
    seed: 1657, slug: "village-feast-dancers", sourceTitle: "Dancers and a Guitar at a Village Feast",
    orientation: "landscape", medium: "etching", palette: "verdigris", composition: "standing", background: "village",
    instrument: guitar({ rose: "open", bridge: "rectangular", frets: 8 }),
    player: man({ posture: "standing", headwear: "broad-hat", hair: "short" }),
    rightHand: { action: "strum", over: "rose", fingers: "extended", littleFingerOnSoundboard: false },
    leftHand: { ...CHORD, stops: [...CHORD.stops] },
    props: ["dancers", "tree"], mirrored: true,
  },
  {
    seed: 1648, slug: "young-woman-tuning", sourceTitle: "Young Woman Tuning a Guitar",
    orientation: "portrait", medium: "oil", palette: "ochre", composition: "seated", background: "curtain",
    instrument: guitar({ rose: "wedding-cake", bridge: "moustache", frets: 10, unusedPegVisible: true }),
    player: { posture: "seated", sex: "woman", headwear: "bare", hair: "bun", beard: false, cloak: false, crossedLeg: false, eyesClosed: false },
    rightHand: { action: "pluck", over: "rose", fingers: "curled", littleFingerOnSoundboard: true },
    leftHand: { action: "turn-peg", peg: 2 },
    props: [], mirrored: false,
  },
  {
    seed: 1667, slug: "street-musicians-fountain", sourceTitle: "Street Musicians at the Fountain",
    orientation: "landscape", medium: "oil", palette: "verdigris", composition: "two-figures", background: "street-wall",
    instrument: guitar({ rose: "flat-rosette", bridge: "moustache", frets: 9, fretSlant: 5 }),
    player: man({ headwear: "bare", hair: "long", eyesClosed: true, crossedLeg: true }),
    rightHand: { action: "strum", over: "bridge", fingers: "extended", littleFingerOnSoundboard: true },
    leftHand: { action: "chord", thumbOverNeck: true, stops: [{ finger: 1, course: 1, fret: 1 }, { finger: 2, course: 3, fret: 2 }, { finger: 3, course: 4, fret: 3 }, { finger: 4, course: 2, fret: 3 }] },
    props: ["fountain", "boy-tambourine"], mirrored: false,
  },
  {
    seed: 1700, slug: "tile-guitar-player", sourceTitle: "Tile with a Guitar Player",
    orientation: "square", medium: "tile", palette: "umber", composition: "standing", background: "paper",
    instrument: guitar({ rose: "open", bridge: "rectangular", frets: 8 }),
    player: man({ posture: "standing", headwear: "broad-hat", hair: "short", beard: false }),
    rightHand: { action: "strum", over: "rose", fingers: "extended", littleFingerOnSoundboard: false },
    leftHand: { ...CHORD, stops: [...CHORD.stops] },
    props: ["dog"], mirrored: false,
  },
  {
    seed: 1675, slug: "theorbo-music-room", sourceTitle: "Theorbo Player in a Music Room",
    orientation: "portrait", medium: "oil", palette: "crimson", composition: "seated", background: "interior-window",
    instrument: { kind: "theorbo", rose: "flat-rosette", bridge: "rectangular", frets: 8, fretSlant: 0, unusedPegVisible: false },
    player: man({ headwear: "bare", hair: "long", beard: false }),
    rightHand: { action: "pluck", over: "rose", fingers: "curled", littleFingerOnSoundboard: true },
    leftHand: { action: "chord", thumbOverNeck: false, stops: [{ finger: 1, course: 2, fret: 1 }, { finger: 2, course: 4, fret: 2 }] },
    props: ["table", "songbook"], mirrored: false,
  },
  {
    seed: 1530, slug: "tapestry-vihuela", sourceTitle: "Tapestry Fragment with a Vihuela",
    orientation: "landscape", medium: "tapestry", palette: "crimson", composition: "standing", background: "millefleurs",
    instrument: { kind: "vihuela", rose: "flat-rosette", bridge: "rectangular", frets: 10, fretSlant: 0, unusedPegVisible: true },
    player: man({ posture: "standing", headwear: "beret", hair: "long", beard: false }),
    rightHand: { action: "pluck", over: "rose", fingers: "curled", littleFingerOnSoundboard: false },
    leftHand: { action: "chord", thumbOverNeck: false, stops: [{ finger: 1, course: 3, fret: 1 }, { finger: 2, course: 5, fret: 2 }, { finger: 3, course: 4, fret: 3 }] },
    props: [], mirrored: false,
  },
];

export const DEMO_SCENES: SceneSpec[] = PARAMS.map((p) => ({ ...p, evidence: sceneEvidence(p) }));
