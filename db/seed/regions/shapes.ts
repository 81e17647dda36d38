// Region shapes for the demo pictures, made from the evidence the drawing code measured: rectangles
// round what was drawn, a circle round the rose, and the body's outline. Pure.
import { sampleSpline } from "../images/geom";
import { geometry } from "../images/instrument";
import type { Rect, SceneSpec } from "../images/types";
import type { RegionShape } from "../../schema/regions";

type Pt = [number, number];

const round1 = (n: number) => Math.round(n * 10) / 10;
const centre = (r: Rect): Pt => [r.x + r.width / 2, r.y + r.height / 2];

/** A rectangle round an evidence box with a margin (a person marks a little wide), kept in the image. */
export function rectAround(r: Rect, image: { width: number; height: number }, margin = 0.06): RegionShape {
  const mx = Math.round(r.width * margin), my = Math.round(r.height * margin);
  const x = Math.max(0, r.x - mx), y = Math.max(0, r.y - my);
  const w = Math.min(image.width, r.x + r.width + mx) - x, h = Math.min(image.height, r.y + r.height + my) - y;
  return { kind: "rectangle", x, y, w, h };
}

/** A polygon of `n` points on the circle inscribed in the rose's box: roses are round. */
export function circleAround(r: Rect, n = 24): RegionShape {
  const [cx, cy] = centre(r);
  const radius = Math.min(r.width, r.height) / 2;
  const points = Array.from({ length: n }, (_, i): Pt => {
    const a = (i / n) * 2 * Math.PI;
    return [round1(cx + radius * Math.cos(a)), round1(cy + radius * Math.sin(a))];
  });
  return { kind: "polygon", points };
}

// How far the rose's drawing reaches beyond the hole, as a multiple of its radius: inlaid rings and a
// ring of points round a guitar's rose, one carved ring round a lute's (see images/rose.ts).
const ROSE_REACH = { guitarLike: 1.388, lute: 1.06 };

/**
 * The soundboard's outline in image pixels. The drawing places the instrument by a rotation and a
 * uniform scale (images/geom.ts `frame`), which the evidence does not record, so both are recovered:
 * the rose's box is centred on the rose and its width gives the scale; the axis runs from the rose
 * towards the head (flat heads sit on the axis) or, for bent-back pegboxes and the cittern's sickle
 * head, away from the bridge. The outline is symmetric about the axis, so a mirrored print needs
 * nothing more.
 */
export function bodyOutline(scene: SceneSpec, perSegment = 2): RegionShape {
  const g = geometry(scene.instrument);
  const e = scene.evidence;
  const lute = scene.instrument.kind === "lute" || scene.instrument.kind === "theorbo";
  const reach = lute ? ROSE_REACH.lute : ROSE_REACH.guitarLike;
  const scale = (Math.min(e.rose.rect.width, e.rose.rect.height) - 2) / (2 * reach * g.rose.r);
  const rose = centre(e.rose.rect);
  const flatHead = scene.instrument.kind === "guitar" || scene.instrument.kind === "vihuela";
  const toward = flatHead ? centre(e.head.rect) : centre(e.bridge.rect);
  const sign = flatHead ? 1 : -1;
  const len = Math.hypot(toward[0] - rose[0], toward[1] - rose[1]);
  const u: Pt = [(sign * (toward[0] - rose[0])) / len, (sign * (toward[1] - rose[1])) / len];
  const v: Pt = [-u[1], u[0]];
  // The drawing smooths a spline through the outline's knots; a few points per span follow it closely.
  const points = sampleSpline(g.outline, true, perSegment).map(([x, y]): Pt => {
    const dx = (x - g.rose.c[0]) * scale, dy = y * scale;
    const px = Math.min(e.image.width, Math.max(0, rose[0] + u[0] * dx + v[0] * dy));
    const py = Math.min(e.image.height, Math.max(0, rose[1] + u[1] * dx + v[1] * dy));
    return [round1(px), round1(py)];
  });
  return { kind: "polygon", points };
}

/** A band across the top of the picture, `fraction` of its height (for the sky of a street scene). */
export function topBand(image: { width: number; height: number }, fraction: number): RegionShape {
  return { kind: "rectangle", x: 0, y: 0, w: image.width, h: Math.round(image.height * fraction) };
}

/** The whole picture: what a region about the setting or the ensemble is about. */
export function wholePicture(image: { width: number; height: number }): RegionShape {
  return { kind: "rectangle", x: 0, y: 0, w: image.width, h: image.height };
}
