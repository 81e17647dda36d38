// Raster grain laid over the rendered picture with soft light (mid-grey is neutral): the weave of
// canvas and mottled varnish, the fibres of paper, the pooling of glaze. Seeded, so it repeats.
import sharp from "sharp";
import type { Medium } from "./look";
import { Rng } from "./random";

const AMOUNT: Record<Medium, { low: number; fine: number; warm: number }> = {
  oil: { low: 26, fine: 16, warm: 6 },
  chalk: { low: 18, fine: 30, warm: 4 },
  etching: { low: 10, fine: 18, warm: 2 },
  engraving: { low: 10, fine: 16, warm: 2 },
  tile: { low: 22, fine: 8, warm: 0 },
  tapestry: { low: 16, fine: 24, warm: 3 },
};

export async function grainLayer(width: number, height: number, medium: Medium, seed: number): Promise<Buffer> {
  const rng = new Rng(seed ^ 0x5eed);
  const { low, fine, warm } = AMOUNT[medium];
  // Mottling: a coarse random field, smoothly enlarged.
  const lw = Math.max(2, Math.round(width / 40)), lh = Math.max(2, Math.round(height / 40));
  const coarse = Buffer.alloc(lw * lh);
  for (let i = 0; i < coarse.length; i++) coarse[i] = 128 + Math.round(rng.jitter(low));
  const mottle = await sharp(coarse, { raw: { width: lw, height: lh, channels: 1 } }).resize(width, height, { kernel: "cubic", fit: "fill" }).raw().toBuffer();
  const out = Buffer.alloc(width * height * 3);
  for (let i = 0, j = 0; i < mottle.length; i++, j += 3) {
    const v = mottle[i] + (rng.next() - 0.5) * 2 * fine;
    // A little more red than blue: the grain reads warm, like aged varnish or paper.
    out[j] = Math.max(0, Math.min(255, v + warm));
    out[j + 1] = Math.max(0, Math.min(255, v));
    out[j + 2] = Math.max(0, Math.min(255, v - warm));
  }
  return out;
}
