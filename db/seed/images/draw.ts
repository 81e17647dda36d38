// drawScene: the SVG of a scene, and the evidence of what it drew (boxes measured by the pen while
// drawing). renderScene: that SVG through librsvg (sharp) with the medium's grain, as a large JPEG.
import sharp from "sharp";
import { canvasSize, compose } from "./compose";
import { type Box } from "./geom";
import { Pen } from "./pen";
import { geometry } from "./instrument";
import { instrumentCounts } from "./instruments";
import { lookFor } from "./look";
import { grainLayer } from "./finish";
import { Rng } from "./random";
import type { Evidence, Rect, SceneParams } from "./types";

function build(spec: SceneParams): { svg: string; evidence: Evidence } {
  const { width, height } = canvasSize(spec);
  const pen = new Pen(lookFor(spec.medium));
  compose(pen, spec, width, height, new Rng(spec.seed));
  const rect = (name: string): Rect => {
    const b = pen.box(name);
    if (!b) throw new Error(`scene ${spec.slug}: nothing was drawn for ${name}`);
    return toRect(b, width, height);
  };
  const optional = (name: string) => (pen.box(name) ? rect(name) : null);
  const g = geometry(spec.instrument);
  const rh = optional("rightHand"), lh = optional("leftHand");
  const evidence: Evidence = {
    image: { width, height },
    mirrored: spec.mirrored,
    instrument: { ...instrumentCounts(g, spec.instrument), rect: rect("instrument") },
    rose: { kind: spec.instrument.kind === "lute" || spec.instrument.kind === "theorbo" ? "carved-lute" : spec.instrument.rose, rect: rect("rose") },
    bridge: { kind: spec.instrument.bridge, rect: rect("bridge") },
    head: { rect: rect("head"), pegs: instrumentCounts(g, spec.instrument).pegs },
    rightHand: spec.rightHand && rh ? { ...spec.rightHand, rect: rh } : null,
    leftHand: spec.leftHand && lh ? { ...spec.leftHand, rect: lh } : null,
    others: ["viol", "tambourine"].flatMap((k) => (pen.box(`other:${k}`) ? [{ kind: k, rect: rect(`other:${k}`) }] : [])),
  };
  return { svg: pen.svg(width, height), evidence };
}

/** Outward-rounded and clipped to the image. */
function toRect(b: Box, W: number, H: number): Rect {
  const l = Math.max(0, Math.floor(b.x0)), t = Math.max(0, Math.floor(b.y0));
  const r = Math.min(W, Math.ceil(b.x1)), btm = Math.min(H, Math.ceil(b.y1));
  return { x: l, y: t, width: Math.max(0, r - l), height: Math.max(0, btm - t) };
}

export function drawScene(spec: SceneParams): string {
  return build(spec).svg;
}

export function sceneEvidence(spec: SceneParams): Evidence {
  return build(spec).evidence;
}

export async function renderScene(spec: SceneParams, opts: { width?: number; quality?: number } = {}): Promise<{ jpeg: Buffer; width: number; height: number }> {
  const full = canvasSize(spec);
  const width = Math.round(opts.width ?? full.width);
  const height = Math.round((full.height * width) / full.width);
  // librsvg renders SVG user units at 72 dpi as pixels; scale the density for other widths.
  const base = await sharp(Buffer.from(drawScene(spec)), { density: (72 * width) / full.width, limitInputPixels: false })
    .resize(width, height, { fit: "fill" })
    .removeAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  const grain = await grainLayer(width, height, spec.medium, spec.seed);
  const jpeg = await sharp(base.data, { raw: { width, height, channels: 3 } })
    .composite([{ input: grain, raw: { width, height, channels: 3 }, blend: "soft-light" }])
    .toColourspace("srgb")
    .jpeg({ quality: opts.quality ?? 88, chromaSubsampling: "4:4:4" })
    .withIccProfile("srgb")
    .toBuffer();
  return { jpeg, width, height };
}
