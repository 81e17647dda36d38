// info.json: IIIF Image API 3.0, §5 Image Information, §6 Compliance Level; the level tables of
// the Compliance document (iiif.io/api/image/3.0/compliance, §3 and §4), read from the stored copy
// of the specification's source, and the required keys listed in shared/CHECKS.md.
import { describe, expect, it } from "vitest";
import { IMPLEMENTED, LEVELS, complianceOf, infoJson, scaleFactorsFor, sizesFor, type Capabilities } from "@/lib/iiif";

const base = {
  id: "https://example.org/iiif/abc",
  width: 6000,
  height: 4000,
  tileWidth: 512,
  scaleFactors: scaleFactorsFor(6000, 4000, 512),
};
const HTTP = ["baseUriRedirect", "cors", "jsonldMediaType"] as const;

describe("info.json required properties — §5.2 (CHECKS.md)", () => {
  const info = infoJson(base);
  it("has @context first, id, type, protocol, profile, width and height", () => {
    expect(Object.keys(info)[0]).toBe("@context");
    expect(info).toMatchObject({
      "@context": "http://iiif.io/api/image/3/context.json",
      id: "https://example.org/iiif/abc",
      type: "ImageService3",
      protocol: "http://iiif.io/api/image",
      width: 6000,
      height: 4000,
    });
    expect(["level0", "level1", "level2"]).toContain(info.profile);
  });
  it("declares the tiles (§5.4 example: width 512, scale factors 1…16; height omitted when square)", () => {
    expect(info.tiles).toEqual([{ width: 512, scaleFactors: [1, 2, 4, 8, 16] }]);
    expect(infoJson({ ...base, tileHeight: 256 }).tiles[0]).toEqual({ width: 512, height: 256, scaleFactors: [1, 2, 4, 8, 16] });
  });
  it("passes sizes, limits and rights through", () => {
    const sizes = sizesFor(6000, 4000, [8, 16]);
    const full = infoJson({ ...base, sizes, maxWidth: 3000, maxHeight: 2000, maxArea: 4_000_000, rights: "http://rightsstatements.org/vocab/InC-EDU/1.0/" });
    expect(full).toMatchObject({ sizes, maxWidth: 3000, maxHeight: 2000, maxArea: 4_000_000, rights: "http://rightsstatements.org/vocab/InC-EDU/1.0/" });
  });
  it("refuses what §5.2 forbids: a trailing slash, maxHeight without maxWidth, sizes or tiles over the limits", () => {
    expect(() => infoJson({ ...base, id: "https://example.org/iiif/abc/" })).toThrow();
    expect(() => infoJson({ ...base, maxHeight: 2000 })).toThrow();
    expect(() => infoJson({ ...base, maxWidth: 400 })).toThrow(); // 512-wide tiles
    expect(() => infoJson({ ...base, maxWidth: 3000, sizes: [{ width: 6000, height: 4000 }] })).toThrow();
  });
});

describe("compliance level — Compliance §3, §4 and §6 (the highest level fully met)", () => {
  it("without the route's HTTP features the honest profile is level0, everything else listed", () => {
    const info = infoJson(base);
    expect(info.profile).toBe("level0");
    expect(info.extraFeatures).toEqual(expect.arrayContaining(["regionByPx", "regionSquare", "sizeByW", "sizeByWh", "rotationBy90s", "mirroring"]));
    expect(info.extraFormats).toEqual(["png", "webp"]);
  });
  it("with CORS, the JSON-LD media type and the base-URI redirect, what we implement is level2", () => {
    const info = infoJson({ ...base, extraFeatures: [...HTTP] });
    expect(info.profile).toBe("level2");
    // Beyond level 2: mirroring (optional at every level); sizeUpscaling is dropped without limits.
    expect(info.extraFeatures).toEqual(["mirroring"]);
    expect(info.extraFormats).toEqual(["webp"]); // png is required by level 2
    expect(info.extraQualities).toEqual(["color", "gray"]); // §4.4: listed at any level
  });
  it("sizeUpscaling is claimed only with maxWidth or maxArea (§5.7)", () => {
    expect(infoJson({ ...base, extraFeatures: [...HTTP], maxWidth: 8000 }).extraFeatures).toEqual(["mirroring", "sizeUpscaling"]);
    expect(infoJson({ ...base, extraFeatures: [...HTTP], maxArea: 30_000_000 }).extraFeatures).toContain("sizeUpscaling");
  });
  it("without percentage regions it falls back to level1 and lists the rest", () => {
    const caps: Capabilities = { ...IMPLEMENTED, features: IMPLEMENTED.features.filter((f) => f !== "regionByPct") };
    const info = infoJson({ ...base, extraFeatures: [...HTTP], implemented: caps });
    expect(info.profile).toBe("level1");
    expect(info.extraFeatures).toEqual(["mirroring", "rotationBy90s", "sizeByConfinedWh", "sizeByPct"]);
    expect(info.extraFormats).toEqual(["png", "webp"]);
  });
  it("a static pyramid as sharp writes it (tiles only, jpg) is level0, as sharp's own info.json says", () => {
    expect(complianceOf({ features: [], qualities: ["default"], formats: ["jpg"] }).profile).toBe("level0");
  });
  it("level tables: level 2 requires level 1 plus pct regions and sizes, !w,h, rotation by 90s, color, gray and png", () => {
    expect(LEVELS.level1.features).toEqual(["regionByPx", "regionSquare", "sizeByW", "sizeByH", "sizeByWh", ...HTTP]);
    expect(LEVELS.level2.features.filter((f) => !LEVELS.level1.features.includes(f))).toEqual([
      "regionByPct", "sizeByPct", "sizeByConfinedWh", "rotationBy90s",
    ]);
    expect(LEVELS.level2.qualities).toEqual(["default", "color", "gray"]);
    expect(LEVELS.level2.formats).toEqual(["jpg", "png"]);
  });
});
