// Affine frames and a "pen" that writes SVG in image pixels while remembering the bounding box of
// every named group it draws, so the evidence rectangles come from the very geometry that was drawn.
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

/** Gradient stops: offset, colour, optional opacity. */
export type Stops = readonly (readonly [number, string, number?])[];

export type Style = {
  fill?: string;
  stroke?: string;
  /** Stroke width in image pixels, whatever the frame's scale. */
  sw?: number;
  op?: number;
  cap?: "round" | "butt" | "square";
  join?: "round" | "miter" | "bevel";
  dash?: string;
  rule?: "evenodd";
  /** An evidence line (string, fret, tracery): stays dark ink in monochrome media. */
  ink?: boolean;
};

/** How a medium turns the painter's colours into its own (oil keeps them; prints hatch them). */
export interface Look {
  readonly name: string;
  fill(color: string): string;
  stroke(color: string, ink: boolean): string;
  gradient(stops: Stops): Stops | string;
  /** Patterns the medium needs (hatching), written once into the document. */
  defs(): string;
  /** A reserve drawn under evidence lines, so they read over dark hatching as well as light. */
  halo?(): string;
}

export class Pen {
  m: Mat = IDENTITY;
  /** Applied after every frame: a mirrored print flips the whole plate here, not with an SVG
   * transform (a transformed hatching pattern sends librsvg down a very slow path). */
  private base: Mat = IDENTITY;
  private body: string[] = [];
  private defs: string[] = [];
  private boxes = new Map<string, Box>();
  private active: string[] = [];
  private ids = 0;

  constructor(readonly look: Look) {}

  setBase(m: Mat) {
    this.base = m;
  }

  private get out(): Mat {
    return this.base === IDENTITY ? this.m : mul(this.base, this.m);
  }

  with<T>(m: Mat, fn: () => T): T {
    const saved = this.m;
    this.m = m;
    try {
      return fn();
    } finally {
      this.m = saved;
    }
  }

  /** Everything drawn inside fn grows the named box (and the boxes of enclosing groups). */
  group<T>(name: string, fn: () => T): T {
    this.active.push(name);
    try {
      return fn();
    } finally {
      this.active.pop();
    }
  }

  box(name: string): Box | undefined {
    return this.boxes.get(name);
  }

  mark(p: Pt, pad: number) {
    for (const name of this.active) {
      let b = this.boxes.get(name);
      if (!b) this.boxes.set(name, (b = emptyBox()));
      grow(b, p, pad);
    }
  }

  id(prefix: string) {
    return `${prefix}${++this.ids}`;
  }

  raw(svg: string) {
    this.body.push(svg);
  }

  def(svg: string) {
    this.defs.push(svg);
  }

  open(attrs: string) {
    this.body.push(`<g ${attrs}>`);
  }

  close() {
    this.body.push("</g>");
  }

  /** Defines a clip path from shapes drawn by fn (in the current frame); they are not tracked. */
  clip(fn: () => void): string {
    const id = this.id("c");
    const saved = this.body, active = this.active;
    this.body = [];
    this.active = [];
    fn();
    this.defs.push(`<clipPath id="${id}">${this.body.join("")}</clipPath>`);
    this.body = saved;
    this.active = active;
    return `url(#${id})`;
  }

  linear(a: Pt, b: Pt, stops: Stops): string {
    const mapped = this.look.gradient(stops);
    if (typeof mapped === "string") return mapped;
    const [p, q] = [apply(this.out, a), apply(this.out, b)];
    const id = this.id("l");
    this.defs.push(
      `<linearGradient id="${id}" gradientUnits="userSpaceOnUse" x1="${num(p[0])}" y1="${num(p[1])}" x2="${num(q[0])}" y2="${num(q[1])}">${stopTags(mapped)}</linearGradient>`,
    );
    return `url(#${id})`;
  }

  radial(c: Pt, r: number, stops: Stops): string {
    const mapped = this.look.gradient(stops);
    if (typeof mapped === "string") return mapped;
    const p = apply(this.out, c);
    const id = this.id("r");
    this.defs.push(
      `<radialGradient id="${id}" gradientUnits="userSpaceOnUse" cx="${num(p[0])}" cy="${num(p[1])}" r="${num(r * scaleOf(this.m))}">${stopTags(mapped)}</radialGradient>`,
    );
    return `url(#${id})`;
  }

  path(cmds: readonly Cmd[], s: Style) {
    const pad = (s.stroke && s.stroke !== "none" ? (s.sw ?? 1) / 2 : 0) + 1;
    let d = "";
    const m = this.out;
    for (const c of cmds) {
      if (c[0] === "Z") {
        d += "Z";
        continue;
      }
      d += c[0];
      for (let i = 1; i < c.length; i++) {
        const p = apply(m, c[i] as Pt);
        this.mark(p, pad);
        d += `${num(p[0])} ${num(p[1])}${i < c.length - 1 ? " " : ""}`;
      }
    }
    if (s.ink && s.stroke && this.look.halo) this.body.push(`<path d="${d}" fill="none" stroke="${this.look.halo()}" stroke-width="${num((s.sw ?? 1) + 2.4)}" stroke-linecap="round" stroke-linejoin="round"/>`);
    this.body.push(`<path d="${d}"${this.attrs(s)}/>`);
  }

  poly(pts: readonly Pt[], s: Style, closed = true) {
    const cmds: Cmd[] = pts.map((p, i) => (i === 0 ? ["M", p] : ["L", p]));
    if (closed) cmds.push(["Z"]);
    this.path(cmds, s);
  }

  smooth(pts: readonly Pt[], s: Style, closed = true) {
    this.path(spline(pts, closed), s);
  }

  line(a: Pt, b: Pt, s: Style) {
    this.path([["M", a], ["L", b]], s);
  }

  circle(c: Pt, r: number, s: Style) {
    const p = apply(this.out, c);
    const rr = r * scaleOf(this.m);
    const pad = (s.stroke && s.stroke !== "none" ? (s.sw ?? 1) / 2 : 0) + 1;
    this.mark([p[0] - rr, p[1] - rr], pad);
    this.mark([p[0] + rr, p[1] + rr], pad);
    if (s.ink && s.stroke && this.look.halo) this.body.push(`<circle cx="${num(p[0])}" cy="${num(p[1])}" r="${num(rr)}" fill="none" stroke="${this.look.halo()}" stroke-width="${num((s.sw ?? 1) + 2.4)}"/>`);
    this.body.push(`<circle cx="${num(p[0])}" cy="${num(p[1])}" r="${num(rr)}"${this.attrs(s)}/>`);
  }

  ellipse(c: Pt, rx: number, ry: number, degrees: number, s: Style) {
    this.path(ellipseCmds(c, rx, ry, degrees), s);
  }

  svg(width: number, height: number): string {
    return (
      `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">` +
      `<defs>${this.look.defs()}${this.defs.join("")}</defs>${this.body.join("")}</svg>`
    );
  }

  private attrs(s: Style): string {
    let a = ` fill="${s.fill ? this.look.fill(s.fill) : "none"}"`;
    if (s.stroke && s.stroke !== "none") {
      a += ` stroke="${this.look.stroke(s.stroke, s.ink ?? false)}" stroke-width="${num(s.sw ?? 1)}"`;
      a += ` stroke-linecap="${s.cap ?? "round"}" stroke-linejoin="${s.join ?? "round"}"`;
      if (s.dash) a += ` stroke-dasharray="${s.dash}"`;
    }
    // Not `opacity`: librsvg renders every element with group opacity through a full-canvas
    // offscreen surface, which made a scene take minutes; paint opacities cost nothing.
    if (s.op !== undefined) a += ` fill-opacity="${num3(s.op)}" stroke-opacity="${num3(s.op)}"`;
    if (s.rule) a += ` fill-rule="${s.rule}"`;
    return a;
  }
}

const num3 = (n: number) => String(Math.round(n * 1000) / 1000);
const stopTags = (stops: Stops) =>
  stops.map(([o, c, a]) => `<stop offset="${num3(o)}" stop-color="${c}"${a === undefined ? "" : ` stop-opacity="${num3(a)}"`}/>`).join("");

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
