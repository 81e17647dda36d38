// Our region shapes (full-image pixel coordinates) to and from the selectors of the drawing layer's
// own annotation model, which over OpenSeadragon is in the image's pixel coordinates as well (it
// converts pointer positions with viewerElementToImageCoordinates). Pure, no browser APIs.
import { boundingBox, MAX_POLYGON_POINTS, polygonArea } from "@/lib/regions/geometry";
import type { RegionShape } from "@/lib/regions/types";

export type { RegionShape };
export type ImageSize = { width: number; height: number };

type Bounds = { minX: number; minY: number; maxX: number; maxY: number };
/** The two selector shapes the drawing layer makes: RECTANGLE (optionally turned by `rot` radians) and POLYGON. */
export type LayerSelector =
  | { type: "RECTANGLE"; geometry: { x: number; y: number; w: number; h: number; rot?: number; bounds: Bounds } }
  | { type: "POLYGON"; geometry: { points: number[][]; bounds: Bounds } }
  | { type: string; geometry: { bounds: Bounds } };

/** A turn smaller than this (radians, about 0.06°) is a plain rectangle. */
const NO_TURN = 1e-3;

const boundsOf = (points: [number, number][]): Bounds => ({
  minX: Math.min(...points.map((p) => p[0])),
  minY: Math.min(...points.map((p) => p[1])),
  maxX: Math.max(...points.map((p) => p[0])),
  maxY: Math.max(...points.map((p) => p[1])),
});

/** The layer's selector for one of our shapes. */
export function toSelector(shape: RegionShape): LayerSelector {
  if (shape.kind === "rectangle") {
    const { x, y, w, h } = shape;
    return { type: "RECTANGLE", geometry: { x, y, w, h, rot: 0, bounds: { minX: x, minY: y, maxX: x + w, maxY: y + h } } };
  }
  const points = shape.points.map(([x, y]) => [x, y] as [number, number]);
  return { type: "POLYGON", geometry: { points, bounds: boundsOf(points) } };
}

const clamp = (v: number, max: number) => Math.min(Math.max(Math.round(v), 0), max);

/** The corners of a rectangle turned by `rot` radians about its centre (as the layer's editor turns it). */
function turnedCorners(x: number, y: number, w: number, h: number, rot: number): [number, number][] {
  const cx = x + w / 2;
  const cy = y + h / 2;
  const cos = Math.cos(rot);
  const sin = Math.sin(rot);
  return [
    [x, y],
    [x + w, y],
    [x + w, y + h],
    [x, y + h],
  ].map(([px, py]) => [cx + (px - cx) * cos - (py - cy) * sin, cy + (px - cx) * sin + (py - cy) * cos]);
}

/** Whole pixels inside the image, with repeated neighbours (and a closing repeat of the first) dropped. */
function cleanPoints(points: number[][], size: ImageSize): [number, number][] {
  const out: [number, number][] = [];
  for (const [x, y] of points) {
    const p: [number, number] = [clamp(x, size.width), clamp(y, size.height)];
    const last = out[out.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
  }
  while (out.length > 1 && out[0][0] === out[out.length - 1][0] && out[0][1] === out[out.length - 1][1]) out.pop();
  return out;
}

/**
 * Our shape for a selector the layer made, in whole pixels clipped to the image: evidence is not
 * located more finely than a pixel, and a crop of it must be a valid IIIF region. A turned
 * rectangle becomes the polygon of its corners (our rectangles are upright). Null when nothing
 * of it is left: outside the image, thinner than a pixel, or not a shape we keep.
 */
export function shapeOf(selector: LayerSelector, size: ImageSize): RegionShape | null {
  if (selector.type === "RECTANGLE" && "w" in selector.geometry) {
    const { x, y, w, h, rot = 0 } = selector.geometry;
    if (Math.abs(rot) > NO_TURN) return polygonOf(turnedCorners(x, y, w, h, rot), size);
    const x0 = clamp(x, size.width);
    const y0 = clamp(y, size.height);
    const x1 = clamp(x + w, size.width);
    const y1 = clamp(y + h, size.height);
    return x1 - x0 >= 1 && y1 - y0 >= 1 ? { kind: "rectangle", x: x0, y: y0, w: x1 - x0, h: y1 - y0 } : null;
  }
  if (selector.type === "POLYGON" && "points" in selector.geometry) return polygonOf(selector.geometry.points, size);
  return null;
}

function polygonOf(points: number[][], size: ImageSize): RegionShape | null {
  const clean = cleanPoints(points, size);
  if (clean.length < 3 || clean.length > MAX_POLYGON_POINTS || polygonArea(clean) < 1) return null;
  return { kind: "polygon", points: clean };
}

/** The same shape within `tolerance` pixels at every coordinate. */
export function sameShape(a: RegionShape | null | undefined, b: RegionShape | null | undefined, tolerance = 0.5): boolean {
  if (!a || !b) return a === b;
  const near = (p: number, q: number) => Math.abs(p - q) <= tolerance;
  if (a.kind === "rectangle" && b.kind === "rectangle") return near(a.x, b.x) && near(a.y, b.y) && near(a.w, b.w) && near(a.h, b.h);
  if (a.kind === "polygon" && b.kind === "polygon") {
    return a.points.length === b.points.length && a.points.every(([x, y], i) => near(x, b.points[i][0]) && near(y, b.points[i][1]));
  }
  return false;
}

/** "rectangle at 120, 340, 200 × 150 px" or "polygon of 5 points within 80, 60, 300 × 410 px". */
export function describeShape(shape: RegionShape): string {
  const { x, y, w, h } = boundingBox(shape);
  const at = `${x}, ${y}, ${w} × ${h} px`;
  return shape.kind === "rectangle" ? `rectangle at ${at}` : `polygon of ${shape.points.length} points within ${at}`;
}
