// Arranges a scene on the canvas: ground, the figures and props behind, the player, the figures in
// front, then the surface of the medium. Placement depends on format, posture and instrument.
import { drawGround } from "./backgrounds";
import { drawViol } from "./cittern";
import { apply, frame, IDENTITY, mul, type Mat, type Pt } from "./geom";
import { type Pen } from "./pen";
import { geometry } from "./instrument";
import { drawInstrument } from "./instruments";
import { blend, PALETTES, PAPER, type Palette } from "./look";
import { boy, dancer, dog, drinker, drinkerHands, womanAtWindow } from "./people";
import { drawPlayer, HOLDS } from "./player";
import { balcony, fountain, garland, glass, jug, songbook, table, tree } from "./props";
import type { Rng } from "./random";
import type { SceneParams } from "./types";
import { finishSurface } from "./texture";

export const GLAZE = "#f2eee2";

export function canvasSize(spec: SceneParams): { width: number; height: number } {
  if (spec.orientation === "portrait") return { width: 3600, height: 4800 };
  if (spec.orientation === "square") return { width: 4200, height: 4200 };
  return { width: 4800, height: 3600 };
}

/** Where the player's hips go (fractions of the canvas) and how many pixels a millimetre takes. */
function placement(spec: SceneParams, W: number, H: number): { x: number; y: number; s: number } {
  const seated = spec.player?.posture === "seated";
  const p = spec.props;
  const x = spec.composition === "tavern-table" ? 0.33 : p.includes("songbook") ? 0.4 : spec.composition === "two-figures" ? 0.38 : spec.composition === "standing" && p.includes("dancers") ? 0.3 : 0.5;
  if (spec.orientation === "square") return { x: x * W, y: 0.56 * H, s: 1.72 };
  if (spec.orientation === "portrait") {
    if (spec.instrument.kind === "theorbo") return { x: 0.46 * W, y: 0.66 * H, s: 1.95 };
    return seated ? { x: x * W, y: 0.6 * H, s: 2.6 } : { x: x * W, y: 0.55 * H, s: 2.2 };
  }
  return seated ? { x: x * W, y: 0.655 * H, s: 2.35 } : { x: x * W, y: 0.55 * H, s: 1.7 };
}

export function compose(pen: Pen, spec: SceneParams, W: number, H: number, rng: Rng) {
  const pal = PALETTES[spec.palette];
  const paper = spec.medium === "chalk" ? PAPER.chalk : spec.medium === "tile" ? GLAZE : PAPER.print;
  // A print reversed from its painting: the whole plate is mirrored (and so are the evidence boxes).
  if (spec.mirrored) pen.setBase([-1, 0, 0, 1, W, 0]);
  drawGround(pen, spec.background, W, H, pal, rng.fork(1), paper, !spec.props.includes("balcony"));
  if (spec.composition === "emblem") emblem(pen, spec, W, H, pal, rng.fork(2));
  else withPlayer(pen, spec, W, H, pal, rng.fork(3));
  pen.setBase(IDENTITY);
  finishSurface(pen, spec.medium, W, H, rng.fork(4));
}

function withPlayer(pen: Pen, spec: SceneParams, W: number, H: number, pal: Palette, rng: Rng) {
  const fig = spec.player!;
  const { x, y, s } = placement(spec, W, H);
  const has = (p: SceneParams["props"][number]) => spec.props.includes(p);
  const at = (fx: number, fy: number, k = 1): Mat => frame([fx * W, fy * H], 0, s * k);

  if (has("balcony")) {
    // High in the wall and further off: smaller than the player in the street.
    const k = 0.6, by = 0.3;
    pen.with(at(0.76, by, k), () => balcony(pen, pal, "back"));
    if (has("woman-at-window")) womanAtWindow(pen, frame([0.76 * W, by * H + 260 * s * k], 0, s * k), pal);
    pen.with(at(0.76, by, k), () => balcony(pen, pal, "front"));
  }
  if (has("tree")) pen.with(at(0.9, 0.78, 0.9), () => tree(pen, pal, rng));
  if (has("dancers")) {
    dancer(pen, at(0.64, 0.5, 0.46), pal, true, 0.6);
    dancer(pen, at(0.8, 0.51, 0.46), pal, false, -0.5);
  }
  if (has("fountain")) pen.with(at(0.62, 0.8, 0.85), () => fountain(pen, pal));
  const drinkers: Mat[] = has("drinkers") ? [at(0.63, 0.6, 0.9), at(0.88, 0.6, 0.9)] : [];
  if (drinkers.length) {
    drinker(pen, drinkers[0], { sex: "man", headwear: "cap", hair: "short", beard: true, eyesClosed: false }, pal, pal.cloth2, -0.5);
    drinker(pen, drinkers[1], { sex: "man", headwear: "broad-hat", hair: "long", beard: false, eyesClosed: false }, pal, pal.cloth, -0.3);
  }
  if (has("table")) {
    const [tx, ty] = has("drinkers") ? [0.76, 0.6] : [0.8, 0.64];
    pen.with(at(tx, ty), () => table(pen, has("drinkers") ? 1050 : 720, ((0.93 - ty) * H) / s, pal, rng));
    if (has("jug")) pen.with(at(tx + 0.04, ty + 0.004), () => jug(pen, pal));
    if (has("glasses")) {
      pen.with(at(tx - 0.12, ty + 0.004), () => glass(pen, true));
      pen.with(at(tx + 0.14, ty + 0.004), () => glass(pen, false));
    }
    // The open book lies on the table: seen from a low angle, so its depth is foreshortened.
    if (has("songbook")) pen.with(mul(frame([(tx - 0.01) * W, ty * H - 62 * s], 4, s * 0.95), [1, 0, 0, 0.5, 0, 0]), () => songbook(pen, pal, rng));
    for (const d of drinkers) drinkerHands(pen, d, pal);
  }

  // The blind player sits on a stone block by the fountain.
  if (has("fountain")) pen.with(at(x / W, y / H), () => pen.poly([[-300, 20], [300, 20], [320, 480], [-320, 480]], { fill: pen.linear([-300, 0], [300, 0], [[0, blend(pal.bgLight, "#c8b890", 0.5)], [1, pal.bg]]), stroke: "#0a0604", sw: 3 }));
  // Contact shadow on the floor.
  pen.ellipse([x, y + (fig.posture === "seated" ? 500 : 880) * s], 460 * s, 60 * s, 0, { fill: "#000000", op: 0.3 });
  const kind = spec.instrument.kind;
  const hold = kind === "theorbo" ? HOLDS.theorbo : kind === "lute" && fig.posture === "seated" ? HOLDS.lute : HOLDS[fig.posture];
  drawPlayer({
    pen, figure: frame([x, y], 0, s), posture: fig.posture, fig, hold, inst: spec.instrument, g: geometry(spec.instrument),
    rh: spec.rightHand, lh: spec.leftHand, pal, rng, chair: fig.posture === "seated" && !has("fountain"), strap: fig.posture === "standing",
  });
  if (has("boy-tambourine")) pen.group("other:tambourine", () => boy(pen, at(0.82, 0.62, 0.72), pal));
  if (has("dog")) dog(pen, at(0.74, 0.86, 0.8), pal);
}

/** Title page: a framed field with a cartouche, a garland, a cittern and a viol hung from it. */
function emblem(pen: Pen, spec: SceneParams, W: number, H: number, pal: Palette, rng: Rng) {
  const ink = "#1a1612";
  for (const x of [0.09 * W, 0.91 * W]) {
    pen.poly([[x - 160, 0.12 * H], [x + 160, 0.12 * H], [x + 160, 0.9 * H], [x - 160, 0.9 * H]], { fill: "#9a8f80", stroke: ink, sw: 4 });
    for (let k = -3; k <= 3; k++) pen.line([x + k * 40, 0.14 * H], [x + k * 40, 0.88 * H], { stroke: ink, sw: 3 });
  }
  pen.poly([[0.04 * W, 0.06 * H], [0.96 * W, 0.06 * H], [0.96 * W, 0.16 * H], [0.04 * W, 0.16 * H]], { fill: "#c9c0b0", stroke: ink, sw: 4 });
  pen.smooth([[0.25 * W, 0.08 * H], [0.75 * W, 0.08 * H], [0.8 * W, 0.11 * H], [0.75 * W, 0.14 * H], [0.25 * W, 0.14 * H], [0.2 * W, 0.11 * H]], { fill: "#f0e8d6", stroke: ink, sw: 5 });
  const text = (t: string, yf: number, size: number) =>
    pen.raw(`<text x="${W / 2}" y="${Math.round(yf * H)}" font-family="DejaVu Serif, serif" font-size="${size}" text-anchor="middle" fill="${ink}" letter-spacing="${size * 0.12}">${t}</text>`);
  text("HARMONIA DELLE CORDE", 0.108, 130);
  text("LIBRO PRIMO DI SONATE", 0.132, 80);
  pen.poly([[0.04 * W, 0.86 * H], [0.96 * W, 0.86 * H], [0.96 * W, 0.94 * H], [0.04 * W, 0.94 * H]], { fill: "#c9c0b0", stroke: ink, sw: 4 });
  text("APPRESSO GLI EREDI DI NESSUNO · CIↃ IↃC LXVIII", 0.905, 70);
  const hook: Pt[] = [[0.2 * W, 0.2 * H], [0.35 * W, 0.3 * H], [0.5 * W, 0.27 * H], [0.65 * W, 0.3 * H], [0.8 * W, 0.2 * H]];
  garland(pen, hook, pal, rng);
  pen.path([["M", [0.5 * W - 120, 0.27 * H]], ["C", [0.5 * W - 260, 0.2 * H], [0.5 * W - 10, 0.2 * H], [0.5 * W + 120, 0.27 * H]]], { fill: "#e8dcc0", stroke: ink, sw: 4 });
  // The cittern and the viol hang head-up from ribbons tied to the garland.
  const g = geometry(spec.instrument);
  const cm = frame([0.3 * W, 0.84 * H], 84, 3.1);
  const vm = frame([0.68 * W, 0.83 * H], 95, 1.5);
  pen.line([0.35 * W, 0.3 * H], apply(cm, [g.headEnd - 40, 0]), { stroke: ink, sw: 6 });
  pen.line([0.65 * W, 0.3 * H], apply(vm, [1240, 0]), { stroke: ink, sw: 6 });
  pen.with(cm, () => drawInstrument(pen, g, spec.instrument, pal, rng));
  pen.group("other:viol", () => pen.with(vm, () => drawViol(pen, pal)));
}
