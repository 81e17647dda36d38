// The player's body in a figure frame (millimetres, origin between the hips, y down): chair, legs or
// skirt, doublet or bodice, collar, and sleeves that run to wherever the hands have to be.
import { add, mix, ribbon, type Pt } from "./geom";
import { type Pen } from "./pen";
import { blend, type Palette } from "./look";
import type { Rng } from "./random";
import type { FigureSpec } from "./types";

export type Posture = "seated" | "standing";

export const SKELETON = {
  shoulderR: [-185, -530] as Pt,
  shoulderL: [185, -530] as Pt,
  neck: [0, -590] as Pt,
  head: [12, -720] as Pt,
};

export function drawChair(pen: Pen, pal: Palette) {
  const wood = blend(pal.woodDark, pal.bgDark, 0.3);
  for (const s of [-1, 1]) {
    pen.poly([[s * 250, -640], [s * 226, -640], [s * 226, 470], [s * 250, 470]], { fill: wood, stroke: "#0a0604", sw: 2 });
    pen.circle([s * 238, -660], 22, { fill: pal.woodLight, stroke: "#0a0604", sw: 2 });
  }
  pen.poly([[-228, -600], [228, -600], [228, -330], [-228, -330]], { fill: pen.linear([0, -600], [0, -330], [[0, pal.cloth2Dark], [1, "#0d0805"]]), stroke: "#0a0604", sw: 2 });
  for (let i = 0; i < 9; i++) pen.circle([-210 + i * 52.5, -590], 6, { fill: pal.gold, op: 0.8 });
  pen.poly([[-280, 20], [280, 20], [260, 70], [-260, 70]], { fill: wood, stroke: "#0a0604", sw: 2 });
}

const stocking = (pal: Palette) => blend(pal.clothDark, pal.linenShadow, 0.35);

function leg(pen: Pen, hip: Pt, knee: Pt, foot: Pt, pal: Palette, breeches: string) {
  pen.smooth(ribbon([hip, mix(hip, knee, 0.5), knee], [165, 158, 130]), { fill: pen.linear(add(hip, [-90, 0]), add(hip, [90, 0]), [[0, blend(breeches, "#ffffff", 0.15)], [1, blend(breeches, "#000000", 0.45)]]), stroke: "#0a0604", sw: 2.4 });
  pen.smooth(ribbon([add(knee, [0, 10]), mix(knee, foot, 0.4), add(foot, [0, -20])], [100, 96, 66]), { fill: pen.linear(add(knee, [-50, 0]), add(knee, [60, 0]), [[0, stocking(pal)], [1, blend(stocking(pal), "#000000", 0.45)]]), stroke: "#1a120c", sw: 2 });
  // A garter ribbon below the knee, and a shoe with a rosette.
  pen.smooth(ribbon([add(knee, [-58, 30]), add(knee, [58, 34])], [22, 22]), { fill: pal.cloth2, stroke: "#0a0604", sw: 1.5 });
  pen.smooth([add(foot, [-48, -24]), add(foot, [52, -26]), add(foot, [78, 18]), add(foot, [-44, 22])], { fill: "#1b120c", stroke: "#000000", sw: 2 });
  pen.circle(add(foot, [10, -18]), 16, { fill: pal.cloth2Dark, stroke: "#000000", sw: 1.2 });
}

export function drawLegs(pen: Pen, fig: FigureSpec, posture: Posture, pal: Palette) {
  if (fig.sex === "woman") return drawSkirt(pen, posture, pal);
  if (posture === "standing") {
    leg(pen, [-90, 20], [-110, 470], [-150, 860], pal, pal.cloth2);
    leg(pen, [90, 20], [100, 470], [120, 870], pal, pal.cloth2);
  } else if (fig.crossedLeg) {
    // Right over left: the right knee rests on the left one and its shin slants across the left
    // shin, the foot hanging free beyond it.
    leg(pen, [100, 30], [110, 130], [110, 495], pal, pal.cloth2);
    leg(pen, [-100, 20], [120, 40], [270, 400], pal, pal.cloth2);
  } else {
    leg(pen, [-110, 30], [-150, 120], [-175, 490], pal, pal.cloth2);
    leg(pen, [110, 30], [150, 120], [175, 495], pal, pal.cloth2);
  }
}

function drawSkirt(pen: Pen, posture: Posture, pal: Palette) {
  const hem = posture === "standing" ? 880 : 520;
  const w = posture === "standing" ? 380 : 440;
  const out: Pt[] = [[-140, -140], [140, -140], [w * 0.7, hem * 0.4], [w, hem], [0, hem + 20], [-w, hem], [-w * 0.7, hem * 0.4]];
  pen.smooth(out, { fill: pen.linear([-w, 0], [w, 0], [[0, blend(pal.cloth2, "#ffffff", 0.15)], [0.5, pal.cloth2], [1, pal.cloth2Dark]]), stroke: "#0a0604", sw: 2.4 });
  // Deep vertical folds.
  for (let i = -3; i <= 3; i++) {
    const x = i * w * 0.26;
    pen.path([["M", [x * 0.3, -100]], ["C", [x * 0.6, hem * 0.3], [x * 0.9, hem * 0.6], [x, hem]]], { stroke: pal.cloth2Dark, sw: 14, op: 0.35 });
    pen.path([["M", [x * 0.3 + 18, -90]], ["C", [x * 0.6 + 24, hem * 0.3], [x * 0.9 + 30, hem * 0.6], [x + 34, hem]]], { stroke: blend(pal.cloth2, "#ffffff", 0.3), sw: 6, op: 0.3 });
  }
}

export function drawTorso(pen: Pen, fig: FigureSpec, pal: Palette, rng: Rng) {
  const woman = fig.sex === "woman";
  const sh = woman ? 172 : 190, waist = woman ? 115 : 140;
  // The neck first, so the collar and the chin overlap it.
  pen.smooth([[-40, -660], [40, -660], [42, -600], [60, -560], [0, -548], [-60, -560], [-42, -600]], { fill: pen.linear([-50, 0], [50, 0], [[0, pal.skin], [1, pal.skinShadow]]), stroke: pal.skinShadow, sw: 2 });
  const out: Pt[] = [[-56, -585], [-150, -570], [-sh, -535], [-sh + 8, -420], [-waist - 10, -250], [-waist, -130], [-waist - 40, -30], [0, woman ? -60 : -10], [waist + 40, -30], [waist, -130], [waist + 10, -250], [sh - 8, -420], [sh, -535], [150, -570], [56, -585]];
  pen.smooth(out, { fill: pen.linear([-sh, -400], [sh, -200], [[0, pal.clothLight], [0.35, pal.cloth], [1, pal.clothDark]]), stroke: "#0a0604", sw: 2.6 });
  if (woman) {
    // Low neckline: skin, then the chemise edge with its gathered frill.
    pen.smooth([[-150, -560], [0, -585], [150, -560], [120, -470], [0, -440], [-120, -470]], { fill: pen.linear([-120, -560], [120, -450], [[0, pal.skinLight], [1, pal.skinShadow]]) });
    pen.smooth([[-132, -486], [0, -452], [132, -486], [126, -472], [0, -436], [-126, -472]], { fill: pal.linen, stroke: pal.linenShadow, sw: 1.2 });
    for (let i = 0; i < 22; i++) pen.circle(mix([-128, -476], [128, -476], i / 21), 5, { stroke: pal.linenShadow, sw: 1, op: 0.8 });
    pen.poly([[-70, -440], [70, -440], [0, -80]], { fill: pal.cloth2, stroke: "#0a0604", sw: 1.6, op: 0.9 });
    for (let i = 0; i < 8; i++) pen.line([-52 + i * 5.5, -420 + i * 40], [52 - i * 5.5, -420 + i * 40], { stroke: pal.gold, sw: 2.2, op: 0.8 });
  } else {
    pen.path([["M", [4, -560]], ["C", [8, -400], [0, -250], [6, -40]]], { stroke: "#0a0604", sw: 3 });
    for (let y = -540; y < -60; y += 34) pen.circle([6 + rng.jitter(1), y], 7, { fill: pal.gold, stroke: "#2a1a08", sw: 1.2 });
    // Short tabs of the doublet's skirt below the waist.
    for (let i = -4; i <= 4; i++) pen.line([i * 38, -120], [i * 46, -26], { stroke: "#0a0604", sw: 1.8, op: 0.7 });
  }
  for (let i = 0; i < 6; i++) {
    const x = rng.range(-sh * 0.7, sh * 0.7), y = rng.range(-480, -200);
    pen.path([["M", [x, y]], ["C", [x + 20, y + 40], [x - 10, y + 80], [x + 8, y + 120]]], { stroke: pal.clothDark, sw: 6, op: 0.3 });
  }
  if (!woman) drawCollar(pen, pal);
}

function drawCollar(pen: Pen, pal: Palette) {
  const band: Pt[] = [[-58, -600], [58, -600], [160, -545], [180, -505], [110, -470], [0, -490], [-110, -470], [-180, -505], [-160, -545]];
  pen.smooth(band, { fill: pen.linear([-150, -600], [150, -480], [[0, "#f6efde"], [0.6, pal.linen], [1, pal.linenShadow]]), stroke: pal.linenShadow, sw: 2 });
  // Lace edging: a row of small scallops, each with a pierced eye.
  const edge: Pt[] = [[-180, -505], [-110, -470], [0, -490], [110, -470], [180, -505]];
  for (let i = 0; i < edge.length - 1; i++) {
    for (let k = 0; k < 8; k++) {
      const p = mix(edge[i], edge[i + 1], (k + 0.5) / 8);
      pen.circle(p, 8, { fill: pal.linen, stroke: pal.linenShadow, sw: 1.1 });
      pen.circle(p, 2.2, { fill: pal.linenShadow, op: 0.8 });
    }
  }
  pen.line([0, -598], [0, -492], { stroke: pal.linenShadow, sw: 1.5, op: 0.8 });
}

/** A sleeve from shoulder through elbow to wrist, in image pixels (width in pixels). */
export function drawSleeve(pen: Pen, path: Pt[], widths: number[], pal: Palette, woman: boolean) {
  const outline = ribbon(path, widths);
  const [a, b] = [path[0], path[path.length - 1]];
  pen.smooth(outline, { fill: pen.linear(add(a, [-widths[0] / 2, -widths[0] / 2]), add(b, [widths[0] / 2, widths[0] / 2]), [[0, woman ? blend(pal.linen, "#000000", 0.05) : pal.clothLight], [0.5, woman ? pal.linenShadow : pal.cloth], [1, woman ? blend(pal.linenShadow, "#000000", 0.35) : pal.clothDark]]), stroke: "#0a0604", sw: 2.6 });
  // Panes of a slashed sleeve (or the gathers of a chemise sleeve): long strips along its length.
  for (const f of [-0.22, 0.05, 0.3]) {
    const strip = path.map((p, i) => {
      const q2 = path[Math.min(path.length - 1, i + 1)], o = path[Math.max(0, i - 1)];
      const len = Math.hypot(q2[0] - o[0], q2[1] - o[1]) || 1;
      return [p[0] - ((q2[1] - o[1]) / len) * widths[i] * f, p[1] + ((q2[0] - o[0]) / len) * widths[i] * f] as Pt;
    });
    pen.smooth(strip, { stroke: woman ? pal.linenShadow : pal.cloth2, sw: widths[0] * 0.06, op: 0.55 }, false);
  }
}

/** A linen cuff at the wrist with a turned-back lace edge. */
export function drawCuff(pen: Pen, wrist: Pt, toward: Pt, width: number, pal: Palette) {
  const d: Pt = [toward[0] - wrist[0], toward[1] - wrist[1]];
  const len = Math.hypot(d[0], d[1]) || 1;
  const u: Pt = [d[0] / len, d[1] / len], n: Pt = [-u[1], u[0]];
  const at = (s: number, w: number): Pt => [wrist[0] + u[0] * s + n[0] * w, wrist[1] + u[1] * s + n[1] * w];
  pen.smooth([at(-width * 0.35, -width * 0.55), at(-width * 0.35, width * 0.55), at(width * 0.12, width * 0.62), at(width * 0.12, -width * 0.62)], { fill: pen.linear(at(0, -width), at(0, width), [[0, "#f6efde"], [1, pal.linenShadow]]), stroke: pal.linenShadow, sw: 1.8 });
  for (let i = 0; i < 9; i++) pen.circle(at(width * 0.12, -width * 0.56 + (i * width * 1.12) / 8), width * 0.07, { fill: pal.linen, stroke: pal.linenShadow, sw: 1 });
}
