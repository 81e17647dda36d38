// The image information document (info.json): IIIF Image API 3.0, §5 Image Information and §6
// Compliance Level. The profile is computed from what the service really implements (see
// capabilities.ts), never asserted. Pure.
import {
  complianceOf, IMPLEMENTED,
  type Capabilities, type Feature, type Format, type Level, type Quality,
} from "./capabilities";

export interface InfoJsonInput {
  /** Base URI of the image service, without a trailing slash (§5.2). */
  id: string;
  width: number;
  height: number;
  tileWidth: number;
  tileHeight?: number;
  scaleFactors: readonly number[];
  sizes?: readonly { width: number; height: number }[];
  /** Features on top of `implemented`, e.g. the route's "cors", "jsonldMediaType", "baseUriRedirect". */
  extraFeatures?: readonly Feature[];
  extraFormats?: readonly Format[];
  extraQualities?: readonly Quality[];
  maxWidth?: number;
  maxHeight?: number;
  maxArea?: number;
  /** A Creative Commons or RightsStatements.org URI (§5.6). */
  rights?: string;
  /** What the image route implements; defaults to IMPLEMENTED. */
  implemented?: Capabilities;
}

export interface InfoJson {
  "@context": "http://iiif.io/api/image/3/context.json";
  id: string;
  type: "ImageService3";
  protocol: "http://iiif.io/api/image";
  profile: Level;
  width: number;
  height: number;
  maxWidth?: number;
  maxHeight?: number;
  maxArea?: number;
  sizes?: { width: number; height: number }[];
  tiles: { width: number; height?: number; scaleFactors: number[] }[];
  rights?: string;
  extraQualities?: Quality[];
  extraFormats?: Format[];
  extraFeatures?: Feature[];
}

const union = <T>(a: readonly T[], b: readonly T[] = []) => [...new Set([...a, ...b])];

export function infoJson(input: InfoJsonInput): InfoJson {
  const { id, width, height, tileWidth, maxWidth, maxHeight, maxArea } = input;
  const tileHeight = input.tileHeight ?? tileWidth;
  if (/\/$/.test(id)) throw new Error("info.json id must not end with a slash (§5.2)");
  if (maxHeight !== undefined && maxWidth === undefined) throw new Error("maxWidth MUST be given with maxHeight (§5.2)");
  const within = (w: number, h: number) =>
    (!maxWidth || w <= maxWidth) && (!(maxHeight ?? maxWidth) || h <= (maxHeight ?? maxWidth)!) && (!maxArea || w * h <= maxArea);
  // §5.2: declared sizes and tiles MUST be within the limits.
  if (!within(tileWidth, tileHeight)) throw new Error(`tiles of ${tileWidth}×${tileHeight} exceed the limits`);
  for (const s of input.sizes ?? []) if (!within(s.width, s.height)) throw new Error(`size ${s.width}×${s.height} exceeds the limits`);

  const implemented = input.implemented ?? IMPLEMENTED;
  let features = union(implemented.features, input.extraFeatures);
  // §5.7: a server that supports sizeUpscaling MUST specify maxWidth or maxArea.
  if (!maxWidth && !maxArea) features = features.filter((f) => f !== "sizeUpscaling");
  const c = complianceOf({
    features,
    qualities: union(implemented.qualities, input.extraQualities),
    formats: union(implemented.formats, input.extraFormats),
  });

  // @context first (§5.2: it SHOULD be the very first key).
  const info: InfoJson = {
    "@context": "http://iiif.io/api/image/3/context.json",
    id,
    type: "ImageService3",
    protocol: "http://iiif.io/api/image",
    profile: c.profile,
    width,
    height,
    ...(maxWidth !== undefined && { maxWidth }),
    ...(maxHeight !== undefined && { maxHeight }),
    ...(maxArea !== undefined && { maxArea }),
    ...(input.sizes !== undefined && input.sizes.length > 0 && { sizes: input.sizes.map((s) => ({ width: s.width, height: s.height })) }),
    tiles: [{ width: tileWidth, ...(tileHeight !== tileWidth && { height: tileHeight }), scaleFactors: [...input.scaleFactors] }],
    ...(input.rights && { rights: input.rights }),
    ...(c.extraQualities.length > 0 && { extraQualities: c.extraQualities }),
    ...(c.extraFormats.length > 0 && { extraFormats: c.extraFormats }),
    ...(c.extraFeatures.length > 0 && { extraFeatures: c.extraFeatures }),
  };
  return info;
}

/** §5.1: the Content-Type for an info.json response without an Accept header. */
export const INFO_JSON_CONTENT_TYPE = 'application/ld+json;profile="http://iiif.io/api/image/3/context.json"';
