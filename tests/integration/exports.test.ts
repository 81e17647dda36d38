// The open-standard exports served by the running app, checked against the required properties of the
// published specifications: W3C Web Annotation Data Model (W3C Recommendation, 23 February 2017) and
// IIIF Presentation API 3.0, with Media Fragments URI 1.0 for rectangles. Readers get only vetted work.
import { beforeAll, describe, expect, it } from "vitest";
import type { RegionView } from "@/lib/regions/types";
import { call, DEMO, signedIn, type Jar } from "../support/app";
import { photographedSource, vocabulary, type Vocabulary } from "../support/evidence";

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
let contributor: Jar, editor: Jar, reader: Jar;
let vocab: Vocabulary;
let sourceId: number, imageId: number;
let vetted: RegionView, draft: RegionView;

beforeAll(async () => {
  [contributor, editor, reader] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.reader)]);
  vocab = await vocabulary();
  ({ sourceId, imageId } = await photographedSource(contributor, 1200, 900));
  const mark = async (shape: unknown, observations: unknown[]) =>
    (await (await call(`/api/images/${imageId}/regions`, { jar: contributor, json: { shape, observations } })).json()) as RegionView;
  const hand = await mark({ kind: "rectangle", x: 100, y: 200, w: 300, h: 400 }, [
    { aspectId: vocab.aspect("right_hand_technique"), termId: vocab.term("right_hand_technique", "strumming"), confidence: "probable", note: "thumb down the strings" },
  ]);
  draft = await mark({ kind: "polygon", points: [[500, 300], [600, 250], [700, 300], [600, 420]] }, [
    { aspectId: vocab.aspect("rose"), termId: vocab.term("rose", "recessed_multi_layer"), confidence: "certain" },
  ]);
  const proposed = (await (await call(`/api/regions/${hand.id}/propose`, { jar: contributor, json: { version: hand.version } })).json()) as RegionView;
  vetted = (await (await call(`/api/regions/${hand.id}/review`, { jar: editor, json: { version: proposed.version, decision: "vetted" } })).json()) as RegionView;
}, 120_000);

const get = async (path: string, jar?: Jar) => {
  const res = await call(path, { jar });
  return { res, body: res.status === 200 ? ((await res.json()) as Json) : null };
};

describe("W3C Web Annotation page of a photograph", () => {
  it("is JSON-LD with the annotation context, an id, the AnnotationPage type and one annotation per region shown (§3.1, §5.2)", async () => {
    const { res, body } = await get(`/api/images/${imageId}/annotations`, reader);
    expect(res.headers.get("content-type")).toMatch(/^application\/ld\+json/);
    expect(res.headers.get("content-type")).toContain("http://www.w3.org/ns/anno.jsonld");
    expect([body!["@context"]].flat()).toContain("http://www.w3.org/ns/anno.jsonld");
    expect(body!.type).toBe("AnnotationPage");
    expect(body!.id).toMatch(new RegExp(`^https?://[^/]+/api/images/${imageId}/annotations$`));
    // The reader sees the vetted region only.
    expect(body!.items).toHaveLength(1);
    const [a] = body!.items as Json[];
    expect(a.type).toBe("Annotation");
    expect(typeof a.id).toBe("string");
    expect(a.created).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d(\.\d+)?Z$/);
    expect(a.creator).toMatchObject({ type: "Person", name: expect.any(String) });
  });

  it("targets a rectangle with a FragmentSelector holding a Media Fragments xywh value in pixels (§4.2.1)", async () => {
    const { body } = await get(`/api/images/${imageId}/annotations`, reader);
    const target = (body!.items as Json[])[0].target as Json;
    expect(target.type).toBe("SpecificResource");
    expect(target.selector).toEqual({ type: "FragmentSelector", conformsTo: "http://www.w3.org/TR/media-frags/", value: "xywh=100,200,300,400" });
    expect(target.source).toMatch(new RegExp(`/iiif/3/manifests/${sourceId}/canvas/${imageId}$`));
  });

  it("carries each observation as a body in words, with its confidence and note", async () => {
    const { body } = await get(`/api/images/${imageId}/annotations`, reader);
    const bodies = [(body!.items as Json[])[0].body].flat() as Json[];
    const text = bodies.filter((b) => b.type === "TextualBody").map((b) => b.value).join("\n");
    expect(text).toContain("Right-hand technique: strumming (probable)");
    expect(text).toContain("thumb down the strings");
  });

  it("gives the author their draft polygon as an SvgSelector (§4.2.7) when they ask for their own work", async () => {
    const { body } = await get(`/api/images/${imageId}/annotations`, contributor);
    expect(body!.items).toHaveLength(2);
    const polygon = (body!.items as Json[]).find((a) => a.target.selector.type === "SvgSelector")!;
    expect(polygon.target.selector.value).toMatch(/^<svg[^>]*xmlns="http:\/\/www\.w3\.org\/2000\/svg"[^>]*><polygon points="500,300 600,250 700,300 600,420"\s*\/><\/svg>$/);
  });

  it("answers at each annotation's own id with that annotation, and not at all for work the caller may not see", async () => {
    const one = await get(`/api/regions/${vetted.id}/annotation`, reader);
    expect(one.body!["@context"]).toBe("http://www.w3.org/ns/anno.jsonld");
    expect(one.body!.id).toMatch(new RegExp(`/api/regions/${vetted.id}/annotation$`));
    expect((await get(`/api/regions/${draft.id}/annotation`, reader)).res.status).toBe(404);
  });
});

describe("IIIF Presentation 3.0 manifest of a source", () => {
  it("has the context, id, type, a language-map label and a canvas per photograph at full size", async () => {
    const { res, body } = await get(`/iiif/3/manifests/${sourceId}`, reader);
    expect(res.headers.get("content-type")).toContain("http://iiif.io/api/presentation/3/context.json");
    expect(body!["@context"]).toBe("http://iiif.io/api/presentation/3/context.json");
    expect(body!.type).toBe("Manifest");
    expect(body!.id).toMatch(new RegExp(`/iiif/3/manifests/${sourceId}$`));
    expect(Object.values(body!.label as Json).flat()[0]).toMatch(/^Evidence-/);
    const [canvas] = body!.items as Json[];
    expect(canvas.type).toBe("Canvas");
    expect(canvas.id).not.toContain("#");
    expect([canvas.width, canvas.height]).toEqual([1200, 900]);
  });

  it("paints the photograph from the image service on its canvas and links the annotation page that targets it", async () => {
    const { body } = await get(`/iiif/3/manifests/${sourceId}`, reader);
    const [canvas] = body!.items as Json[];
    const painting = canvas.items[0].items[0];
    expect(canvas.items[0].type).toBe("AnnotationPage");
    expect(painting).toMatchObject({ type: "Annotation", motivation: "painting", target: canvas.id });
    const service = painting.body.service[0];
    expect(service.type).toBe("ImageService3");
    const info = await call(`${new URL(service.id).pathname}/info.json`, { jar: reader });
    expect(info.status).toBe(200);
    expect(canvas.annotations).toEqual([{ id: expect.stringMatching(new RegExp(`/api/images/${imageId}/annotations$`)), type: "AnnotationPage" }]);
    const page = await get(new URL(canvas.annotations[0].id).pathname, reader);
    expect((page.body!.items as Json[]).every((a) => a.target.source === canvas.id)).toBe(true);
  });

  it("is not given for a source the caller may not see", async () => {
    const res = await call("/api/sources", { jar: contributor, json: { title: "Unpublished evidence", objectType: "drawing" } });
    const { source } = (await res.json()) as { source: { id: number } };
    expect((await call(`/iiif/3/manifests/${source.id}`, { jar: reader })).status).toBe(404);
    expect((await call(`/iiif/3/manifests/not-a-number`)).status).toBe(400);
  });
});
