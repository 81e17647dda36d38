// What makes the drawing read as an object: craquelure and varnish on the paintings, a plate mark on
// the prints, a glazed edge with corner motifs on the tile, the weave and frayed edge of the tapestry.
// (The grain of canvas, paper and glaze is raster noise added at render time, see finish.ts.)
import { num, type Pt } from "./geom";
import { type Pen } from "./pen";
import { PAPER, type Medium } from "./look";
import type { Rng } from "./random";

/** A network of fine cracks: jittered cells, with a lifted light edge beside each dark crack. */
function craquelure(pen: Pen, W: number, H: number, rng: Rng) {
  const cell = 120;
  const cols = Math.ceil(W / cell) + 1, rows = Math.ceil(H / cell) + 1;
  const pts: Pt[][] = [];
  for (let j = 0; j < rows; j++) {
    pts.push([]);
    for (let i = 0; i < cols; i++) pts[j].push([i * cell + rng.jitter(cell * 0.4), j * cell * 0.8 + rng.jitter(cell * 0.3)]);
  }
  let d = "";
  const seg = (a: Pt, b: Pt) => {
    const m: Pt = [(a[0] + b[0]) / 2 + rng.jitter(12), (a[1] + b[1]) / 2 + rng.jitter(12)];
    d += `M${num(a[0])} ${num(a[1])}L${num(m[0])} ${num(m[1])}L${num(b[0])} ${num(b[1])}`;
  };
  for (let j = 0; j < rows; j++)
    for (let i = 0; i < cols; i++) {
      if (i + 1 < cols && rng.chance(0.85)) seg(pts[j][i], pts[j][i + 1]);
      if (j + 1 < rows && rng.chance(0.8)) seg(pts[j][i], pts[j + 1][i]);
    }
  pen.raw(`<path d="${d}" fill="none" stroke="#f3e2bc" stroke-width="1.2" stroke-opacity="0.1" transform="translate(1.5 1.5)"/>`);
  pen.raw(`<path d="${d}" fill="none" stroke="#140b04" stroke-width="1.2" stroke-opacity="0.2"/>`);
}

function varnish(pen: Pen, W: number, H: number) {
  pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: "#9a6412", op: 0.09 });
  pen.poly([[0, 0], [W, 0], [W, H], [0, H]], { fill: pen.radial([W * 0.45, H * 0.42], Math.max(W, H) * 0.75, [[0, "#000000", 0], [0.6, "#0d0803", 0.1], [1, "#0d0803", 0.6]]) });
}

/** The plate's bevelled edge pressed into the sheet, and the bare paper beyond it. */
function plateMark(pen: Pen, W: number, H: number) {
  const m = Math.round(Math.min(W, H) * 0.045);
  pen.raw(`<path d="M0 0H${W}V${H}H0Z M${m} ${m}V${H - m}H${W - m}V${m}Z" fill="${PAPER.print}" fill-rule="evenodd"/>`);
  pen.raw(`<rect x="${m}" y="${m}" width="${W - 2 * m}" height="${H - 2 * m}" fill="none" stroke="#6a5a44" stroke-width="5" stroke-opacity="0.6"/>`);
  pen.raw(`<rect x="${m - 6}" y="${m - 6}" width="${W - 2 * m + 12}" height="${H - 2 * m + 12}" fill="none" stroke="#ffffff" stroke-width="4" stroke-opacity="0.7"/>`);
}

/** Tile: corner motifs in cobalt, a thinner glaze at the edges, a few crazing lines and a chip. */
function tileEdge(pen: Pen, W: number, H: number, rng: Rng) {
  const blue = "#1c3a86";
  for (const [cx, cy, sx, sy] of [[0, 0, 1, 1], [W, 0, -1, 1], [0, H, 1, -1], [W, H, -1, -1]]) {
    const p = (x: number, y: number): Pt => [cx + sx * x, cy + sy * y];
    pen.poly([p(0, 0), p(300, 0), p(0, 300)], { fill: blue, op: 0.9 });
    pen.path([["M", p(40, 330)], ["C", p(120, 250), p(250, 120), p(330, 40)]], { stroke: blue, sw: 14 });
    for (let k = 0; k < 3; k++) pen.circle(p(200 + k * 70, 200 - k * 70 + 70), 20, { fill: blue });
  }
  pen.raw(`<rect x="8" y="8" width="${W - 16}" height="${H - 16}" fill="none" stroke="#b9ad92" stroke-width="16" stroke-opacity="0.8"/>`);
  let d = "";
  for (let i = 0; i < 14; i++) {
    let p: Pt = [rng.range(0, W), rng.range(0, H)];
    d += `M${num(p[0])} ${num(p[1])}`;
    for (let k = 0; k < 8; k++) {
      p = [p[0] + rng.jitter(160), p[1] + rng.jitter(160)];
      d += `L${num(p[0])} ${num(p[1])}`;
    }
  }
  pen.raw(`<path d="${d}" fill="none" stroke="#6d6656" stroke-width="1.5" stroke-opacity="0.35"/>`);
  pen.smooth([[W - 260, H], [W - 180, H - 70], [W - 60, H - 40], [W, H - 150], [W, H]], { fill: "#c9b48e" });
}

/** Tapestry: ribs of the warp across the whole weave, and a frayed, irregular fragment edge. */
function weave(pen: Pen, W: number, H: number, rng: Rng) {
  const id = pen.id("weave");
  pen.def(`<pattern id="${id}" patternUnits="userSpaceOnUse" width="12" height="8"><line x1="0" y1="0" x2="0" y2="8" stroke="#000" stroke-width="3" stroke-opacity="0.22"/><line x1="6" y1="0" x2="6" y2="8" stroke="#fff" stroke-width="1.2" stroke-opacity="0.12"/><line x1="0" y1="4" x2="12" y2="4" stroke="#000" stroke-width="0.8" stroke-opacity="0.12"/></pattern>`);
  pen.raw(`<rect width="${W}" height="${H}" fill="url(#${id})"/>`);
  const edge: Pt[] = [];
  const m = 110;
  for (let x = 0; x <= W; x += 60) edge.push([x, m + rng.jitter(50)]);
  for (let y = 0; y <= H; y += 60) edge.push([W - m + rng.jitter(50), y]);
  for (let x = W; x >= 0; x -= 60) edge.push([x, H - m + rng.jitter(50)]);
  for (let y = H; y >= 0; y -= 60) edge.push([m + rng.jitter(50), y]);
  const inner = edge.map(([x, y]) => `${num(x)} ${num(y)}`).join("L");
  pen.raw(`<path d="M0 0H${W}V${H}H0Z M${inner}Z" fill="#2b2824" fill-rule="evenodd"/>`);
  // Loose warp threads hanging from the top and bottom edges.
  let d = "";
  for (let x = 40; x < W; x += rng.range(20, 60)) {
    const y0 = m + rng.jitter(40);
    d += `M${num(x)} ${num(y0)}L${num(x + rng.jitter(10))} ${num(y0 - rng.range(20, 90))}`;
    const y1 = H - m + rng.jitter(40);
    d += `M${num(x)} ${num(y1)}L${num(x + rng.jitter(10))} ${num(y1 + rng.range(20, 90))}`;
  }
  pen.raw(`<path d="${d}" fill="none" stroke="#d8c9a4" stroke-width="3" stroke-opacity="0.8"/>`);
}

export function finishSurface(pen: Pen, medium: Medium, W: number, H: number, rng: Rng) {
  if (medium === "oil") {
    varnish(pen, W, H);
    craquelure(pen, W, H, rng);
  } else if (medium === "etching" || medium === "engraving") plateMark(pen, W, H);
  else if (medium === "tile") tileEdge(pen, W, H, rng);
  else if (medium === "tapestry") weave(pen, W, H, rng);
}
