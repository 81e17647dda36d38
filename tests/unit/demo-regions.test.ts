// The demo regions planned for the invented demo pictures: every review state, shapes inside the
// pictures and over what they claim to show, observations in the seeded vocabulary, and counts that
// match the drawing and pass the stringing check.
import { describe, expect, it } from "vitest";
import { DEMO_SCENES, type Rect, type SceneSpec } from "../../db/seed/images/index";
import { planDemoRegions, regionSummary, type PlannedObservation, type PlannedRegion, type PlannedVersion } from "../../db/seed/regions/plan";
import { fitShape } from "../../lib/regions/geometry";
import type { RegionShape } from "../../lib/regions/types";
import { checkStringing, type StringingInput } from "../../lib/stringing";
import { VOCABULARY } from "../../lib/vocabulary/definition";

const PLANS = DEMO_SCENES.map((scene, i) => ({ scene, regions: planDemoRegions(scene, i) }));
const ALL = PLANS.flatMap((p) => p.regions);
const working = (r: PlannedRegion) => r.versions[r.versions.length - 1];
const find = (slug: string) => PLANS.find((p) => p.scene.slug === slug)!;
const part = (slug: string, name: string) => find(slug).regions.find((r) => r.part === name);

function insideImage(shape: RegionShape, image: { width: number; height: number }) {
  const points: [number, number][] = shape.kind === "rectangle" ? [[shape.x, shape.y], [shape.x + shape.w, shape.y + shape.h]] : shape.points;
  return points.every(([x, y]) => x >= 0 && y >= 0 && x <= image.width && y <= image.height);
}
const contains = (shape: RegionShape, r: Rect) => shape.kind === "rectangle" && shape.x <= r.x && shape.y <= r.y && shape.x + shape.w >= r.x + r.width && shape.y + shape.h >= r.y + r.height;

/** Ray casting: whether a point lies inside a polygon. */
function inPolygon([x, y]: [number, number], points: [number, number][]) {
  let inside = false;
  for (let i = 0, j = points.length - 1; i < points.length; j = i++) {
    const [xi, yi] = points[i], [xj, yj] = points[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

/** The readings the stringing check would get from these versions (as lib/regions/stringing.ts maps them). */
function stringingOf(versions: PlannedVersion[]): StringingInput {
  const obs: PlannedObservation[] = versions.flatMap((v) => v.observations);
  const counts = (aspect: string) => obs.filter((o) => o.aspect === aspect).map((o) => ({ value: o.count!, confidence: o.confidence }));
  const terms = (aspect: string) => obs.filter((o) => o.aspect === aspect).map((o) => ({ key: o.term!, confidence: o.confidence }));
  return { pegs: counts("peg_count"), strings: counts("string_count"), courses: counts("course_count"), arrangement: terms("course_arrangement"), instrumentType: terms("instrument_type") };
}

describe("demo regions plan", () => {
  it("plans the same regions every time", () => {
    for (const [i, scene] of DEMO_SCENES.entries()) expect(JSON.stringify(planDemoRegions(scene, i))).toBe(JSON.stringify(PLANS[i].regions));
  });

  it("marks every picture, with the parts each one shows", () => {
    for (const { scene, regions } of PLANS) {
      expect(regions.length, scene.slug).toBeGreaterThanOrEqual(4);
      expect(regions.some((r) => r.part === "instrument"), scene.slug).toBe(true);
      expect(new Set(regions.map((r) => r.part)).size, scene.slug).toBe(regions.length);
      if (!scene.evidence.rightHand) expect(regions.some((r) => r.part === "rightHand" || r.part === "leftHand"), scene.slug).toBe(false);
    }
  });

  it("has regions in every review state, and a vetted region with a newer version in review", () => {
    const states = new Set(ALL.map((r) => regionSummary(r).state));
    expect([...states].sort()).toEqual(["draft", "proposed", "returned", "vetted", "withdrawn"]);
    const pending = ALL.filter((r) => {
      const s = regionSummary(r);
      return s.vettedNumber !== null && s.workingNumber > s.vettedNumber && s.state === "proposed";
    });
    expect(pending.length).toBeGreaterThanOrEqual(1);
    // A returned version followed by a corrected, vetted one.
    expect(ALL.some((r) => r.versions.length > 1 && r.versions[0].state === "returned" && working(r).state === "vetted")).toBe(true);
    // The editor's own proposal, which only another editor may decide.
    expect(ALL.some((r) => r.author === "editor" && working(r).state === "proposed")).toBe(true);
  });

  it("keeps each history possible: only decided versions are followed, decisions have a reviewer other than the author", () => {
    for (const r of ALL) {
      r.versions.forEach((v, i) => {
        expect(v.number, r.key).toBe(i + 1);
        if (i < r.versions.length - 1) expect(["vetted", "returned"], r.key).toContain(v.state);
        const decided = v.state === "vetted" || v.state === "returned";
        expect(v.review !== null, r.key).toBe(decided);
        if (v.review) {
          expect(v.review.decision, r.key).toBe(v.state);
          expect(v.review.reviewer, r.key).not.toBe(r.author);
          if (v.state === "returned") expect(v.review.comment?.length ?? 0, r.key).toBeGreaterThan(20);
        }
        expect(v.proposedAgo === null, r.key).toBe(v.state === "draft");
        expect(v.observations.length, r.key).toBeGreaterThan(0);
        // Times are hours before the seed: each step later (smaller) than the one before, all in the past.
        const times = [v.createdAgo, v.proposedAgo, v.decidedAgo].filter((t): t is number => t !== null);
        expect([...times].sort((a, b) => b - a), r.key).toEqual(times);
        expect(v.changedAgo, r.key).toBeGreaterThan(0);
        if (i > 0) expect(v.createdAgo, r.key).toBeLessThan(r.versions[i - 1].changedAgo);
      });
    }
  });

  it("draws every shape inside its picture and round what it names", () => {
    for (const { scene, regions } of PLANS) {
      const e = scene.evidence;
      for (const r of regions) {
        for (const v of r.versions) {
          expect(insideImage(v.shape, e.image), `${r.key} v${v.number}`).toBe(true);
          // The API's own check accepts it unchanged: nothing to clip, some area.
          expect(fitShape(v.shape, e.image), r.key).toEqual({ shape: v.shape });
        }
        const final = working(r).shape;
        if (r.part === "rightHand") expect(contains(final, e.rightHand!.rect), r.key).toBe(true);
        if (r.part === "leftHand") expect(contains(final, e.leftHand!.rect), r.key).toBe(true);
        if (r.part === "head") expect(contains(final, e.head.rect), r.key).toBe(true);
        if (r.part === "instrument") expect(contains(final, e.instrument.rect), r.key).toBe(true);
        const roseCentre: [number, number] = [e.rose.rect.x + e.rose.rect.width / 2, e.rose.rect.y + e.rose.rect.height / 2];
        if (r.part === "rose" || r.part === "body") {
          expect(final.kind, r.key).toBe("polygon");
          if (final.kind !== "polygon") continue;
          expect(inPolygon(roseCentre, final.points), r.key).toBe(true);
          // The outline of the soundboard lies within the whole instrument (a few pixels of stroke aside).
          const box = e.instrument.rect;
          for (const [x, y] of final.points) {
            expect(x, r.key).toBeGreaterThanOrEqual(box.x - 4);
            expect(x, r.key).toBeLessThanOrEqual(box.x + box.width + 4);
            expect(y, r.key).toBeGreaterThanOrEqual(box.y - 4);
            expect(y, r.key).toBeLessThanOrEqual(box.y + box.height + 4);
          }
        }
      }
      expect(regions.some((r) => working(r).shape.kind === "polygon"), scene.slug).toBe(true);
    }
  });

  it("records only aspects and terms of the seeded vocabulary, each with a value of its kind", () => {
    const aspects = new Map(VOCABULARY.map((a) => [a.key, a]));
    for (const r of ALL) {
      for (const o of r.versions.flatMap((v) => v.observations)) {
        const aspect = aspects.get(o.aspect);
        expect(aspect, `${r.key} ${o.aspect}`).toBeDefined();
        if (aspect!.kind === "terms") expect(aspect!.terms.map((t) => t.key), `${r.key} ${o.aspect}`).toContain(o.term);
        if (aspect!.kind === "count") expect(Number.isInteger(o.count) && o.count! > 0, `${r.key} ${o.aspect}`).toBe(true);
        if (aspect!.kind === "text") expect(o.text?.length ?? 0, `${r.key} ${o.aspect}`).toBeGreaterThan(10);
        expect(o.term === undefined || (o.count === undefined && o.text === undefined), r.key).toBe(true);
      }
    }
  });

  it("counts what each picture draws: pegs on the head, strings and courses on the instrument", () => {
    for (const { scene } of PLANS) {
      const i = scene.evidence.instrument;
      const instrument = working(part(scene.slug, "instrument")!).observations;
      const count = (obs: PlannedObservation[], aspect: string) => obs.find((o) => o.aspect === aspect)?.count;
      expect(count(instrument, "course_count"), scene.slug).toBe(i.courses);
      expect(count(instrument, "string_count"), scene.slug).toBe(i.strings);
      expect(count(instrument, "fret_count"), scene.slug).toBe(i.frets);
      const head = part(scene.slug, "head");
      if (head) expect(count(working(head).observations, "peg_count"), scene.slug).toBe(scene.evidence.head.pegs);
    }
    // Common practice for the baroque guitar: ten pegs, nine strings, five courses, the first single.
    for (const slug of ["guitarist-tavern-table", "young-woman-tuning"]) {
      const obs = [...working(part(slug, "instrument")!).observations, ...working(part(slug, "head")!).observations];
      expect(obs.find((o) => o.aspect === "peg_count")?.count).toBe(10);
      expect(obs.find((o) => o.aspect === "string_count")?.count).toBe(9);
      expect(obs.find((o) => o.aspect === "course_count")?.count).toBe(5);
      expect(obs.find((o) => o.aspect === "course_arrangement")?.term).toBe("single_first");
      expect(obs.find((o) => o.aspect === "instrument_type")?.term).toBe("five_course_guitar");
    }
  });

  it("passes the stringing check on what the author sees and on what readers see", () => {
    for (const { scene, regions } of PLANS) {
      const authors = checkStringing(stringingOf(regions.map(working)));
      expect(authors.status, `${scene.slug}: ${authors.summary}`).toBe("fits");
      const vetted = regions.flatMap((r) => [...r.versions].reverse().find((v) => v.state === "vetted") ?? []);
      expect(checkStringing(stringingOf(vetted)).status, scene.slug).not.toBe("disagrees");
    }
    const tavern = checkStringing(stringingOf(find("guitarist-tavern-table").regions.map(working)));
    expect(tavern.settled).toMatchObject({ pegs: 10, strings: 9, courses: 5, instrumentType: "five_course_guitar" });
    // The returned first reading of the lute's pegbox miscounted; the vetted correction agrees.
    const lute = part("lute-player-songbook", "head")!;
    expect(lute.versions[0].observations.find((o) => o.aspect === "peg_count")?.count).toBe(12);
    expect(working(lute).observations.find((o) => o.aspect === "peg_count")?.count).toBe(13);
  });

  it("says what the hands do as drawn", () => {
    for (const { scene } of PLANS as { scene: SceneSpec }[]) {
      const rh = part(scene.slug, "rightHand");
      if (!rh || !scene.evidence.rightHand) continue;
      const obs = working(rh).observations;
      const term = (aspect: string) => obs.find((o) => o.aspect === aspect)?.term;
      expect(term("right_hand_technique"), scene.slug).toBe(scene.evidence.rightHand.action === "strum" ? "strumming" : "plucking");
      expect(term("right_hand_position"), scene.slug).toBe(scene.evidence.rightHand.over === "rose" ? "over_rose" : "near_bridge");
      expect(term("little_finger_rest"), scene.slug).toBe(scene.evidence.rightHand.littleFingerOnSoundboard ? "yes" : "no");
    }
  });
});
