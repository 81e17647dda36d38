// Region links: IIIF Image API 3.0 URLs for crops (§4.1, §4.2) and W3C Media Fragments URI 1.0
// (basic), §4.2.2 Spatial Dimension (`xywh=`, units pixel and percent; section number and
// grammar from memory), the value a Web Annotation FragmentSelector carries (CHECKS.md:
// `xywh=100,200,300,400`).
import { readFileSync, readdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { fragmentToRegion, parseImageRequest, regionToFragment, regionUrl, splitImagePath } from "@/lib/iiif";

const base = "https://example.org/iiif/abc";
const image = { width: 1000, height: 800 };

describe("regionUrl — crops for the light table", () => {
  it("a crop at a common height: …/x,y,w,h/,300/0/default.jpg", () => {
    expect(regionUrl(base + "/", { x: 100, y: 200, w: 300, h: 400 }, { height: 300 })).toBe(`${base}/100,200,300,400/,300/0/default.jpg`);
  });
  it("a crop smaller than the height asks for upscaling with ^ (§4.2: otherwise a 400)", () => {
    expect(regionUrl(base, { x: 0, y: 0, w: 50, h: 100 }, { height: 300 })).toBe(`${base}/0,0,50,100/^,300/0/default.jpg`);
  });
  it("width, confined box, rotation, quality and format", () => {
    const r = { x: 0, y: 0, w: 400, h: 200 };
    expect(regionUrl(base, r)).toBe(`${base}/0,0,400,200/max/0/default.jpg`);
    expect(regionUrl(base, r, { width: 100 })).toBe(`${base}/0,0,400,200/100,/0/default.jpg`);
    expect(regionUrl(base, r, { width: 100, height: 100, rotation: 90, mirror: true, quality: "gray", format: "webp" }))
      .toBe(`${base}/0,0,400,200/!100,100/!90/gray.webp`);
  });
  it("the URL it builds is a valid request of the size asked", () => {
    const url = regionUrl(base, { x: 100, y: 200, w: 300, h: 400 }, { height: 300 });
    const r = parseImageRequest(splitImagePath(url.slice(base.length + 1))!, image);
    expect(r.ok && r.size).toEqual({ w: 225, h: 300 });
  });
  it("refuses regions that are not integers or empty", () => {
    expect(() => regionUrl(base, { x: 0.5, y: 0, w: 10, h: 10 })).toThrow();
    expect(() => regionUrl(base, { x: 0, y: 0, w: 0, h: 10 })).toThrow();
  });
});

describe("fragmentToRegion — Media Fragments URI 1.0 §4.2.2 (from memory)", () => {
  it("xywh=100,200,300,400 is pixels (the default unit)", () => {
    expect(fragmentToRegion("xywh=100,200,300,400")).toEqual({ x: 100, y: 200, w: 300, h: 400 });
  });
  it("xywh=pixel: is the same; a leading # and other dimensions are allowed", () => {
    expect(fragmentToRegion("#xywh=pixel:100,200,300,400")).toEqual({ x: 100, y: 200, w: 300, h: 400 });
    expect(fragmentToRegion("t=10&xywh=100,200,300,400")).toEqual({ x: 100, y: 200, w: 300, h: 400 });
  });
  it("xywh=percent: is relative to the image's size", () => {
    expect(fragmentToRegion("xywh=percent:25,25,50,50", image)).toEqual({ x: 250, y: 200, w: 500, h: 400 });
    // Edges are rounded, not the width: 12.5 % → 125 px, 22.55 % → 226 px, so w = 101.
    expect(fragmentToRegion("xywh=percent:12.5,10,10.05,5", image)).toEqual({ x: 125, y: 80, w: 101, h: 40 });
    expect(() => fragmentToRegion("xywh=percent:25,25,50,50")).toThrow();
  });
  it("with the image's size, a region partly outside is clipped and one wholly outside is null", () => {
    expect(fragmentToRegion("xywh=900,700,300,300", image)).toEqual({ x: 900, y: 700, w: 100, h: 100 });
    expect(fragmentToRegion("xywh=1000,0,10,10", image)).toBeNull();
  });
  it("malformed or empty fragments are null", () => {
    for (const f of ["xywh=1,2,3", "xywh=-1,2,3,4", "xywh=1.5,2,3,4", "xywh=inch:1,2,3,4", "xywh=1,2,0,4", "t=10", "", "xywh=a,b,c,d"]) {
      expect(fragmentToRegion(f, image), f).toBeNull();
    }
  });
});

describe("regionToFragment", () => {
  it("writes pixels without a unit, as the Web Annotation examples do (CHECKS.md)", () => {
    expect(regionToFragment({ x: 100, y: 200, w: 300, h: 400 })).toBe("xywh=100,200,300,400");
  });
  it("writes percent of the image's size and reads back to the same region", () => {
    const r = { x: 125, y: 80, w: 333, h: 41 };
    const f = regionToFragment(r, { unit: "percent", image });
    expect(f).toBe("xywh=percent:12.5,10,33.3,5.125");
    expect(fragmentToRegion(f, image)).toEqual(r);
  });
});

// lib/iiif runs in the browser too: only its own files, no sharp, no node:, no server-only.
describe("lib/iiif stays pure", () => {
  const dir = fileURLToPath(new URL("../../lib/iiif/", import.meta.url));
  // serve.ts is the server glue (storage, sharp, permissions); everything else is arithmetic.
  const files = readdirSync(dir).filter((f) => f.endsWith(".ts") && f !== "serve.ts");
  it.each(files)("%s imports only ./files", (file) => {
    const source = readFileSync(dir + file, "utf8");
    const specifiers = [...source.matchAll(/\bfrom\s+"([^"]+)"|\bimport\s+"([^"]+)"/g)].map((m) => m[1] ?? m[2]);
    for (const s of specifiers) expect(s.startsWith("./"), `${file} imports ${s}`).toBe(true);
  });
});
