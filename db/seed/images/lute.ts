// Lute (bowl back, carved rose, pegbox bent back with side pegs) and theorbo (the same family with a
// long extended neck and a second pegbox for the open bass strings). Instrument frame in mm.
import { add, type Pt } from "./geom";
import { type Pen } from "./pen";
import { drawBody } from "./guitar";
import { neckHalf, stringLines, type Geometry } from "./instrument";
import type { Palette } from "./look";
import type { Rng } from "./random";
import { drawRose } from "./rose";

export const THEORBO_DIAPASONS = 8;

type Box = { start: Pt; angle: number; length: number; w0: number; w1: number };

/** The bowl shows as a ribbed crescent below the top: the lute is turned a little towards us. */
function bowl(pen: Pen, g: Geometry, pal: Palette) {
  const back = g.outline.map(([x, y]) => [x * 0.99 + 3, y * 1.02 + 30] as Pt);
  pen.smooth(back, { fill: pen.linear([0, 0], [0, 190], [[0, pal.wood], [1, pal.woodDark]]), stroke: "#120a05", sw: 3 });
  for (let k = 1; k <= 6; k++) pen.smooth(g.outline.map(([x, y]) => [x * (1 - k * 0.002) + k * 0.5, y * (1 + k * 0.003) + k * 4.6] as Pt), { stroke: k % 2 ? pal.woodLight : "#1a0f07", sw: k % 2 ? 1.6 : 2.2, op: 0.75 }, true);
}

/** A pegbox: an open trough seen from above, pegs through both walls, knobs alternating sides. */
function pegbox(pen: Pen, box: Box, pegs: number, pal: Palette, firstSide: 1 | -1): Pt[] {
  const a = (box.angle * Math.PI) / 180;
  const d: Pt = [Math.cos(a), Math.sin(a)], n: Pt = [-d[1], d[0]];
  const at = (t: number, s: number): Pt => {
    const w = box.w0 + (box.w1 - box.w0) * (t / box.length);
    return [box.start[0] + d[0] * t + n[0] * s * w, box.start[1] + d[1] * t + n[1] * s * w];
  };
  const shafts: Pt[] = [];
  const knobs: { p: Pt; s: number }[] = [];
  for (let i = 0; i < pegs; i++) {
    const t = 22 + (i * (box.length - 40)) / Math.max(1, pegs - 1);
    const s = i % 2 === 0 ? firstSide : -firstSide;
    shafts.push(at(t, 0));
    knobs.push({ p: at(t, s * 1.9), s });
  }
  const wall = [at(0, -1), at(box.length, -1), at(box.length + 12, 0), at(box.length, 1), at(0, 1)];
  pen.smooth(wall.map((p) => add(p, [0, 6])), { fill: pal.woodDark });
  pen.poly(wall, { fill: pal.wood, stroke: "#120a05", sw: 2.4 });
  pen.poly([at(6, -0.7), at(box.length - 6, -0.7), at(box.length - 6, 0.7), at(6, 0.7)], { fill: "#160d07", stroke: pal.woodDark, sw: 1.4 });
  knobs.forEach(({ p, s }, i) => {
    pen.line(at(22 + (i * (box.length - 40)) / Math.max(1, pegs - 1), -s * 0.9), p, { stroke: pal.woodDark, sw: 5 });
    pen.ellipse(p, 11, 6, box.angle + 90, { fill: pal.woodLight, stroke: "#120a05", sw: 1.8, ink: true });
    pen.ellipse(add(p, [-1.5, -1.5]), 5, 2, box.angle + 90, { fill: "#f0d2a0", op: 0.5 });
  });
  return shafts;
}

function luteBridge(pen: Pen, g: Geometry, half: number, pal: Palette) {
  pen.group("bridge", () => {
    const x = g.bridgeX;
    pen.smooth([[x - 4, -half - 18], [x + 2, -half], [x + 8, 0], [x + 2, half], [x - 4, half + 18], [x - 8, half], [x - 8, -half]], { fill: pal.woodDark, stroke: "#000000", sw: 2, ink: true });
    pen.line([x + 4, -half], [x + 4, half], { stroke: pal.woodLight, sw: 1.2, op: 0.6 });
  });
}

function fretsAndBoard(pen: Pen, g: Geometry, pal: Palette, extraBass = 0) {
  const x0 = g.joinX - 12;
  const h0 = neckHalf(g, x0);
  pen.poly([[x0, -h0 - extraBass], [g.nutX, -g.nutHalf - extraBass], [g.nutX, g.nutHalf], [x0, h0]], { fill: pen.linear([0, -h0], [0, h0], [[0, "#3a2a1e"], [0.5, pal.ebony], [1, "#0f0a07"]]), stroke: "#0c0805", sw: 2.2 });
  pen.poly([[x0, h0], [g.nutX, g.nutHalf], [g.nutX, g.nutHalf + 8], [x0, h0 + 12]], { fill: pal.woodDark, stroke: "#0c0805", sw: 1.5 });
  for (let k = 1; k < g.frets.length; k++) {
    const x = g.frets[k], h = neckHalf(g, x) + 1;
    for (const dx of [-0.9, 0.9]) pen.line([x + dx, -h], [x + dx, h], { stroke: pal.gut, sw: 1.7, ink: true });
    pen.ellipse([x, -h - 1.2], 2.5, 1.7, 20, { fill: pal.gut, stroke: "#2a1e12", sw: 1.1, ink: true });
  }
  pen.poly([[g.nutX - 2, -g.nutHalf - 1], [g.nutX + 4, -g.nutHalf - 1], [g.nutX + 4, g.nutHalf + 1], [g.nutX - 2, g.nutHalf + 1]], { fill: pal.linen, stroke: "#3a2d1e", sw: 1.6, ink: true });
}

function strings(pen: Pen, g: Geometry, ends: Pt[], pal: Palette) {
  stringLines(g).forEach(({ course, yb, yn }, i) => {
    const w = 1.1 + (course - 1) * 0.2;
    const nut: Pt = [g.nutX, yn];
    pen.line([g.bridgeX + 2, yb + 1.6], [g.joinX - 12, yb + ((yn - yb) * (g.joinX - 12 - g.bridgeX)) / (g.nutX - g.bridgeX) + 1.6], { stroke: "#2a1a0c", sw: w + 0.6, op: 0.3 });
    pen.line([g.bridgeX + 2, yb], nut, { stroke: pal.gut, sw: w, ink: true });
    pen.line(nut, ends[i], { stroke: pal.gut, sw: w * 0.85, op: 0.9, ink: true });
    pen.circle([g.bridgeX - 3, yb], 1.8, { stroke: pal.gut, sw: 1.1 });
  });
}

export function drawLute(pen: Pen, g: Geometry, pal: Palette, rng: Rng) {
  pen.group("instrument", () => {
    bowl(pen, g, pal);
    drawBody(pen, g, pal, rng);
    drawRose(pen, "carved-lute", g.rose.c, g.rose.r, pal);
    luteBridge(pen, g, g.spreadBridge + 10, pal);
    fretsAndBoard(pen, g, pal);
    // Bent back at the nut: in this view the pegbox drops steeply towards the treble side.
    const shafts = pen.group("head", () => pegbox(pen, { start: [g.nutX + 3, 0], angle: 62, length: 175, w0: 24, w1: 15 }, g.pegs.length, pal, -1));
    const order = stringLines(g).map((_, i) => shafts[Math.min(shafts.length - 1, i)]);
    strings(pen, g, order, pal);
  });
}

export function drawTheorbo(pen: Pen, g: Geometry, pal: Palette, rng: Rng) {
  const off = g.nutHalf + 16; // the extension runs on the bass side, clear of the lower pegbox
  const upperX = g.nutX + 720;
  pen.group("instrument", () => {
    bowl(pen, g, pal);
    drawBody(pen, g, pal, rng);
    drawRose(pen, "carved-lute", g.rose.c, g.rose.r, pal);
    luteBridge(pen, g, g.spreadBridge + 44, pal);
    fretsAndBoard(pen, g, pal, 14);
    const lower = pen.group("head", () => pegbox(pen, { start: [g.nutX + 3, 0], angle: 0, length: 190, w0: 26, w1: 22 }, stringLines(g).length, pal, 1));
    const upper = pen.group("head", () => {
      // The extended neck: a long slender bar ending in the second nut and pegbox.
      pen.poly([[g.nutX + 150, -off - 13], [upperX, -off - 11], [upperX, -off + 11], [g.nutX + 150, -off + 9]], { fill: pen.linear([0, -off - 12], [0, -off + 12], [[0, pal.woodLight], [1, pal.woodDark]]), stroke: "#120a05", sw: 2 });
      pen.poly([[upperX - 4, -off - 12], [upperX + 2, -off - 12], [upperX + 2, -off + 12], [upperX - 4, -off + 12]], { fill: pal.linen, stroke: "#3a2d1e", sw: 1.4, ink: true });
      return pegbox(pen, { start: [upperX + 3, -off], angle: 0, length: 170, w0: 20, w1: 17 }, THEORBO_DIAPASONS, pal, -1);
    });
    strings(pen, g, lower, pal);
    // The diapasons: open basses from the bridge's bass end to the upper nut.
    for (let i = 0; i < THEORBO_DIAPASONS; i++) {
      const yb = -g.spreadBridge - 8 - i * 4.2;
      const yn = -off - 8 + i * 2.3;
      pen.line([g.bridgeX + 2, yb], [upperX, yn], { stroke: pal.gut, sw: 2.1, ink: true });
      pen.line([upperX, yn], upper[i], { stroke: pal.gut, sw: 1.8, op: 0.9, ink: true });
      pen.circle([g.bridgeX - 3, yb], 1.8, { stroke: pal.gut, sw: 1.1 });
    }
  });
}
