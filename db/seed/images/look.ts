// Palettes (the painter's colours) and media (how a chalk drawing, a print, a tile or a tapestry
// turns those colours into its own: sanguine hatching, black hatching, cobalt washes, wool colours).
import type { Look, Stops } from "./pen";

export type Medium = "oil" | "chalk" | "etching" | "engraving" | "tile" | "tapestry";
export type PaletteName = "umber" | "crimson" | "verdigris" | "ochre";

export type Palette = {
  bg: string; bgDark: string; bgLight: string; floor: string;
  cloth: string; clothDark: string; clothLight: string;
  cloth2: string; cloth2Dark: string;
  linen: string; linenShadow: string;
  skin: string; skinShadow: string; skinLight: string; lips: string; hair: string;
  wood: string; woodDark: string; woodLight: string;
  top: string; topDark: string; ebony: string; gut: string; gold: string; sky: string;
};

const BASE = {
  linen: "#e8dcc0", linenShadow: "#a89a7c",
  skin: "#d9a77f", skinShadow: "#8f5a3c", skinLight: "#f0c9a2", lips: "#a4483a",
  wood: "#7a4a22", woodDark: "#3e220f", woodLight: "#a86c36",
  top: "#d4a767", topDark: "#9c7440", ebony: "#1f1712", gut: "#efe2bd", gold: "#c79a3e", sky: "#8da0a4",
};

export const PALETTES: Record<PaletteName, Palette> = {
  umber: { ...BASE, bg: "#3a2a1c", bgDark: "#1c140d", bgLight: "#6b5239", floor: "#2c2017", cloth: "#6a4a2c", clothDark: "#2e1f12", clothLight: "#9c7449", cloth2: "#7d2a20", cloth2Dark: "#3d120d", hair: "#2a1a10" },
  crimson: { ...BASE, bg: "#2f241b", bgDark: "#150f0a", bgLight: "#5f4a35", floor: "#261b13", cloth: "#8a2b22", clothDark: "#3b0f0b", clothLight: "#bd5a43", cloth2: "#3f4a2e", cloth2Dark: "#1c2214", hair: "#3a2414" },
  verdigris: { ...BASE, bg: "#33301f", bgDark: "#17150d", bgLight: "#666042", floor: "#2a2517", cloth: "#3f5a3c", clothDark: "#18261a", clothLight: "#6f8a5f", cloth2: "#9a6b2a", cloth2Dark: "#4a3010", hair: "#4a2e18" },
  ochre: { ...BASE, bg: "#3b2d18", bgDark: "#1b140a", bgLight: "#745a30", floor: "#2d2212", cloth: "#a57a2e", clothDark: "#4d3410", clothLight: "#d2a656", cloth2: "#5a2c3a", cloth2Dark: "#2a121a", hair: "#1f150e" },
};

type Rgb = [number, number, number];
export const hex = (c: string): Rgb => [1, 3, 5].map((i) => parseInt(c.slice(i, i + 2), 16)) as Rgb;
const toHex = (c: Rgb) => "#" + c.map((v) => Math.round(Math.max(0, Math.min(255, v))).toString(16).padStart(2, "0")).join("");
export const blend = (a: string, b: string, t: number) => {
  const [p, q] = [hex(a), hex(b)];
  return toHex([0, 1, 2].map((i) => p[i] + (q[i] - p[i]) * t) as Rgb);
};
export const luma = (c: string) => {
  const [r, g, b] = hex(c);
  return (0.299 * r + 0.587 * g + 0.114 * b) / 255;
};
const isColor = (c: string) => /^#[0-9a-f]{6}$/i.test(c);
const mean = (stops: Stops) => stops.reduce((acc, s, i) => (i === 0 ? s[1] : blend(acc, s[1], 1 / (i + 1))), stops[0][1]);

const OIL: Look = { name: "oil", fill: (c) => c, stroke: (c) => c, gradient: (s) => s, defs: () => "" };

/** Lines of integer slope m through a square tile of side T, `per` lines per tile height, seamless
 * when repeated. (Rotating the pattern instead made librsvg take minutes per picture.) */
function hatchLines(m: number, T: number, per: number, ink: string, w: number) {
  const gap = T / per;
  let out = "";
  const line = (x1: number, y1: number, x2: number, y2: number) => (out += `<line x1="${x1}" y1="${y1}" x2="${x2}" y2="${y2}" stroke="${ink}" stroke-width="${w}"/>`);
  // Vertical lines (engraving cross-hatch) are the one slope that is not a number of rises per run.
  if (!Number.isFinite(m)) for (let x = gap / 2; x < T; x += gap) line(x, 0, x, T);
  else for (let c = -Math.abs(m) * T * 2 - T; c <= Math.abs(m) * T * 2 + 2 * T; c += gap) line(-T, c + m * T, 2 * T, c - 2 * m * T);
  return out;
}

/** Hatching media: the darker the colour, the denser the lines; the darkest are cross-hatched. */
function hatched(name: string, paper: string, ink: string, slope: number, cross: number, per: number): Look {
  const LEVELS = 6, T = 48;
  const level = (c: string) => Math.min(LEVELS, Math.round((1 - luma(c)) * 1.35 * LEVELS - 1.2));
  const pattern = (k: number) => {
    const w = [0, 0.9, 1.5, 2.2, 2.4, 3.2][k - 1] ?? 3.2;
    const body = hatchLines(slope, T, per, ink, w) + (k >= 4 ? hatchLines(cross, T, per, ink, k >= 5 ? w : w * 0.7) : "");
    return `<pattern id="${name}-h${k}" patternUnits="userSpaceOnUse" width="${T}" height="${T}"><rect width="${T}" height="${T}" fill="${paper}"/>${body}</pattern>`;
  };
  const fill = (c: string) => {
    if (!isColor(c)) return c;
    const k = level(c);
    return k <= 0 ? paper : k >= LEVELS ? ink : `url(#${name}-h${k})`;
  };
  return {
    name,
    fill,
    stroke: (c, inkLine) => (!isColor(c) ? c : inkLine || luma(c) < 0.62 ? ink : paper),
    // Translucent glazes (sheen, blush, shadow pools) have no equivalent in line: leave them out.
    gradient: (s) => (s.some((st) => st[2] !== undefined && st[2] < 1) ? "none" : fill(mean(s))),
    halo: () => paper,
    defs: () => Array.from({ length: LEVELS - 1 }, (_, i) => pattern(i + 1)).join(""),
  };
}

const WOOL = ["#f0e4c4", "#d9b970", "#b8862e", "#7a5a2a", "#4a3320", "#2a1d14", "#8e2f25", "#5c1f1c", "#3f5a48", "#263a33", "#2e3f5e", "#c98e74", "#9a6a52"];
const nearestWool = (c: string) => {
  const p = hex(c);
  let best = WOOL[0], d = Infinity;
  for (const w of WOOL) {
    const q = hex(w);
    const e = (p[0] - q[0]) ** 2 * 0.3 + (p[1] - q[1]) ** 2 * 0.59 + (p[2] - q[2]) ** 2 * 0.11;
    if (e < d) [best, d] = [w, e];
  }
  return best;
};

/** Tapestry: a few dyed wools; shading is woven in bands, so gradients become hard steps. */
const TAPESTRY: Look = {
  name: "tapestry",
  fill: (c) => (isColor(c) ? nearestWool(c) : c),
  stroke: (c, ink) => (!isColor(c) ? c : ink ? nearestWool(blend(c, "#000000", 0.35)) : nearestWool(c)),
  gradient: (s) => s.flatMap((st, i) => (i === 0 ? [[st[0], nearestWool(st[1]), st[2]] as const] : [[st[0], nearestWool(s[i - 1][1]), st[2]] as const, [st[0], nearestWool(st[1]), st[2]] as const])),
  defs: () => "",
};

/** Tin-glazed tile: cobalt washes in a few strengths on a warm white glaze. */
function cobalt(): Look {
  const glaze = "#f2eee2", blue = "#1c3a86";
  const wash = (c: string) => blend(glaze, blue, Math.round(Math.pow(1 - luma(c), 1.2) * 4) / 4);
  return {
    name: "tile",
    fill: (c) => (isColor(c) ? wash(c) : c),
    stroke: (c, ink) => (!isColor(c) ? c : ink || luma(c) < 0.55 ? "#142c6a" : wash(c)),
    gradient: (s) => s.map(([o, c, a]) => [o, wash(c), a] as const),
    halo: () => glaze,
    defs: () => "",
  };
}

export const PAPER = { chalk: "#ecdcc0", print: "#f0e8d6" };

export function lookFor(medium: Medium): Look {
  switch (medium) {
    case "oil": return OIL;
    case "chalk": return hatched("chalk", PAPER.chalk, "#8a3b24", 2, -1, 3);
    case "etching": return hatched("etch", PAPER.print, "#2a211a", 1, -1, 4);
    case "engraving": return hatched("engr", PAPER.print, "#1a1612", 0, Infinity, 4);
    case "tile": return cobalt();
    case "tapestry": return TAPESTRY;
  }
}
