// Tile pyramids: IIIF Image API 3.0, §5.4 Tiles, and Implementation Notes §3 "Tile region
// parameter calculation" (integer arithmetic, partial tiles at the right and lower edges, size
// rounded up). Paths are written exactly as sharp's `tile({ layout: "iiif3" })` writes them
// (checked in tests/unit/iiif-tiles.test.ts), so a pyramid on disk and this grid agree. Pure.
import type { Region, Size } from "./request";

export interface TileSize { width: number; height?: number }
export interface Tile {
  scaleFactor: number;
  /** Column n and row m, counting from the upper-left tile. */
  col: number;
  row: number;
  region: Region;
  size: Size;
  /** region/size/0/default.jpg, as sharp names the file. */
  path: string;
}

const tileDims = (t: number | TileSize): { tw: number; th: number } =>
  typeof t === "number" ? { tw: t, th: t } : { tw: t.width, th: t.height ?? t.width };

function checkPositive(...values: number[]) {
  for (const v of values) if (!Number.isInteger(v) || v < 1) throw new Error(`expected a positive integer, got ${v}`);
}

/** Scale factors 1, 2, 4, … up to the first one at which a single tile holds the whole image. */
export function scaleFactorsFor(width: number, height: number, tile: number | TileSize): number[] {
  const { tw, th } = tileDims(tile);
  checkPositive(width, height, tw, th);
  const factors = [1];
  for (let s = 1; Math.ceil(width / s) > tw || Math.ceil(height / s) > th; ) factors.push((s *= 2));
  return factors;
}

/** The size of the full image at scale factor s: ceil(W/s) × ceil(H/s), as for tiles. */
export const scaledSize = (width: number, height: number, s: number): Size => ({ w: Math.ceil(width / s), h: Math.ceil(height / s) });

/** info.json `sizes` implied by the scale factors, smallest first (§5.3). */
export const sizesFor = (width: number, height: number, scaleFactors: readonly number[]) =>
  [...scaleFactors]
    .sort((a, b) => b - a)
    .map((s) => scaledSize(width, height, s))
    .map(({ w, h }) => ({ width: w, height: h }));

/**
 * Every tile at every scale factor. Region x = n·tw·s, w = min(tw·s, W − x) (likewise y, h);
 * size w = ceil(w_region / s). A tile covering the whole image has region `full` (the canonical
 * form, §4.8, and what sharp writes). Sizes stay w,h as sharp writes them, even where §4.8's
 * canonical size is `max` (every full-resolution tile): the image route must accept both.
 */
export function tileGrid(
  width: number,
  height: number,
  tile: number | TileSize,
  scaleFactors: readonly number[],
  format = "jpg",
): Tile[] {
  const { tw, th } = tileDims(tile);
  checkPositive(width, height, tw, th, ...scaleFactors);
  const tiles: Tile[] = [];
  for (const s of scaleFactors) {
    const step = { x: tw * s, y: th * s };
    for (let row = 0, y = 0; y < height; row++, y += step.y) {
      for (let col = 0, x = 0; x < width; col++, x += step.x) {
        const region = { x, y, w: Math.min(step.x, width - x), h: Math.min(step.y, height - y) };
        const size = { w: Math.ceil(region.w / s), h: Math.ceil(region.h / s) };
        const whole = region.w === width && region.h === height;
        const r = whole ? "full" : `${x},${y},${region.w},${region.h}`;
        tiles.push({ scaleFactor: s, col, row, region, size, path: `${r}/${size.w},${size.h}/0/default.${format}` });
      }
    }
  }
  return tiles;
}

/** The tile's URL under an image service base URI (the info.json `id`, no trailing slash). */
export const tileUrl = (base: string, tile: Pick<Tile, "path">) => `${base.replace(/\/+$/, "")}/${tile.path}`;
