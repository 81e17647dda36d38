// A region's shape as a Web Annotation Selector (W3C Web Annotation Data Model, Recommendation
// 23 February 2017, §4.2). Rectangles become a FragmentSelector with a Media Fragments `xywh=` value
// (§4.2.1), polygons an SvgSelector with one embedded <polygon> (§4.2.7). Coordinates are full-image
// pixels, which is also the Canvas's coordinate space in the manifest. Pure.
import { regionToFragment } from "@/lib/iiif/fragments";
import { formatNumber, type ImageSize, type Region } from "@/lib/iiif/request";
import type { RegionShape } from "@/lib/regions/types";
import { MEDIA_FRAGMENTS, SVG_NAMESPACE } from "./context";

export type FragmentSelector = { type: "FragmentSelector"; conformsTo: typeof MEDIA_FRAGMENTS; value: string };
export type SvgSelector = { type: "SvgSelector"; value: string };
export type ShapeSelector = FragmentSelector | SvgSelector;

const clamp = (v: number, low: number, high: number) => Math.min(high, Math.max(low, v));

/**
 * Media Fragments URI 1.0 §4.2.2 allows only non-negative integers for pixels, so a rectangle that is
 * not on whole pixels is widened to the pixels it touches; IIIF §5.3 forbids content outside the
 * Canvas, so it is clipped to the image. Null when nothing of it lies on the image.
 */
export function rectangleInPixels(shape: { x: number; y: number; w: number; h: number }, image: ImageSize): Region | null {
  const x0 = clamp(Math.floor(shape.x), 0, image.width);
  const y0 = clamp(Math.floor(shape.y), 0, image.height);
  const x1 = clamp(Math.ceil(shape.x + shape.w), 0, image.width);
  const y1 = clamp(Math.ceil(shape.y + shape.h), 0, image.height);
  return x1 > x0 && y1 > y0 ? { x: x0, y: y0, w: x1 - x0, h: y1 - y0 } : null;
}

/**
 * One well-formed SVG document with a single polygon, no style and no script: the model's note under
 * §4.2.7 advises against anything that is not shape, and the vocabulary RECOMMENDS a single shape
 * element. Points are in the source's pixels (§4.2.7: relative to the Source's dimensions).
 */
export function polygonSvg(points: readonly (readonly [number, number])[], image: ImageSize): string {
  if (points.length < 3) throw new Error("a polygon needs at least three points");
  const list = points
    .map(([x, y]) => `${formatNumber(clamp(x, 0, image.width))},${formatNumber(clamp(y, 0, image.height))}`)
    .join(" ");
  return `<svg xmlns="${SVG_NAMESPACE}"><polygon points="${list}"/></svg>`;
}

/**
 * Exactly one selector per region. §4.2 allows several only when they select the same content, so a
 * polygon does not also get its bounding box as a FragmentSelector.
 */
export function shapeSelector(shape: RegionShape, image: ImageSize): ShapeSelector {
  if (shape.kind === "polygon") return { type: "SvgSelector", value: polygonSvg(shape.points, image) };
  const box = rectangleInPixels(shape, image);
  if (!box) throw new Error(`the rectangle ${shape.x},${shape.y},${shape.w},${shape.h} lies outside the ${image.width}×${image.height} image`);
  return { type: "FragmentSelector", conformsTo: MEDIA_FRAGMENTS, value: regionToFragment(box) };
}
