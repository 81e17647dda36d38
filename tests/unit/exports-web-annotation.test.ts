// Regions as W3C Web Annotations. Every check names the section of the W3C Web Annotation Data Model
// (W3C Recommendation, 23 February 2017; section numbers from its table of contents, read from a stored
// copy) or of IIIF Presentation API 3.0 it comes from. The Media Fragments value is the one in
// shared/CHECKS.md (`xywh=100,200,300,400`). The SVG Selector is §4.2.7 of the model (§4.2.6 is the Data
// Position Selector).
import { describe, expect, it } from "vitest";
import { ANNO_CONTEXT, IIIF_PRESENTATION_CONTEXT, MEDIA_FRAGMENTS, xsdDateTime } from "@/lib/exports/context";
import { annotationPage, regionAnnotation, type WebAnnotation } from "@/lib/exports/web-annotation";
import { fragmentToRegion } from "@/lib/iiif/fragments";
import { EMPTY_DRAFT, PAGE_12, PAGE_INPUT, PROPOSED_POLYGON, SERVICE_12, VETTED_RECTANGLE } from "../fixtures/exports";

const page = annotationPage(PAGE_INPUT);
const [vetted, proposed, empty] = page.items;
const image = { width: PAGE_INPUT.imageWidth, height: PAGE_INPUT.imageHeight };

// W3C §3.3.5: the motivations the model defines (for `motivation` and for a body's `purpose`).
const MOTIVATIONS = [
  "assessing", "bookmarking", "classifying", "commenting", "describing", "editing", "highlighting",
  "identifying", "linking", "moderating", "questioning", "replying", "tagging",
];
// Terms of the two contexts our documents use (stored copies of w3c/web-annotation jsonld/anno.jsonld
// and IIIF/api source/api/presentation/3/context.json), limited to what a page could contain.
const CONTEXT_TERMS = new Set([
  "@context", "id", "type", "body", "target", "source", "selector", "motivation", "purpose", "creator", "created",
  "modified", "name", "value", "format", "language", "conformsTo", "items", "label", "startIndex", "partOf",
  "service", "width", "height", "profile",
]);
const CLASSES = new Set([
  "AnnotationPage", "Annotation", "TextualBody", "SpecificResource", "FragmentSelector", "SvgSelector", "Person",
  "Image", "ImageService3", "Canvas",
]);
const XSD_DATETIME_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(?:\.\d+)?Z$/;

function walk(node: unknown, visit: (key: string, value: unknown, parent: Record<string, unknown>) => void): void {
  if (Array.isArray(node)) node.forEach((n) => walk(n, visit));
  else if (node && typeof node === "object") {
    for (const [k, v] of Object.entries(node)) {
      visit(k, v, node as Record<string, unknown>);
      if (k !== "label") walk(v, visit); // a language map's keys are language tags, not terms
    }
  }
}
const isAbsoluteHttp = (s: unknown) => typeof s === "string" && /^https?:$/.test(new URL(s).protocol);
const bodiesWith = (a: WebAnnotation, purpose: string) => a.body.filter((b) => b.purpose === purpose);

describe("the Annotation Page (W3C §5.2; IIIF Presentation 3.0 §5.5)", () => {
  it("§5.2: @context lists anno.jsonld; IIIF §4.6: the IIIF context is the last item", () => {
    expect(page["@context"]).toContain(ANNO_CONTEXT);
    expect(page["@context"].at(-1)).toBe(IIIF_PRESENTATION_CONTEXT);
  });
  it("§5.2: exactly one IRI as id, type AnnotationPage, startIndex a non-negative integer", () => {
    expect(page.id).toBe(PAGE_12);
    expect(page.type).toBe("AnnotationPage");
    expect(Number.isInteger(page.startIndex) && page.startIndex >= 0).toBe(true);
  });
  it("§5.2: items lists the annotations in the order given", () => {
    expect(page.items.map((a) => a.id)).toEqual([VETTED_RECTANGLE.iri, PROPOSED_POLYGON.iri, EMPTY_DRAFT.iri]);
  });
  it("IIIF §4.4 and §4.7: label is a language map, not the W3C string form", () => {
    expect(page.label).toEqual({ en: [PAGE_INPUT.label] });
  });
  it("IIIF §4.6 and §4.8: only the page has @context, and no other key starts with @", () => {
    const atKeys: string[] = [];
    walk(page, (k, _v, parent) => { if (k.startsWith("@")) atKeys.push(k === "@context" && parent === (page as unknown) ? "top" : k); });
    expect(atKeys).toEqual(["top"]);
  });
  it("every key is a term of anno.jsonld or the IIIF context, or a schema: compact IRI (anno.jsonld defines the prefix)", () => {
    const unknown: string[] = [];
    walk(page, (k) => { if (!CONTEXT_TERMS.has(k) && !k.startsWith("schema:")) unknown.push(k); });
    expect(unknown).toEqual([]);
  });
  it("every type value is a class the contexts define", () => {
    const types: string[] = [];
    walk(page, (k, v) => { if (k === "type") types.push(v as string); });
    expect(types.filter((t) => !CLASSES.has(t))).toEqual([]);
  });
  it("is plain JSON: nothing is lost or changed by serialising it", () => {
    expect(JSON.parse(JSON.stringify(page))).toStrictEqual(page);
  });
  it("an image without regions gives an empty page (IIIF §3.4: SHOULD have items; W3C §5.2 would want one)", () => {
    expect(annotationPage({ ...PAGE_INPUT, regions: [] }).items).toEqual([]);
  });
});

describe("each region as an Annotation (W3C §3.1)", () => {
  it("§3.1: exactly one IRI as id, type Annotation, at least one target", () => {
    for (const a of page.items) {
      expect(isAbsoluteHttp(a.id)).toBe(true);
      expect(a.type).toBe("Annotation");
      expect([a.target].flat().length).toBeGreaterThanOrEqual(1);
    }
  });
  it("§3.1: a standalone annotation has the single @context anno.jsonld, as a string", () => {
    const alone = regionAnnotation(VETTED_RECTANGLE, PAGE_INPUT);
    expect(alone["@context"]).toBe(ANNO_CONTEXT);
    expect(Object.keys(alone)[0]).toBe("@context");
    const { "@context": _, ...rest } = alone;
    expect(rest).toEqual(vetted);
  });
  it("§3.3.1: created and modified are xsd:dateTime in UTC written with Z", () => {
    for (const a of page.items) {
      expect(a.created).toMatch(XSD_DATETIME_UTC);
      expect(a.modified).toMatch(XSD_DATETIME_UTC);
    }
    expect(vetted.created).toBe("2025-02-03T09:15:00Z");
    expect(vetted.modified).toBe("2025-02-10T16:40:05Z"); // a database time without a zone is UTC
    expect(proposed.created).toBe("2025-03-01T07:00:00Z"); // +01:00 moved to UTC
    expect(proposed.modified).toBe("2025-03-01T08:00:00.250Z");
    expect(() => xsdDateTime("10 February")).toThrow();
  });
  it("§3.3.1 and §3.3.2: one creator, a Person with a name (and an IRI when there is one)", () => {
    expect(vetted.creator).toEqual({ id: "https://cordarium.example/people/4", type: "Person", name: "Inés Valcárcel" });
    expect(proposed.creator).toEqual({ type: "Person", name: "Tomás Ferreira" });
  });
  it("§3.3.5: exactly one motivation, from the model's list; describing when something is recorded", () => {
    for (const a of page.items) expect(MOTIVATIONS).toContain(a.motivation);
    expect(vetted.motivation).toBe("describing");
    expect(proposed.motivation).toBe("describing");
    expect(empty.motivation).toBe("highlighting");
  });
  it("§3.3.5: every body's purpose comes from the same list", () => {
    for (const a of page.items) for (const b of a.body) expect(MOTIVATIONS).toContain(b.purpose);
  });
});

describe("bodies: observations, confidence, notes and review state", () => {
  it("§3.2.4: each TextualBody has exactly one string value, format text/plain and language en", () => {
    for (const a of page.items) {
      for (const b of a.body.filter((x) => x.type === "TextualBody")) {
        expect(typeof (b as { value: unknown }).value).toBe("string");
        expect(b).toMatchObject({ format: "text/plain", language: "en" });
      }
    }
  });
  it("the label and each observation are describing bodies, in words, with confidence and note", () => {
    expect(bodiesWith(vetted, "describing").map((b) => (b as { value: string }).value)).toEqual([
      "Guitarist's right hand",
      "Right-hand technique: strumming (probable). Note: The thumb is hidden by the sleeve.",
      "String count: 9 (certain)",
      "Setting: an outdoor wedding feast (possible)",
    ]);
  });
  it("a term without an IRI is also a tagging body naming its aspect", () => {
    expect(bodiesWith(vetted, "tagging")).toEqual([
      { type: "TextualBody", purpose: "tagging", value: "Right-hand technique: strumming", format: "text/plain", language: "en" },
    ]);
  });
  it("§4.1: a term with an IRI is a classifying Specific Resource with that IRI as its one source", () => {
    expect(bodiesWith(proposed, "classifying")).toEqual([
      { type: "SpecificResource", purpose: "classifying", source: "https://cordarium.example/vocabulary/rose/carved_parchment" },
    ]);
    expect(bodiesWith(proposed, "tagging")).toEqual([]);
  });
  it("the review state is in words (a commenting body) and in schema:creativeWorkStatus with the version", () => {
    expect(bodiesWith(vetted, "commenting").map((b) => (b as { value: string }).value)).toEqual(["Vetted by an editor (version 2)."]);
    expect(bodiesWith(proposed, "commenting").map((b) => (b as { value: string }).value))
      .toEqual(["Proposed for review; not yet vetted by an editor (version 1)."]);
    expect([vetted, proposed, empty].map((a) => a["schema:creativeWorkStatus"])).toEqual(["vetted", "proposed", "draft"]);
    expect([vetted, proposed, empty].map((a) => a["schema:version"])).toEqual([2, 1, 1]);
  });
  it("a region with nothing recorded carries only its state (a blank label is no label)", () => {
    expect(empty.body.map((b) => b.purpose)).toEqual(["commenting"]);
  });
});

describe("targets and selectors (W3C §4, §4.2)", () => {
  it("§4: one Specific Resource with exactly one source, the full image with its IIIF image service", () => {
    expect(vetted.target.type).toBe("SpecificResource");
    expect(vetted.target.source).toEqual({
      id: `${SERVICE_12}/full/max/0/default.jpg`, type: "Image", format: "image/jpeg", width: 6000, height: 4000,
      service: [{ id: SERVICE_12, type: "ImageService3" }],
    });
  });
  it("IIIF §3.4 annotations: from a manifest, the target's source is the Canvas", () => {
    const canvasId = "https://cordarium.example/iiif/3/manifests/7/canvas/12";
    const onCanvas = annotationPage({ ...PAGE_INPUT, canvasId });
    for (const a of onCanvas.items) expect(a.target.source).toBe(canvasId);
  });
  it("§4.2.1: a rectangle is a FragmentSelector conforming to Media Fragments, value xywh=100,200,300,400", () => {
    expect(vetted.target.selector).toEqual({ type: "FragmentSelector", conformsTo: MEDIA_FRAGMENTS, value: "xywh=100,200,300,400" });
    expect(MEDIA_FRAGMENTS).toBe("http://www.w3.org/TR/media-frags/");
  });
  it("the xywh value reads back (lib/iiif/fragments.ts) as the region's rectangle", () => {
    const { x, y, w, h } = VETTED_RECTANGLE.shape as { x: number; y: number; w: number; h: number };
    expect(fragmentToRegion(vetted.target.selector.value, image)).toEqual({ x, y, w, h });
  });
  it("Media Fragments pixels are integers: a fractional rectangle covers the pixels it touches", () => {
    expect(empty.target.selector.value).toBe("xywh=10,20,51,31"); // 10.4–60.6 × 20.6–50.6
    expect(fragmentToRegion(empty.target.selector.value, image)).toEqual({ x: 10, y: 20, w: 51, h: 31 });
  });
  it("IIIF §5.3: a rectangle spilling past the image is clipped to it; one wholly outside is refused", () => {
    const spill = { ...VETTED_RECTANGLE, shape: { kind: "rectangle" as const, x: 5900, y: 3950, w: 300, h: 300 } };
    expect(regionAnnotation(spill, PAGE_INPUT).target.selector.value).toBe("xywh=5900,3950,100,50");
    const outside = { ...VETTED_RECTANGLE, shape: { kind: "rectangle" as const, x: 7000, y: 0, w: 10, h: 10 } };
    expect(() => regionAnnotation(outside, PAGE_INPUT)).toThrow(/outside/);
  });
  it("§4.2.7: a polygon is an SvgSelector whose value is one SVG document with one polygon and no style", () => {
    const selector = proposed.target.selector;
    expect(selector.type).toBe("SvgSelector");
    const m = /^<svg xmlns="http:\/\/www\.w3\.org\/2000\/svg"><polygon points="([^"<>&]*)"\/><\/svg>$/.exec(selector.value);
    expect(m).not.toBeNull();
    expect(selector.value).not.toMatch(/style|script|transform/);
    const points = m![1].split(" ").map((pair) => pair.split(",").map(Number));
    expect(points).toEqual((PROPOSED_POLYGON.shape as { points: number[][] }).points);
  });
  it("§4.2: one selector per target — a polygon does not get its bounding box as an alternative", () => {
    for (const a of page.items) expect(Array.isArray(a.target.selector)).toBe(false);
  });
});
