// IIIF Image API 3.0 image-request arithmetic: {region}/{size}/{rotation}/{quality}.{format} read
// against one image's size and the server's limits. Sections cited are of iiif.io/api/image/3.0
// (read from the stored copy of IIIF/api source/image/3.0/index.md and implementation.md).
// Pure: no I/O, no sharp — the viewer can build and check requests in the browser.
import {
  DEFAULT_QUALITY, IMPLEMENTED, isFormat, isQuality,
  type Capabilities, type Feature, type Format, type Quality,
} from "./capabilities";
import { fitToLimits, type Limits, type Size } from "./limits";

export interface Region { x: number; y: number; w: number; h: number }
export interface ImageSize { width: number; height: number }
export interface ImageRequestPath { region: string; size: string; rotation: string; quality: string; format: string }
export type { Limits, Size };

export interface ImageRequest {
  ok: true;
  /** In full-image pixels, cropped at the image edge (§4.1). */
  region: Region;
  /** Output size before rotation (§4.2); rotation by 90 or 270 swaps it. */
  size: Size;
  rotation: { degrees: number; mirror: boolean };
  quality: Quality;
  format: Format;
  /** True when the size is larger than the region (a `^` request the server honours). */
  upscaled: boolean;
  /** §4.8 canonical form: region/size/rotation/quality.format */
  canonical: string;
}
export interface ImageRequestError { ok: false; status: 400 | 404 | 501; message: string }
export type ImageRequestResult = ImageRequest | ImageRequestError;

type Step<T> = { ok: true; value: T; canonical: string } | ImageRequestError;

const bad = (message: string): ImageRequestError => ({ ok: false, status: 400, message });
// §7.3: 501 "a valid IIIF request that is not implemented".
const notImplemented = (message: string): ImageRequestError => ({ ok: false, status: 501, message });

// §4: pixel values are non-negative integers; §4.7: floats are only digits and "."
// (a leading 0 is a SHOULD, so ".5" is accepted).
const INT = /^\d+$/;
const FLOAT = /^(?:\d+(?:\.\d*)?|\.\d+)$/;
const int = (s: string) => (INT.test(s) ? Number(s) : NaN);
const float = (s: string) => (FLOAT.test(s) ? Number(s) : NaN);

/** §4.7: an integer where possible, otherwise no exponent and no trailing zeros. */
export function formatNumber(n: number): string {
  return Number.isInteger(n) ? String(n) : n.toFixed(10).replace(/0+$/, "").replace(/\.$/, "");
}

/**
 * Percentages to pixels: both edges rounded to the nearest pixel, so that regions sharing an edge
 * in percent share it in pixels. §4.7 leaves the rounding to the implementation; rounding is what
 * makes the §4.1 example pct:41.6,7.5,40,70 of a 300×200 image equal 125,15,120,140.
 */
export function pctSpan(start: number, length: number, total: number): [number, number] {
  const a = Math.round((start * total) / 100);
  return [a, Math.round(((start + length) * total) / 100) - a];
}

function region(spec: string, image: ImageSize, caps: Capabilities): Step<Region> {
  const { width: W, height: H } = image;
  const has = (f: Feature) => caps.features.includes(f);
  let r: Region;
  if (spec === "full") r = { x: 0, y: 0, w: W, h: H };
  else if (spec === "square") {
    if (!has("regionSquare")) return notImplemented("square regions are not supported");
    const side = Math.min(W, H); // §4.1: centred is "a reasonable default"
    r = { x: Math.floor((W - side) / 2), y: Math.floor((H - side) / 2), w: side, h: side };
  } else if (spec.startsWith("pct:")) {
    const v = spec.slice(4).split(",").map(float);
    if (v.length !== 4 || v.some(Number.isNaN)) return bad(`region "${spec}" is not pct:x,y,w,h`);
    if (!has("regionByPct")) return notImplemented("percentage regions are not supported");
    const [x, w] = pctSpan(v[0], v[2], W);
    const [y, h] = pctSpan(v[1], v[3], H);
    r = { x, y, w, h };
  } else {
    const v = spec.split(",").map(int);
    if (v.length !== 4 || v.some(Number.isNaN)) return bad(`region "${spec}" is not full, square, x,y,w,h or pct:x,y,w,h`);
    if (!has("regionByPx")) return notImplemented("pixel regions are not supported");
    r = { x: v[0], y: v[1], w: v[2], h: v[3] };
  }
  // §4.1: zero width or height, or entirely outside → 400; partly outside → cropped at the edge.
  if (r.w === 0 || r.h === 0) return bad(`region "${spec}" has zero width or height`);
  if (r.x >= W || r.y >= H) return bad(`region "${spec}" lies outside the ${W}×${H} image`);
  r = { x: r.x, y: r.y, w: Math.min(r.w, W - r.x), h: Math.min(r.h, H - r.y) };
  const full = r.x === 0 && r.y === 0 && r.w === W && r.h === H;
  return { ok: true, value: r, canonical: full ? "full" : `${r.x},${r.y},${r.w},${r.h}` };
}

function size(spec: string, r: Region, limits: Limits, caps: Capabilities): Step<Size> {
  const up = spec.startsWith("^");
  const body = up ? spec.slice(1) : spec;
  const has = (f: Feature) => caps.features.includes(f);
  // §5.7: a server that upscales MUST declare maxWidth or maxArea; without them we do not.
  const canUpscale = has("sizeUpscaling") && Boolean(limits.maxWidth || limits.maxArea);
  const ratio = r.w / r.h;
  let s: Size;
  let explicit = true; // explicit sizes over the limits are errors; max and !w,h are fitted to them
  let m: RegExpExecArray | null;
  if (body === "max") {
    s = fitToLimits(r.w, r.h, limits, up && canUpscale);
    explicit = false;
  } else if (body.startsWith("pct:")) {
    const n = float(body.slice(4));
    if (Number.isNaN(n)) return bad(`size "${spec}" is not pct:n`);
    if (!has("sizeByPct")) return notImplemented("percentage sizes are not supported");
    s = { w: Math.round((r.w * n) / 100), h: Math.round((r.h * n) / 100) };
  } else if ((m = /^!(\d+),(\d+)$/.exec(body))) {
    if (!has("sizeByConfinedWh")) return notImplemented("!w,h sizes are not supported");
    const [w, h] = [Number(m[1]), Number(m[2])];
    // §4.2: as large as possible within w×h, the region (unless ^) and the server's limits;
    // a ^ box that needs upscaling on a service without it falls to the 501 below.
    const k = Math.min(w / r.w, h / r.h, up ? Infinity : 1);
    const fitted = { w: Math.min(w, Math.round(r.w * k)), h: Math.min(h, Math.round(r.h * k)) };
    s = fitToLimits(fitted.w, fitted.h, limits, false);
    explicit = false;
  } else if ((m = /^(\d*),(\d*)$/.exec(body)) && (m[1] || m[2])) {
    const [w, h] = [m[1] ? Number(m[1]) : NaN, m[2] ? Number(m[2]) : NaN];
    const feature: Feature = m[1] && m[2] ? "sizeByWh" : m[1] ? "sizeByW" : "sizeByH";
    if (!has(feature)) return notImplemented(`${feature} sizes are not supported`);
    // Aspect kept as closely as possible (§4.2): the missing side is rounded to the nearest pixel.
    s = feature === "sizeByWh" ? { w, h } : feature === "sizeByW" ? { w, h: Math.round(w / ratio) } : { w: Math.round(h * ratio), h };
  } else {
    return bad(`size "${spec}" is not max, w,, ,h, pct:n, w,h or !w,h (optionally with ^)`);
  }
  // §4.2: never below 1 pixel; no upscaling without ^ (400); ^ upscaling unsupported → 501.
  if (s.w < 1 || s.h < 1) return bad(`size "${spec}" of region ${r.w}×${r.h} gives an empty image`);
  const upscaled = s.w > r.w || s.h > r.h;
  if (upscaled && !up) return bad(`size "${spec}" is larger than the ${r.w}×${r.h} region; prefix it with ^ to upscale`);
  if (upscaled && !canUpscale) return notImplemented("upscaling is not supported by this image service");
  // §4.2: "greater than the server-imposed limits … SHOULD result in a 400" (§7.3's table
  // mentions 404 for this too; the size section is the more specific rule).
  if (explicit && exceeds(s, limits)) return bad(`size ${s.w}×${s.h} exceeds this image service's limits`);
  return { ok: true, value: s, canonical: canonicalSize(s, r, limits, canUpscale) };
}

function exceeds(s: Size, limits: Limits): boolean {
  const maxH = limits.maxHeight ?? limits.maxWidth; // §5.2: maxHeight defaults to maxWidth
  return Boolean((limits.maxWidth && s.w > limits.maxWidth) || (maxH && s.h > maxH) || (limits.maxArea && s.w * s.h > limits.maxArea));
}

// §4.8: max if it is the maximum size without upscaling, ^max if the maximum upscaled size,
// otherwise w,h, prefixed with ^ if it needs upscaling.
function canonicalSize(s: Size, r: Region, limits: Limits, canUpscale: boolean): string {
  const same = (t: Size) => t.w === s.w && t.h === s.h;
  const upscaled = s.w > r.w || s.h > r.h;
  if (same(fitToLimits(r.w, r.h, limits, false))) return "max";
  if (upscaled && canUpscale && same(fitToLimits(r.w, r.h, limits, true))) return "^max";
  return `${upscaled ? "^" : ""}${s.w},${s.h}`;
}

function rotation(spec: string, caps: Capabilities): Step<{ degrees: number; mirror: boolean }> {
  const mirror = spec.startsWith("!");
  const degrees = float(mirror ? spec.slice(1) : spec);
  if (Number.isNaN(degrees) || degrees > 360) return bad(`rotation "${spec}" is not n or !n with n from 0 to 360`);
  // §4.3: "A rotation value that is out of range or unsupported SHOULD result in a 400" — the
  // rotation section says 400 here, not 501.
  const by90 = degrees % 90 === 0;
  if (!by90 && !caps.features.includes("rotationArbitrary")) return bad(`rotation "${spec}": only multiples of 90 are supported`);
  if (by90 && degrees % 360 !== 0 && !caps.features.includes("rotationBy90s")) return bad(`rotation "${spec}" is not supported`);
  if (mirror && !caps.features.includes("mirroring")) return bad(`mirroring ("${spec}") is not supported`);
  const value = { degrees: degrees % 360, mirror }; // 360 draws the same image as 0
  return { ok: true, value, canonical: `${mirror ? "!" : ""}${formatNumber(value.degrees)}` };
}

export function parseImageRequest(
  path: ImageRequestPath,
  image: ImageSize,
  limits: Limits = {},
  caps: Capabilities = IMPLEMENTED,
): ImageRequestResult {
  if (!(Number.isInteger(image.width) && Number.isInteger(image.height) && image.width > 0 && image.height > 0)) {
    throw new Error(`image size ${image.width}×${image.height} is not two positive integers`);
  }
  const r = region(path.region, image, caps);
  if (!r.ok) return r;
  const s = size(path.size, r.value, limits, caps);
  if (!s.ok) return s;
  const rot = rotation(path.rotation, caps);
  if (!rot.ok) return rot;
  // §4.4 and §4.5: an unsupported quality or format SHOULD be a 400.
  if (!isQuality(path.quality) || !caps.qualities.includes(path.quality)) return bad(`quality "${path.quality}" is not supported`);
  if (!isFormat(path.format) || !caps.formats.includes(path.format)) return bad(`format "${path.format}" is not supported`);
  // §4.8: `default` if the server's default quality is requested; ours is color.
  const quality = path.quality === DEFAULT_QUALITY ? "default" : path.quality;
  return {
    ok: true,
    region: r.value,
    size: s.value,
    rotation: rot.value,
    quality: path.quality,
    format: path.format,
    upscaled: s.value.w > r.value.w || s.value.h > r.value.h,
    canonical: `${r.canonical}/${s.canonical}/${rot.canonical}/${quality}.${path.format}`,
  };
}

/** Splits "region/size/rotation/quality.format" (the part after the identifier) into its parameters. */
export function splitImagePath(path: string): ImageRequestPath | null {
  const m = /^([^/]+)\/([^/]+)\/([^/]+)\/([^/.]+)\.([^/.]+)$/.exec(path.replace(/^\/+/, ""));
  return m ? { region: m[1], size: m[2], rotation: m[3], quality: m[4], format: m[5] } : null;
}
