// The arithmetic of the light table's shared view: one zoom and one relative offset applied to every
// crop, and how large a crop to ask the IIIF service for. Pure: the client table and the tests use it.
import type { Box } from "@/lib/regions/types";

export const MIN_ZOOM = 1;
export const MAX_ZOOM = 8;
export const ZOOM_STEP = 1.5;
/** One arrow-key press pans by this share of the visible window. */
export const PAN_STEP = 0.1;

/**
 * Crops are fetched at twice their height on screen, so they stay sharp on high-density screens and
 * at the first zoom steps; deeper zoom asks for more (4×, 8×), never past the region's own pixels once
 * the base is reached (the browser enlarges as well as the service would), and never past this area,
 * which keeps each render well inside the service's maxArea.
 */
export const CROP_MAX_AREA = 16_000_000;

/**
 * Where every crop is looking: `zoom` ≥ 1, and the top-left corner of the visible window as a share of
 * the crop's width and height (0 … 1 − 1/zoom). Shares rather than pixels, so that crops of different
 * widths show the same part of themselves.
 */
export type SharedView = { zoom: number; x: number; y: number };

export const WHOLE_VIEW: SharedView = { zoom: 1, x: 0, y: 0 };

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));
const round = (v: number) => Math.round(v * 1e6) / 1e6;

/** Keeps the window inside the crop: no empty margin at any zoom. */
export function clampView(view: SharedView): SharedView {
  const zoom = clamp(Number.isFinite(view.zoom) ? view.zoom : 1, MIN_ZOOM, MAX_ZOOM);
  const room = 1 - 1 / zoom;
  return { zoom: round(zoom), x: round(clamp(view.x, 0, room)), y: round(clamp(view.y, 0, room)) };
}

/** A new zoom that keeps the centre of the visible window where it was. */
export function zoomTo(view: SharedView, zoom: number): SharedView {
  const next = clamp(zoom, MIN_ZOOM, MAX_ZOOM);
  const cx = view.x + 0.5 / view.zoom;
  const cy = view.y + 0.5 / view.zoom;
  return clampView({ zoom: next, x: cx - 0.5 / next, y: cy - 0.5 / next });
}

export const zoomIn = (view: SharedView) => zoomTo(view, view.zoom * ZOOM_STEP);
export const zoomOut = (view: SharedView) => zoomTo(view, view.zoom / ZOOM_STEP);

/** Moves the window by shares of the crop (dx = 0.1: a tenth of the crop's width to the right). */
export function panBy(view: SharedView, dx: number, dy: number): SharedView {
  return clampView({ zoom: view.zoom, x: view.x + dx, y: view.y + dy });
}

/** A drag of (dx, dy) screen pixels over a crop of width × height on screen: the picture follows the pointer. */
export function dragBy(view: SharedView, dx: number, dy: number, width: number, height: number): SharedView {
  if (width <= 0 || height <= 0) return view;
  return panBy(view, -dx / (width * view.zoom), -dy / (height * view.zoom));
}

/** The one CSS transform every crop gets (percentages are of the crop itself, with transform-origin 0 0). */
export function viewTransform(view: SharedView): string {
  const { zoom, x, y } = clampView(view);
  return `translate(${round(-x * zoom * 100)}%, ${round(-y * zoom * 100)}%) scale(${zoom})`;
}

/** A crop's width on screen at the common height, keeping the region's proportions. */
export function cropWidth(box: Pick<Box, "w" | "h">, height: number): number {
  return Math.max(1, Math.round((height * box.w) / box.h));
}

/** The height to ask the IIIF service for, for a crop shown `height` pixels high at this zoom. */
export function cropRequestHeight(box: Pick<Box, "w" | "h">, height: number, zoom: number): number {
  const tier = zoom > 4 ? 8 : zoom > 2 ? 4 : 2;
  const base = 2 * height;
  const wanted = Math.max(base, Math.min(tier * height, box.h));
  const areaCap = Math.floor(Math.sqrt((CROP_MAX_AREA * box.h) / box.w));
  return Math.max(1, Math.min(wanted, areaCap));
}
