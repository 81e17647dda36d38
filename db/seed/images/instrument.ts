// Geometry of the plucked instruments in their own frame, in millimetres: x runs from the tail of the
// body to the head, y across the soundboard with the treble (first course) side positive. Drawing,
// hands and evidence all read the same numbers, so a fingertip lands on the string it claims to stop.
import { sampleSpline, type Pt } from "./geom";
import type { InstrumentKind, InstrumentSpec } from "./types";

export type Geometry = {
  kind: InstrumentKind;
  outline: Pt[];
  bodyLength: number;
  rose: { c: Pt; r: number };
  bridgeX: number;
  joinX: number;
  nutX: number;
  headEnd: number;
  nutHalf: number;
  joinHalf: number;
  frets: number[];
  stringsPerCourse: number[];
  pegs: Pt[];
  /** Peg index of each string, in string order (bass first); pegs missing here have no string. */
  pegOfString: number[];
  /** Half the distance between the outer course centres at the nut and at the bridge. */
  spreadNut: number;
  spreadBridge: number;
  pairNut: number;
  pairBridge: number;
};

type Shape = { length: number; knots: [number, number][] };

// Half-outline knots (x, half-width) from tail to neck joint; mirrored to close the soundboard.
const SHAPES: Record<InstrumentKind, Shape> = {
  guitar: { length: 460, knots: [[0, 0], [5, 60], [22, 102], [60, 126], [118, 133], [178, 124], [228, 104], [258, 98], [295, 102], [350, 108], [405, 100], [440, 76], [455, 42], [460, 0]] },
  vihuela: { length: 520, knots: [[0, 0], [6, 70], [26, 118], [70, 142], [135, 148], [200, 138], [255, 122], [290, 118], [335, 124], [400, 130], [460, 118], [498, 86], [515, 46], [520, 0]] },
  lute: { length: 480, knots: [[0, 0], [8, 80], [35, 132], [90, 160], [160, 164], [240, 148], [320, 116], [400, 78], [455, 50], [478, 36], [480, 0]] },
  theorbo: { length: 520, knots: [[0, 0], [8, 82], [36, 138], [95, 166], [170, 170], [250, 154], [340, 120], [425, 80], [490, 50], [517, 38], [520, 0]] },
  cittern: { length: 300, knots: [[0, 0], [6, 62], [28, 104], [80, 122], [140, 114], [200, 88], [255, 58], [288, 38], [300, 0]] },
};

type Layout = {
  bridgeX: number; neck: number; head: number; nutHalf: number; joinHalf: number;
  rose: [number, number]; courses: number[]; spread: [number, number]; pair: [number, number];
};

const LAYOUTS: Record<InstrumentKind, Layout> = {
  // Five courses, the first single: 1 + 2·4 = nine strings on ten pegs.
  guitar: { bridgeX: 100, neck: 325, head: 175, nutHalf: 24, joinHalf: 29, rose: [292, 43], courses: [1, 2, 2, 2, 2], spread: [19, 31], pair: [3.2, 5] },
  vihuela: { bridgeX: 105, neck: 330, head: 190, nutHalf: 28, joinHalf: 33, rose: [330, 46], courses: [1, 2, 2, 2, 2, 2], spread: [23, 36], pair: [3.1, 4.8] },
  lute: { bridgeX: 88, neck: 300, head: 170, nutHalf: 32, joinHalf: 36, rose: [300, 56], courses: [1, 2, 2, 2, 2, 2, 2], spread: [27, 52], pair: [2.8, 4.6] },
  theorbo: { bridgeX: 92, neck: 330, head: 170, nutHalf: 33, joinHalf: 37, rose: [315, 58], courses: [1, 1, 1, 1, 1, 1], spread: [28, 50], pair: [0, 0] },
  cittern: { bridgeX: 62, neck: 330, head: 150, nutHalf: 20, joinHalf: 24, rose: [188, 30], courses: [2, 2, 3, 2], spread: [15, 24], pair: [2.6, 4] },
};

export function geometry(spec: InstrumentSpec): Geometry {
  const shape = SHAPES[spec.kind];
  const lay = LAYOUTS[spec.kind];
  const treble = shape.knots.map(([x, h]) => [x, h] as Pt);
  const bass = shape.knots.slice(1, -1).reverse().map(([x, h]) => [x, -h] as Pt);
  const outline = [...treble, ...bass];
  const joinX = shape.length;
  const nutX = joinX + lay.neck;
  const scale = nutX - lay.bridgeX;
  const frets = Array.from({ length: spec.frets + 1 }, (_, k) => nutX - scale * (1 - Math.pow(2, -k / 12)));
  const strings = lay.courses.reduce((a, b) => a + b, 0);
  const { pegs, pegOfString } = pegLayout(spec.kind, nutX, lay.head, strings);
  return {
    kind: spec.kind, outline, bodyLength: shape.length,
    rose: { c: [lay.rose[0], 0], r: lay.rose[1] },
    bridgeX: lay.bridgeX, joinX, nutX, headEnd: nutX + lay.head,
    nutHalf: lay.nutHalf, joinHalf: lay.joinHalf, frets,
    stringsPerCourse: lay.courses, pegs, pegOfString,
    spreadNut: lay.spread[0], spreadBridge: lay.spread[1], pairNut: lay.pair[0], pairBridge: lay.pair[1],
  };
}

/** Rear pegs of a flat head in two staggered rows (guitar, vihuela, cittern): the rows splay outwards
 * towards the top so each string reaches its own peg without crossing another. Lutes and theorbos
 * have side pegs in a pegbox, drawn by lute.ts from the same count. */
function pegLayout(kind: InstrumentKind, nutX: number, head: number, strings: number) {
  const total = kind === "guitar" ? 10 : kind === "vihuela" ? 12 : strings;
  const rows = Math.ceil(total / 2);
  const pegs: Pt[] = [];
  const step = (head - 48) / Math.max(1, rows - 1);
  const [y0, dy] = kind === "cittern" ? [6, 2.5] : kind === "vihuela" ? [8, 3.4] : [9, 3.6];
  for (let side = -1; side <= 1; side += 2)
    for (let i = 0; i < rows && pegs.length < total; i++) pegs.push([nutX + 30 + i * step, side * (y0 + dy * i)]);
  // Strings bass → treble: the bass half takes the bass row from the far end inwards, the treble
  // half the treble row from the nut outwards; the surplus peg (far treble end) stays empty.
  const pegOfString: number[] = [];
  const upper = Math.ceil(strings / 2);
  for (let s = 0; s < strings; s++) pegOfString.push(s < upper ? upper - 1 - s + (rows - upper) : rows + (s - upper));
  return { pegs, pegOfString };
}

export const stringCount = (g: Geometry) => g.stringsPerCourse.reduce((a, b) => a + b, 0);

/** Centre of course c (1 = treble) at x. */
export function courseY(g: Geometry, c: number, x: number) {
  const n = g.stringsPerCourse.length;
  const t = Math.max(0, Math.min(1, (x - g.bridgeX) / (g.nutX - g.bridgeX)));
  const spread = g.spreadBridge + (g.spreadNut - g.spreadBridge) * t;
  return spread * (1 - (2 * (c - 1)) / Math.max(1, n - 1));
}

/** Every string as [course, y at bridge, y at nut], bass first. */
export function stringLines(g: Geometry): { course: number; yb: number; yn: number }[] {
  const out: { course: number; yb: number; yn: number }[] = [];
  for (let c = g.stringsPerCourse.length; c >= 1; c--) {
    const n = g.stringsPerCourse[c - 1];
    for (let k = 0; k < n; k++) {
      const off = n === 1 ? 0 : (k / (n - 1) - 0.5);
      out.push({ course: c, yb: courseY(g, c, g.bridgeX) + off * g.pairBridge, yn: courseY(g, c, g.nutX) + off * g.pairNut });
    }
  }
  return out;
}

export const neckHalf = (g: Geometry, x: number) =>
  g.joinHalf + ((g.nutHalf - g.joinHalf) * (x - g.joinX)) / (g.nutX - g.joinX);

/** Where a finger stops a course: just behind the fret, towards the nut. */
export const stopX = (g: Geometry, fret: number) => g.frets[fret] + 0.3 * (g.frets[fret - 1] - g.frets[fret]);

/** Half-width of the soundboard at x (from the sampled treble outline). */
export function bodyHalf(g: Geometry, x: number) {
  const side = sampleSpline(g.outline, true, 12).filter((p) => p[1] >= 0).sort((a, b) => a[0] - b[0]);
  for (let i = 1; i < side.length; i++) {
    if (side[i][0] >= x) {
      const [a, b] = [side[i - 1], side[i]];
      return a[1] + ((b[1] - a[1]) * (x - a[0])) / Math.max(1e-6, b[0] - a[0]);
    }
  }
  return 0;
}
