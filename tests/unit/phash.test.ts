// Perceptual hashes. Sources: pHash — C. Zauner, "Implementation and Benchmarking of Perceptual
// Image Hash Functions", master's thesis, FH Hagenberg, 2010; dHash — N. Krawetz, "Kind of Like
// That", HackerFactor blog, 2013 (from memory). The thresholds (≤ 10 a variant, > 15 different,
// shared/CHECKS.md) are common practice, not a standard, and configurable.
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import {
  DIFFERENT_THRESHOLD, NEAR_DUPLICATE_THRESHOLD,
  dHash, dct2d, fromHex, hammingDistance, isNearDuplicate, pHash, toHex,
} from "@/lib/images/phash";

// Drawings standing in for photographs: a lute-like still life and three unrelated pictures.
const W = 640;
const H = 480;
const svg = (body: string) => Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}">${body}</svg>`);
const pictures = {
  // Grain (feTurbulence) so that re-encoding and resizing really change the pixels.
  lute: svg(`
    <defs><filter id="grain"><feTurbulence type="fractalNoise" baseFrequency="0.9" numOctaves="2" seed="3"/>
      <feColorMatrix type="saturate" values="0"/><feComponentTransfer><feFuncA type="linear" slope="0.35"/></feComponentTransfer></filter>
    <linearGradient id="g" x1="0" y1="0" x2="1" y2="1"><stop offset="0" stop-color="#f3e3c3"/><stop offset="1" stop-color="#6b4a2a"/></linearGradient></defs>
    <rect width="640" height="480" fill="url(#g)"/>
    <ellipse cx="250" cy="300" rx="140" ry="110" fill="#8b4513"/>
    <circle cx="250" cy="290" r="30" fill="#2b1a0d"/>
    <rect x="330" y="150" width="230" height="36" transform="rotate(-25 330 168)" fill="#3d2412"/>
    <circle cx="520" cy="90" r="50" fill="#e8c070"/>
    <rect x="40" y="40" width="90" height="160" fill="#1f3a5f"/>
    <rect width="640" height="480" filter="url(#grain)"/>`),
  stripes: svg(`
    <rect width="640" height="480" fill="#dde"/>
    ${Array.from({ length: 8 }, (_, i) => `<rect x="${i * 80}" y="0" width="40" height="480" fill="#234"/>`).join("")}
    <polygon points="320,40 600,440 40,440" fill="#c33"/>`),
  radial: svg(`
    <defs><radialGradient id="r" cx="0.3" cy="0.7" r="0.8"><stop offset="0" stop-color="#fff"/><stop offset="1" stop-color="#024"/></radialGradient></defs>
    <rect width="640" height="480" fill="url(#r)"/>
    ${[[500, 60], [420, 200], [560, 330], [80, 80], [250, 120]].map(([x, y]) => `<rect x="${x}" y="${y}" width="70" height="70" fill="#fc0"/>`).join("")}`),
  bands: svg(`
    <rect width="640" height="480" fill="#222"/>
    ${Array.from({ length: 6 }, (_, i) => `<rect x="0" y="${i * 80}" width="640" height="40" fill="#9c9"/>`).join("")}
    <circle cx="480" cy="240" r="150" fill="#eee"/>`),
};
const watermark = Buffer.from(
  `<svg xmlns="http://www.w3.org/2000/svg" width="200" height="40"><text x="0" y="30" font-family="DejaVu Sans, sans-serif" font-size="24" fill="white" fill-opacity="0.8">© Cordarium</text></svg>`,
);

const png = (b: Buffer) => sharp(b).png().toBuffer();
let original: Buffer;
const variants: Record<string, Buffer> = {};
beforeAll(async () => {
  original = await png(pictures.lute);
  variants["re-encoded as JPEG quality 60"] = await sharp(original).jpeg({ quality: 60 }).toBuffer();
  variants["resized to half"] = await sharp(original).resize(W / 2, H / 2).png().toBuffer();
  variants["brightened by 10 %"] = await sharp(original).modulate({ brightness: 1.1 }).png().toBuffer();
  variants["with a small text watermark"] = await sharp(original).composite([{ input: watermark, left: 420, top: 430 }]).png().toBuffer();
});

describe.each([
  ["dHash", dHash],
  ["pHash", pHash],
] as const)("%s", (_name, hash) => {
  it("identical images → distance 0", async () => {
    expect(hammingDistance(await hash(original), await hash(Buffer.from(original)))).toBe(0);
  });
  it.each(["re-encoded as JPEG quality 60", "resized to half", "brightened by 10 %", "with a small text watermark"])(
    "the same picture %s → distance ≤ 10 (common practice; configurable)",
    async (variant) => {
      const d = hammingDistance(await hash(original), await hash(variants[variant]));
      expect(d).toBeLessThanOrEqual(NEAR_DUPLICATE_THRESHOLD);
      expect(isNearDuplicate(d)).toBe(true);
    },
  );
  it("the same picture stored sideways with EXIF orientation 6 → distance ≤ 10 (auto-oriented first)", async () => {
    // Orientation 6: the stored pixels are turned 90° anticlockwise; a viewer turns them back.
    const sideways = await sharp(original).rotate(270).jpeg({ quality: 95 }).withMetadata({ orientation: 6 }).toBuffer();
    expect((await sharp(sideways).metadata()).orientation).toBe(6);
    expect(hammingDistance(await hash(original), await hash(sideways))).toBeLessThanOrEqual(NEAR_DUPLICATE_THRESHOLD);
  });
  it("a transparent PNG hashes as if on white (onto black, its dark shapes would vanish)", async () => {
    const shapes = `<circle cx="200" cy="240" r="120" fill="#111"/><rect x="380" y="60" width="200" height="120" fill="#444"/>`;
    const transparent = await png(svg(shapes));
    const onWhite = await png(svg(`<rect width="640" height="480" fill="#fff"/>${shapes}`));
    expect((await sharp(transparent).metadata()).hasAlpha).toBe(true);
    const onBlack = await png(svg(`<rect width="640" height="480" fill="#000"/>${shapes}`));
    // ≤ 2 rather than 0: antialiased edges blend a little differently (pHash of flat drawings).
    expect(hammingDistance(await hash(transparent), await hash(onWhite))).toBeLessThanOrEqual(2);
    expect(hammingDistance(await hash(transparent), await hash(onBlack))).toBeGreaterThan(DIFFERENT_THRESHOLD);
  });
  it("the mirrored picture is not a near duplicate (the hash sees layout)", async () => {
    const mirrored = await sharp(original).flop().png().toBuffer();
    expect(hammingDistance(await hash(original), await hash(mirrored))).toBeGreaterThan(DIFFERENT_THRESHOLD);
  });
  it("different pictures → distance > 15 pairwise (common practice; configurable)", async () => {
    const hashes = await Promise.all(Object.values(pictures).map(async (p) => hash(await png(p))));
    for (let i = 0; i < hashes.length; i++)
      for (let j = i + 1; j < hashes.length; j++) {
        const d = hammingDistance(hashes[i], hashes[j]);
        expect(d, `pictures ${i} and ${j}`).toBeGreaterThan(DIFFERENT_THRESHOLD);
        expect(isNearDuplicate(d)).toBe(false);
      }
  });
});

describe("dct2d — the DCT-II written out (orthonormal)", () => {
  it("a constant block has only the DC term, n·c", () => {
    const d = dct2d(new Array(32 * 32).fill(7), 32);
    expect(d[0]).toBeCloseTo(32 * 7, 9);
    for (let i = 1; i < d.length; i++) expect(Math.abs(d[i])).toBeLessThan(1e-9);
  });
  it("a single cosine basis function gives a single coefficient", () => {
    const n = 8, u = 3, v = 5;
    const block = Array.from({ length: n * n }, (_, i) => {
      const [y, x] = [Math.floor(i / n), i % n];
      return Math.cos((Math.PI * (2 * x + 1) * u) / (2 * n)) * Math.cos((Math.PI * (2 * y + 1) * v) / (2 * n));
    });
    const d = dct2d(block, n);
    for (let i = 0; i < d.length; i++) {
      if (i === v * n + u) expect(d[i]).toBeCloseTo(n / 2, 9); // (√(2/n))² · (n/2)² = n/2
      else expect(Math.abs(d[i])).toBeLessThan(1e-9);
    }
  });
  it("keeps the energy (Parseval), as an orthonormal transform must", () => {
    const block = Array.from({ length: 16 * 16 }, (_, i) => Math.sin(i * 1.7) * 100 + (i % 7));
    const energy = (a: ArrayLike<number>) => Array.from(a).reduce((s, x) => s + x * x, 0);
    expect(energy(dct2d(block, 16))).toBeCloseTo(energy(block), 6);
  });
  it("refuses a block of the wrong length", () => expect(() => dct2d([1, 2, 3], 2)).toThrow());
});

describe("pHash bits", () => {
  it("has 32 bits above the median of 64 distinct coefficients", async () => {
    const h = await pHash(original);
    expect(h.toString(2).split("").filter((b) => b === "1")).toHaveLength(32);
  });
});

describe("hammingDistance, toHex, fromHex", () => {
  it("known values", () => {
    expect(hammingDistance(0n, 0n)).toBe(0);
    expect(hammingDistance(0n, 0xffffffffffffffffn)).toBe(64);
    expect(hammingDistance(0b1011n, 0b0110n)).toBe(3);
    expect(hammingDistance(0x8000000000000001n, 1n)).toBe(1);
    expect(hammingDistance(0xf0f0f0f0f0f0f0f0n, 0x0f0f0f0f0f0f0f0fn)).toBe(64);
  });
  it("refuses values that are not 64-bit", () => {
    expect(() => hammingDistance(-1n, 0n)).toThrow(RangeError);
    expect(() => hammingDistance(1n << 64n, 0n)).toThrow(RangeError);
  });
  it("16 hex digits, zero-padded, for a CHAR(16) column, and back", () => {
    expect(toHex(0n)).toBe("0000000000000000");
    expect(toHex(0xabcn)).toBe("0000000000000abc");
    expect(toHex(0xffffffffffffffffn)).toBe("ffffffffffffffff");
    expect(fromHex("0000000000000ABC")).toBe(0xabcn);
    expect(fromHex(toHex(0x8f3e00c1d2a4b567n))).toBe(0x8f3e00c1d2a4b567n);
    for (const bad of ["abc", "0x00000000000000", "000000000000000g", "00000000000000000"]) expect(() => fromHex(bad), bad).toThrow();
  });
  it("isNearDuplicate: ≤ threshold, 10 by default (common practice; configurable)", () => {
    expect(isNearDuplicate(10)).toBe(true);
    expect(isNearDuplicate(11)).toBe(false);
    expect(isNearDuplicate(11, 12)).toBe(true);
    expect(NEAR_DUPLICATE_THRESHOLD).toBe(10);
    expect(DIFFERENT_THRESHOLD).toBe(15);
  });
});
