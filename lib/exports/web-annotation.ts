// An image's regions as W3C Web Annotations (Web Annotation Data Model, W3C Recommendation,
// 23 February 2017) collected in an Annotation Page (§5.2) that is also a IIIF Presentation 3.0
// Annotation Page, so a manifest's Canvas can refer to it from `annotations`. Pure: the route gathers
// the regions (what the caller may see) and the absolute URLs; this only shapes them.
//
// Choices, with the model's words for them (§3.3.5 Motivation and Purpose):
// - The annotation's motivation is `describing` ("describe the Target, as opposed to a comment about
//   it"): an observation states what the picture shows. A region with nothing recorded is `highlighting`.
// - Each observation is a TextualBody with purpose `describing` whose text carries the aspect, value,
//   confidence and note ("Right-hand technique: strumming (probable). Note: …"). The model has no
//   property for confidence, so the words are the only place it travels.
// - A vocabulary term also gets a machine-usable body: purpose `classifying` on a SpecificResource whose
//   source is the term's IRI when there is one (§4.1), otherwise a `tagging` TextualBody "Aspect: term".
// - The review state is shown to people as a `commenting` body ("Proposed for review; not yet vetted
//   by an editor") and to machines as `schema:creativeWorkStatus` with `schema:version`. anno.jsonld
//   defines the `schema:` prefix (http://schema.org/); the model invites extra properties (§3.3 note).
import { observationSentence, type ObservationView, type RegionShape, type RegionState } from "@/lib/regions/types";
import { ANNO_CONTEXT, PAGE_CONTEXT, fullImageUrl, languageMap, xsdDateTime, type LanguageMap } from "./context";
import { shapeSelector, type ShapeSelector } from "./selectors";

export type ObservationExport = Pick<
  ObservationView,
  "aspectKey" | "aspectLabel" | "kind" | "termKey" | "termLabel" | "count" | "text" | "confidence" | "note"
> & { /** A dereferenceable IRI for the term, when the vocabulary publishes one. */ termIri?: string | null };

export interface RegionExport {
  id: number;
  /** Absolute URL of the region; also the annotation's id (§3.1: exactly one IRI). */
  iri: string;
  shape: RegionShape;
  label: string | null;
  state: RegionState;
  versionNumber: number;
  author: { name: string; iri?: string | null };
  created: Date | string;
  modified: Date | string;
  observations: ObservationExport[];
}

/** Where the regions lie: the image service and, when the page is used from a manifest, the Canvas. */
export interface AnnotationTargetInput {
  /** Absolute URL of the IIIF Image API service, e.g. https://host/iiif/3/12. */
  imageServiceId: string;
  /** The Canvas the regions lie on; IIIF §3.4 wants it as the target of a Canvas's `annotations`. */
  canvasId?: string | null;
  imageWidth: number;
  imageHeight: number;
}

export interface AnnotationPageInput extends AnnotationTargetInput {
  /** Absolute URL of this page, e.g. https://host/api/images/12/annotations. */
  pageId: string;
  label: string;
  regions: RegionExport[];
}

export type TextualBody = {
  type: "TextualBody";
  purpose: "describing" | "tagging" | "commenting";
  value: string;
  format: "text/plain";
  language: "en";
};
export type ClassifyingBody = { type: "SpecificResource"; purpose: "classifying"; source: string };
export type AnnotationBody = TextualBody | ClassifyingBody;

export type ImageSource = {
  id: string;
  type: "Image";
  format: "image/jpeg";
  width: number;
  height: number;
  service: { id: string; type: "ImageService3" }[];
};

export interface WebAnnotation {
  "@context"?: typeof ANNO_CONTEXT;
  id: string;
  type: "Annotation";
  motivation: "describing" | "highlighting";
  creator: { id?: string; type: "Person"; name: string };
  created: string;
  modified: string;
  "schema:creativeWorkStatus": RegionState;
  "schema:version": number;
  body: AnnotationBody[];
  target: { type: "SpecificResource"; source: string | ImageSource; selector: ShapeSelector };
}

export interface AnnotationPage {
  "@context": typeof PAGE_CONTEXT;
  id: string;
  type: "AnnotationPage";
  label: LanguageMap;
  startIndex: 0;
  items: WebAnnotation[];
}

const text = (purpose: TextualBody["purpose"], value: string): TextualBody => ({
  type: "TextualBody",
  purpose,
  value,
  format: "text/plain",
  language: "en",
});

const STATE_SENTENCES: Record<RegionState, string> = {
  vetted: "Vetted by an editor",
  proposed: "Proposed for review; not yet vetted by an editor",
  draft: "Draft, not yet proposed for review",
  returned: "Returned to its author for changes; not vetted",
  withdrawn: "Withdrawn by its author; not vetted",
};

/** The words a reader sees for a region's review state, e.g. "Vetted by an editor (version 2)." */
export function stateSentence(state: RegionState, versionNumber: number): string {
  return `${STATE_SENTENCES[state]} (version ${versionNumber}).`;
}

/** "Right-hand technique: strumming (probable). Note: the thumb is hidden by the sleeve." */
export function observationText(o: ObservationExport): string {
  const note = o.note?.trim();
  return note ? `${observationSentence(o)}. Note: ${note}` : observationSentence(o);
}

function observationBodies(o: ObservationExport): AnnotationBody[] {
  const bodies: AnnotationBody[] = [text("describing", observationText(o))];
  if (o.kind === "terms" && o.termLabel) {
    bodies.push(o.termIri
      ? { type: "SpecificResource", purpose: "classifying", source: o.termIri }
      : text("tagging", `${o.aspectLabel}: ${o.termLabel}`));
  }
  return bodies;
}

function targetSource(target: AnnotationTargetInput): string | ImageSource {
  if (target.canvasId) return target.canvasId;
  return {
    id: fullImageUrl(target.imageServiceId),
    type: "Image",
    format: "image/jpeg",
    width: target.imageWidth,
    height: target.imageHeight,
    service: [{ id: target.imageServiceId, type: "ImageService3" }],
  };
}

function annotationOf(region: RegionExport, target: AnnotationTargetInput): WebAnnotation {
  const described = [
    ...(region.label?.trim() ? [text("describing", region.label.trim())] : []),
    ...region.observations.flatMap(observationBodies),
  ];
  const image = { width: target.imageWidth, height: target.imageHeight };
  return {
    id: region.iri,
    type: "Annotation",
    motivation: described.length > 0 ? "describing" : "highlighting",
    creator: { ...(region.author.iri ? { id: region.author.iri } : {}), type: "Person", name: region.author.name },
    created: xsdDateTime(region.created),
    modified: xsdDateTime(region.modified),
    "schema:creativeWorkStatus": region.state,
    "schema:version": region.versionNumber,
    body: [...described, text("commenting", stateSentence(region.state, region.versionNumber))],
    target: { type: "SpecificResource", source: targetSource(target), selector: shapeSelector(region.shape, image) },
  };
}

/** One region as a standalone annotation document (§3.1: a single @context value is a string). */
export function regionAnnotation(region: RegionExport, target: AnnotationTargetInput): WebAnnotation {
  return { "@context": ANNO_CONTEXT, ...annotationOf(region, target) };
}

/**
 * The page of an image's annotations, in the order given. The embedded annotations carry no @context
 * (IIIF §4.6: only the top-most resource). An image without regions gives an empty `items`: IIIF §3.4
 * only says a page SHOULD have items, while W3C §5.2 says MUST, so callers that can should not refer
 * to an empty page (the manifest builder leaves `annotations` out when asked to).
 */
export function annotationPage(input: AnnotationPageInput): AnnotationPage {
  return {
    "@context": PAGE_CONTEXT,
    id: input.pageId,
    type: "AnnotationPage",
    label: languageMap(input.label),
    startIndex: 0,
    items: input.regions.map((region) => annotationOf(region, input)),
  };
}
