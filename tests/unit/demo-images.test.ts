// The invented demo pictures: deterministic SVG, evidence boxes that enclose what was drawn, the
// counts of a five-course guitar, and a large sRGB JPEG with real detail in the rose.
import { createHash } from "node:crypto";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { DEMO_SCENES, drawScene, renderScene, sceneEvidence, type Rect, type SceneSpec } from "../../db/seed/images/index";

const TITLES = [
  "A Guitarist Strumming at a Tavern Table",
  "The Serenade under the Balcony",
  "Lute Player with a Songbook",
  "Title page with a Cittern and a Viol",
  "Dancers and a Guitar at a Village Feast",
  "Young Woman Tuning a Guitar",
  "Street Musicians at the Fountain",
  "Tile with a Guitar Player",
  "Theorbo Player in a Music Room",
  "Tapestry Fragment with a Vihuela",
];

const sha = (s: string) => createHash("sha256").update(s).digest("hex");
const inside = (a: Rect, b: Rect) => a.x >= b.x && a.y >= b.y && a.x + a.width <= b.x + b.width && a.y + a.height <= b.y + b.height;
const scene = (slug: string) => DEMO_SCENES.find((s) => s.slug === slug) as SceneSpec;

describe("demo scenes", () => {
  it("has one scene per invented demo source, with distinct slugs", () => {
    expect(DEMO_SCENES.length).toBeGreaterThanOrEqual(10);
    expect(DEMO_SCENES.map((s) => s.sourceTitle).sort()).toEqual([...TITLES].sort());
    expect(new Set(DEMO_SCENES.map((s) => s.slug)).size).toBe(DEMO_SCENES.length);
  });

  it("draws the same SVG every time from the same spec, and a different one for each scene", () => {
    const hashes = DEMO_SCENES.map((s) => {
      const first = drawScene(s);
      expect(drawScene(s)).toBe(first);
      expect(first.startsWith("<svg")).toBe(true);
      return sha(first);
    });
    expect(new Set(hashes).size).toBe(DEMO_SCENES.length);
  });

  it("records evidence measured from the drawing itself", () => {
    for (const s of DEMO_SCENES) expect(s.evidence).toEqual(sceneEvidence(s));
  });

  it("keeps every evidence rectangle non-empty and inside the image, and the parts inside the instrument", () => {
    for (const s of DEMO_SCENES) {
      const e = s.evidence;
      const image: Rect = { x: 0, y: 0, width: e.image.width, height: e.image.height };
      expect(Math.max(e.image.width, e.image.height)).toBeGreaterThanOrEqual(4000);
      const rects = [e.instrument.rect, e.rose.rect, e.bridge.rect, e.head.rect, ...(e.rightHand ? [e.rightHand.rect] : []), ...(e.leftHand ? [e.leftHand.rect] : []), ...e.others.map((o) => o.rect)];
      for (const r of rects) {
        expect(r.width, s.slug).toBeGreaterThan(0);
        expect(r.height, s.slug).toBeGreaterThan(0);
        expect(inside(r, image), s.slug).toBe(true);
      }
      for (const part of [e.rose.rect, e.bridge.rect, e.head.rect]) expect(inside(part, e.instrument.rect), s.slug).toBe(true);
      // Players have both hands drawn; the title page's instruments hang on a garland.
      expect(!!e.rightHand, s.slug).toBe(!!s.rightHand);
      expect(!!e.leftHand, s.slug).toBe(!!s.leftHand);
    }
  });

  it("gives a five-course guitar ten pegs and nine strings: a single first course and four double courses", () => {
    // Common practice for the baroque guitar: the first (treble) course single, the other four
    // paired, on a head with ten pegs, so one peg carries no string.
    const guitars = DEMO_SCENES.filter((s) => s.instrument.kind === "guitar");
    expect(guitars.length).toBeGreaterThanOrEqual(6);
    for (const s of guitars) {
      const i = s.evidence.instrument;
      expect(i.courses, s.slug).toBe(5);
      expect(i.stringsPerCourse, s.slug).toEqual([1, 2, 2, 2, 2]);
      expect(i.strings, s.slug).toBe(9);
      expect(i.pegs, s.slug).toBe(10);
      expect(s.evidence.head.pegs, s.slug).toBe(10);
      expect(i.unusedPegs, s.slug).toBe(1);
      expect(i.fretKind, s.slug).toBe("tied-gut");
      expect(i.frets, s.slug).toBeGreaterThanOrEqual(8);
      expect(i.frets, s.slug).toBeLessThanOrEqual(10);
    }
    expect(guitars.some((s) => s.evidence.instrument.unusedPegVisible)).toBe(true);
    expect(guitars.some((s) => !s.evidence.instrument.unusedPegVisible)).toBe(true);
    expect(new Set(guitars.map((s) => s.instrument.rose))).toEqual(new Set(["open", "flat-rosette", "wedding-cake"]));
    expect(new Set(guitars.map((s) => s.instrument.bridge))).toEqual(new Set(["rectangular", "moustache"]));
  });

  it("matches the sources: the vihuela has six courses, the tuner turns a peg, the fountain player strums near the bridge", () => {
    expect(scene("tapestry-vihuela").evidence.instrument.courses).toBe(6);
    expect(scene("young-woman-tuning").evidence.leftHand?.action).toBe("turn-peg");
    expect(scene("street-musicians-fountain").evidence.rightHand?.over).toBe("bridge");
    expect(scene("village-feast-dancers").evidence.mirrored).toBe(true);
    expect(scene("title-page-cittern-viol").evidence.others.map((o) => o.kind)).toContain("viol");
  });
});

describe("renderScene", () => {
  // stats() describes the input image, so the crop is materialised first.
  const stdev = async (jpeg: Buffer, r: Rect) => {
    const crop = await sharp(jpeg).extract({ left: r.x, top: r.y, width: r.width, height: r.height }).png().toBuffer();
    const { channels } = await sharp(crop).stats();
    return Math.max(...channels.slice(0, 3).map((c) => c.stdev));
  };

  it("renders a large sRGB JPEG whose rose has detail to zoom into", async () => {
    const s = scene("guitarist-tavern-table");
    const { jpeg, width, height } = await renderScene(s);
    expect([...jpeg.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]);
    const meta = await sharp(jpeg).metadata();
    expect(meta.format).toBe("jpeg");
    expect(Math.max(meta.width ?? 0, meta.height ?? 0)).toBeGreaterThanOrEqual(4000);
    expect([meta.width, meta.height]).toEqual([width, height]);
    expect(meta.channels).toBe(3);
    expect(meta.space).toBe("srgb");
    expect(await stdev(jpeg, s.evidence.rose.rect)).toBeGreaterThan(30);
  }, 60_000);

  it("renders the pegs of a head sharply enough to count", async () => {
    const s = scene("young-woman-tuning");
    const { jpeg } = await renderScene(s);
    expect(await stdev(jpeg, s.evidence.head.rect)).toBeGreaterThan(25);
    expect(await stdev(jpeg, s.evidence.rose.rect)).toBeGreaterThan(30);
  }, 60_000);
});
