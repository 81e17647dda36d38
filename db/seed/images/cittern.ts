// The cittern (small flat body, fixed metal frets, wire strings, sickle head with rear pegs) and a bass
// viol for the emblematic title page. Instrument frames in millimetres, tail at the origin.
import { add, inset, polar, type Pt } from "./geom";
import { type Pen } from "./pen";
import { drawBody } from "./guitar";
import { neckHalf, stringLines, type Geometry } from "./instrument";
import type { Palette } from "./look";
import type { Rng } from "./random";
import { drawRose } from "./rose";
import type { InstrumentSpec } from "./types";

const WIRE = ["#d6d2c4", "#c9a656"];

export function drawCittern(pen: Pen, g: Geometry, spec: InstrumentSpec, pal: Palette, rng: Rng) {
  pen.group("instrument", () => {
    pen.group("head", () => citternHead(pen, g, pal));
    drawBody(pen, g, pal, rng);
    drawRose(pen, spec.rose, g.rose.c, g.rose.r, pal);
    const x0 = g.joinX - 60;
    const h0 = neckHalf(g, x0);
    pen.poly([[x0, -h0], [g.nutX, -g.nutHalf], [g.nutX, g.nutHalf], [x0, h0]], { fill: pen.linear([0, -h0], [0, h0], [[0, "#3a2a1e"], [0.5, pal.ebony], [1, "#0f0a07"]]), stroke: "#0c0805", sw: 2 });
    pen.poly([[x0 + 40, h0], [g.nutX, g.nutHalf], [g.nutX, g.nutHalf + 7], [x0 + 60, h0 + 8]], { fill: pal.woodDark });
    // Fixed brass frets: one bright line each, with a dark line where it meets the board.
    for (let k = 1; k < g.frets.length; k++) {
      const x = g.frets[k], h = neckHalf(g, x);
      pen.line([x - 1, -h], [x - 1, h], { stroke: "#000000", sw: 2.4, op: 0.6 });
      pen.line([x, -h], [x, h], { stroke: "#d9b868", sw: 1.8, ink: true });
    }
    pen.poly([[g.nutX - 2, -g.nutHalf - 1], [g.nutX + 4, -g.nutHalf - 1], [g.nutX + 4, g.nutHalf + 1], [g.nutX - 2, g.nutHalf + 1]], { fill: pal.linen, stroke: "#3a2d1e", sw: 1.5, ink: true });
    pen.group("bridge", () => {
      const half = g.spreadBridge + 7;
      pen.poly([[g.bridgeX - 3, -half], [g.bridgeX + 4, -half], [g.bridgeX + 4, half], [g.bridgeX - 3, half]], { fill: pal.woodLight, stroke: "#000000", sw: 1.8, ink: true });
      for (const { yb } of stringLines(g)) pen.circle([6, yb * 0.8], 1.8, { fill: "#b8b2a0", stroke: "#000000", sw: 0.8 });
    });
    stringLines(g).forEach(({ course, yb, yn }, i) => {
      const color = WIRE[course % 2];
      const peg = g.pegs[g.pegOfString[i]];
      pen.line([6, yb * 0.8], [g.bridgeX, yb], { stroke: color, sw: 1, ink: true });
      pen.line([g.bridgeX, yb + 1.5], [g.joinX - 60, yb + 1.5], { stroke: "#1a0f06", sw: 1.4, op: 0.35 });
      pen.line([g.bridgeX, yb], [g.nutX, yn], { stroke: color, sw: 1 + course * 0.15, ink: true });
      pen.line([g.nutX, yn], [peg[0] - 4.5, peg[1]], { stroke: color, sw: 0.9, ink: true });
    });
  });
}

function citternHead(pen: Pen, g: Geometry, pal: Palette) {
  const x0 = g.nutX, L = g.headEnd - g.nutX;
  // A sickle: the flat head sweeps back towards the bass side and ends in a carved knob.
  const side: Pt[] = [[x0, 24], [x0 + L * 0.5, 26], [x0 + L * 0.9, 22], [x0 + L * 1.08, 4], [x0 + L * 1.12, -22], [x0 + L * 1.05, -48], [x0 + L * 0.98, -40], [x0 + L * 0.96, -26], [x0 + L * 0.7, -24], [x0, -24]];
  for (const [x, y] of g.pegs) {
    pen.line([x, y], [x + 1, y - 28], { stroke: pal.woodDark, sw: 4 });
    pen.ellipse([x + 1, y - 30], 7, 4.4, 0, { fill: pal.wood, stroke: "#150c06", sw: 1.8, ink: true });
  }
  pen.smooth(side.map((p) => add(p, [0, 6])), { fill: pal.woodDark });
  pen.smooth(side, { fill: pen.linear([x0, -30], [x0, 30], [[0, pal.woodLight], [1, pal.wood]]), stroke: "#150c06", sw: 2.4 });
  const knob: Pt = [x0 + L * 1.03, -52];
  pen.circle(knob, 11, { fill: pal.woodLight, stroke: "#150c06", sw: 2 });
  for (let i = 0; i < 3; i++) pen.circle(knob, 8 - i * 2.6, { stroke: "#150c06", sw: 1.2 });
  g.pegs.forEach(([x, y], i) => {
    pen.circle([x, y], 3, { fill: pal.woodLight, stroke: "#140b05", sw: 1.6, ink: true });
    pen.circle([x - 4.5, y], g.pegOfString.includes(i) ? 0.9 : 1.3, { fill: "#0a0604" });
  });
}

/** A bass viol hung by its neck: sloping shoulders, C-holes, tailpiece, six strings over tied frets. */
export function drawViol(pen: Pen, pal: Palette) {
  const knots: [number, number][] = [[0, 0], [10, 140], [70, 210], [160, 222], [250, 196], [300, 150], [345, 138], [392, 152], [440, 172], [520, 150], [600, 104], [660, 66], [700, 40], [706, 0]];
  const outline: Pt[] = [...knots.map(([x, y]) => [x, y] as Pt), ...knots.slice(1, -1).reverse().map(([x, y]) => [x, -y] as Pt)];
  const nutX = 1080, bridgeX = 250;
  {
    pen.smooth(outline.map(([x, y]) => [x, y + 12] as Pt), { fill: pal.woodDark, stroke: "#140b05", sw: 2.5 });
    pen.smooth(outline, { fill: pen.linear([0, -200], [0, 220], [[0, pal.woodLight], [1, pal.wood]]), stroke: "#140b05", sw: 3 });
    pen.smooth(inset(outline, 6), { stroke: pal.ebony, sw: 1.6, ink: true });
    for (const s of [-1, 1]) {
      // C-holes, open to the outside.
      pen.path([["M", [300, s * 58]], ["C", [330, s * 86], [390, s * 86], [410, s * 60]]], { stroke: "#0a0604", sw: 7 });
      pen.circle([300, s * 58], 4.5, { fill: "#0a0604" });
      pen.circle([410, s * 60], 4.5, { fill: "#0a0604" });
    }
    pen.smooth([[14, 0], [30, -40], [180, -30], [190, 0], [180, 30], [30, 40]], { fill: pal.ebony, stroke: "#000000", sw: 2, ink: true });
    pen.poly([[560, -30], [nutX, -26], [nutX, 26], [560, 30]], { fill: pal.ebony, stroke: "#000000", sw: 2 });
    const frets = Array.from({ length: 7 }, (_, k) => nutX - (nutX - bridgeX) * (1 - Math.pow(2, -(k + 1) / 12)));
    for (const x of frets) pen.line([x, -29], [x, 29], { stroke: pal.gut, sw: 1.8, ink: true });
    pen.smooth([[bridgeX - 6, -58], [bridgeX + 10, -44], [bridgeX + 12, 0], [bridgeX + 10, 44], [bridgeX - 6, 58]], { fill: pal.linen, stroke: "#3a2d1e", sw: 1.6, ink: true }, false);
    for (let i = 0; i < 6; i++) {
      const yb = -45 + i * 18, yn = -20 + i * 8;
      pen.line([182, yb * 0.55], [nutX, yn], { stroke: pal.gut, sw: 1.2 + (5 - i) * 0.25, ink: true });
    }
    // Pegbox and a carved scroll.
    pen.poly([[nutX, -24], [nutX + 180, -18], [nutX + 180, 18], [nutX, 24]], { fill: pal.wood, stroke: "#140b05", sw: 2.2 });
    for (let i = 0; i < 6; i++) pen.ellipse([nutX + 30 + i * 25, (i % 2 ? 1 : -1) * 36], 6, 10, 0, { fill: pal.woodLight, stroke: "#140b05", sw: 1.6, ink: true });
    const sc: Pt = [nutX + 205, 0];
    pen.circle(sc, 30, { fill: pal.woodLight, stroke: "#140b05", sw: 2.2 });
    for (let t = 0; t < 22; t++) pen.line(polar(sc, 28 - t * 1.1, t * 0.55), polar(sc, 28 - (t + 1) * 1.1, (t + 1) * 0.55), { stroke: "#140b05", sw: 1.6 });
  }
}
