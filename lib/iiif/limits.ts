// Server-imposed size limits: IIIF Image API 3.0, §5.2 Technical Properties (maxWidth, maxHeight,
// maxArea) and Implementation Notes §4 "Maximum size calculation". Pure.

export interface Limits { maxWidth?: number; maxHeight?: number; maxArea?: number }
export interface Size { w: number; h: number }

/**
 * The largest size of aspect w:h within the limits, never larger than w×h unless `allowUpscale`
 * (then it grows to meet the limits; with no limits at all it stays w×h). maxHeight defaults to
 * maxWidth (§5.2). The notes leave the algorithm open; like theirs this rounds to the nearest pixel
 * and falls back to rounding down where rounding would step over maxArea.
 */
export function fitToLimits(w: number, h: number, limits: Limits, allowUpscale: boolean): Size {
  const maxW = limits.maxWidth;
  const maxH = limits.maxHeight ?? limits.maxWidth;
  const area = limits.maxArea;
  let k = allowUpscale ? Infinity : 1;
  if (maxW) k = Math.min(k, maxW / w);
  if (maxH) k = Math.min(k, maxH / h);
  if (area) k = Math.min(k, Math.sqrt(area / (w * h)));
  if (!Number.isFinite(k) || k === 1) return { w, h };
  let out = { w: Math.round(w * k), h: Math.round(h * k) };
  if (area && out.w * out.h > area) out = { w: Math.floor(w * k), h: Math.floor(h * k) };
  return { w: maxW ? Math.min(out.w, maxW) : out.w, h: maxH ? Math.min(out.h, maxH) : out.h };
}
