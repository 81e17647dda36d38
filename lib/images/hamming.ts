// 64-bit perceptual hashes as bigints: distance, storage form and the near-duplicate rule.
// Pure (no sharp), so a browser or a SQL-side batch can compare stored hashes too.

const BITS = 64n;
const MASK = (1n << BITS) - 1n;

function check(h: bigint): bigint {
  if (h < 0n || h > MASK) throw new RangeError(`not a 64-bit hash: ${h}`);
  return h;
}

/** Number of differing bits of two 64-bit hashes (0 … 64). */
export function hammingDistance(a: bigint, b: bigint): number {
  let x = check(a) ^ check(b);
  let n = 0;
  for (; x !== 0n; n++) x &= x - 1n; // clears the lowest set bit
  return n;
}

/** 16 lower-case hex digits, zero-padded: the CHAR(16) column's form. */
export const toHex = (h: bigint): string => check(h).toString(16).padStart(16, "0");

export function fromHex(hex: string): bigint {
  if (!/^[0-9a-fA-F]{16}$/.test(hex)) throw new Error(`not 16 hex digits: "${hex}"`);
  return BigInt(`0x${hex}`);
}

/**
 * Distances on 64-bit dHash/pHash: 0 identical, up to about 10 a likely variant of the same
 * picture, above about 15 different pictures. Common practice, not a standard — sources differ,
 * so the threshold is a parameter; tune it on the archive's own duplicates.
 */
export const NEAR_DUPLICATE_THRESHOLD = 10;
export const DIFFERENT_THRESHOLD = 15;

export const isNearDuplicate = (distance: number, threshold = NEAR_DUPLICATE_THRESHOLD): boolean => distance <= threshold;
