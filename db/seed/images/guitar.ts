// The waisted, flat-headed instruments: the five-course guitar (and the six-course vihuela). Drawn in
// the instrument frame (millimetres); stroke widths are image pixels, so strings stay hair-fine.
import { inset, ribbon, type Pt } from "./geom";
import { type Pen } from "./pen";
import { neckHalf, stringLines, type Geometry } from "./instrument";
import type { Palette } from "./look";
import type { Rng } from "./random";
import { drawRose } from "./rose";
import type { InstrumentSpec } from "./types";

export function drawFlatHeaded(pen: Pen, g: Geometry, spec: InstrumentSpec, pal: Palette, rng: Rng) {
  pen.group("instrument", () => {
    pen.group("head", () => drawKnobs(pen, g, pal));
    drawBody(pen, g, pal, rng);
    drawRose(pen, spec.rose, g.rose.c, g.rose.r, pal);
    drawNeck(pen, g, spec, pal);
    pen.group("head", () => drawHead(pen, g, pal));
    pen.group("bridge", () => drawBridge(pen, g, spec, pal));
    drawStrings(pen, g, spec, pal);
  });
}

export function drawBody(pen: Pen, g: Geometry, pal: Palette, rng: Rng) {
  // The ribs show as a band below the top: the guitar is tilted a little towards us.
  pen.smooth(g.outline.map(([x, y]) => [x, y + 10] as Pt), { fill: pal.woodDark, stroke: "#140b05", sw: 3 });
  pen.smooth(g.outline.map(([x, y]) => [x, y + 5] as Pt), { fill: pal.wood, op: 0.8 });
  const top = pen.linear([0, -140], [0, 150], [[0, pal.top], [0.55, pal.top], [1, pal.topDark]]);
  pen.smooth(g.outline, { fill: top, stroke: "#1e1108", sw: 3 });
  // Spruce grain: fine lines along the length, clipped to the top.
  const clip = pen.clip(() => pen.smooth(g.outline, { fill: "#000" }));
  pen.open(`clip-path="${clip}"`);
  for (let y = -160; y < 160; y += rng.range(2.2, 4.5)) {
    const w = rng.jitter(1.2);
    pen.path([["M", [-5, y]], ["C", [150, y + w], [300, y - w], [g.bodyLength + 5, y + w * 0.5]]], { stroke: pal.topDark, sw: rng.range(0.8, 1.6), op: rng.range(0.15, 0.35) });
  }
  // Light falls from the upper left: a soft sheen on the lower bout, shadow towards the treble edge.
  pen.circle([120, -40], 150, { fill: pen.radial([120, -40], 150, [[0, "#fff3d6", 0.28], [1, "#fff3d6", 0]]) });
  pen.close();
  // Binding and purfling: a dark edge, a checkered band and a fine inner line.
  pen.smooth(inset(g.outline, 5), { stroke: pal.linen, sw: 4.5 });
  pen.smooth(inset(g.outline, 5), { stroke: pal.ebony, sw: 4.5, dash: "4 4", ink: true });
  pen.smooth(inset(g.outline, 9), { stroke: pal.woodDark, sw: 1.4, ink: true });
}

function drawNeck(pen: Pen, g: Geometry, spec: InstrumentSpec, pal: Palette) {
  const x0 = g.joinX - 22;
  const h0 = neckHalf(g, x0), h1 = g.nutHalf;
  // The side of the neck below the fingerboard.
  pen.poly([[x0, h0], [g.nutX, h1], [g.nutX, h1 + 9], [g.joinX, h0 + 14]], { fill: pal.woodDark, stroke: "#140b05", sw: 2 });
  const board = pen.linear([0, -h0], [0, h0], [[0, "#3a2a1e"], [0.5, pal.ebony], [1, "#0f0a07"]]);
  pen.poly([[x0, -h0], [g.nutX, -h1], [g.nutX, h1], [x0, h0]], { fill: board, stroke: "#0c0805", sw: 2.2 });
  // Ivory stringing along both edges of the fingerboard.
  for (const s of [-1, 1]) pen.line([x0, s * (h0 - 2.5)], [g.nutX, s * (h1 - 2.5)], { stroke: pal.linen, sw: 1.4, op: 0.8 });
  drawFrets(pen, g, spec, pal);
  // Bone nut with a notch for every string.
  pen.poly([[g.nutX - 2, -h1 - 1], [g.nutX + 4, -h1 - 1], [g.nutX + 4, h1 + 1], [g.nutX - 2, h1 + 1]], { fill: pal.linen, stroke: "#3a2d1e", sw: 1.6, ink: true });
}

/** Tied gut frets: each a double wrap of gut with its knot at the bass edge. */
function drawFrets(pen: Pen, g: Geometry, spec: InstrumentSpec, pal: Palette) {
  const t = Math.tan((spec.fretSlant * Math.PI) / 180);
  for (let k = 1; k < g.frets.length; k++) {
    const x = g.frets[k];
    const h = neckHalf(g, x) + 1;
    for (const dx of [-0.9, 0.9]) {
      const a: Pt = [x + dx - t * h, -h], b: Pt = [x + dx + t * h, h];
      pen.line([a[0] - 0.8, a[1]], [b[0] - 0.8, b[1]], { stroke: "#000000", sw: 2.6, op: 0.6 });
      pen.line(a, b, { stroke: pal.gut, sw: 1.8, ink: true });
    }
    // The knot, and the wrap disappearing round the treble edge of the neck.
    pen.ellipse([x - t * h, -h - 1.2], 2.6, 1.8, 20, { fill: pal.gut, stroke: "#2a1e12", sw: 1.2, ink: true });
    pen.line([x - t * h - 1, -h - 1.5], [x - t * h - 4.5, -h - 4.5], { stroke: pal.gut, sw: 1.3 });
    pen.line([x + t * h, h], [x + t * h - 1.5, h + 8], { stroke: pal.gut, sw: 1.6, op: 0.8 });
  }
}

function headOutline(g: Geometry): Pt[] {
  const x0 = g.nutX, L = g.headEnd - g.nutX, w = g.nutHalf + 5;
  const side: Pt[] = [[x0 + 2, w], [x0 + L * 0.45, w + 4], [x0 + L * 0.88, w + 8], [x0 + L * 0.97, w + 3], [x0 + L * 1.0, w * 0.55], [x0 + L * 1.06, w * 0.2]];
  const crest: Pt = [x0 + L * 1.08, 0];
  return [...side, crest, ...side.slice().reverse().map(([x, y]) => [x, -y] as Pt)];
}

/** Thumb-pieces of the rear pegs, behind the head: the bass row shows past the head's upper edge. */
function drawKnobs(pen: Pen, g: Geometry, pal: Palette) {
  for (const [x, y] of g.pegs) {
    const k: Pt = [x + 2, y - 31];
    pen.poly([[x - 1.6, y], [x + 1.6, y], [k[0] + 1.6, k[1]], [k[0] - 1.6, k[1]]], { fill: pal.woodDark });
    pen.ellipse(k, 8.5, 5, 0, { fill: pal.wood, stroke: "#150c06", sw: 2, ink: true });
    pen.ellipse([k[0] - 2, k[1] - 1.2], 4, 1.6, 0, { fill: pal.woodLight, op: 0.7 });
  }
}

function drawHead(pen: Pen, g: Geometry, pal: Palette) {
  const out = headOutline(g);
  pen.smooth(out.map(([x, y]) => [x, y + 7] as Pt), { fill: pal.woodDark });
  pen.smooth(out, { fill: pen.linear([g.nutX, -30], [g.nutX, 30], [[0, pal.woodLight], [1, pal.wood]]), stroke: "#150c06", sw: 2.6 });
  pen.smooth(out.map(([x, y]) => [g.nutX + (x - g.nutX) * 0.96 + 3, y * 0.8] as Pt), { stroke: pal.ebony, sw: 1.5, op: 0.8, ink: true });
  g.pegs.forEach(([x, y], i) => {
    const used = g.pegOfString.includes(i);
    pen.circle([x, y], 3.6, { fill: pal.woodLight, stroke: "#140b05", sw: 1.8, ink: true });
    pen.circle([x - 0.8, y - 0.8], 1.4, { fill: "#f4dcb0", op: 0.6 });
    // The string hole beside the peg: dark and empty on the peg that carries no string.
    pen.circle([x - 5.5, y], used ? 1.1 : 1.5, { fill: "#0a0604" });
  });
}

export function drawBridge(pen: Pen, g: Geometry, spec: InstrumentSpec, pal: Palette) {
  const x = g.bridgeX, half = g.spreadBridge + 14;
  if (spec.bridge === "moustache") {
    for (const s of [-1, 1]) {
      // Each moustache end: a tapering wave along the top ending in a curl.
      const c: Pt[] = [];
      for (let i = 0; i <= 12; i++) {
        const t = i / 12;
        c.push([x + 1 + Math.sin(t * Math.PI * 1.5) * 7, s * (half - 2 + t * 50)]);
      }
      const end = c[c.length - 1];
      pen.smooth(ribbon(c, c.map((_, i) => 10 - i * 0.62)), { fill: pal.ebony, stroke: "#000000", sw: 1.6, ink: true });
      pen.circle([end[0] - 3, end[1] - s * 1], 4.2, { fill: pal.ebony, stroke: pal.gold, sw: 1.4 });
    }
  }
  pen.poly([[x - 6, -half], [x + 9, -half + 2], [x + 9, half - 2], [x - 6, half]], { fill: pal.ebony, stroke: "#000000", sw: 2.2, ink: true });
  pen.line([x - 4, -half + 3], [x - 4, half - 3], { stroke: pal.woodLight, sw: 1.4, op: 0.55 });
}

function drawStrings(pen: Pen, g: Geometry, spec: InstrumentSpec, pal: Palette) {
  const lines = stringLines(g);
  lines.forEach(({ course, yb, yn }, i) => {
    const w = 1.1 + (course - 1) * 0.28;
    const peg = g.pegs[g.pegOfString[i]];
    // A shadow on the top (but not over the hole), then the gut itself.
    const xe = g.joinX - 22, ye = yb + ((yn - yb) * (xe - g.bridgeX)) / (g.nutX - g.bridgeX);
    pen.line([g.bridgeX + 1, yb + 1.6], [xe, ye + 1.6], { stroke: "#2a1a0c", sw: w + 0.6, op: 0.35 });
    pen.line([g.bridgeX + 1, yb], [g.nutX, yn], { stroke: pal.gut, sw: w, ink: true });
    pen.line([g.nutX, yn], [peg[0] - 5.5, peg[1]], { stroke: pal.gut, sw: w * 0.9, ink: true });
    // Tied on at the bridge: a loop round the string, the end tucked under.
    pen.ellipse([g.bridgeX - 3, yb], 3, 1.3, 0, { stroke: pal.gut, sw: 1.2, ink: true });
    pen.line([g.bridgeX - 5, yb], [g.bridgeX - 9, yb + 1.5], { stroke: pal.gut, sw: 1.1 });
    pen.path([["M", [peg[0] - 5.5, peg[1]]], ["C", [peg[0] - 3, peg[1] - 5], [peg[0] + 4, peg[1] - 4], [peg[0] + 3.6, peg[1]]]], { stroke: pal.gut, sw: 1.1, ink: true });
  });
  if (!spec.unusedPegVisible) {
    // The empty peg keeps a cut end of old string, so it does not read as plainly unused.
    const unused = g.pegs.find((_, i) => !g.pegOfString.includes(i));
    if (unused) pen.path([["M", [unused[0] - 5.5, unused[1]]], ["C", [unused[0] - 12, unused[1] + 6], [unused[0] - 4, unused[1] + 12], [unused[0] - 14, unused[1] + 16]]], { stroke: pal.gut, sw: 1.2, ink: true });
  }
}
