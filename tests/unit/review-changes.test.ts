// What the review page highlights between the last decided version of a region and the proposed one.
// The example region is invented: a five-course guitar's rose and its player's right hand.
import { describe, expect, it } from "vitest";
import { compareObservations, compareShapes, compareVersions, type ComparableVersion } from "@/lib/review/changes";
import type { ObservationView, RegionShape } from "@/lib/regions/types";
import { boundingBox } from "@/lib/regions/geometry";

let nextId = 1;
function obs(aspect: [number, string, ObservationView["kind"]], value: { term?: [number, string]; count?: number; text?: string }, confidence: ObservationView["confidence"] = "certain", note: string | null = null): ObservationView {
  const [aspectId, aspectLabel, kind] = aspect;
  return {
    id: nextId++,
    aspectId,
    aspectKey: aspectLabel.toLowerCase().replace(/\W+/g, "_"),
    aspectLabel,
    kind,
    termId: value.term?.[0] ?? null,
    termKey: value.term?.[1] ?? null,
    termLabel: value.term?.[1] ?? null,
    count: value.count ?? null,
    text: value.text ?? null,
    confidence,
    note,
  };
}

const TECHNIQUE = [1, "Right-hand technique", "terms"] as const satisfies [number, string, "terms"];
const ROSE = [2, "Rose", "terms"] as const satisfies [number, string, "terms"];
const PEGS = [3, "Peg count", "count"] as const satisfies [number, string, "count"];
const SETTING_NOTE = [4, "Body outline", "text"] as const satisfies [number, string, "text"];

const version = (shape: RegionShape, observations: ObservationView[], label: string | null = null): ComparableVersion => ({
  shape,
  box: boundingBox(shape),
  label,
  observations,
});

describe("compareShapes", () => {
  const rect = (x: number, y: number, w: number, h: number): RegionShape => ({ kind: "rectangle", x, y, w, h });

  it("says unchanged for the same rectangle", () => {
    const a = version(rect(100, 200, 300, 400), []);
    expect(compareShapes(a, a)).toMatchObject({ changed: false, moved: null, resized: null, words: "unchanged" });
  });

  it("tells a move from a resize, with the distances", () => {
    const change = compareShapes(version(rect(100, 200, 300, 400), []), version(rect(140, 190, 300, 420), []));
    expect(change.changed).toBe(true);
    expect(change.moved).toEqual({ dx: 40, dy: -10 });
    expect(change.resized).toEqual({ from: { w: 300, h: 400 }, to: { w: 300, h: 420 } });
    expect(change.words).toBe("moved 40 px right and 10 px up; resized from 300 × 400 to 300 × 420 px");
  });

  it("notices a rectangle redrawn as a polygon, and a polygon reshaped inside the same bounds", () => {
    const polygon: RegionShape = { kind: "polygon", points: [[100, 200], [400, 200], [250, 600]] };
    expect(compareShapes(version(rect(100, 200, 300, 400), []), version(polygon, [])).redrawn).toBe(true);
    const other: RegionShape = { kind: "polygon", points: [[100, 200], [400, 200], [300, 600], [250, 500]] };
    const change = compareShapes(version(polygon, []), version(other, []));
    expect(change).toMatchObject({ changed: true, redrawn: false, moved: null, resized: null, reshaped: true });
    expect(change.words).toBe("outline redrawn within the same bounds");
  });
});

describe("compareObservations", () => {
  it("keeps an observation that says the same thing as unchanged", () => {
    const before = [obs(TECHNIQUE, { term: [11, "strumming"] }, "probable")];
    const after = [obs(TECHNIQUE, { term: [11, "strumming"] }, "probable")];
    expect(compareObservations(before, after).map((c) => c.status)).toEqual(["unchanged"]);
  });

  it("reports a new term for the same aspect as a change of value, with the confidence when it moved too", () => {
    const before = [obs(TECHNIQUE, { term: [11, "strumming"] }, "possible")];
    const after = [obs(TECHNIQUE, { term: [12, "plucking"] }, "probable")];
    const [change] = compareObservations(before, after);
    expect(change).toMatchObject({ status: "changed", fields: ["value", "confidence"] });
    expect(change.before?.termLabel).toBe("strumming");
    expect(change.after?.termLabel).toBe("plucking");
  });

  it("reports a note or confidence alone as a change of that part only", () => {
    const before = [obs(PEGS, { count: 10 }, "certain", null)];
    const after = [obs(PEGS, { count: 10 }, "certain", "the tenth peg is partly hidden by the hand")];
    expect(compareObservations(before, after)[0]).toMatchObject({ status: "changed", fields: ["note"] });
  });

  it("lists added and removed observations, in the new version's order with removed ones after", () => {
    const before = [obs(ROSE, { term: [21, "open hole"] }), obs(PEGS, { count: 10 })];
    const after = [obs(TECHNIQUE, { term: [11, "strumming"] }), obs(PEGS, { count: 10 })];
    const changes = compareObservations(before, after);
    expect(changes.map((c) => [c.aspectLabel, c.status])).toEqual([
      ["Right-hand technique", "added"],
      ["Peg count", "unchanged"],
      ["Rose", "removed"],
    ]);
  });

  it("pairs several observations of one aspect by value first, so a reordering is no change", () => {
    const before = [obs(SETTING_NOTE, { text: "waisted" }), obs(SETTING_NOTE, { text: "deep ribs" })];
    const after = [obs(SETTING_NOTE, { text: "deep ribs" }), obs(SETTING_NOTE, { text: "waisted" }), obs(SETTING_NOTE, { text: "flat back" })];
    expect(compareObservations(before, after).map((c) => c.status)).toEqual(["unchanged", "unchanged", "added"]);
  });
});

describe("compareVersions", () => {
  it("sums up: nothing changed", () => {
    const v = version({ kind: "rectangle", x: 0, y: 0, w: 10, h: 10 }, [obs(PEGS, { count: 10 })], "pegbox");
    const w = version({ kind: "rectangle", x: 0, y: 0, w: 10, h: 10 }, [obs(PEGS, { count: 10 })], "pegbox");
    expect(compareVersions(v, w)).toMatchObject({ anything: false, observationsChanged: 0, label: { changed: false } });
  });

  it("sums up: label, shape and two observations changed", () => {
    const v = version({ kind: "rectangle", x: 0, y: 0, w: 10, h: 10 }, [obs(PEGS, { count: 9 }), obs(ROSE, { term: [21, "open hole"] })], null);
    const w = version({ kind: "rectangle", x: 5, y: 0, w: 10, h: 10 }, [obs(PEGS, { count: 10 }), obs(ROSE, { term: [21, "open hole"] }), obs(TECHNIQUE, { term: [11, "strumming"] })], "head");
    const changes = compareVersions(v, w);
    expect(changes.anything).toBe(true);
    expect(changes.label).toEqual({ changed: true, before: null, after: "head" });
    expect(changes.shape.words).toBe("moved 5 px right");
    expect(changes.observationsChanged).toBe(2);
  });
});
