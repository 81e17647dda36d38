// Roses (soundhole decorations), drawn fine enough to be read at full zoom: an open hole ringed with
// inlay, a flat carved rosette, and the recessed parchment "wedding cake" of tiers with tracery.
import { polar, type Pt } from "./geom";
import { type Pen } from "./pen";
import type { Palette } from "./look";
import type { RoseKind } from "./types";

const TAU = Math.PI * 2;

/** Rings of inlay around the hole: dark lines with a checkered band between them. */
function inlayRings(pen: Pen, c: Pt, r: number, pal: Palette) {
  pen.circle(c, r * 1.3, { stroke: pal.woodDark, sw: 2.2, ink: true });
  pen.circle(c, r * 1.24, { stroke: pal.linen, sw: 5 });
  pen.circle(c, r * 1.24, { stroke: pal.ebony, sw: 5, dash: "5 5", ink: true });
  pen.circle(c, r * 1.18, { stroke: pal.woodDark, sw: 1.6, ink: true });
  pen.circle(c, r * 1.12, { stroke: pal.woodDark, sw: 1.2, ink: true });
  // A ring of small dots, as in mother-of-pearl or ebony points set into the top.
  for (let i = 0; i < 36; i++) pen.circle(polar(c, r * 1.37, (i / 36) * TAU), r * 0.018, { fill: pal.ebony });
}

function hole(pen: Pen, c: Pt, r: number, pal: Palette) {
  pen.circle(c, r, { fill: pen.radial([c[0] - r * 0.2, c[1] - r * 0.25], r * 1.1, [[0, "#0a0604"], [0.75, "#1a0f08"], [1, pal.woodDark]]) });
}

function openRose(pen: Pen, c: Pt, r: number, pal: Palette) {
  hole(pen, c, r, pal);
  // The cut edge of the top catches the light on the far side.
  pen.circle(c, r, { stroke: pal.topDark, sw: 2.5, ink: true });
  pen.path([["M", polar(c, r * 0.985, Math.PI * 1.05)], ["C", polar(c, r * 1.08, Math.PI * 1.3), polar(c, r * 1.08, Math.PI * 1.7), polar(c, r * 0.985, Math.PI * 1.95)]], { stroke: pal.gut, sw: 1.4, op: 0.7 });
  // Inside, the bracing bar under the top is just visible.
  pen.poly([polar(c, r * 0.95, 2.0), polar(c, r * 0.95, 1.15), polar(c, r * 0.8, 1.2), polar(c, r * 0.8, 1.95)], { fill: "#2a1a0f", op: 0.8 });
}

function rosette(pen: Pen, c: Pt, r: number, pal: Palette, petals: number, turn: number) {
  hole(pen, c, r, pal);
  const line = (draw: (s: { stroke: string; sw: number; ink?: boolean }) => void) => {
    draw({ stroke: "#120a05", sw: 4.2 });
    draw({ stroke: pal.gut, sw: 2.2, ink: true });
  };
  // Interlaced circles through the centre: the classic carved star of the flat rose.
  line((s) => {
    for (let i = 0; i < petals; i++) pen.circle(polar(c, r * 0.5, turn + (i / petals) * TAU), r * 0.5, s);
  });
  line((s) => {
    for (let i = 0; i < petals; i++) pen.circle(polar(c, r * 0.62, turn + ((i + 0.5) / petals) * TAU), r * 0.36, s);
  });
  line((s) => pen.circle(c, r * 0.96, s));
  line((s) => pen.circle(c, r * 0.2, s));
  // Tiny lozenges between the petals' tips, cut in the band of the rim.
  for (let i = 0; i < petals * 2; i++) {
    const a = turn + (i / (petals * 2)) * TAU;
    pen.poly([polar(c, r * 0.8, a), polar(c, r * 0.87, a + 0.07), polar(c, r * 0.94, a), polar(c, r * 0.87, a - 0.07)], { fill: pal.gut, stroke: "#120a05", sw: 1.2, ink: true });
  }
  pen.circle(c, r * 0.07, { fill: pal.gut, stroke: "#120a05", sw: 1.4, ink: true });
}

/** Recessed tiers, each smaller, darker and a little further down-right, like a cake seen from above. */
function weddingCake(pen: Pen, c: Pt, r: number, pal: Palette) {
  hole(pen, c, r, pal);
  const tiers = 4;
  for (let t = 0; t < tiers; t++) {
    const ro = r * (1 - t * 0.2);
    const ri = r * (1 - (t + 1) * 0.2);
    const ct: Pt = [c[0] + t * r * 0.035, c[1] + t * r * 0.045];
    const shade = ["#e6d5ad", "#cdb88c", "#ad9669", "#8a744d"][t];
    // The wall of the tier, seen as a thin dark crescent below its rim.
    pen.circle([ct[0] + r * 0.02, ct[1] + r * 0.03], ro, { stroke: "#1a0f07", sw: 4 });
    pen.circle(ct, ro, { stroke: shade, sw: 2.6, ink: true });
    pen.circle(ct, ri + (ro - ri) * 0.12, { stroke: shade, sw: 1.6, ink: true });
    const m = 28 - t * 5;
    const mid = (ro + ri) / 2, loop = (ro - ri) * 0.42;
    for (let i = 0; i < m; i++) {
      const a = (i / m) * TAU + t * 0.2;
      // Interlocking loops of parchment, each with a pin-prick eye: the "fine geometric tracery".
      pen.circle(polar(ct, mid, a), loop, { stroke: "#120a05", sw: 3 });
      pen.circle(polar(ct, mid, a), loop, { stroke: shade, sw: 1.5, ink: true });
      pen.circle(polar(ct, mid, a + Math.PI / m), loop * 0.28, { fill: shade });
      pen.line(polar(ct, ro, a), polar(ct, ri + (ro - ri) * 0.12, a + Math.PI / m), { stroke: shade, sw: 1.1, op: 0.9, ink: true });
    }
  }
  // The central boss: an eight-pointed star on the deepest tier.
  const cc: Pt = [c[0] + tiers * r * 0.035, c[1] + tiers * r * 0.045];
  const star: Pt[] = [];
  for (let i = 0; i < 16; i++) star.push(polar(cc, i % 2 ? r * 0.08 : r * 0.18, (i / 16) * TAU));
  pen.poly(star, { fill: "#7a6442", stroke: "#120a05", sw: 1.4, ink: true });
  pen.circle(cc, r * 0.04, { fill: "#120a05" });
  pen.circle(c, r, { stroke: pal.gold, sw: 3, ink: true });
}

export function drawRose(pen: Pen, kind: RoseKind | "carved-lute", c: Pt, r: number, pal: Palette) {
  pen.group("rose", () => {
    // Guitars have inlaid rings round the rose; a lute's rose is carved in the top itself.
    if (kind === "carved-lute") pen.circle(c, r * 1.06, { stroke: pal.topDark, sw: 3, ink: true });
    else inlayRings(pen, c, r, pal);
    if (kind === "open") openRose(pen, c, r, pal);
    else if (kind === "flat-rosette") rosette(pen, c, r, pal, 8, 0);
    else if (kind === "wedding-cake") weddingCake(pen, c, r, pal);
    else rosette(pen, c, r, pal, 12, 0.13);
  });
}
