// Things in the room or the street, each drawn in its own frame in millimetres: a carpet-covered
// table, a jug and glasses, an open songbook, a fountain, a balcony, a garland, a tree, a tambourine.
import { polar, type Pt } from "./geom";
import { type Pen } from "./pen";
import { blend, type Palette } from "./look";
import type { Rng } from "./random";

/** Table under a knotted carpet; the top edge is at y = 0, the carpet hangs to `drop`. */
export function table(pen: Pen, width: number, drop: number, pal: Palette, rng: Rng) {
  const w = width / 2;
  pen.poly([[-w + 40, -70], [w - 40, -70], [w, 0], [-w, 0]], { fill: pen.linear([0, -70], [0, 0], [[0, blend(pal.cloth2, "#000000", 0.2)], [1, pal.cloth2]]), stroke: "#0a0604", sw: 2 });
  pen.poly([[-w, 0], [w, 0], [w + 30, drop], [-w - 30, drop]], { fill: pen.linear([-w, 0], [w, drop], [[0, pal.cloth2], [1, pal.cloth2Dark]]), stroke: "#0a0604", sw: 2.4 });
  // Borders of the carpet: a band of lozenges between stripes, and a fringe.
  for (const y of [60, drop - 110]) {
    pen.poly([[-w - 5, y], [w + 5, y], [w + 10, y + 70], [-w - 10, y + 70]], { fill: pal.clothDark, stroke: pal.gold, sw: 2 });
    for (let x = -w; x < w; x += 70) pen.poly([[x, y + 35], [x + 35, y + 8], [x + 70, y + 35], [x + 35, y + 62]], { fill: pal.gold, stroke: "#0a0604", sw: 1.5, op: 0.85 });
  }
  for (let x = -w + 80; x < w - 80; x += 220) {
    const y = 260 + rng.jitter(10);
    pen.poly([[x, y], [x + 60, y - 70], [x + 120, y], [x + 60, y + 70]], { fill: blend(pal.linen, pal.cloth2, 0.4), stroke: "#0a0604", sw: 1.5, op: 0.7 });
  }
  for (let x = -w - 30; x < w + 30; x += 14) pen.line([x, drop], [x + rng.jitter(3), drop + 40], { stroke: blend(pal.linen, pal.gold, 0.5), sw: 2.2 });
  for (let i = 0; i < 10; i++) {
    const x = -w + (i + 0.5) * (width / 10);
    pen.path([["M", [x, 0]], ["C", [x + 20, drop * 0.4], [x - 20, drop * 0.7], [x + 10, drop]]], { stroke: "#000000", sw: 18, op: 0.18 });
  }
}

export function jug(pen: Pen, pal: Palette) {
  const glaze = blend(pal.woodLight, "#6b5a44", 0.5);
  pen.path([["M", [60, -180]], ["C", [150, -190], [150, -60], [70, -60]]], { stroke: "#20170f", sw: 30 });
  pen.path([["M", [60, -180]], ["C", [150, -190], [150, -60], [70, -60]]], { stroke: glaze, sw: 20 });
  pen.smooth([[-40, -260], [40, -260], [46, -200], [95, -120], [90, -30], [60, 0], [-60, 0], [-90, -30], [-95, -120], [-46, -200]], { fill: pen.linear([-90, -200], [90, 0], [[0, blend(glaze, "#ffffff", 0.35)], [0.4, glaze], [1, "#1f1710"]]), stroke: "#140e08", sw: 2.4 });
  pen.ellipse([0, -258], 40, 10, 0, { fill: "#1a120b", stroke: "#140e08", sw: 2 });
  pen.ellipse([-40, -130], 14, 40, -10, { fill: "#ffffff", op: 0.25 });
}

export function glass(pen: Pen, wine: boolean) {
  const green = "#6f8a5a";
  pen.smooth([[-45, -200], [45, -200], [40, -120], [0, -95], [-40, -120]], { fill: green, stroke: "#1e2a18", sw: 2, op: 0.55 });
  if (wine) pen.smooth([[-42, -160], [42, -160], [38, -122], [0, -100], [-38, -122]], { fill: "#5a1a14", op: 0.8 });
  pen.poly([[-16, -98], [16, -98], [20, -20], [-20, -20]], { fill: green, stroke: "#1e2a18", sw: 2, op: 0.7 });
  for (let i = 0; i < 3; i++) for (const x of [-10, 10]) pen.circle([x, -80 + i * 22], 6, { fill: "#8fae72", stroke: "#1e2a18", sw: 1 });
  pen.ellipse([0, -12], 40, 12, 0, { fill: green, stroke: "#1e2a18", sw: 2, op: 0.7 });
  pen.line([-30, -190], [-24, -130], { stroke: "#ffffff", sw: 3, op: 0.5 });
}

/** An open songbook seen from above: staves, notes and a red initial, fine enough to zoom into. */
export function songbook(pen: Pen, pal: Palette, rng: Rng) {
  const page = blend(pal.linen, "#ffffff", 0.3);
  pen.poly([[-310, -10], [0, 20], [310, -10], [300, 250], [0, 280], [-300, 250]], { fill: pal.cloth2Dark, stroke: "#0a0604", sw: 2 });
  for (const s of [-1, 1]) {
    pen.smooth([[0, 0], [s * 150, -22], [s * 290, -10], [s * 282, 236], [s * 150, 226], [0, 258]], { fill: pen.linear([s * 290, 0], [0, 0], [[0, page], [1, blend(page, "#7a6a50", 0.3)]]), stroke: "#3a2d1e", sw: 1.8 });
    for (let sys = 0; sys < 5; sys++) {
      const y0 = 22 + sys * 42;
      for (let l = 0; l < 5; l++) pen.line([s * 30, y0 + l * 5.5], [s * 262, y0 + l * 5.5 - 6], { stroke: "#4a3a2a", sw: 1, ink: true });
      for (let k = 0; k < 14; k++) {
        const x = s * (50 + k * 15), y = y0 + rng.int(0, 8) * 2.75 - k * 0.35;
        pen.ellipse([x, y], 3.2, 2.2, -20, { fill: "#1a120a" });
        pen.line([x + 3, y], [x + 3, y - 16], { stroke: "#1a120a", sw: 1 });
      }
    }
  }
  pen.poly([[-262, 10], [-232, 10], [-232, 40], [-262, 40]], { fill: "#8a2a1c", stroke: "#3a120a", sw: 1.2 });
}

export function fountain(pen: Pen, pal: Palette) {
  const stone = blend(pal.bgLight, "#b0a080", 0.45);
  const shade = blend(stone, "#000000", 0.45);
  pen.poly([[-60, -620], [60, -620], [80, -150], [-80, -150]], { fill: pen.linear([-80, 0], [80, 0], [[0, stone], [1, shade]]), stroke: "#1a140e", sw: 2.4 });
  pen.ellipse([0, -640], 200, 46, 0, { fill: pen.linear([-200, 0], [200, 0], [[0, stone], [1, shade]]), stroke: "#1a140e", sw: 2.4 });
  pen.poly([[-700, -150], [700, -150], [680, 120], [-680, 120]], { fill: pen.linear([-700, 0], [700, 0], [[0, stone], [1, shade]]), stroke: "#1a140e", sw: 3 });
  pen.ellipse([0, -150], 700, 90, 0, { fill: blend(pal.sky, "#203040", 0.5), stroke: "#1a140e", sw: 3 });
  for (const s of [-1, 1]) for (let k = 0; k < 4; k++) pen.path([["M", [s * 40, -700]], ["C", [s * (120 + k * 40), -820], [s * (220 + k * 50), -500], [s * (240 + k * 60), -190]]], { stroke: "#dfe8e8", sw: 2.4, op: 0.6 });
  for (let x = -640; x < 640; x += 160) pen.line([x, -90], [x + 10, 100], { stroke: "#1a140e", sw: 2, op: 0.5 });
}

/** A window high in the street wall with shutters ("back"), and its iron railing ("front"), which
 * goes in front of whoever leans out; the sill is at y = 0. */
export function balcony(pen: Pen, pal: Palette, part: "back" | "front") {
  if (part === "front") return railing(pen, pal);
  pen.poly([[-360, -760], [360, -760], [360, 0], [-360, 0]], { fill: "#150e09", stroke: "#0a0604", sw: 4 });
  for (const s of [-1, 1]) pen.poly([[s * 360, -760], [s * 560, -720], [s * 560, -40], [s * 360, 0]], { fill: pen.linear([s * 360, 0], [s * 560, 0], [[0, pal.cloth2Dark], [1, pal.cloth2]]), stroke: "#0a0604", sw: 3 });
}

/** A stone parapet with balusters in relief: solid, so it hides whoever leans on it below the waist. */
function railing(pen: Pen, pal: Palette) {
  const stone = blend(pal.bgLight, "#b0a080", 0.4), shade = blend(stone, "#000000", 0.45);
  pen.poly([[-470, -10], [470, -10], [470, 50], [-470, 50]], { fill: pen.linear([0, -10], [0, 50], [[0, stone], [1, shade]]), stroke: "#0a0604", sw: 3 });
  pen.poly([[-450, 50], [450, 50], [450, 330], [-450, 330]], { fill: shade, stroke: "#0a0604", sw: 3 });
  for (let x = -390; x <= 390; x += 97.5) {
    pen.smooth([[x - 20, 60], [x + 20, 60], [x + 16, 110], [x + 36, 200], [x + 22, 300], [x + 28, 320], [x - 28, 320], [x - 22, 300], [x - 36, 200], [x - 16, 110]], { fill: pen.linear([x - 36, 0], [x + 36, 0], [[0, stone], [1, blend(shade, "#000000", 0.2)]]), stroke: "#0a0604", sw: 2 });
  }
  pen.poly([[-480, 330], [480, 330], [440, 400], [-440, 400]], { fill: stone, stroke: "#0a0604", sw: 3 });
}

/** A swag of laurel along a curve, leaves in pairs with fruit here and there, and a ribbon bow. */
export function garland(pen: Pen, path: Pt[], pal: Palette, rng: Rng) {
  const leaf = blend(pal.cloth, "#3f5a3c", 0.7);
  for (let i = 0; i < path.length - 1; i++) {
    const [a, b] = [path[i], path[i + 1]];
    const along = (Math.atan2(b[1] - a[1], b[0] - a[0]) * 180) / Math.PI;
    for (let k = 0; k < 26; k++) {
      const t = k / 26;
      const c: Pt = [a[0] + (b[0] - a[0]) * t + rng.jitter(10), a[1] + (b[1] - a[1]) * t + rng.jitter(10)];
      for (const side of [-1, 1]) {
        const ang = along + side * rng.range(35, 70);
        pen.ellipse(polar(c, 40, (ang * Math.PI) / 180), 52, 17, ang, { fill: leaf, stroke: "#0a0604", sw: 2 });
        pen.line(c, polar(c, 80, (ang * Math.PI) / 180), { stroke: "#0a0604", sw: 1.4 });
      }
      if (rng.chance(0.2)) pen.circle(c, 24, { fill: pal.cloth2, stroke: "#0a0604", sw: 2 });
    }
  }
  const mid = path[Math.floor(path.length / 2)];
  for (const s of [-1, 1]) {
    pen.smooth([mid, [mid[0] + s * 120, mid[1] - 90], [mid[0] + s * 170, mid[1] - 20], [mid[0] + s * 110, mid[1] + 30]], { fill: pal.linen, stroke: "#0a0604", sw: 3 });
    pen.smooth([mid, [mid[0] + s * 60, mid[1] + 140], [mid[0] + s * 100, mid[1] + 300], [mid[0] + s * 70, mid[1] + 310], [mid[0] + s * 30, mid[1] + 150]], { fill: pal.linen, stroke: "#0a0604", sw: 3 });
  }
  pen.circle(mid, 34, { fill: pal.linen, stroke: "#0a0604", sw: 3 });
}

export function tree(pen: Pen, pal: Palette, rng: Rng) {
  pen.poly([[-50, 0], [50, 0], [30, -700], [-30, -700]], { fill: pal.woodDark, stroke: "#0a0604", sw: 2 });
  for (let i = 0; i < 40; i++) pen.circle([rng.jitter(380), -900 + rng.jitter(300)], rng.range(80, 160), { fill: blend("#3f5a3c", pal.bgDark, rng.range(0, 0.5)), stroke: "#0a0604", sw: 1.6 });
}

export function tambourine(pen: Pen, pal: Palette) {
  pen.circle([0, 0], 150, { fill: pen.radial([-40, -40], 170, [[0, pal.linen], [1, pal.linenShadow]]), stroke: pal.woodDark, sw: 14 });
  for (let i = 0; i < 6; i++) {
    const p = polar([0, 0], 150, (i / 6) * Math.PI * 2);
    pen.circle(p, 16, { fill: pal.gold, stroke: "#2a1a08", sw: 1.4 });
  }
}
