// The light table's link (regions in order, crop size, proposed opt-in) and its shared view: one zoom
// and one relative offset for every crop, turned into one CSS transform (CSS Transforms Module Level 1:
// `translate(t) scale(s)` maps a point p to s·p + t, and translate percentages are of the element's own
// box — from memory), and the IIIF sizes asked for (Image API 3.0 §4.2, `^` for upscaling).
import { describe, expect, it } from "vitest";
import { regionUrl } from "@/lib/iiif";
import { CROP_HEIGHTS, lightTableHref, MAX_REGIONS, moveRegion, readCropSize, readProposed, readSelection } from "@/lib/light-table/links";
import { clampView, CROP_MAX_AREA, cropRequestHeight, cropWidth, dragBy, panBy, viewTransform, WHOLE_VIEW, zoomIn, zoomOut, zoomTo } from "@/lib/light-table/view";

describe("lightTableHref", () => {
  it("lists the regions in the order given, commas unescaped", () => {
    expect(lightTableHref([12, 40, 7])).toBe("/light-table?r=12,40,7");
    expect(lightTableHref([7, 40, 12])).toBe("/light-table?r=7,40,12");
  });
  it("is the bare page for no regions, and drops repeats and ids that cannot be regions", () => {
    expect(lightTableHref([])).toBe("/light-table");
    expect(lightTableHref([3, 3, 0, -2, 1.5, Number.NaN, 9])).toBe("/light-table?r=3,9");
  });
  it("carries the crop size (unless it is the default) and the opt-in to proposed work", () => {
    expect(lightTableHref([1, 2], { size: "large", proposed: true })).toBe("/light-table?r=1,2&size=large&proposed=1");
    expect(lightTableHref([1, 2], { size: "medium", proposed: false })).toBe("/light-table?r=1,2");
  });
  it("round-trips through readSelection", () => {
    const href = lightTableHref([5, 81, 2, 34]);
    expect(readSelection(new URL(href, "http://x").searchParams.get("r")).ids).toEqual([5, 81, 2, 34]);
  });
});

describe("readSelection", () => {
  it("reads comma lists and repeated parameters, first place wins for repeats", () => {
    expect(readSelection("12, 40,7,40")).toEqual({ ids: [12, 40, 7], malformed: 0, beyondLimit: 0 });
    expect(readSelection(["1,2", "3"]).ids).toEqual([1, 2, 3]);
    expect(readSelection(undefined)).toEqual({ ids: [], malformed: 0, beyondLimit: 0 });
    expect(readSelection("")).toEqual({ ids: [], malformed: 0, beyondLimit: 0 });
  });
  it("counts entries that are not region ids", () => {
    expect(readSelection("4,x,0,-3,2.5,007,5")).toEqual({ ids: [4, 5], malformed: 5, beyondLimit: 0 });
    expect(readSelection("99999999999999999999").malformed).toBe(1);
  });
  it(`keeps at most ${MAX_REGIONS} regions and counts the rest`, () => {
    const many = Array.from({ length: MAX_REGIONS + 3 }, (_, i) => i + 1).join(",");
    const s = readSelection(many);
    expect(s.ids).toHaveLength(MAX_REGIONS);
    expect(s.beyondLimit).toBe(3);
  });
  it("reads the size and the proposed flag, falling back to medium and off", () => {
    expect(readCropSize("large")).toBe("large");
    expect(readCropSize("huge")).toBe("medium");
    expect(readCropSize(undefined)).toBe("medium");
    expect(CROP_HEIGHTS).toEqual({ small: 240, medium: 360, large: 520 });
    expect(readProposed("1")).toBe(true);
    expect(readProposed("0")).toBe(false);
    expect(readProposed(undefined)).toBe(false);
  });
});

describe("moveRegion", () => {
  it("moves one item and keeps the others in their order", () => {
    expect(moveRegion([1, 2, 3, 4], 0, 2)).toEqual([2, 3, 1, 4]);
    expect(moveRegion([1, 2, 3, 4], 3, 0)).toEqual([4, 1, 2, 3]);
    expect(moveRegion([1, 2, 3, 4], 1, 2)).toEqual([1, 3, 2, 4]);
  });
  it("leaves the order alone for moves off either end", () => {
    expect(moveRegion([1, 2, 3], 0, -1)).toEqual([1, 2, 3]);
    expect(moveRegion([1, 2, 3], 2, 3)).toEqual([1, 2, 3]);
  });
});

describe("the shared view", () => {
  it("zooms about the centre and keeps the window inside the crop", () => {
    const twice = zoomTo(WHOLE_VIEW, 2);
    expect(twice).toEqual({ zoom: 2, x: 0.25, y: 0.25 });
    expect(zoomTo(twice, 1)).toEqual(WHOLE_VIEW);
    expect(zoomTo(WHOLE_VIEW, 100).zoom).toBe(8);
    expect(zoomTo(WHOLE_VIEW, 0.1).zoom).toBe(1);
    expect(zoomOut(zoomIn(WHOLE_VIEW))).toEqual(WHOLE_VIEW);
  });
  it("pans by shares of the crop, never past its edges", () => {
    const v = zoomTo(WHOLE_VIEW, 2);
    expect(panBy(v, 0.1, -0.1)).toEqual({ zoom: 2, x: 0.35, y: 0.15 });
    expect(panBy(v, 5, 5)).toEqual({ zoom: 2, x: 0.5, y: 0.5 });
    expect(panBy(WHOLE_VIEW, 0.3, 0.3)).toEqual(WHOLE_VIEW);
  });
  it("a drag over a crop moves the picture with the pointer, the same share for every crop", () => {
    const v = zoomTo(WHOLE_VIEW, 2);
    // 100 px to the left over a crop 400 px wide at 2×: the window moves right by 100 / 800 of the crop.
    expect(dragBy(v, -100, 0, 400, 300)).toEqual({ zoom: 2, x: 0.375, y: 0.25 });
  });
  it("turns the view into one transform: the window's corner lands on the crop's corner", () => {
    expect(viewTransform(WHOLE_VIEW)).toBe("translate(0%, 0%) scale(1)");
    const v = { zoom: 2, x: 0.25, y: 0.5 };
    expect(viewTransform(v)).toBe("translate(-50%, -100%) scale(2)");
    // s·p + t at the window's corner: 2 · (0.25 W) − 0.5 W = 0, for any width W.
    for (const W of [120, 999]) expect(2 * 0.25 * W + -0.5 * W).toBe(0);
    expect(clampView({ zoom: Number.NaN, x: 3, y: -1 })).toEqual(WHOLE_VIEW);
  });
});

describe("crop sizes", () => {
  it("keeps the region's proportions at the common height", () => {
    expect(cropWidth({ w: 300, h: 400 }, 360)).toBe(270);
    expect(cropWidth({ w: 1000, h: 100 }, 240)).toBe(2400);
  });
  it("asks for twice the height, upscaled with ^ when the region is smaller", () => {
    const box = { x: 10, y: 20, w: 100, h: 150 };
    const h = cropRequestHeight(box, 360, 1);
    expect(h).toBe(720);
    expect(regionUrl("/iiif/3/9", box, { height: h })).toBe("/iiif/3/9/10,20,100,150/^,720/0/default.jpg");
  });
  it("asks for more when zoomed deeper, but not past the region's own pixels once the base is reached", () => {
    const big = { w: 3000, h: 4000 };
    expect(cropRequestHeight(big, 360, 1)).toBe(720);
    expect(cropRequestHeight(big, 360, 3)).toBe(1440);
    expect(cropRequestHeight(big, 360, 6)).toBe(2880);
    expect(cropRequestHeight({ w: 800, h: 1000 }, 360, 6)).toBe(1000);
    expect(cropRequestHeight({ w: 80, h: 100 }, 360, 6)).toBe(720);
  });
  it("stays within the area cap for very wide regions", () => {
    const wide = { w: 10_000, h: 500 };
    const h = cropRequestHeight(wide, 520, 8);
    expect(h * Math.round((h * wide.w) / wide.h)).toBeLessThanOrEqual(CROP_MAX_AREA * 1.001);
  });
});
