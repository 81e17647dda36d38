// Our region shapes against the drawing layer's selectors: whole pixels inside the image, turned
// rectangles as polygons, nothing kept of shapes with no area. Area by the shoelace formula (common
// practice); pixel rounding and clipping are ours.
import { describe, expect, it } from "vitest";
import { describeShape, sameShape, shapeOf, toSelector, type LayerSelector, type RegionShape } from "@/components/regions/region-shapes";
import { commandFor } from "@/components/regions/region-tools";

const image = { width: 2000, height: 1500 };
const rect = (x: number, y: number, w: number, h: number, rot = 0): LayerSelector => ({
  type: "RECTANGLE",
  geometry: { x, y, w, h, rot, bounds: { minX: x, minY: y, maxX: x + w, maxY: y + h } },
});
const polygon = (points: number[][]): LayerSelector => ({ type: "POLYGON", geometry: { points, bounds: { minX: 0, minY: 0, maxX: 0, maxY: 0 } } });

describe("shapeOf", () => {
  it("rounds a rectangle's edges to whole pixels (edges, not width, so no pixel is lost between neighbours)", () => {
    expect(shapeOf(rect(400.4, 299.6, 599.3, 500.2), image)).toEqual({ kind: "rectangle", x: 400, y: 300, w: 600, h: 500 });
  });
  it("clips a rectangle that spills over the edge and drops one wholly outside", () => {
    expect(shapeOf(rect(-50, 1400, 300, 300), image)).toEqual({ kind: "rectangle", x: 0, y: 1400, w: 250, h: 100 });
    expect(shapeOf(rect(2100, 10, 50, 50), image)).toBeNull();
    expect(shapeOf(rect(10, 10, 0.3, 50), image)).toBeNull();
  });
  it("keeps a turned rectangle as the polygon of its corners, turned about its centre", () => {
    const shape = shapeOf(rect(100, 100, 200, 100, Math.PI / 2), image);
    // A quarter turn of 200 × 100 about (200, 150) stands it on end: 100 wide, 200 tall.
    expect(shape).toEqual({ kind: "polygon", points: [[250, 50], [250, 250], [150, 250], [150, 50]] });
  });
  it("cleans a polygon: whole pixels, no repeated neighbours, no closing repeat; three points at least", () => {
    expect(shapeOf(polygon([[10.2, 10], [10, 10.4], [100, 10], [100, 100], [10, 10]]), image)).toEqual({ kind: "polygon", points: [[10, 10], [100, 10], [100, 100]] });
    expect(shapeOf(polygon([[10, 10], [20, 20], [30, 30]]), image)).toBeNull(); // on one line: no area
    expect(shapeOf(polygon([[10, 10], [20, 20]]), image)).toBeNull();
  });
  it("round-trips through the layer's selector", () => {
    const shapes: RegionShape[] = [
      { kind: "rectangle", x: 5, y: 6, w: 70, h: 80 },
      { kind: "polygon", points: [[1, 2], [30, 4], [15, 40]] },
    ];
    for (const s of shapes) {
      expect(shapeOf(toSelector(s), image)).toEqual(s);
    }
  });
  it("ignores shapes it does not keep", () => {
    expect(shapeOf({ type: "ELLIPSE", geometry: { bounds: { minX: 0, minY: 0, maxX: 9, maxY: 9 } } }, image)).toBeNull();
  });
});

describe("sameShape and describeShape", () => {
  it("compares within a tolerance, kind by kind", () => {
    expect(sameShape({ kind: "rectangle", x: 1, y: 1, w: 10, h: 10 }, { kind: "rectangle", x: 1.4, y: 1, w: 10, h: 10 })).toBe(true);
    expect(sameShape({ kind: "rectangle", x: 1, y: 1, w: 10, h: 10 }, { kind: "rectangle", x: 2, y: 1, w: 10, h: 10 })).toBe(false);
    expect(sameShape({ kind: "polygon", points: [[0, 0], [5, 0], [0, 5]] }, { kind: "rectangle", x: 0, y: 0, w: 5, h: 5 })).toBe(false);
  });
  it("says where a shape is, in pixels", () => {
    expect(describeShape({ kind: "rectangle", x: 120, y: 340, w: 200, h: 150 })).toBe("rectangle at 120, 340, 200 × 150 px");
    expect(describeShape({ kind: "polygon", points: [[80, 60], [380, 100], [200, 470]] })).toBe("polygon of 3 points within 80, 60, 300 × 410 px");
  });
});

describe("commandFor: the viewer's keys", () => {
  const key = (k: string, mods: Partial<{ shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean }> = {}) => ({ key: k, shiftKey: false, ctrlKey: false, metaKey: false, altKey: false, ...mods });
  it("tools, for those who may draw", () => {
    expect(commandFor(key("r"), true)).toEqual({ kind: "tool", tool: "rectangle" });
    expect(commandFor(key("R", { shiftKey: true }), true)).toEqual({ kind: "tool", tool: "rectangle" });
    expect(commandFor(key("p"), true)).toEqual({ kind: "tool", tool: "polygon" });
    expect(commandFor(key("v"), true)).toEqual({ kind: "tool", tool: "select" });
    expect(commandFor(key("Delete"), true)).toEqual({ kind: "delete" });
    expect(commandFor(key("z", { ctrlKey: true }), true)).toEqual({ kind: "undo" });
    expect(commandFor(key("z", { metaKey: true }), true)).toEqual({ kind: "undo" });
  });
  it("leaves R to the viewer's rotation, and drawing keys alone, for readers", () => {
    expect(commandFor(key("r"), false)).toBeNull();
    expect(commandFor(key("Delete"), false)).toBeNull();
    expect(commandFor(key("z", { ctrlKey: true }), false)).toBeNull();
  });
  it("moves through regions and rotates for everyone; leaves the viewer's zoom and pan keys alone", () => {
    expect(commandFor(key("n"), false)).toEqual({ kind: "next" });
    expect(commandFor(key("j"), false)).toEqual({ kind: "next" });
    expect(commandFor(key("N", { shiftKey: true }), false)).toEqual({ kind: "previous" });
    expect(commandFor(key("k"), false)).toEqual({ kind: "previous" });
    expect(commandFor(key("]"), false)).toEqual({ kind: "rotate", by: 90 });
    for (const k of ["+", "-", "0", "w", "a", "s", "d", "ArrowUp"]) expect(commandFor(key(k), true)).toBeNull();
    expect(commandFor(key("r", { altKey: true }), true)).toBeNull();
  });
});
