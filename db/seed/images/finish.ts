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
  const out = new Uint8ClampedArray(width * height * 3);
  // Per-pixel grain from an inline xorshift, four bytes per step: the Rng class is too slow for
  // seventeen million pixels.
  let x = (seed * 2654435761) | 1, bits = 0;
  for (let i = 0, j = 0; i < mottle.length; i++, j += 3) {
    if ((i & 3) === 0) {
      x ^= x << 13;
      x ^= x >>> 17;
      x ^= x << 5;
      bits = x >>> 0;
    }
    const v = mottle[i] + (((bits >>> ((i & 3) * 8)) & 255) / 127.5 - 1) * fine;
    // A little more red than blue: the grain reads warm, like aged varnish or paper.
    out[j] = v + warm;
    out[j + 1] = v;
    out[j + 2] = v - warm;
  }
  return Buffer.from(out.buffer);
}
