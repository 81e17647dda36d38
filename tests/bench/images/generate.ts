// The test photographs: deterministic JPEGs with detail at every scale (an SVG of many shapes,
// gradients and fine strokes, plus gaussian noise so that they compress like a photograph rather than
// like flat artwork). Written once under .data/bench/images/ and reused while the generation matches.
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import sharp from "sharp";
import { ROOT } from "../database";
import { prng, type Prng } from "../vocabulary";

// Bump when the generator changes: the next run then writes the images again.
const GENERATION = 2;
export const IMAGES_DIR = join(ROOT, ".data/bench/images");
export const PICTURES = {
  "24mp": { width: 6000, height: 4000, seed: 24 },
  "100mp": { width: 12240, height: 8160, seed: 100 },
} as const;
export type PictureId = keyof typeof PICTURES;
export type Picture = { id: PictureId; path: string; width: number; height: number; bytes: number; generatedMs: number | null };

// The drawing is made in a 6000 × 4000 space and scaled by the viewBox, so both sizes show the same
// composition, rendered at full size (not upscaled) with noise added per pixel afterwards. More shapes
// would make the 100 MP one slower to render (12,000 took librsvg 90 s) without changing how it codes.
function svg(r: Prng, width: number, height: number, shapes: number): string {
  const W = 6000;
  const H = 4000;
  const colour = () => `rgb(${r.int(0, 255)},${r.int(0, 255)},${r.int(0, 255)})`;
  const defs: string[] = [];
  for (let i = 0; i < 60; i++) {
    const n = r.int(2, 5);
    const stops = Array.from({ length: n }, (_, k) => `<stop offset="${(k / (n - 1)).toFixed(2)}" stop-color="${colour()}" stop-opacity="${(0.4 + r.next() * 0.6).toFixed(2)}"/>`).join("");
    defs.push(
      i % 2
        ? `<linearGradient id="g${i}" x1="${r.next().toFixed(2)}" y1="${r.next().toFixed(2)}" x2="${r.next().toFixed(2)}" y2="${r.next().toFixed(2)}">${stops}</linearGradient>`
        : `<radialGradient id="g${i}" cx="${r.next().toFixed(2)}" cy="${r.next().toFixed(2)}" r="${(0.3 + r.next()).toFixed(2)}">${stops}</radialGradient>`,
    );
  }
  const fill = () => (r.chance(0.7) ? `url(#g${r.int(0, 59)})` : colour());
  const body: string[] = [`<rect width="${W}" height="${H}" fill="url(#g1)"/>`];
  for (let i = 0; i < shapes; i++) {
    const x = r.int(-200, W);
    const y = r.int(-200, H);
    const size = Math.round(8 + 900 * r.next() ** 3);
    const opacity = (0.3 + r.next() * 0.7).toFixed(2);
    const kind = r.int(0, 4);
    if (kind === 0) body.push(`<circle cx="${x}" cy="${y}" r="${size}" fill="${fill()}" fill-opacity="${opacity}"/>`);
    else if (kind === 1)
      body.push(`<rect x="${x}" y="${y}" width="${size}" height="${r.int(4, size * 2)}" fill="${fill()}" fill-opacity="${opacity}" transform="rotate(${r.int(0, 359)} ${x} ${y})"/>`);
    else if (kind === 2) {
      const points = Array.from({ length: r.int(3, 9) }, () => `${x + r.int(-size, size)},${y + r.int(-size, size)}`).join(" ");
      body.push(`<polygon points="${points}" fill="${fill()}" fill-opacity="${opacity}"/>`);
    } else {
      // Curves and hatching: the thin, high-contrast detail that makes JPEG work hard.
      let d = `M${x},${y}`;
      for (let k = 0; k < r.int(2, 8); k++) d += ` Q${x + r.int(-size, size)},${y + r.int(-size, size)} ${x + r.int(-size, size)},${y + r.int(-size, size)}`;
      body.push(`<path d="${d}" fill="none" stroke="${colour()}" stroke-width="${(0.6 + r.next() * (kind === 3 ? 3 : 24)).toFixed(1)}" stroke-opacity="${opacity}"/>`);
    }
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${W} ${H}" preserveAspectRatio="none"><defs>${defs.join("")}</defs>${body.join("")}</svg>`;
}

/** Adds luminance noise (σ ≈ 9) and a little chroma noise in place, from a fixed table and xorshift. */
function addNoise(pixels: Buffer, seed: number) {
  const table = new Int8Array(65536);
  const r = prng(seed);
  for (let i = 0; i < table.length; i++) {
    const g = Math.sqrt(-2 * Math.log(1 - r.next())) * Math.cos(2 * Math.PI * r.next());
    table[i] = Math.max(-127, Math.min(127, Math.round(g * 9)));
  }
  let s = seed | 1;
  for (let i = 0; i < pixels.length; i += 3) {
    s ^= s << 13;
    s ^= s >>> 17;
    s ^= s << 5;
    const luma = table[s & 0xffff];
    const chroma = table[(s >>> 16) & 0xffff] >> 2;
    pixels[i] = Math.max(0, Math.min(255, pixels[i] + luma + chroma));
    pixels[i + 1] = Math.max(0, Math.min(255, pixels[i + 1] + luma));
    pixels[i + 2] = Math.max(0, Math.min(255, pixels[i + 2] + luma - chroma));
  }
}

export async function picture(id: PictureId): Promise<Picture> {
  const { width, height, seed } = PICTURES[id];
  mkdirSync(IMAGES_DIR, { recursive: true });
  const path = join(IMAGES_DIR, `${id}.jpg`);
  const marker = `${path}.json`;
  const expected = { generation: GENERATION, width, height, seed };
  if (existsSync(path) && existsSync(marker) && readFileSync(marker, "utf8") === JSON.stringify(expected)) {
    return { id, path, width, height, bytes: statSync(path).size, generatedMs: null };
  }
  const t = performance.now();
  const drawing = Buffer.from(svg(prng(seed), width, height, 3_000));
  const { data } = await sharp(drawing, { limitInputPixels: false, unlimited: true }).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  addNoise(data, seed);
  await sharp(data, { raw: { width, height, channels: 3 }, limitInputPixels: false }).jpeg({ quality: 90 }).toFile(path);
  writeFileSync(marker, JSON.stringify(expected));
  return { id, path, width, height, bytes: statSync(path).size, generatedMs: Math.round(performance.now() - t) };
}
