import "server-only";
import { mkdtemp, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { Readable } from "node:stream";
import sharp from "sharp";
import type { Actor } from "@/lib/auth/policy";
import { appUrl, config } from "@/lib/config";
import { NotFoundError } from "@/lib/errors";
import { cacheKey, originalKey, previewKey, tilesPrefix } from "@/lib/images/keys";
import { getImageForViewer } from "@/lib/images/queries";
import { downloadTo, getObject, putObject } from "@/lib/storage/objects";
import { iiifRightsUri } from "@/lib/exports/context";
import { infoJson, type InfoJson } from "./info";
import { parseImageRequest, type ImageRequest, type ImageRequestPath } from "./request";
import { scaleFactorsFor, sizesFor } from "./tiles";

// The server side of the IIIF Image API: pre-generated tiles served as they are, every other request
// computed with sharp once and kept in object storage under its canonical path.
export const TILE_SIZE = 512;
export const LIMITS = { maxArea: 40_000_000 };
const ROUTE_FEATURES = ["cors", "jsonldMediaType", "baseUriRedirect"] as const;
export const INFO_CONTENT_TYPE = 'application/ld+json;profile="http://iiif.io/api/image/3/context.json"';
const MIME = { jpg: "image/jpeg", png: "image/png", webp: "image/webp" } as Record<string, string>;
const PREVIEW = 1600;

export const serviceId = (imageId: number) => `${appUrl()}/iiif/3/${imageId}`;

async function readyImage(actor: Actor | null, imageId: number) {
  const image = await getImageForViewer(actor, imageId);
  if (image.state !== "ready" || !image.width || !image.height) throw new NotFoundError("image (it is not processed yet)");
  return image;
}

export async function imageInfo(actor: Actor | null, imageId: number): Promise<{ info: InfoJson; published: boolean }> {
  const image = await readyImage(actor, imageId);
  const scaleFactors = scaleFactorsFor(image.width!, image.height!, TILE_SIZE);
  const info = infoJson({
    id: serviceId(imageId),
    width: image.width!,
    height: image.height!,
    tileWidth: TILE_SIZE,
    scaleFactors,
    sizes: sizesFor(image.width!, image.height!, scaleFactors).filter((s) => s.width * s.height <= LIMITS.maxArea),
    extraFeatures: [...ROUTE_FEATURES],
    ...LIMITS,
    // IIIF asks for the http form of Creative Commons and RightsStatements.org URIs.
    rights: iiifRightsUri(image.rightsUri) ?? undefined,
  });
  return { info, published: image.source.state === "published" };
}

export type ImageAnswer = { body: ReadableStream | Buffer; contentType: string; published: boolean } | { error: { status: number; message: string } };

const toWeb = (body: Readable) => Readable.toWeb(body) as unknown as ReadableStream;

/** The pre-generated tile for this request, if sharp wrote one (its paths use explicit sizes). */
async function pregenerated(storageKey: string, req: ImageRequest, full: { width: number; height: number }) {
  if (req.rotation.degrees !== 0 || req.rotation.mirror || req.format !== "jpg" || (req.quality !== "default" && req.quality !== "color")) return null;
  const { x, y, w, h } = req.region;
  const size = `${req.size.w},${req.size.h}`;
  const whole = x === 0 && y === 0 && w === full.width && h === full.height;
  for (const region of whole ? ["full", `${x},${y},${w},${h}`] : [`${x},${y},${w},${h}`]) {
    const object = await getObject(`${tilesPrefix(storageKey)}${region}/${size}/0/default.jpg`);
    if (object) return object;
  }
  return null;
}

async function render(storageKey: string, req: ImageRequest, full: { width: number; height: number }): Promise<Buffer> {
  const work = await mkdtemp(join(tmpdir(), "cordarium-iiif-"));
  try {
    // Small outputs come from the stored preview (already oriented, sRGB); the rest from the original.
    const scale = Math.min(1, PREVIEW / Math.max(full.width, full.height));
    const fromPreview = req.size.w <= req.region.w * scale && req.size.h <= req.region.h * scale;
    const file = join(work, "in");
    await downloadTo(fromPreview ? previewKey(storageKey) : originalKey(storageKey), file);
    const s = fromPreview ? scale : 1;
    const left = Math.floor(req.region.x * s);
    const top = Math.floor(req.region.y * s);
    const inputW = Math.round(full.width * s);
    const inputH = Math.round(full.height * s);
    const width = Math.max(1, Math.min(inputW - left, Math.round(req.region.w * s)));
    const height = Math.max(1, Math.min(inputH - top, Math.round(req.region.h * s)));
    // Orientation comes before the crop (sharp applies them in call order): regions are in the upright image.
    let pipeline = sharp(file, { limitInputPixels: config().IMAGE_MAX_PIXELS })
      .autoOrient()
      .extract({ left, top, width, height })
      .resize(req.size.w, req.size.h, { fit: "fill" })
      .toColourspace("srgb");
    if (req.rotation.mirror) pipeline = pipeline.flop();
    if (req.rotation.degrees) pipeline = pipeline.rotate(req.rotation.degrees);
    if (req.quality === "gray") pipeline = pipeline.greyscale();
    if (req.format === "png") return await pipeline.png().toBuffer();
    if (req.format === "webp") return await pipeline.webp({ quality: 85 }).toBuffer();
    // Awaited here so that the temporary file outlives the pipeline.
    return await pipeline.jpeg({ quality: 85 }).toBuffer();
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

export async function imageRequest(actor: Actor | null, imageId: number, path: ImageRequestPath): Promise<ImageAnswer> {
  const image = await readyImage(actor, imageId);
  const full = { width: image.width!, height: image.height! };
  const req = parseImageRequest(path, full, LIMITS);
  if (!req.ok) return { error: { status: req.status, message: req.message } };
  const published = image.source.state === "published";
  const contentType = MIME[req.format];
  const tile = await pregenerated(image.storageKey, req, full);
  if (tile) return { body: toWeb(tile.body), contentType, published };
  const cached = await getObject(cacheKey(image.storageKey, req.canonical));
  if (cached) return { body: toWeb(cached.body), contentType, published };
  const rendered = await render(image.storageKey, req, full);
  await putObject(cacheKey(image.storageKey, req.canonical), rendered, contentType);
  return { body: rendered, contentType, published };
}
