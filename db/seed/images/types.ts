// What a demo scene is made of, and the evidence it records about what was drawn (for the seed's
// regions and observations). All rectangles are in pixels of the full-size rendered image.
import type { Medium, PaletteName } from "./look";

export type InstrumentKind = "guitar" | "vihuela" | "lute" | "theorbo" | "cittern";
export type RoseKind = "open" | "flat-rosette" | "wedding-cake";
export type BridgeKind = "rectangular" | "moustache";
export type Composition = "seated" | "standing" | "two-figures" | "tavern-table" | "emblem";
export type Background = "interior-window" | "street-wall" | "curtain" | "paper" | "millefleurs" | "village";
export type Orientation = "landscape" | "portrait" | "square";

/** A stopped note: finger 1 (index) to 4 (little), course 1 (treble) upwards, fret 1 upwards. */
export type Stop = { finger: 1 | 2 | 3 | 4; course: number; fret: number };

export type InstrumentSpec = {
  kind: InstrumentKind;
  rose: RoseKind;
  bridge: BridgeKind;
  /** Tied gut frets on the neck (fixed metal frets on the cittern). */
  frets: number;
  /** Degrees off square; players slanted tied frets to temper the tuning. */
  fretSlant: number;
  /** Whether the peg left without a string is plainly empty (otherwise it carries a cut string end). */
  unusedPegVisible: boolean;
};

export type RightHandSpec = {
  action: "strum" | "pluck";
  over: "rose" | "bridge";
  fingers: "extended" | "curled";
  littleFingerOnSoundboard: boolean;
};

export type LeftHandSpec =
  | { action: "chord"; stops: Stop[]; thumbOverNeck: boolean }
  | { action: "turn-peg"; peg: number };

export type FigureSpec = {
  posture: "seated" | "standing";
  sex: "man" | "woman";
  headwear: "broad-hat" | "beret" | "cap" | "bare";
  hair: "short" | "long" | "bun";
  beard: boolean;
  cloak: boolean;
  /** Seated players: the guitar rests on the crossed right leg instead of across the lap. */
  crossedLeg: boolean;
  eyesClosed: boolean;
};

export type Prop =
  | "table" | "jug" | "glasses" | "songbook" | "drinkers" | "balcony" | "woman-at-window"
  | "fountain" | "dancers" | "boy-tambourine" | "dog" | "garland" | "viol" | "tree";

export type SceneParams = {
  seed: number;
  slug: string;
  sourceTitle: string;
  orientation: Orientation;
  medium: Medium;
  palette: PaletteName;
  composition: Composition;
  background: Background;
  instrument: InstrumentSpec;
  player: FigureSpec | null;
  rightHand: RightHandSpec | null;
  leftHand: LeftHandSpec | null;
  props: Prop[];
  /** Reversed as a print after a painting: the player appears left-handed. */
  mirrored: boolean;
};

export type Rect = { x: number; y: number; width: number; height: number };

export type Evidence = {
  image: { width: number; height: number };
  mirrored: boolean;
  instrument: {
    kind: InstrumentKind;
    rect: Rect;
    courses: number;
    strings: number;
    stringsPerCourse: number[];
    pegs: number;
    pegPlacement: "rear" | "side";
    unusedPegs: number;
    unusedPegVisible: boolean;
    frets: number;
    fretKind: "tied-gut" | "fixed-metal";
    fretSlant: number;
  };
  rose: { kind: RoseKind | "carved-lute"; rect: Rect };
  bridge: { kind: BridgeKind; rect: Rect };
  head: { rect: Rect; pegs: number };
  rightHand: (RightHandSpec & { rect: Rect }) | null;
  leftHand: (LeftHandSpec & { rect: Rect }) | null;
  others: { kind: string; rect: Rect }[];
};

export type SceneSpec = SceneParams & { evidence: Evidence };
