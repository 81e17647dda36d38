// The seeded vocabulary: the aspects the design notes list (DESIGN.md, "Seed vocabulary"), each in its
// section with the right kind, keys that are unique and valid, and a description for every entry.
import { describe, expect, it } from "vitest";
import { VOCABULARY } from "@/lib/vocabulary/definition";
import { ASPECT_SECTIONS } from "@/lib/vocabulary/kinds";
import { keyFromLabel, keySchema, labelSchema } from "@/lib/vocabulary/schemas";

const EXPECTED: Record<string, [section: string, kind: string, terms?: string[]]> = {
  instrument_type: ["instrument", "terms", ["five_course_guitar", "four_course_guitar", "six_course_guitar", "vihuela", "lute", "theorbo", "cittern", "other"]],
  course_count: ["instrument", "count"],
  string_count: ["instrument", "count"],
  peg_count: ["instrument", "count"],
  course_arrangement: ["instrument", "terms", ["all_double", "single_first", "octave_lower", "bourdons"]],
  fret_count: ["instrument", "count"],
  fret_kind: ["instrument", "terms", ["tied_gut", "fixed", "not_visible"]],
  fret_slant: ["instrument", "terms", ["parallel", "slanted", "unclear"]],
  rose: ["instrument", "terms", ["open_hole", "flat_carved", "recessed_multi_layer", "not_visible"]],
  rose_material: ["instrument", "text"],
  bridge_shape: ["instrument", "terms", ["rectangular", "moustache", "other"]],
  body_outline: ["instrument", "text"],
  head_and_pegs: ["instrument", "text"],
  right_hand_technique: ["player", "terms", ["strumming", "plucking", "both", "unclear"]],
  right_hand_fingers: ["player", "text"],
  little_finger_rest: ["player", "terms", ["yes", "no", "not_visible"]],
  right_hand_position: ["player", "terms", ["over_rose", "near_bridge", "near_neck"]],
  left_hand: ["player", "terms", ["chord_shape", "barre", "thumb_over_neck", "not_visible"]],
  posture: ["player", "terms", ["seated", "standing", "walking"]],
  instrument_angle: ["player", "text"],
  support: ["player", "terms", ["strap", "knee", "table", "crossed_legs"]],
  setting: ["context", "terms", ["street", "tavern", "court", "domestic", "theatre", "church", "allegory", "portrait"]],
  ensemble: ["context", "terms", ["solo", "with_voice", "with_dance", "with_other_instruments"]],
  depiction: ["reliability", "terms", ["from_life", "schematic", "copy", "allegorical"]],
  condition: ["reliability", "terms", ["overpainted", "restored", "damaged", "sound"]],
};

describe("the seed vocabulary", () => {
  it("has exactly the listed aspects, in section order, with their kinds and term keys", () => {
    expect(VOCABULARY.map((a) => a.key)).toEqual(Object.keys(EXPECTED));
    for (const aspect of VOCABULARY) {
      const [section, kind, terms = []] = EXPECTED[aspect.key];
      expect([aspect.key, aspect.section, aspect.kind], aspect.key).toEqual([aspect.key, section, kind]);
      expect(aspect.terms.map((t) => t.key), aspect.key).toEqual(terms);
    }
    const sectionRanks = VOCABULARY.map((a) => ASPECT_SECTIONS.indexOf(a.section));
    expect(sectionRanks).toEqual([...sectionRanks].sort((a, b) => a - b));
  });

  it("has unique aspect keys, unique term keys and labels within each aspect, all valid", () => {
    expect(new Set(VOCABULARY.map((a) => a.key)).size).toBe(VOCABULARY.length);
    for (const aspect of VOCABULARY) {
      expect(keySchema.safeParse(aspect.key).success, aspect.key).toBe(true);
      expect(labelSchema.safeParse(aspect.label).success, aspect.key).toBe(true);
      expect(new Set(aspect.terms.map((t) => t.key)).size, aspect.key).toBe(aspect.terms.length);
      expect(new Set(aspect.terms.map((t) => t.label.toLowerCase())).size, aspect.key).toBe(aspect.terms.length);
      for (const term of aspect.terms) expect(keySchema.safeParse(term.key).success, `${aspect.key}.${term.key}`).toBe(true);
    }
  });

  it("describes every aspect and term in one line", () => {
    const entries = VOCABULARY.flatMap((a) => [a, ...a.terms]);
    for (const entry of entries) {
      expect(entry.description.length, entry.key).toBeGreaterThan(5);
      expect(entry.description, entry.key).not.toMatch(/\n/);
    }
  });

  it("uses the trade's words for the labels the design notes name", () => {
    const label = (aspect: string, term: string) => VOCABULARY.find((a) => a.key === aspect)!.terms.find((t) => t.key === term)!.label;
    expect(label("instrument_type", "five_course_guitar")).toBe("five-course guitar");
    expect(label("rose", "recessed_multi_layer")).toBe("recessed multi-layer");
    expect(label("left_hand", "barre")).toBe("barré");
    expect(label("depiction", "copy")).toBe("copy after another work");
    expect(VOCABULARY.find((a) => a.key === "little_finger_rest")!.label).toBe("Little finger resting on the soundboard");
  });

  it("suggests keys from labels without accents or punctuation", () => {
    expect(keyFromLabel("Thumb over the neck")).toBe("thumb_over_the_neck");
    expect(keyFromLabel("Barré")).toBe("barre");
    expect(keyFromLabel("  Right-hand technique ")).toBe("right_hand_technique");
    expect(keySchema.safeParse(keyFromLabel("Five-course guitar (Spanish)")).success).toBe(true);
  });
});
