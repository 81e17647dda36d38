// Region shapes in full-image pixel coordinates: checks against the image and bounding boxes. Pure.
import type { Box, RegionShape } from "./types";

export const MAX_POLYGON_POINTS = 500;

/** The smallest integer box that holds the shape. */
export function boundingBox(shape: RegionShape): Box {
  if (shape.kind === "rectangle") return { x: shape.x, y: shape.y, w: shape.w, h: shape.h };
  const xs = shape.points.map((p) => p[0]);
  const ys = shape.points.map((p) => p[1]);
  const x = Math.floor(Math.min(...xs));
  const y = Math.floor(Math.min(...ys));
  return { x, y, w: Math.max(1, Math.ceil(Math.max(...xs)) - x), h: Math.max(1, Math.ceil(Math.max(...ys)) - y) };
}

/** Twice the signed area (shoelace formula); zero for a degenerate polygon. */
export function polygonArea(points: [number, number][]): number {
  let sum = 0;
  for (let i = 0; i < points.length; i++) {
    const [x1, y1] = points[i];
    const [x2, y2] = points[(i + 1) % points.length];
    sum += x1 * y2 - x2 * y1;
  }
  return Math.abs(sum) / 2;
}

const round = (n: number) => Math.round(n * 100) / 100;

/**
 * Shapes drawn near the edge may spill a little past it; they are clipped to the image. A shape wholly
 * outside, or with no area, is refused with a message saying why (null when the shape is fine).
 */
export function fitShape(shape: RegionShape, image: { width: number; height: number }): { shape: RegionShape } | { error: string } {
  const { width, height } = image;
  if (shape.kind === "rectangle") {
    const x0 = Math.max(0, Math.round(shape.x));
    const y0 = Math.max(0, Math.round(shape.y));
    const x1 = Math.min(width, Math.round(shape.x + shape.w));
    const y1 = Math.min(height, Math.round(shape.y + shape.h));
    if (x1 - x0 < 1 || y1 - y0 < 1) return { error: "The rectangle lies outside the photograph or has no area." };
    return { shape: { kind: "rectangle", x: x0, y: y0, w: x1 - x0, h: y1 - y0 } };
  }
  if (shape.points.length < 3) return { error: "A polygon needs at least three points." };
  if (shape.points.length > MAX_POLYGON_POINTS) return { error: `A polygon may have at most ${MAX_POLYGON_POINTS} points.` };
  const points = shape.points.map(([x, y]) => [round(Math.min(width, Math.max(0, x))), round(Math.min(height, Math.max(0, y)))] as [number, number]);
  if (polygonArea(points) < 1) return { error: "The polygon lies outside the photograph or has no area." };
  return { shape: { kind: "polygon", points } };
}
