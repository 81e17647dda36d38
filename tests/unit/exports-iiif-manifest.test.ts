// A source as a IIIF Presentation API 3.0 Manifest. Every check names the section of
// iiif.io/api/presentation/3.0 (stored copy of IIIF/api source/presentation/3.0/index.md, 3.0.1) it
// comes from; the required values are the ones in shared/CHECKS.md. Image sizes are checked against
// IIIF Image API 3.0 request arithmetic (lib/iiif/request.ts, itself tested against that specification).
import { describe, expect, it } from "vitest";
import { IIIF_PRESENTATION_CONTEXT, canvasIdFor, iiifRightsUri } from "@/lib/exports/context";
import { sourceManifest, type ManifestInput } from "@/lib/exports/iiif-manifest";
import { annotationPage } from "@/lib/exports/web-annotation";
import { IMPLEMENTED, complianceOf } from "@/lib/iiif/capabilities";
import { parseImageRequest, splitImagePath } from "@/lib/iiif/request";
import { HOST, MANIFEST_ID, MANIFEST_INPUT, PAGE_12, PAGE_INPUT, SERVICE_12 } from "../fixtures/exports";

const manifest = sourceManifest(MANIFEST_INPUT);
const [panel, detail] = manifest.items;
const build = (changes: Partial<ManifestInput>) => sourceManifest({ ...MANIFEST_INPUT, ...changes });
const BCP47_OR_NONE = /^(?:none|[a-z]{2,3}(?:-[A-Za-z0-9]{2,8})*)$/;

function languageMaps(node: unknown, found: unknown[] = []): unknown[] {
  if (Array.isArray(node)) node.forEach((n) => languageMaps(n, found));
  else if (node && typeof node === "object") {
    for (const [k, v] of Object.entries(node)) {
      if (k === "label" || k === "summary" || (k === "value" && !("type" in node))) found.push(v);
      else languageMaps(v, found);
    }
  }
  return found;
}

describe("the Manifest (IIIF §5.2; CHECKS.md)", () => {
  it("§4.6: @context is the Presentation 3 context, and the first key", () => {
    expect(manifest["@context"]).toBe("http://iiif.io/api/presentation/3/context.json");
    expect(IIIF_PRESENTATION_CONTEXT).toBe(manifest["@context"]);
    expect(Object.keys(manifest)[0]).toBe("@context");
  });
  it("§5.2: id is the manifest's HTTP(S) URI, type Manifest, label a language map", () => {
    expect(manifest.id).toBe(MANIFEST_ID);
    expect(manifest.type).toBe("Manifest");
    expect(manifest.label).toEqual({ en: ["Wedding feast with guitarist"] });
  });
  it("§3.4 items: at least one Canvas, one per image in order; none at all is refused", () => {
    expect(manifest.items.map((c) => c.type)).toEqual(["Canvas", "Canvas"]);
    expect(() => build({ images: [] })).toThrow(/at least one image/);
  });
  it("§4.4: every label, summary and metadata value is a language map of string arrays keyed by BCP 47 or none", () => {
    const maps = languageMaps(manifest);
    expect(maps.length).toBeGreaterThan(10);
    for (const map of maps) {
      expect(typeof map).toBe("object");
      for (const [key, values] of Object.entries(map as object)) {
        expect(key).toMatch(BCP47_OR_NONE);
        expect(Array.isArray(values) && values.every((v) => typeof v === "string")).toBe(true);
      }
    }
  });
  it("§4.8: no key but the top @context starts with @ (embedded resources carry no @context)", () => {
    const text = JSON.stringify(manifest);
    expect(text.match(/"@[a-z]+":/gi)).toEqual(['"@context":']);
  });
  it("§3.1 metadata: attribution, date in words and EDTF, place, collection, accession number, type, medium, rights", () => {
    expect(manifest.metadata).toEqual([
      { label: { en: ["Attribution"] }, value: { en: ["Attributed to Juan de Olmedo"] } },
      { label: { en: ["Date"] }, value: { en: ["about 1650 (EDTF 1650~)"] } },
      { label: { en: ["Place"] }, value: { none: ["Sevilla"] } },
      { label: { en: ["Collection"] }, value: { none: ["Museo Imaginario de Córdoba"] } },
      { label: { en: ["Accession number"] }, value: { none: ["MIC-0457"] } },
      { label: { en: ["Object type"] }, value: { en: ["Painting"] } },
      { label: { en: ["Medium"] }, value: { en: ["Oil on panel"] } },
      { label: { en: ["Rights"] }, value: { en: ["CC BY 4.0"] } },
    ]);
  });
  it("§3.1 metadata: missing fields are left out, and an unreadable dating is shown as given", () => {
    const bare = build({ attribution: null, place: "  ", collection: undefined, accessionNumber: null, objectType: null, medium: null, rightsUri: null, datingEdtf: "sometime" });
    expect(bare.metadata).toEqual([{ label: { en: ["Date"] }, value: { en: ["sometime"] } }]);
  });
  it("§3.1 navDate: an xsd:dateTime with Z at the first day the dating allows; none for an open start", () => {
    expect(manifest.navDate).toBe("1650-01-01T00:00:00Z");
    expect(build({ datingEdtf: "1640/1660" }).navDate).toBe("1640-01-01T00:00:00Z");
    expect(build({ datingEdtf: "../1700" }).navDate).toBeUndefined();
  });
  it("§3.1 summary and §4.5: plain text that looks like HTML gets a trailing space", () => {
    expect(manifest.summary).toEqual({ en: [MANIFEST_INPUT.summary] });
    expect(build({ summary: "<b>not markup</b>" }).summary).toEqual({ en: ["<b>not markup</b> "] });
  });
  it("§3.1 requiredStatement: the credit line under the label Attribution", () => {
    expect(manifest.requiredStatement).toEqual({
      label: { en: ["Attribution"] },
      value: { en: ["Photograph courtesy of the Museo Imaginario de Córdoba"] },
    });
    expect(build({ creditLine: null }).requiredStatement).toBeUndefined();
  });
  it("§3.1 homepage: the source page as Text with a label and text/html", () => {
    expect(manifest.homepage).toEqual([
      { id: `${HOST}/sources/7`, type: "Text", label: { en: ["Wedding feast with guitarist"] }, format: "text/html", language: ["en"] },
    ]);
  });
  it("§3.1 provider: an Agent with id, type and label when given", () => {
    expect(manifest.provider).toBeUndefined();
    const withProvider = build({ provider: { id: `${HOST}/about`, label: "Cordarium", homepage: `${HOST}/` } });
    expect(withProvider.provider).toEqual([{
      id: `${HOST}/about`, type: "Agent", label: { en: ["Cordarium"] },
      homepage: [{ id: `${HOST}/`, type: "Text", label: { en: ["Cordarium"] }, format: "text/html", language: ["en"] }],
    }]);
  });
});

describe("rights (IIIF §3.1: Creative Commons or RightsStatements.org URIs only, as those define them)", () => {
  it("the stored https Creative Commons URI becomes the http URI both bodies publish for machines", () => {
    expect(manifest.rights).toBe("http://creativecommons.org/licenses/by/4.0/");
    expect(iiifRightsUri("https://creativecommons.org/publicdomain/zero/1.0/")).toBe("http://creativecommons.org/publicdomain/zero/1.0/");
  });
  it("a RightsStatements.org URI is kept as it is", () => {
    expect(build({ rightsUri: "http://rightsstatements.org/vocab/InC-EDU/1.0/" }).rights).toBe("http://rightsstatements.org/vocab/InC-EDU/1.0/");
  });
  it("any other URI is left out of rights (and shown to people in metadata instead)", () => {
    const other = build({ rightsUri: "https://example.org/our-licence" });
    expect(other.rights).toBeUndefined();
    expect(other.metadata.at(-1)).toEqual({ label: { en: ["Rights"] }, value: { en: ["https://example.org/our-licence"] } });
    expect(iiifRightsUri("https://creativecommons.org/about/")).toBeNull();
  });
});

describe("Canvases (IIIF §5.3; CHECKS.md)", () => {
  it("§5.3: its own HTTP(S) URI without a fragment, under the manifest", () => {
    expect(panel.id).toBe(`${MANIFEST_ID}/canvas/12`);
    expect(panel.id).not.toContain("#");
    expect(canvasIdFor(MANIFEST_ID, 12)).toBe(panel.id);
    expect(() => build({ manifestId: `${MANIFEST_ID}#top` })).toThrow(/fragment/);
  });
  it("§3.2: width and height together, positive integers, equal to the image (regions are in its pixels)", () => {
    expect([panel.width, panel.height, detail.width, detail.height]).toEqual([6000, 4000, 180, 240]);
    expect(() => build({ images: [{ ...MANIFEST_INPUT.images[0], height: 0 }] })).toThrow(/positive integers/);
  });
  it("§5.3: a label for each Canvas", () => {
    expect(panel.label).toEqual({ en: ["Whole panel"] });
  });
  it("§5.3 and §3.5: one Annotation Page in items, painting the image onto the Canvas, targeting the Canvas", () => {
    expect(panel.items).toHaveLength(1);
    const [pageOfPaint] = panel.items;
    expect(pageOfPaint.type).toBe("AnnotationPage");
    expect(pageOfPaint.items).toHaveLength(1);
    const [paint] = pageOfPaint.items;
    expect(paint).toMatchObject({ type: "Annotation", motivation: "painting", target: panel.id });
    expect(paint.body).toEqual({
      id: `${SERVICE_12}/full/max/0/default.jpg`, type: "Image", format: "image/jpeg", width: 6000, height: 4000,
      service: [{ id: SERVICE_12, type: "ImageService3", profile: "level2" }],
    });
  });
  it("§3.2 id: embedded pages and annotations have HTTP(S) URIs of their own, all distinct", () => {
    const ids = manifest.items.flatMap((c) => [c.id, c.items[0].id, c.items[0].items[0].id]);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(new URL(id).protocol).toBe("https:");
  });
  it("the image service's profile is the one info.json declares (Image API 3.0 §6, with the route's HTTP features)", () => {
    const routeFeatures = ["cors", "jsonldMediaType", "baseUriRedirect"] as const;
    const { profile } = complianceOf({ ...IMPLEMENTED, features: [...IMPLEMENTED.features, ...routeFeatures] });
    expect(panel.items[0].items[0].body.service[0].profile).toBe(profile);
  });
  it("the painted image's size is what full/max returns under the service's limits (Image API 3.0 §4.2 max)", () => {
    const big = build({ limits: { maxArea: 40_000_000 }, images: [{ ...MANIFEST_INPUT.images[0], width: 8000, height: 6000 }] });
    const body = big.items[0].items[0].items[0].body;
    expect(big.items[0].width).toBe(8000); // the Canvas keeps the full image's coordinates
    expect(body.width * body.height).toBeLessThanOrEqual(40_000_000);
    expect(Math.abs(body.width / body.height - 8000 / 6000)).toBeLessThan(0.001);
  });
  it("§3.1 thumbnail: from the image service, at most 300 px, never upscaled, and a valid request of that size", () => {
    for (const canvas of manifest.items) {
      const [thumb] = canvas.thumbnail;
      const base = thumb.service[0].id;
      expect(thumb.id.startsWith(`${base}/`)).toBe(true);
      const answer = parseImageRequest(splitImagePath(thumb.id.slice(base.length + 1))!, canvas);
      expect(answer.ok && answer.size).toEqual({ w: thumb.width, h: thumb.height });
      expect(answer.ok && answer.upscaled).toBe(false);
      expect(Math.max(thumb.width, thumb.height)).toBeLessThanOrEqual(300);
    }
    expect([panel.thumbnail[0].width, panel.thumbnail[0].height]).toEqual([300, 200]);
    expect([detail.thumbnail[0].width, detail.thumbnail[0].height]).toEqual([180, 240]);
    expect(manifest.thumbnail).toEqual(panel.thumbnail);
  });
});

describe("the regions' Annotation Page from the Canvas (IIIF §3.4 annotations, §5.5)", () => {
  it("§5.5: referred to with id and type only, never items; in annotations, not in items", () => {
    expect(panel.annotations).toEqual([{ id: PAGE_12, type: "AnnotationPage" }]);
    expect(panel.items.some((p) => p.id === PAGE_12)).toBe(false);
  });
  it("an image with nothing to show has no annotations property", () => {
    expect(detail.annotations).toBeUndefined();
  });
  it("§3.4: the page served at that URL targets this Canvas and paints nothing", () => {
    const regions = annotationPage({ ...PAGE_INPUT, canvasId: canvasIdFor(MANIFEST_ID, 12) });
    expect(regions.id).toBe(panel.annotations![0].id);
    for (const a of regions.items) {
      expect(a.target.source).toBe(panel.id);
      expect(a.motivation).not.toBe("painting");
    }
  });
});
