// Regions as IIIF URLs and as W3C Media Fragments (Media Fragments URI 1.0 (basic), W3C
// Recommendation 2012, §4.2.2 Spatial Dimension — section number and grammar from memory):
// `xywh=x,y,w,h`, `xywh=pixel:x,y,w,h` (the same) and `xywh=percent:x,y,w,h` (of the image's size).
// The Web Annotation FragmentSelector uses the same value. Pure.
import { formatNumber, pctSpan, type ImageSize, type Region } from "./request";

export interface RegionUrlOptions {
  /** Output height (the light table sets crops side by side at one height). */
  height?: number;
  /** Output width; with height as well, the crop is confined to width×height (!w,h). */
  width?: number;
  rotation?: number;
  mirror?: boolean;
  quality?: string;
  format?: string;
}

/**
 * An IIIF image request for a crop, e.g. `…/x,y,w,h/,300/0/default.jpg`. When the asked size is
 * larger than the region the size gets `^` (IIIF 3.0 §4.2: upscaling without it is a 400), so the
 * service must declare sizeUpscaling for small crops to reach the common height.
 */
export function regionUrl(base: string, region: Region, opts: RegionUrlOptions = {}): string {
  const { x, y, w, h } = region;
  if (![x, y, w, h].every(Number.isInteger) || x < 0 || y < 0 || w < 1 || h < 1) {
    throw new Error(`region ${x},${y},${w},${h} is not four non-negative integers with a positive size`);
  }
  let size = "max";
  if (opts.width && opts.height) {
    size = `${Math.min(opts.width / w, opts.height / h) > 1 ? "^" : ""}!${opts.width},${opts.height}`;
  } else if (opts.height) size = `${opts.height > h ? "^" : ""},${opts.height}`;
  else if (opts.width) size = `${opts.width > w ? "^" : ""}${opts.width},`;
  const rotation = `${opts.mirror ? "!" : ""}${formatNumber(opts.rotation ?? 0)}`;
  const tail = `${x},${y},${w},${h}/${size}/${rotation}/${opts.quality ?? "default"}.${opts.format ?? "jpg"}`;
  return `${base.replace(/\/+$/, "")}/${tail}`;
}

const PIXEL = /^\d+$/;
const PERCENT = /^\d+(?:\.\d+)?$/;

/**
 * `xywh=…` (optionally with a leading `#`, or inside a longer fragment such as `t=1&xywh=…`) to a
 * region in image pixels. Percent needs the image's size; pixel values must be integers. A region
 * partly outside the image is clipped to it; one with zero width or height, or wholly outside, is
 * null, as is anything that is not an xywh fragment.
 */
export function fragmentToRegion(fragment: string, image?: ImageSize): Region | null {
  const pair = fragment.replace(/^#/, "").split("&").find((p) => p.startsWith("xywh="));
  if (!pair) return null;
  const m = /^xywh=(?:(pixel|percent):)?([^,]+),([^,]+),([^,]+),([^,]+)$/.exec(pair);
  if (!m) return null;
  const percent = m[1] === "percent";
  const raw = m.slice(2, 6);
  if (!raw.every((v) => (percent ? PERCENT : PIXEL).test(v))) return null;
  const [a, b, c, d] = raw.map(Number);
  let r: Region;
  if (percent) {
    if (!image) throw new Error("a percent fragment needs the image's width and height");
    const [x, w] = pctSpan(a, c, image.width);
    const [y, h] = pctSpan(b, d, image.height);
    r = { x, y, w, h };
  } else r = { x: a, y: b, w: c, h: d };
  if (r.w === 0 || r.h === 0) return null;
  if (!image) return r;
  if (r.x >= image.width || r.y >= image.height) return null;
  return { x: r.x, y: r.y, w: Math.min(r.w, image.width - r.x), h: Math.min(r.h, image.height - r.y) };
}

/**
 * A region as `xywh=x,y,w,h` (pixels, the default unit, as Web Annotation examples write it) or
 * `xywh=percent:…` of the image's size, to at most 4 decimals.
 */
export function regionToFragment(region: Region, opts: { unit?: "pixel" | "percent"; image?: ImageSize } = {}): string {
  const { x, y, w, h } = region;
  if (opts.unit !== "percent") return `xywh=${x},${y},${w},${h}`;
  if (!opts.image) throw new Error("a percent fragment needs the image's width and height");
  const { width: W, height: H } = opts.image;
  const pct = (v: number, total: number) => formatNumber(Math.round((v / total) * 100 * 1e4) / 1e4);
  return `xywh=percent:${pct(x, W)},${pct(y, H)},${pct(w, W)},${pct(h, H)}`;
}
