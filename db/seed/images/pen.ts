// A "pen" that writes SVG in image pixels while remembering the bounding box of every named group
// it draws, so the evidence rectangles come from the very geometry that was drawn.
import { apply, emptyBox, grow, IDENTITY, mul, num, scaleOf, spline, ellipseCmds, type Box, type Cmd, type Mat, type Pt } from "./geom";

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
