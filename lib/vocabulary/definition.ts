// The evidence vocabulary the archive starts with: what a marked region can say about the instrument,
// the player, the scene and how far the picture can be trusted. Pure data, seeded by key; editors
// extend and reword it afterwards. Labels are the words players and organologists use.
import type { AspectKind, AspectSection } from "./kinds";

export type TermDefinition = { key: string; label: string; description: string };
export type AspectDefinition = {
  key: string;
  label: string;
  description: string;
  kind: AspectKind;
  section: AspectSection;
  terms: TermDefinition[];
};

type Seed = Omit<AspectDefinition, "section">;

const term = (key: string, label: string, description: string): TermDefinition => ({ key, label, description });
const count = (key: string, label: string, description: string): Seed => ({ key, label, description, kind: "count", terms: [] });
const text = (key: string, label: string, description: string): Seed => ({ key, label, description, kind: "text", terms: [] });
const terms = (key: string, label: string, description: string, list: TermDefinition[]): Seed => ({ key, label, description, kind: "terms", terms: list });

const notVisible = (what: string) => term("not_visible", "not visible", `The picture does not show ${what}, or too little of it to say.`);

const INSTRUMENT: Seed[] = [
  terms("instrument_type", "Instrument type", "Which plucked instrument the region shows.", [
    term("five_course_guitar", "five-course guitar", "The baroque guitar: five courses, usually ten strings or nine with a single first."),
    term("four_course_guitar", "four-course guitar", "The small guitar of the sixteenth century, four courses."),
    term("six_course_guitar", "six-course guitar", "A guitar with six courses or six single strings, late in the period."),
    term("vihuela", "vihuela", "The Spanish guitar-shaped instrument tuned like a lute, usually six courses."),
    term("lute", "lute", "Round back of ribs, angled pegbox, many courses."),
    term("theorbo", "theorbo", "A large lute with an extended neck carrying long unstopped bass strings."),
    term("cittern", "cittern", "Flat back, wire strings, fixed metal frets, often a carved head."),
    term("other", "other", "Another plucked instrument; say which in the note."),
  ]),
  count("course_count", "Course count", "How many courses (single strings or pairs played as one) can be counted."),
  count("string_count", "String count", "How many separate strings can be counted, whatever their grouping."),
  count("peg_count", "Peg count", "How many tuning pegs can be counted in the head or pegbox."),
  terms("course_arrangement", "Course arrangement", "How the strings are grouped into courses.", [
    term("all_double", "all courses double", "Every course is a pair of strings."),
    term("single_first", "single first course", "The highest course is one string, the others pairs."),
    term("octave_lower", "octave strings on lower courses", "Lower courses pair a string with its octave."),
    term("bourdons", "bourdons", "Thick low strings on the bass courses, sounding the low octave."),
  ]),
  count("fret_count", "Fret count", "How many frets can be counted on the neck."),
  terms("fret_kind", "Fret kind", "What the frets are made of and how they sit on the neck.", [
    term("tied_gut", "tied gut", "Loops of gut tied round the neck, movable by the player."),
    term("fixed", "fixed", "Frets set into the fingerboard: wood, bone or metal."),
    notVisible("the frets"),
  ]),
  terms("fret_slant", "Fret slant", "Whether the frets run square across the neck or at an angle.", [
    term("parallel", "parallel", "Frets square to the strings and parallel to each other."),
    term("slanted", "slanted", "One or more frets set at an angle, as some players did for tuning."),
    term("unclear", "unclear", "The drawing or the viewpoint does not let one tell."),
  ]),
  terms("rose", "Rose", "The soundhole and what fills it.", [
    term("open_hole", "open hole", "A plain round soundhole with nothing in it."),
    term("flat_carved", "flat carved", "A rose cut in the plane of the soundboard."),
    term("recessed_multi_layer", "recessed multi-layer", "A rose sunk below the soundboard, built up in layers like a small cake."),
    notVisible("the soundhole"),
  ]),
  text("rose_material", "Rose material", "What the rose seems to be made of: parchment, wood, paper, and so on."),
  terms("bridge_shape", "Bridge shape", "The outline of the bridge on the soundboard.", [
    term("rectangular", "rectangular", "A plain bar or block."),
    term("moustache", "moustache", "A bar with curling ends swept out to either side."),
    term("other", "other", "Another outline; describe it in the note."),
  ]),
  text("body_outline", "Body outline", "The shape of the body as drawn: waist, shoulders, proportions."),
  text("head_and_pegs", "Head and pegs", "The head or pegbox: shape, carving, how the pegs enter."),
];

const PLAYER: Seed[] = [
  terms("right_hand_technique", "Right-hand technique", "How the right hand sets the strings going.", [
    term("strumming", "strumming", "Brushing across the strings, the rasgueado manner."),
    term("plucking", "plucking", "Fingers or thumb picking single strings, the punteado manner."),
    term("both", "both", "The picture suggests a mixed manner."),
    term("unclear", "unclear", "The hand is shown but its action cannot be told."),
  ]),
  text("right_hand_fingers", "Right-hand fingers", "Which right-hand fingers are extended, curled or touching the strings."),
  terms("little_finger_rest", "Little finger resting on the soundboard", "Whether the right little finger is planted on the soundboard.", [
    term("yes", "yes", "The little finger rests on the soundboard."),
    term("no", "no", "The little finger is lifted or curled away."),
    notVisible("the little finger"),
  ]),
  terms("right_hand_position", "Right-hand position", "Where along the strings the right hand plays.", [
    term("over_rose", "over the rose", "The hand plays over the soundhole."),
    term("near_bridge", "near the bridge", "The hand plays close to the bridge."),
    term("near_neck", "near the neck", "The hand plays up towards the end of the fingerboard."),
  ]),
  terms("left_hand", "Left hand", "What the left hand is doing on the neck.", [
    term("chord_shape", "chord shape", "Several fingers stopping strings as in a chord."),
    term("barre", "barré", "One finger laid across several strings."),
    term("thumb_over_neck", "thumb over the neck", "The thumb wrapped round to the front of the neck."),
    notVisible("the left hand"),
  ]),
  terms("posture", "Posture", "How the player's body is placed.", [
    term("seated", "seated", "The player sits."),
    term("standing", "standing", "The player stands still."),
    term("walking", "walking", "The player plays on the move."),
  ]),
  text("instrument_angle", "Instrument angle", "How the instrument is held: neck raised or level, body tilted."),
  terms("support", "Support", "What bears the instrument's weight besides the hands.", [
    term("strap", "strap", "A band or ribbon round the player's neck or shoulder."),
    term("knee", "knee", "The body rests on the player's knee or thigh."),
    term("table", "table", "The instrument rests on or against a table."),
    term("crossed_legs", "crossed legs", "The player crosses the legs to raise the instrument."),
  ]),
];

const CONTEXT: Seed[] = [
  terms("setting", "Setting", "Where the scene takes place, or what kind of picture it is.", [
    term("street", "street", "Out of doors in a town or village."),
    term("tavern", "tavern", "An inn, tavern or other drinking place."),
    term("court", "court", "A palace, a noble household or a formal entertainment."),
    term("domestic", "domestic", "A private room of a house."),
    term("theatre", "theatre", "A stage, a play or players in costume."),
    term("church", "church", "A church or a devotional scene."),
    term("allegory", "allegory", "A personification or allegory, such as Music or Hearing."),
    term("portrait", "portrait", "A portrait in which the instrument is an attribute of the sitter."),
  ]),
  terms("ensemble", "Ensemble", "Whom the player performs with.", [
    term("solo", "solo", "The player plays alone."),
    term("with_voice", "with voice", "The player accompanies singing."),
    term("with_dance", "with dance", "The player plays for dancers."),
    term("with_other_instruments", "with other instruments", "The player is one of several instrumentalists."),
  ]),
];

const RELIABILITY: Seed[] = [
  terms("depiction", "Depiction", "How close to real playing the image is likely to be.", [
    term("from_life", "observed from life", "Details suggest the artist watched a player."),
    term("schematic", "schematic", "Simplified or conventional: strings, frets or hands drawn by formula."),
    term("copy", "copy after another work", "Taken from another picture or print rather than from a player."),
    term("allegorical", "allegorical", "The instrument serves a meaning more than a performance."),
  ]),
  terms("condition", "Condition", "The state of the paint or print in this region.", [
    term("overpainted", "overpainted", "Later paint covers the original in this area."),
    term("restored", "restored", "Retouched or reconstructed by a restorer."),
    term("damaged", "damaged", "Losses, wear or cracks make details uncertain."),
    term("sound", "sound", "No visible loss or later intervention in this area."),
  ]),
];

const BY_SECTION: Record<AspectSection, Seed[]> = { instrument: INSTRUMENT, player: PLAYER, context: CONTEXT, reliability: RELIABILITY };

/** Every seeded aspect, in section order; an aspect's place in its list is its position. */
export const VOCABULARY: AspectDefinition[] = (Object.keys(BY_SECTION) as AspectSection[]).flatMap((section) =>
  BY_SECTION[section].map((seed) => ({ ...seed, section })),
);
