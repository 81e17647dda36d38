// Affine frames and the geometry helpers shared by every drawing: splines, ellipses as Béziers,
// ribbons and insets, in whatever units the current frame uses.
export type Pt = readonly [number, number];
export type Mat = readonly [number, number, number, number, number, number];
export type Box = { x0: number; y0: number; x1: number; y1: number };
export type Cmd = readonly ["M", Pt] | readonly ["L", Pt] | readonly ["C", Pt, Pt, Pt] | readonly ["Z"];

export const IDENTITY: Mat = [1, 0, 0, 1, 0, 0];

export function apply(m: Mat, p: Pt): Pt {
  return [m[0] * p[0] + m[2] * p[1] + m[4], m[1] * p[0] + m[3] * p[1] + m[5]];
}

/** m ∘ n: apply n first, then m. */
export function mul(m: Mat, n: Mat): Mat {
  return [
    m[0] * n[0] + m[2] * n[1],
    m[1] * n[0] + m[3] * n[1],
    m[0] * n[2] + m[2] * n[3],
    m[1] * n[2] + m[3] * n[3],
    m[0] * n[4] + m[2] * n[5] + m[4],
    m[1] * n[4] + m[3] * n[5] + m[5],
  ];
}

/** A local frame: origin, counter-clockwise rotation in degrees (as seen on screen), uniform scale. */
export function frame(origin: Pt, degrees = 0, scale = 1): Mat {
  const a = (degrees * Math.PI) / 180;
  const c = Math.cos(a) * scale;
  const s = Math.sin(a) * scale;
  // local +x runs `degrees` above the horizontal; local +y is 90° clockwise from it (downwards).
  return [c, -s, s, c, origin[0], origin[1]];
}

/** A child frame placed inside a parent frame (origin and angle in the parent's units). */
export const sub = (parent: Mat, origin: Pt, degrees = 0, scale = 1): Mat => mul(parent, frame(origin, degrees, scale));

export const scaleOf = (m: Mat) => Math.sqrt(Math.abs(m[0] * m[3] - m[1] * m[2]));
export const lerp = (a: number, b: number, t: number) => a + (b - a) * t;
export const mix = (p: Pt, q: Pt, t: number): Pt => [lerp(p[0], q[0], t), lerp(p[1], q[1], t)];
export const add = (p: Pt, q: Pt): Pt => [p[0] + q[0], p[1] + q[1]];
export const polar = (c: Pt, r: number, a: number): Pt => [c[0] + r * Math.cos(a), c[1] + r * Math.sin(a)];

export const emptyBox = (): Box => ({ x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity });
export function grow(b: Box, p: Pt, pad = 0) {
  b.x0 = Math.min(b.x0, p[0] - pad);
  b.y0 = Math.min(b.y0, p[1] - pad);
  b.x1 = Math.max(b.x1, p[0] + pad);
  b.y1 = Math.max(b.y1, p[1] + pad);
}

export const num = (n: number) => {
  const s = n.toFixed(1);
  return s.endsWith(".0") ? s.slice(0, -2) : s;
};

/** Closed or open Catmull-Rom spline through the points, as cubic Béziers (control points stay in the hull). */
export function spline(pts: readonly Pt[], closed: boolean): Cmd[] {
  const n = pts.length;
  const at = (i: number) => (closed ? pts[(i + n) % n] : pts[Math.max(0, Math.min(n - 1, i))]);
  const cmds: Cmd[] = [["M", pts[0]]];
  const segments = closed ? n : n - 1;
  for (let i = 0; i < segments; i++) {
    const p0 = at(i - 1), p1 = at(i), p2 = at(i + 1), p3 = at(i + 2);
    const c1: Pt = [p1[0] + (p2[0] - p0[0]) / 6, p1[1] + (p2[1] - p0[1]) / 6];
    const c2: Pt = [p2[0] - (p3[0] - p1[0]) / 6, p2[1] - (p3[1] - p1[1]) / 6];
    cmds.push(["C", c1, c2, p2]);
  }
  if (closed) cmds.push(["Z"]);
  return cmds;
}

/** Ellipse as four Béziers, so it survives any affine frame (mirror and rotation included). */
export function ellipseCmds(c: Pt, rx: number, ry: number, degrees = 0): Cmd[] {
  const k = 0.5523;
  const a = (degrees * Math.PI) / 180;
  const ca = Math.cos(a), sa = Math.sin(a);
  const p = (x: number, y: number): Pt => [c[0] + x * ca - y * sa, c[1] + x * sa + y * ca];
  return [
    ["M", p(rx, 0)],
    ["C", p(rx, ry * k), p(rx * k, ry), p(0, ry)],
    ["C", p(-rx * k, ry), p(-rx, ry * k), p(-rx, 0)],
    ["C", p(-rx, -ry * k), p(-rx * k, -ry), p(0, -ry)],
    ["C", p(rx * k, -ry), p(rx, -ry * k), p(rx, 0)],
    ["Z"],
  ];
}

/** Points along a spline, for outlines that other parts (hands, bridge ends) must follow. */
export function sampleSpline(pts: readonly Pt[], closed: boolean, perSegment = 16): Pt[] {
  const out: Pt[] = [];
  let from: Pt = pts[0];
  for (const c of spline(pts, closed)) {
    if (c[0] === "M") from = c[1];
    if (c[0] !== "C") continue;
    const [, c1, c2, to] = c;
    for (let i = 0; i < perSegment; i++) {
      const t = i / perSegment, u = 1 - t;
      out.push([
        u * u * u * from[0] + 3 * u * u * t * c1[0] + 3 * u * t * t * c2[0] + t * t * t * to[0],
        u * u * u * from[1] + 3 * u * u * t * c1[1] + 3 * u * t * t * c2[1] + t * t * t * to[1],
      ]);
    }
    from = to;
  }
  return out;
}

/** A band of varying width along a centreline, as a closed outline (fingers, sleeves, scrolls). */
export function ribbon(center: readonly Pt[], widths: readonly number[]): Pt[] {
  const left: Pt[] = [], right: Pt[] = [];
  for (let i = 0; i < center.length; i++) {
    const a = center[Math.max(0, i - 1)], b = center[Math.min(center.length - 1, i + 1)];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
    const n: Pt = [-(b[1] - a[1]) / len, (b[0] - a[0]) / len];
    const w = widths[Math.min(widths.length - 1, i)] / 2;
    left.push([center[i][0] + n[0] * w, center[i][1] + n[1] * w]);
    right.push([center[i][0] - n[0] * w, center[i][1] - n[1] * w]);
  }
  return [...left, ...right.reverse()];
}

/** Moves every point of a closed outline inwards by d (outwards if negative), along its normal. */
export function inset(pts: readonly Pt[], d: number): Pt[] {
  let area = 0;
  for (let i = 0; i < pts.length; i++) {
    const [a, b] = [pts[i], pts[(i + 1) % pts.length]];
    area += a[0] * b[1] - b[0] * a[1];
  }
  const sign = area > 0 ? 1 : -1;
  return pts.map((p, i) => {
    const a = pts[(i - 1 + pts.length) % pts.length], b = pts[(i + 1) % pts.length];
    const len = Math.hypot(b[0] - a[0], b[1] - a[1]) || 1;
    return [p[0] - (sign * d * (b[1] - a[1])) / len, p[1] + (sign * d * (b[0] - a[0])) / len] as Pt;
  });
}
