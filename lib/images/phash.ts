// Perceptual hashes for finding the same photograph uploaded twice (re-encoded, resized,
// retouched or watermarked). Server-side: sharp decodes and shrinks; the hashing is plain code.
//   dHash — N. Krawetz, "Kind of Like That", HackerFactor blog, 2013 (from memory).
//   pHash — C. Zauner, "Implementation and Benchmarking of Perceptual Image Hash Functions",
//           master's thesis, FH Hagenberg, 2010 (the DCT hash of the pHash library).
// Both give 64 bits as a bigint, most significant bit first in row-major order.
import sharp, { type SharpInput } from "sharp";

export * from "./hamming";

export interface HashOptions {
  /**
   * Largest input in pixels sharp will decode. sharp's own default (16383², about 268 MP) is
   * written out here on purpose; raise it for very large scans, or pass false for no limit.
   */
  limitInputPixels?: number | false;
}
const DEFAULT_PIXEL_LIMIT = 16383 * 16383;

/**
 * Greyscale pixels at w×h, row-major. Auto-oriented first (a rotated EXIF photograph is the same
 * picture), alpha flattened onto white (a transparent PNG and its JPEG export hash alike), aspect
 * ignored (fit "fill"): the hash is of the picture's layout, not of its frame.
 */
async function greyPixels(input: SharpInput, w: number, h: number, opts: HashOptions): Promise<Float64Array> {
  const { data, info } = await sharp(input, { limitInputPixels: opts.limitInputPixels ?? DEFAULT_PIXEL_LIMIT })
    .autoOrient()
    .flatten({ background: "#ffffff" })
    .greyscale()
    // libvips shrinks by box-averaging first, then Lanczos: a low-pass, as the thesis' mean filter.
    .resize(w, h, { fit: "fill", kernel: "lanczos3" })
    .raw()
    .toBuffer({ resolveWithObject: true });
  // greyscale() may still leave three identical channels: read the first.
  const out = new Float64Array(w * h);
  for (let i = 0; i < out.length; i++) out[i] = data[i * info.channels];
  return out;
}

/** Packs booleans into a bigint, the first one as the most significant bit. */
function pack(bits: boolean[]): bigint {
  let h = 0n;
  for (const b of bits) h = (h << 1n) | (b ? 1n : 0n);
  return h;
}

/**
 * dHash: the picture at 9×8 grey; for each of the 8 rows, 8 comparisons of horizontal neighbours.
 * A bit is 1 when the right pixel is brighter than the left. Bit 63 compares row 0, columns 0 and 1;
 * bit 0 compares row 7, columns 7 and 8 (the order of the Python ImageHash library, from memory).
 */
export async function dHash(input: SharpInput, opts: HashOptions = {}): Promise<bigint> {
  const p = await greyPixels(input, 9, 8, opts);
  const bits: boolean[] = [];
  for (let y = 0; y < 8; y++) for (let x = 0; x < 8; x++) bits.push(p[y * 9 + x + 1] > p[y * 9 + x]);
  return pack(bits);
}

// Orthonormal DCT-II basis: C[k][n] = a(k)·cos(π(2n+1)k / 2N), a(0) = √(1/N), a(k) = √(2/N).
const bases = new Map<number, Float64Array>();
function basis(n: number): Float64Array {
  let c = bases.get(n);
  if (!c) {
    c = new Float64Array(n * n);
    for (let k = 0; k < n; k++) {
      const a = Math.sqrt((k === 0 ? 1 : 2) / n);
      for (let i = 0; i < n; i++) c[k * n + i] = a * Math.cos((Math.PI * (2 * i + 1) * k) / (2 * n));
    }
    bases.set(n, c);
  }
  return c;
}

/**
 * 2-D DCT-II of an n×n block (row-major), separable: rows, then columns. Orthonormal, so energy is
 * kept and a constant block c has only the DC term n·c. O(n³), fine for 32×32.
 */
export function dct2d(block: ArrayLike<number>, n: number): Float64Array {
  if (block.length !== n * n) throw new Error(`expected ${n * n} values, got ${block.length}`);
  const c = basis(n);
  const rows = new Float64Array(n * n);
  for (let y = 0; y < n; y++)
    for (let k = 0; k < n; k++) {
      let s = 0;
      for (let x = 0; x < n; x++) s += c[k * n + x] * block[y * n + x];
      rows[y * n + k] = s;
    }
  const out = new Float64Array(n * n);
  for (let x = 0; x < n; x++)
    for (let k = 0; k < n; k++) {
      let s = 0;
      for (let y = 0; y < n; y++) s += c[k * n + y] * rows[y * n + x];
      out[k * n + x] = s;
    }
  return out;
}

/**
 * pHash: the picture at 32×32 grey, its 2-D DCT, the 8×8 lowest frequencies next to the DC term
 * (rows and columns 1…8, as the pHash library's crop(1,1,8,8) — from memory — so the DC term and
 * the pure row/column averages are left out), one bit per coefficient above their median.
 * Bit 63 is coefficient (1,1), then row-major to (8,8) at bit 0.
 */
export async function pHash(input: SharpInput, opts: HashOptions = {}): Promise<bigint> {
  const d = dct2d(await greyPixels(input, 32, 32, opts), 32);
  const low: number[] = [];
  for (let v = 1; v <= 8; v++) for (let u = 1; u <= 8; u++) low.push(d[v * 32 + u]);
  const sorted = [...low].sort((a, b) => a - b);
  const median = (sorted[31] + sorted[32]) / 2;
  return pack(low.map((x) => x > median));
}
