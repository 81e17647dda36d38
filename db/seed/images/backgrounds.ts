// Grounds behind the figures, in image pixels: a dark interior lit by a leaded window, a street wall
// of plastered stone, a heavy curtain, bare paper (or glaze), a millefleurs field for the tapestry.
import type { Pt } from "./geom";
import type { Pen } from "./pen";
import { blend, type Palette } from "./look";
import type { Rng } from "./random";

export type Ground = "interior-window" | "street-wall" | "curtain" | "paper" | "millefleurs" | "village";

export function drawGround(pen: Pen, kind: Ground, W: number, H: number, pal: Palette, rng: Rng, paper: string, door = true) {
  switch (kind) {
    case "interior-window": return interior(pen, W, H, pal, rng);
    case "street-wall": return street(pen, W, H, pal, rng, door);
    case "curtain": return curtain(pen, W, H, pal, rng);
    case "millefleurs": return millefleurs(pen, W, H, rng);
    case "village": return village(pen, W, H, pal, rng, paper);
    case "paper": return pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: paper });
  }
}

function interior(pen: Pen, W: number, H: number, pal: Palette, rng: Rng) {
  const floorY = H * 0.8;
  pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: pen.linear([0, 0], [W, H * 0.3], [[0, pal.bgLight], [0.35, pal.bg], [1, pal.bgDark]]) });
  // The window, its deep reveal and leaded diamond panes.
  const [x0, y0, x1, y1] = [W * 0.05, H * 0.07, W * 0.21, H * 0.5];
  pen.poly([[x0 - 60, y0 - 50], [x1 + 90, y0 - 70], [x1 + 90, y1 + 90], [x0 - 60, y1 + 60]], { fill: blend(pal.bgLight, "#000000", 0.35), stroke: "#0d0906", sw: 3 });
  pen.poly([[x0, y0], [x1, y0], [x1, y1], [x0, y1]], { fill: pen.linear([x0, y0], [x1, y1], [[0, "#dfe3d2"], [0.6, pal.sky], [1, "#6f7b72"]]) });
  const clip = pen.clip(() => pen.poly([[x0, y0], [x1, y0], [x1, y1], [x0, y1]], { fill: "#000" }));
  pen.open(`clip-path="${clip}"`);
  const step = 64;
  for (let k = -20; k < 30; k++) {
    pen.line([x0 + k * step, y0], [x0 + k * step + (y1 - y0) * 0.6, y1], { stroke: "#2b2a24", sw: 3.2 });
    pen.line([x0 + k * step, y1], [x0 + k * step + (y1 - y0) * 0.6, y0], { stroke: "#2b2a24", sw: 3.2 });
  }
  for (let i = 0; i < 14; i++) pen.circle([rng.range(x0, x1), rng.range(y0, y1)], rng.range(20, 40), { fill: "#f4f1dc", op: 0.12 });
  pen.close();
  pen.poly([[x0 + (x1 - x0) * 0.48, y0], [x0 + (x1 - x0) * 0.52, y0], [x0 + (x1 - x0) * 0.52, y1], [x0 + (x1 - x0) * 0.48, y1]], { fill: "#3a3226", stroke: "#0d0906", sw: 2 });
  pen.poly([[x0 - 80, y1 + 60], [x1 + 110, y1 + 90], [x1 + 110, y1 + 130], [x0 - 80, y1 + 100]], { fill: pal.woodDark, stroke: "#0d0906", sw: 2 });
  // A shaft of window light falling into the room.
  pen.poly([[x1, y0], [x1 + W * 0.55, floorY], [x1 + W * 0.2, floorY], [x1, y1]], { fill: pen.linear([x1, y0], [x1 + W * 0.4, floorY], [[0, "#fff1cf", 0.16], [1, "#fff1cf", 0]]) });
  floor(pen, W, H, floorY, pal, rng);
}

function floor(pen: Pen, W: number, H: number, y: number, pal: Palette, rng: Rng) {
  pen.poly([[0, y], [W, y], [W, H], [0, H]], { fill: pen.linear([0, y], [0, H], [[0, pal.floor], [1, blend(pal.floor, "#000000", 0.4)]]) });
  pen.line([0, y], [W, y], { stroke: "#0a0705", sw: 4 });
  for (let i = -12; i <= 12; i++) pen.line([W / 2 + i * W * 0.07, y], [W / 2 + i * W * 0.16, H], { stroke: "#0a0705", sw: 2, op: 0.5 });
  for (let k = 1; k < 5; k++) pen.line([0, y + (H - y) * Math.pow(k / 5, 1.3)], [W, y + (H - y) * Math.pow(k / 5, 1.3) + rng.jitter(6)], { stroke: "#0a0705", sw: 1.6, op: 0.4 });
}

function street(pen: Pen, W: number, H: number, pal: Palette, rng: Rng, door: boolean) {
  const ground = H * 0.82;
  const stone = blend(pal.bgLight, "#9a8a6c", 0.4);
  pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: pen.linear([0, 0], [W, 0], [[0, stone], [1, blend(stone, "#000000", 0.55)]]) });
  // Courses of stone blocks under worn plaster.
  const rowH = H * 0.055;
  for (let r = 0; r * rowH < ground; r++) {
    const y = r * rowH;
    pen.line([0, y], [W, y + rng.jitter(4)], { stroke: "#2a2118", sw: 2.2, op: 0.55 });
    for (let x = (r % 2) * 110 - 110; x < W; x += rng.range(180, 300)) pen.line([x, y], [x + rng.jitter(5), y + rowH], { stroke: "#2a2118", sw: 2, op: 0.5 });
  }
  for (let i = 0; i < 9; i++) {
    const c: Pt = [rng.range(0, W), rng.range(0, ground)];
    const pts: Pt[] = Array.from({ length: 8 }, (_, k) => [c[0] + Math.cos(k * 0.785) * rng.range(120, 320), c[1] + Math.sin(k * 0.785) * rng.range(80, 200)] as Pt);
    pen.poly(pts, { fill: blend(stone, "#e8dcc0", 0.25), op: 0.18 });
  }
  // A dark arched doorway and a strip of evening sky over the wall.
  if (door) pen.smooth([[W * 0.8, ground], [W * 0.8, H * 0.38], [W * 0.86, H * 0.3], [W * 0.92, H * 0.38], [W * 0.92, ground]], { fill: "#120c08", stroke: "#0a0604", sw: 4 }, false);
  pen.poly([[0, 0], [W, 0], [W, H * 0.05], [0, H * 0.07]], { fill: pen.linear([0, 0], [0, H * 0.07], [[0, "#5d6f7a"], [1, "#c9a77a"]]) });
  pen.poly([[0, ground], [W, ground], [W, H], [0, H]], { fill: pen.linear([0, ground], [0, H], [[0, blend(pal.floor, stone, 0.4)], [1, pal.floor]]) });
  for (let i = 0; i < 260; i++) {
    const y = rng.range(ground + 10, H);
    pen.ellipse([rng.range(0, W), y], rng.range(30, 60) * (y / H), rng.range(12, 24) * (y / H), 0, { fill: blend(stone, "#000000", rng.range(0.2, 0.5)), stroke: "#140e09", sw: 1.6, op: 0.6 });
  }
}

function curtain(pen: Pen, W: number, H: number, pal: Palette, rng: Rng) {
  pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: pen.radial([W * 0.35, H * 0.3], W * 0.9, [[0, pal.bg], [1, pal.bgDark]]) });
  // Heavy folds: each a band lit on one side; the curtain is gathered back to the right.
  const folds = 16, right = W * 0.62;
  for (let i = 0; i < folds; i++) {
    const xa = (i / folds) * right, xb = ((i + 1) / folds) * right;
    const sway = rng.range(-30, 30);
    const gather = i / folds;
    const top: Pt[] = [[xa, 0], [xb, 0]];
    const bottom: Pt[] = [[xb + gather * W * 0.3 + sway, H], [xa + gather * W * 0.28 + sway, H]];
    pen.poly([...top, [xb + gather * W * 0.05, H * 0.5], ...bottom, [xa + gather * W * 0.05, H * 0.5]], {
      fill: pen.linear([xa, 0], [xb, 0], [[0, pal.cloth2Dark], [0.45, blend(pal.cloth2, "#ffffff", 0.12)], [1, pal.cloth2Dark]]),
    });
  }
  pen.path([["M", [right * 0.92, H * 0.46]], ["C", [right * 1.02, H * 0.5], [right * 1.06, H * 0.55], [right * 1.1, H * 0.6]]], { stroke: pal.gold, sw: 16 });
  pen.ellipse([right * 1.1, H * 0.64], 26, 60, 0, { fill: pal.gold, stroke: "#3a2a0a", sw: 3 });
  floor(pen, W, H, H * 0.86, pal, rng);
}

/** Open ground before a row of gabled houses and a church tower, under a pale sky. */
function village(pen: Pen, W: number, H: number, pal: Palette, rng: Rng, sky: string) {
  const horizon = H * 0.6;
  pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: sky });
  let x = -40;
  while (x < W) {
    const w = rng.range(300, 520), h = rng.range(380, 620), roof = rng.range(200, 320);
    const wall = blend(pal.bgLight, "#d8ccb0", 0.5);
    pen.poly([[x, horizon], [x, horizon - h], [x + w / 2, horizon - h - roof], [x + w, horizon - h], [x + w, horizon]], { fill: wall, stroke: "#1a140e", sw: 3 });
    pen.poly([[x - 10, horizon - h + 4], [x + w / 2, horizon - h - roof], [x + w + 10, horizon - h + 4], [x + w / 2, horizon - h - roof + 40]], { fill: blend(pal.cloth2Dark, wall, 0.3), stroke: "#1a140e", sw: 3 });
    for (let k = 0; k < 2; k++) pen.poly([[x + w * (0.22 + k * 0.4), horizon - h * 0.7], [x + w * (0.38 + k * 0.4), horizon - h * 0.7], [x + w * (0.38 + k * 0.4), horizon - h * 0.45], [x + w * (0.22 + k * 0.4), horizon - h * 0.45]], { fill: "#2a2018", stroke: "#1a140e", sw: 2 });
    x += w + rng.range(-20, 60);
  }
  const tower = blend(pal.bgLight, "#c8bca0", 0.4);
  pen.poly([[W * 0.47, horizon], [W * 0.47, H * 0.27], [W * 0.53, H * 0.27], [W * 0.53, horizon]], { fill: tower, stroke: "#1a140e", sw: 3 });
  pen.poly([[W * 0.488, H * 0.33], [W * 0.512, H * 0.33], [W * 0.512, H * 0.4], [W * 0.488, H * 0.4]], { fill: "#2a2018", stroke: "#1a140e", sw: 2 });
  pen.poly([[W * 0.462, H * 0.27], [W * 0.5, H * 0.08], [W * 0.538, H * 0.27]], { fill: blend(pal.cloth2Dark, tower, 0.3), stroke: "#1a140e", sw: 3 });
  pen.poly([[0, horizon], [W, horizon], [W, H], [0, H]], { fill: pen.linear([0, horizon], [0, H], [[0, blend(pal.floor, "#d8ccb0", 0.7)], [1, blend(pal.floor, "#d8ccb0", 0.4)]]) });
  for (let i = 0; i < 40; i++) {
    const p: Pt = [rng.range(0, W), rng.range(horizon + 40, H)];
    pen.line(p, [p[0] + rng.range(60, 200), p[1] + rng.jitter(6)], { stroke: "#2a2018", sw: 2, op: 0.6 });
  }
}

function millefleurs(pen: Pen, W: number, H: number, rng: Rng) {
  pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: "#263a33" });
  const colors = ["#f0e4c4", "#8e2f25", "#d9b970", "#2e3f5e", "#c98e74"];
  for (let i = 0; i < 420; i++) {
    const c: Pt = [rng.range(0, W), rng.range(0, H)];
    const r = rng.range(14, 30);
    pen.path([["M", [c[0], c[1] + r * 3]], ["C", [c[0] + r, c[1] + r * 2], [c[0] - r, c[1] + r], c]], { stroke: "#3f5a48", sw: 6 });
    pen.ellipse([c[0] + r * 1.2, c[1] + r * 2], r * 0.9, r * 0.35, -30, { fill: "#3f5a48" });
    const color = rng.pick(colors);
    for (let k = 0; k < 5; k++) pen.circle([c[0] + Math.cos(k * 1.2566) * r * 0.7, c[1] + Math.sin(k * 1.2566) * r * 0.7], r * 0.5, { fill: color });
    pen.circle(c, r * 0.35, { fill: "#d9b970" });
  }
}
