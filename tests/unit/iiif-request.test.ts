// IIIF Image API 3.0 image requests (iiif.io/api/image/3.0; section numbers of that text, read
// from the stored copy of the specification's source). The 300×200 examples are the
// specification's own (§4.1, §4.2), as listed in shared/CHECKS.md.
import { describe, expect, it } from "vitest";
import {
  IMPLEMENTED, fitToLimits, parseImageRequest, splitImagePath,
  type ImageRequest, type ImageRequestError, type Limits,
} from "@/lib/iiif";

const image = { width: 300, height: 200 };
const req = (region: string, size = "max", rotation = "0", quality = "default", format = "jpg") =>
  ({ region, size, rotation, quality, format });
function ok(path: ReturnType<typeof req>, limits: Limits = {}, img = image): ImageRequest {
  const r = parseImageRequest(path, img, limits);
  if (!r.ok) throw new Error(`expected ok, got ${r.status} ${r.message}`);
  return r;
}
function fail(path: ReturnType<typeof req>, limits: Limits = {}, img = image): ImageRequestError {
  const r = parseImageRequest(path, img, limits);
  if (r.ok) throw new Error(`expected an error, got ${r.canonical}`);
  return r;
}
const up: Limits = { maxWidth: 1000, maxArea: 1_000_000 }; // upscaling needs a declared limit (§5.7)

describe("region — IIIF Image API 3.0, §4.1 (examples of a 300×200 image, CHECKS.md)", () => {
  it("full is the whole image", () => {
    const r = ok(req("full"));
    expect(r.region).toEqual({ x: 0, y: 0, w: 300, h: 200 });
    expect(r.size).toEqual({ w: 300, h: 200 });
    expect(r.canonical).toBe("full/max/0/default.jpg");
  });
  it("125,15,120,140 gives 120×140", () => {
    expect(ok(req("125,15,120,140")).region).toEqual({ x: 125, y: 15, w: 120, h: 140 });
  });
  it("pct:41.6,7.5,40,70 gives exactly the same region as 125,15,120,140 (rounded)", () => {
    const r = ok(req("pct:41.6,7.5,40,70"));
    expect(r.region).toEqual({ x: 125, y: 15, w: 120, h: 140 });
    expect(r.canonical).toBe("125,15,120,140/max/0/default.jpg");
  });
  it("125,15,200,200 is cropped at the image edge to 175×185", () => {
    expect(ok(req("125,15,200,200")).region).toEqual({ x: 125, y: 15, w: 175, h: 185 });
  });
  it("pct:41.6,7.5,66.6,100 is cropped to 175×185 too", () => {
    expect(ok(req("pct:41.6,7.5,66.6,100")).size).toEqual({ w: 175, h: 185 });
  });
  it("square is the centred shorter side; a square image's square is full (§4.8)", () => {
    expect(ok(req("square")).region).toEqual({ x: 50, y: 0, w: 200, h: 200 });
    expect(ok(req("square"), {}, { width: 200, height: 300 }).region).toEqual({ x: 0, y: 50, w: 200, h: 200 });
    expect(ok(req("square"), {}, { width: 64, height: 64 }).canonical).toBe("full/max/0/default.jpg");
  });
  it("a region covering the whole image is canonically full (§4.8)", () => {
    expect(ok(req("0,0,500,500")).canonical).toBe("full/max/0/default.jpg");
  });
  it("zero width or height is 400", () => {
    expect(fail(req("10,10,0,50")).status).toBe(400);
    expect(fail(req("pct:10,10,0.1,10")).status).toBe(400); // 0.3 px rounds to nothing
  });
  it("a region entirely outside the image is 400", () => {
    expect(fail(req("300,0,10,10")).status).toBe(400);
    expect(fail(req("0,200,10,10")).status).toBe(400);
    expect(fail(req("pct:100,0,10,10")).status).toBe(400);
  });
  it("malformed regions are 400: negatives, signs, too few values (§4: non-negative integers)", () => {
    for (const r of ["-1,0,10,10", "+1,0,10,10", "1,2,3", "1.5,0,10,10", "pct:1,2,3", "pct:-1,0,10,10", "fullish", ""]) {
      expect(fail(req(r)).status, r).toBe(400);
    }
  });
});

describe("size — IIIF Image API 3.0, §4.2 (examples of a 300×200 image, CHECKS.md)", () => {
  it("150, gives 150×100 (h = round(w·regionH/regionW))", () => {
    const r = ok(req("full", "150,"));
    expect(r.size).toEqual({ w: 150, h: 100 });
    expect(r.canonical).toBe("full/150,100/0/default.jpg");
  });
  it(",150 gives 225×150", () => expect(ok(req("full", ",150")).size).toEqual({ w: 225, h: 150 }));
  it("pct:50 gives 150×100", () => expect(ok(req("full", "pct:50")).size).toEqual({ w: 150, h: 100 }));
  it("225,100 gives 225×100, distorted as asked", () => expect(ok(req("full", "225,100")).size).toEqual({ w: 225, h: 100 }));
  it("!225,100 gives 150×100 (§4.2 example 6)", () => expect(ok(req("full", "!225,100")).size).toEqual({ w: 150, h: 100 }));
  it("!w,h never upscales without ^", () => expect(ok(req("full", "!600,600")).size).toEqual({ w: 300, h: 200 }));
  it("^360, gives 360×240, canonically ^360,240", () => {
    const r = ok(req("full", "^360,"), up);
    expect(r.size).toEqual({ w: 360, h: 240 });
    expect(r.upscaled).toBe(true);
    expect(r.canonical).toBe("full/^360,240/0/default.jpg");
  });
  it("^!360,360 gives 360×240 (§4.2 example 6)", () => expect(ok(req("full", "^!360,360"), up).size).toEqual({ w: 360, h: 240 }));
  it("^max with maxWidth 360 gives 360×240 (§4.2 example 1), canonically ^max", () => {
    const r = ok(req("full", "^max"), { maxWidth: 360 });
    expect(r.size).toEqual({ w: 360, h: 240 });
    expect(r.canonical).toBe("full/^max/0/default.jpg");
  });
  it("max with maxWidth 200 is scaled down to 200×133 (§4.2 example 1)", () => {
    const r = ok(req("full", "max"), { maxWidth: 200 });
    expect(r.size).toEqual({ w: 200, h: 133 });
    expect(r.canonical).toBe("full/max/0/default.jpg");
  });
  it("upscaling without ^ is 400", () => {
    for (const s of ["360,", ",240", "pct:120", "301,200", "300,201"]) expect(fail(req("full", s), up).status, s).toBe(400);
  });
  it("^ that needs upscaling is 501 when the service does not upscale (§4.2: ^pct:120 → 501)", () => {
    expect(fail(req("full", "^pct:120")).status).toBe(501); // no maxWidth/maxArea declared
    expect(fail(req("full", "^!360,360")).status).toBe(501);
    const noUp = { ...IMPLEMENTED, features: IMPLEMENTED.features.filter((f) => f !== "sizeUpscaling") };
    expect(parseImageRequest(req("full", "^360,"), image, up, noUp)).toMatchObject({ ok: false, status: 501 });
  });
  it("^ that needs no upscaling is served anyway, in the plain canonical form", () => {
    expect(ok(req("full", "^150,")).canonical).toBe("full/150,100/0/default.jpg");
  });
  it("a size that is the maximum is canonically max (§4.8)", () => {
    expect(ok(req("full", "300,200")).canonical).toBe("full/max/0/default.jpg");
    expect(ok(req("125,15,120,140", "pct:100")).canonical).toBe("125,15,120,140/max/0/default.jpg");
  });
  it("a size rounding to zero pixels is 400", () => {
    expect(fail(req("full", "1,"), {}, { width: 300, height: 1 }).status).toBe(400);
    expect(fail(req("full", "0,")).status).toBe(400);
    expect(fail(req("full", "pct:0")).status).toBe(400);
  });
  it("explicit sizes over maxWidth/maxHeight/maxArea are 400; max and !w,h are fitted instead", () => {
    const limits = { maxWidth: 200, maxHeight: 100, maxArea: 14_000 };
    expect(fail(req("full", "201,"), limits).status).toBe(400);
    expect(fail(req("full", ",101"), limits).status).toBe(400);
    expect(fail(req("full", "150,100"), limits).status).toBe(400); // 15 000 px > maxArea
    expect(ok(req("full", "140,90"), limits).size).toEqual({ w: 140, h: 90 });
    // √(14 000 / 60 000) = 0.483: 145×97 would be 14 065 px, so it rounds down to 144×96.
    expect(ok(req("full", "max"), limits).size).toEqual({ w: 144, h: 96 });
    expect(ok(req("full", "!300,300"), limits).size).toEqual({ w: 144, h: 96 });
    expect(ok(req("full", "max"), limits).canonical).toBe("full/max/0/default.jpg");
  });
  it("maxHeight defaults to maxWidth (§5.2)", () => {
    expect(fail(req("full", "100,250"), { maxWidth: 240 }, { width: 300, height: 300 }).status).toBe(400);
  });
  it("malformed sizes are 400", () => {
    for (const s of ["", ",", "full", "pct:", "pct:-5", "!100,", "^", "10,10,10", "1e2,"]) expect(fail(req("full", s)).status, s).toBe(400);
  });
});

describe("fitToLimits — Implementation Notes §4, Maximum size calculation", () => {
  it("the §5.2 example limits: 6000×4000 within maxWidth 3000, maxHeight 2000, maxArea 4 000 000", () => {
    const s = fitToLimits(6000, 4000, { maxWidth: 3000, maxHeight: 2000, maxArea: 4_000_000 }, false);
    expect(s.w * s.h).toBeLessThanOrEqual(4_000_000);
    expect(s).toEqual({ w: 2449, h: 1633 }); // √(4e6/24e6) = 0.40825
  });
  it("no limits and no upscaling: unchanged", () => expect(fitToLimits(6000, 4000, {}, true)).toEqual({ w: 6000, h: 4000 }));
});

describe("rotation — IIIF Image API 3.0, §4.3 (and §4.8 canonical form)", () => {
  it("multiples of 90, with or without mirroring", () => {
    expect(ok(req("full", "max", "90")).rotation).toEqual({ degrees: 90, mirror: false });
    expect(ok(req("full", "max", "!180")).rotation).toEqual({ degrees: 180, mirror: true });
    expect(ok(req("full", "max", "!0")).canonical).toBe("full/max/!0/default.jpg");
    expect(ok(req("full", "max", "270.0")).canonical).toBe("full/max/270/default.jpg");
    expect(ok(req("full", "max", "360")).rotation.degrees).toBe(0);
  });
  it("other angles are 400: §4.3 says an unsupported rotation SHOULD be a 400", () => {
    const r = fail(req("full", "max", "22.5"));
    expect(r.status).toBe(400);
    expect(r.message).toMatch(/multiples of 90/);
  });
  it("out of range or malformed is 400", () => {
    for (const s of ["361", "-90", "+90", "!", "90deg", "!!90"]) expect(fail(req("full", "max", s)).status, s).toBe(400);
  });
  it("arbitrary angles pass when the capabilities include rotationArbitrary", () => {
    const caps = { ...IMPLEMENTED, features: [...IMPLEMENTED.features, "rotationArbitrary" as const] };
    const r = parseImageRequest(req("full", "max", "22.50"), image, {}, caps);
    expect(r.ok && r.canonical).toBe("full/max/22.5/default.jpg"); // §4.7: no trailing zeros
  });
});

describe("quality and format — IIIF Image API 3.0, §4.4 and §4.5", () => {
  it("default, color and gray are served; color is canonically default (our default quality)", () => {
    expect(ok(req("full", "max", "0", "gray")).canonical).toBe("full/max/0/gray.jpg");
    const color = ok(req("full", "max", "0", "color", "png"));
    expect(color.quality).toBe("color");
    expect(color.canonical).toBe("full/max/0/default.png");
  });
  it("bitonal (not implemented) and unknown qualities are 400", () => {
    expect(fail(req("full", "max", "0", "bitonal")).status).toBe(400);
    expect(fail(req("full", "max", "0", "native")).status).toBe(400); // the 1.x name
  });
  it("jpg, png and webp are served; tif (named by the spec, not implemented) and bmp are 400", () => {
    expect(ok(req("full", "max", "0", "default", "webp")).format).toBe("webp");
    expect(fail(req("full", "max", "0", "default", "tif")).status).toBe(400);
    expect(fail(req("full", "max", "0", "default", "bmp")).status).toBe(400);
  });
});

describe("splitImagePath and the §4.6 order example", () => {
  it("reads region/size/rotation/quality.format", () => {
    const path = splitImagePath("125,15,120,140/90,/!345/gray.jpg");
    expect(path).toEqual({ region: "125,15,120,140", size: "90,", rotation: "!345", quality: "gray", format: "jpg" });
    expect(splitImagePath("full/max/0/default")).toBeNull();
  });
  it("90, of a 120×140 region is 90×105", () => {
    expect(ok(req("125,15,120,140", "90,", "!0", "gray")).size).toEqual({ w: 90, h: 105 });
  });
  it("rejects image sizes that are not positive integers (a programming error)", () => {
    expect(() => parseImageRequest(req("full"), { width: 0, height: 10 })).toThrow();
  });
});
