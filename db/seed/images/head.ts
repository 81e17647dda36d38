// Heads in the manner of a provincial painter: an oval face modelled from the upper left, almond
// eyes, a shadowed nose, hair or a hat. Drawn in a head frame in millimetres (origin mid-face).
import { type Cmd, type Pt } from "./geom";
import { type Pen } from "./pen";
import { blend, type Palette } from "./look";
import type { FigureSpec } from "./types";

/** Quadratic curve as a cubic (the pen only speaks cubics). */
const q = (p0: Pt, c: Pt, p2: Pt): Cmd => ["C", [p0[0] + (2 / 3) * (c[0] - p0[0]), p0[1] + (2 / 3) * (c[1] - p0[1])], [p2[0] + (2 / 3) * (c[0] - p2[0]), p2[1] + (2 / 3) * (c[1] - p2[1])], p2];

export type HeadStyle = Pick<FigureSpec, "sex" | "headwear" | "hair" | "beard" | "eyesClosed">;

/** `turn` (−1…1) moves the features towards the viewer's right, as in a three-quarter view. */
export function drawHead(pen: Pen, h: HeadStyle, pal: Palette, turn: number) {
  const t = turn * 14;
  const woman = h.sex === "woman";
  const hairDark = blend(pal.hair, "#000000", 0.3);
  if (h.hair === "long" || h.hair === "bun") {
    const back: Pt[] = h.hair === "long"
      ? [[-96, -70], [-112, 40], [-122, 160], [-84, 205], [-60, 120], [60, 120], [84, 205], [122, 160], [112, 40], [96, -70], [0, -128]]
      : [[-94, -60], [-100, 30], [-70, 60], [70, 60], [100, 30], [94, -60], [0, -126]];
    pen.smooth(back, { fill: pen.linear([-100, -100], [100, 150], [[0, pal.hair], [1, hairDark]]), stroke: "#0d0805", sw: 2 });
    if (h.hair === "bun") pen.circle([64 + t, -104], 44, { fill: pal.hair, stroke: "#0d0805", sw: 2 });
  }
  // The near ear, then the face.
  pen.ellipse([-84 + t * 0.6, -2], 14, 26, -8, { fill: pal.skin, stroke: pal.skinShadow, sw: 2 });
  pen.path([["M", [-84 + t * 0.6, -18]], q([-84 + t * 0.6, -18], [-94 + t * 0.6, 0], [-82 + t * 0.6, 16])], { stroke: pal.skinShadow, sw: 2 });
  const jaw = woman ? 0.92 : 1;
  const face: Pt[] = [[0, -114], [54, -102], [82, -62], [86 - t * 0.3, -8], [78 * jaw, 40], [56 * jaw, 82], [26, 106], [t * 0.4, 113], [-28, 105], [-58 * jaw, 80], [-78 * jaw, 38], [-86, -10], [-82, -62], [-54, -102]];
  pen.smooth(face, { fill: pen.radial([-26 + t * 0.5, -34], 170, [[0, pal.skinLight], [0.45, pal.skin], [1, pal.skinShadow]]), stroke: blend(pal.skinShadow, "#000000", 0.3), sw: 2.4 });
  // Shadow on the far cheek and under the jaw.
  pen.smooth([[40, -90], [84, -40], [82, 30], [56, 84], [26, 108], [44, 40], [50, -20]], { fill: pal.skinShadow, op: 0.35 });
  for (const s of [-1, 1]) pen.circle([s * 46 + t, 38], 30, { fill: pen.radial([s * 46 + t, 38], 30, [[0, pal.lips, 0.28], [1, pal.lips, 0]]) });
  for (const s of [-1, 1]) eye(pen, [s * 33 + t, -14], s === 1 ? 1 - turn * 0.12 : 1 + turn * 0.08, h.eyesClosed, pal);
  for (const s of [-1, 1]) {
    const ex = s * 33 + t;
    pen.path([["M", [ex - 19, -34 + (s === 1 ? 1 : 0)]], q([ex - 19, -34], [ex, -46], [ex + 19, -35]), q([ex + 19, -35], [ex, -41], [ex - 19, -34])], { fill: pal.hair, stroke: pal.hair, sw: woman ? 1.5 : 3 });
  }
  // Nose: the lit ridge, the shadow it casts to the right, the nostrils.
  const n = t * 1.1;
  pen.poly([[n + 4, -16], [n + 14, 28], [n + 10, 40], [n + 26, 36], [n + 16, -10]], { fill: pal.skinShadow, op: 0.45 });
  pen.path([["M", [n + 2, -18]], q([n + 2, -18], [n + 8, 14], [n + 12, 34]), q([n + 12, 34], [n + 2, 44], [n - 10, 39])], { stroke: pal.skinShadow, sw: 2.2 });
  for (const s of [-1, 1]) pen.ellipse([n + s * 8 + 1, 40], 4.5, 2.6, s * 15, { fill: "#4a2416", op: 0.8 });
  pen.circle([n - 2, 30], 6, { fill: pal.skinLight, op: 0.45 });
  // Mouth.
  const m = t * 0.9, my = woman ? 62 : 64, mw = woman ? 19 : 24;
  pen.path([["M", [m - mw, my]], q([m - mw, my], [m - 6, my - 9], [m, my - 4]), q([m, my - 4], [m + 6, my - 9], [m + mw, my]), q([m + mw, my], [m, my + 3], [m - mw, my]), ["Z"]], { fill: blend(pal.lips, "#000000", 0.25), stroke: blend(pal.lips, "#000000", 0.45), sw: 1.6 });
  pen.path([["M", [m - mw + 3, my + 1]], q([m - mw + 3, my + 1], [m, my + 16], [m + mw - 3, my + 1]), ["Z"]], { fill: pal.lips, op: 0.9 });
  pen.ellipse([m - 2, my + 7], 6, 2, 0, { fill: pal.skinLight, op: 0.35 });
  if (h.beard) beard(pen, [m, my], pal);
  hair(pen, h, pal, t, hairDark);
  if (h.headwear !== "bare") hat(pen, h.headwear, pal, t);
}

function eye(pen: Pen, c: Pt, size: number, closed: boolean, pal: Palette) {
  const [x, y] = c, w = 16 * size;
  pen.ellipse([x, y - 2], w * 1.4, 12, 0, { fill: pen.radial([x, y - 2], w * 1.5, [[0, pal.skinShadow, 0.5], [1, pal.skinShadow, 0]]) });
  if (closed) {
    pen.path([["M", [x - w, y]], q([x - w, y], [x, y + 7], [x + w, y])], { stroke: "#3a1e12", sw: 2.6 });
    for (let i = -2; i <= 2; i++) pen.line([x + i * w * 0.35, y + 3.5], [x + i * w * 0.4, y + 7.5], { stroke: "#3a1e12", sw: 1.2 });
    return;
  }
  const almond: Cmd[] = [["M", [x - w, y]], q([x - w, y], [x, y - 11], [x + w, y - 1]), q([x + w, y - 1], [x, y + 8], [x - w, y]), ["Z"]];
  pen.path(almond, { fill: "#e6dac6", stroke: "#5a3422", sw: 1.4 });
  pen.circle([x + 1.5, y - 1.2], 6.5 * size, { fill: "#3d2616", stroke: "#1a0f08", sw: 1 });
  pen.circle([x + 1.5, y - 1.2], 3 * size, { fill: "#0b0705" });
  pen.circle([x - 0.5, y - 3.5], 1.4, { fill: "#fff8ec" });
  pen.path([["M", [x - w - 1, y + 0.5]], q([x - w, y], [x, y - 12.5], [x + w + 1, y - 1.5])], { stroke: "#2a160c", sw: 3 });
  pen.path([["M", [x - w * 0.8, y - 8]], q([x - w * 0.8, y - 8], [x, y - 17], [x + w * 0.9, y - 9])], { stroke: pal.skinShadow, sw: 1.4, op: 0.7 });
}

function beard(pen: Pen, [m, my]: Pt, pal: Palette) {
  for (const s of [-1, 1]) {
    const stroke: Pt[] = [[m, my - 12], [m + s * 14, my - 12], [m + s * 30, my - 6], [m + s * 38, my - 14]];
    pen.smooth([...stroke, ...stroke.slice(1, -1).reverse().map(([x, y]) => [x, y + 5] as Pt)], { fill: pal.hair, stroke: pal.hair, sw: 1.2 });
  }
  pen.smooth([[m - 9, my + 16], [m + 9, my + 16], [m + 5, my + 40], [m, my + 50], [m - 5, my + 40]], { fill: pal.hair, op: 0.95 });
}

function hair(pen: Pen, h: HeadStyle, pal: Palette, t: number, dark: string) {
  const top: Pt[] = h.hair === "short"
    ? [[-90, 8], [-96, -62], [-64, -116], [0, -134], [64, -116], [96, -62], [90, 8], [82, -28], [62, -78], [20, -92], [-24, -88], [-64, -78], [-82, -28]]
    : [[-92, 30], [-98, -60], [-62, -118], [t, -134], [62, -118], [98, -60], [92, 30], [84, -20], [56, -82], [t + 4, -98], [-52, -84], [-84, -20]];
  pen.smooth(top, { fill: pen.linear([-60, -130], [80, 20], [[0, blend(pal.hair, "#ffffff", 0.18)], [0.5, pal.hair], [1, dark]]), stroke: "#0d0805", sw: 2 });
  // Strands: fine lines for the brush-drawn hair.
  for (let i = 0; i < 9; i++) {
    const x = -80 + i * 20;
    pen.path([["M", [x * 0.5 + t * 0.3, -126 + Math.abs(x) * 0.1]], q([x * 0.5, -126], [x * 1.05, -70], [x * 1.1, -20 + Math.abs(x) * 0.2])], { stroke: blend(pal.hair, "#ffffff", 0.25), sw: 1.2, op: 0.5 });
  }
  if (h.hair === "long") {
    for (const side of [-1, 1]) {
      for (let k = 0; k < 4; k++) pen.path([["M", [side * (88 + k * 7), -20 + k * 20]], q([side * (88 + k * 7), 20], [side * (104 + k * 6), 90 + k * 20], [side * (92 + k * 8), 170 + k * 8])], { stroke: blend(pal.hair, "#ffffff", 0.2), sw: 1.4, op: 0.5 });
    }
  }
  if (h.sex === "woman") pen.path([["M", [t, -134]], q([t, -134], [t + 3, -110], [t + 4, -98])], { stroke: dark, sw: 2 });
}

function hat(pen: Pen, kind: FigureSpec["headwear"], pal: Palette, t: number) {
  const felt = blend(pal.hair, pal.clothDark, 0.5);
  if (kind === "broad-hat") {
    pen.ellipse([t * 0.4, -92], 110, 26, -4, { fill: "#000000", op: 0.25 });
    pen.ellipse([0, -104], 178, 44, -4, { fill: pen.linear([-170, -140], [170, -60], [[0, blend(felt, "#ffffff", 0.12)], [1, blend(felt, "#000000", 0.5)]]), stroke: "#0a0705", sw: 2.6 });
    pen.smooth([[-70, -118], [-64, -200], [-30, -232], [30, -236], [66, -204], [72, -118], [0, -106]], { fill: pen.linear([-70, -200], [70, -120], [[0, blend(felt, "#ffffff", 0.1)], [1, blend(felt, "#000000", 0.4)]]), stroke: "#0a0705", sw: 2.4 });
    pen.smooth([[-71, -124], [0, -114], [72, -124], [70, -148], [0, -138], [-69, -148]], { fill: pal.cloth2, stroke: "#0a0705", sw: 1.5 });
    // A feather curling over the brim.
    const plume: Pt[] = [[40, -140], [110, -176], [176, -150], [196, -104], [170, -126], [110, -150], [52, -130]];
    pen.smooth(plume, { fill: blend(pal.linen, pal.gold, 0.2), stroke: pal.linenShadow, sw: 1.5 });
    for (let i = 0; i < 14; i++) pen.line([60 + i * 9, -140 - i * 1.2], [70 + i * 9, -162 + i * 1.5], { stroke: pal.linenShadow, sw: 1, op: 0.7 });
  } else if (kind === "beret") {
    pen.ellipse([-10, -118], 128, 40, -10, { fill: pen.linear([-120, -150], [110, -80], [[0, blend(pal.cloth, "#ffffff", 0.1)], [1, pal.clothDark]]), stroke: "#0a0705", sw: 2.4 });
    pen.smooth([[-92, -104], [0, -92], [92, -110], [90, -124], [0, -108], [-92, -118]], { fill: pal.clothDark, stroke: "#0a0705", sw: 1.5 });
    pen.circle([-20, -150], 9, { fill: pal.clothDark });
  } else {
    // A linen coif or cap, close to the head.
    pen.smooth([[-94, -10], [-98, -70], [-60, -126], [0, -140], [60, -126], [98, -70], [94, -10], [80, -56], [40, -90], [0, -96], [-40, -90], [-80, -56]], { fill: pen.linear([-80, -130], [80, -20], [[0, pal.linen], [1, pal.linenShadow]]), stroke: pal.linenShadow, sw: 2 });
    pen.path([["M", [-86, -40]], q([-86, -40], [0, -110], [86, -40])], { stroke: pal.linenShadow, sw: 1.4, dash: "3 4" });
  }
}
