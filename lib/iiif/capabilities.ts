// What an IIIF Image API 3.0 service can do, and which compliance level that adds up to.
// Feature names: IIIF Image API 3.0, §5.7 Extra Functionality (features table).
// Level tables: IIIF Image API 3.0 Compliance, §3 Image Parameters and §4 HTTP Features
// (read from the stored copy of IIIF/api source/image/3.0/compliance.md, not from memory).
// Pure: no I/O, no sharp, so the viewer can use it in the browser too.

export const FEATURES = [
  "baseUriRedirect", "canonicalLinkHeader", "cors", "jsonldMediaType", "mirroring", "profileLinkHeader",
  "regionByPct", "regionByPx", "regionSquare", "rotationArbitrary", "rotationBy90s",
  "sizeByConfinedWh", "sizeByH", "sizeByPct", "sizeByW", "sizeByWh", "sizeUpscaling",
] as const;
export type Feature = (typeof FEATURES)[number];

export const QUALITIES = ["default", "color", "gray", "bitonal"] as const;
export type Quality = (typeof QUALITIES)[number];

/** §4.5 Format: every extension the specification names. */
export const FORMATS = ["jpg", "tif", "png", "gif", "jp2", "pdf", "webp"] as const;
export type Format = (typeof FORMATS)[number];

export type Level = "level0" | "level1" | "level2";

export interface Capabilities {
  features: readonly Feature[];
  qualities: readonly Quality[];
  formats: readonly Format[];
}

/**
 * What Cordarium's image route implements with sharp: every region and size form, rotation by
 * 90s with mirroring, qualities default (= color), color and gray, formats jpg, png and webp.
 * Not bitonal, tif, gif, jp2 or pdf; no arbitrary rotation. HTTP features (CORS, the JSON-LD
 * media type, the base-URI redirect) belong to the route and are not claimed here: the route
 * adds them to infoJson's extraFeatures when it provides them.
 * `sizeUpscaling` is only honoured when maxWidth or maxArea is set (§5.7: a server that supports
 * it MUST declare one of them).
 */
export const IMPLEMENTED: Capabilities = {
  features: [
    "regionByPx", "regionByPct", "regionSquare",
    "sizeByW", "sizeByH", "sizeByPct", "sizeByConfinedWh", "sizeByWh", "sizeUpscaling",
    "rotationBy90s", "mirroring",
  ],
  qualities: ["default", "color", "gray"],
  formats: ["jpg", "png", "webp"],
};

/** The server's `default` quality for photographs; `color` is canonicalised to `default`. */
export const DEFAULT_QUALITY: Quality = "color";

// Compliance §3.2 marks sizeByWh at level 1 with the "required" icon but "optional" alt text;
// we count it as required (we implement it either way).
const LEVEL1: Capabilities = {
  features: ["regionByPx", "regionSquare", "sizeByW", "sizeByH", "sizeByWh", "baseUriRedirect", "cors", "jsonldMediaType"],
  qualities: ["default"],
  formats: ["jpg"],
};
const LEVEL2: Capabilities = {
  features: [...LEVEL1.features, "regionByPct", "sizeByPct", "sizeByConfinedWh", "rotationBy90s"],
  qualities: ["default", "color", "gray"], // color and gray "(if applicable)"
  formats: ["jpg", "png"],
};
export const LEVELS: Record<Level, Capabilities> = {
  level0: { features: [], qualities: ["default"], formats: ["jpg"] },
  level1: LEVEL1,
  level2: LEVEL2,
};

const covers = (have: Capabilities, need: Capabilities) =>
  need.features.every((f) => have.features.includes(f)) &&
  need.qualities.every((q) => have.qualities.includes(q)) &&
  need.formats.every((f) => have.formats.includes(f));

/**
 * The highest level whose every requirement is met (§6: the profile SHOULD be the highest level
 * for which all requirements are met), and what must be listed on top of it (§5.7: a client MUST
 * assume that a feature in neither the profile nor extraFeatures is unsupported).
 */
export function complianceOf(have: Capabilities): {
  profile: Level;
  extraFeatures: Feature[];
  extraQualities: Quality[];
  extraFormats: Format[];
} {
  const profile: Level = covers(have, LEVEL2) ? "level2" : covers(have, LEVEL1) ? "level1" : "level0";
  const base = LEVELS[profile];
  return {
    profile,
    extraFeatures: FEATURES.filter((f) => have.features.includes(f) && !base.features.includes(f)),
    // §4.4: qualities beyond `default` MUST be listed in extraQualities at any level.
    extraQualities: QUALITIES.filter((q) => q !== "default" && have.qualities.includes(q)),
    extraFormats: FORMATS.filter((f) => have.formats.includes(f) && !base.formats.includes(f)),
  };
}

export const isQuality = (s: string): s is Quality => (QUALITIES as readonly string[]).includes(s);
export const isFormat = (s: string): s is Format => (FORMATS as readonly string[]).includes(s);
