// Tiles: IIIF Image API 3.0 Implementation Notes §3 "Tile region parameter calculation" (integer
// arithmetic; the worked 6000×4000 values are from shared/CHECKS.md), compared with what sharp
// 0.35.5's tile({ layout: "iiif3" }) (libvips dzsave) really writes. This test may use sharp; the
// module under test may not.
import { mkdtempSync, readFileSync, readdirSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, relative } from "node:path";
import sharp from "sharp";
import { afterAll, describe, expect, it } from "vitest";
import { parseImageRequest, scaleFactorsFor, sizesFor, tileGrid, tileUrl, type Tile } from "@/lib/iiif";

const byScale = (tiles: Tile[], s: number) => tiles.filter((t) => t.scaleFactor === s);

describe("tileGrid — the CHECKS.md worked values (6000×4000, tiles of 512)", () => {
  const factors = scaleFactorsFor(6000, 4000, 512);
  const tiles = tileGrid(6000, 4000, 512, factors);
  it("scale factors are 1, 2, 4, 8, 16", () => expect(factors).toEqual([1, 2, 4, 8, 16]));
  it("at s = 1 the grid is 12×8 and the last tile is 5632,3584,368,416 at 368×416", () => {
    const s1 = byScale(tiles, 1);
    expect(s1).toHaveLength(96);
    expect(Math.max(...s1.map((t) => t.col)) + 1).toBe(12);
    expect(Math.max(...s1.map((t) => t.row)) + 1).toBe(8);
    const last = s1[s1.length - 1];
    expect(last.region).toEqual({ x: 5632, y: 3584, w: 368, h: 416 });
    expect(last.size).toEqual({ w: 368, h: 416 });
    expect(last.path).toBe("5632,3584,368,416/368,416/0/default.jpg");
  });
  it("at s = 16 one tile holds the whole image at 375×250", () => {
    expect(byScale(tiles, 16)).toEqual([
      { scaleFactor: 16, col: 0, row: 0, region: { x: 0, y: 0, w: 6000, h: 4000 }, size: { w: 375, h: 250 }, path: "full/375,250/0/default.jpg" },
    ]);
  });
  it("partial tiles round their size up: ceil(w_region / s) (Implementation Notes §3)", () => {
    const t = tileGrid(1537, 1025, 512, [2]).find((x) => x.col === 1 && x.row === 1)!;
    expect(t.region).toEqual({ x: 1024, y: 1024, w: 513, h: 1 });
    expect(t.size).toEqual({ w: 257, h: 1 });
  });
  it("non-square tiles use their own height (§5.4)", () => {
    const t = tileGrid(1000, 1000, { width: 512, height: 256 }, [1]);
    expect(t).toHaveLength(2 * 4);
    expect(t[t.length - 1].region).toEqual({ x: 512, y: 768, w: 488, h: 232 });
  });
  // §4.8 makes a size equal to the region's `max`, so every full-resolution tile's canonical size is
  // max; sharp (and, in a stored copy of OpenSeadragon's IIIFTileSource, the viewer) write w,h.
  it("every tile is a valid request; its canonical form is its path, with max for full-resolution sizes", () => {
    for (const t of tiles) {
      const [region, size, rotation, qf] = t.path.split("/");
      const [quality, format] = qf.split(".");
      const r = parseImageRequest({ region, size, rotation, quality, format }, { width: 6000, height: 4000 });
      const full = t.size.w === t.region.w && t.size.h === t.region.h;
      expect(r.ok && r.canonical, t.path).toBe(full ? t.path.replace(`/${size}/`, "/max/") : t.path);
    }
  });
  it("tileUrl joins the service base and the path", () => {
    expect(tileUrl("https://example.org/iiif/abc/", byScale(tiles, 16)[0])).toBe("https://example.org/iiif/abc/full/375,250/0/default.jpg");
  });
  it("sizesFor lists the full image at each scale factor, smallest first (§5.3)", () => {
    expect(sizesFor(6000, 4000, [1, 2, 4])).toEqual([
      { width: 1500, height: 1000 },
      { width: 3000, height: 2000 },
      { width: 6000, height: 4000 },
    ]);
  });
});

// sharp writes info.json and x,y,w,h/w,h/0/default.jpg files; compare them with our grid.
const work = mkdtempSync(join(tmpdir(), "cordarium-iiif-tiles-"));
afterAll(() => rmSync(work, { recursive: true, force: true }));

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? filesUnder(p) : [p];
  });
}

describe("tileGrid agrees with sharp's tile({ layout: 'iiif3', size: 512 })", () => {
  // Sizes chosen for edges: the CHECKS.md image, exact multiples, one pixel over, one tile or less,
  // and a long thin strip.
  const cases: [number, number][] = [[1500, 1000], [6000, 4000], [1537, 1025], [1024, 512], [513, 100], [512, 512], [100, 100], [3000, 20]];
  it.each(cases)("%i×%i", async (width, height) => {
    const out = join(work, `${width}x${height}`);
    const png = await sharp({ create: { width, height, channels: 3, background: "#8a5a2b" } }).png().toBuffer();
    await sharp(png).tile({ layout: "iiif3", size: 512, id: "https://example.org/iiif" }).toFile(out);

    const info = JSON.parse(readFileSync(join(out, "info.json"), "utf8"));
    const factors = scaleFactorsFor(width, height, 512);
    expect(info.width).toBe(width);
    expect(info.height).toBe(height);
    expect(info.tiles).toEqual([{ width: 512, scaleFactors: factors }]);

    const written = filesUnder(out).map((p) => relative(out, p)).filter((p) => p !== "info.json").sort();
    const ours = tileGrid(width, height, 512, factors).map((t) => t.path).sort();
    expect(ours).toEqual(written);
  });
});
