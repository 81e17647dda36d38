import "server-only";
import type { Actor } from "@/lib/auth/policy";
import { appUrl, datingMargins } from "@/lib/config";
import { readDating } from "@/lib/dating";
import { listImagesOfSource, getImageForViewer } from "@/lib/images/queries";
import { LIMITS } from "@/lib/iiif/serve";
import { placeLine } from "@/lib/places/format";
import { getRegion, listRegionsOfImage, listRegionsOfSource } from "@/lib/regions/queries";
import type { RegionView } from "@/lib/regions/types";
import { attributionInWords, OBJECT_TYPE_LABELS } from "@/lib/sources/vocab";
import { getSource } from "@/lib/sources/queries";
import { countryName } from "@/lib/catalogue/countries";
import { AppError } from "@/lib/errors";
import { canvasIdFor } from "./context";
import { sourceManifest, type Manifest } from "./iiif-manifest";
import { annotationPage, regionAnnotation, type AnnotationPage, type RegionExport, type WebAnnotation } from "./web-annotation";

// The open-standard documents, gathered from what the caller may see: the regions of a photograph as a
// W3C Web Annotation page, one region as an annotation, and a source as a IIIF Presentation manifest.

export const ANNOTATION_CONTENT_TYPE = 'application/ld+json; profile="http://www.w3.org/ns/anno.jsonld"';
export const MANIFEST_CONTENT_TYPE = 'application/ld+json;profile="http://iiif.io/api/presentation/3/context.json"';

export const manifestUrl = (sourceId: number) => `${appUrl()}/iiif/3/manifests/${sourceId}`;
export const annotationPageUrl = (imageId: number) => `${appUrl()}/api/images/${imageId}/annotations`;
export const regionIri = (regionId: number) => `${appUrl()}/api/regions/${regionId}/annotation`;
const imageServiceUrl = (imageId: number) => `${appUrl()}/iiif/3/${imageId}`;

function toExport(r: RegionView): RegionExport {
  return {
    id: r.id,
    iri: regionIri(r.id),
    shape: r.shape,
    label: r.label,
    state: r.state,
    versionNumber: r.versionNumber,
    author: { name: r.authorName },
    created: r.createdAt,
    modified: r.updatedAt,
    observations: r.observations,
  };
}

async function targetOf(actor: Actor | null, imageId: number) {
  const image = await getImageForViewer(actor, imageId);
  return {
    image,
    target: {
      imageServiceId: imageServiceUrl(imageId),
      // The page is referred to from the source's manifest, so it targets that manifest's canvas (IIIF 3.0 §3.4).
      canvasId: canvasIdFor(manifestUrl(image.sourceId), imageId),
      imageWidth: image.width ?? 0,
      imageHeight: image.height ?? 0,
    },
  };
}

export async function imageAnnotationPage(actor: Actor | null, imageId: number, opts: { proposed?: boolean } = {}): Promise<AnnotationPage> {
  const { image, target } = await targetOf(actor, imageId);
  const regions = await listRegionsOfImage(actor, imageId, opts);
  return annotationPage({
    ...target,
    pageId: annotationPageUrl(imageId) + (opts.proposed ? "?proposed=1" : ""),
    label: `Evidence marked on ${image.caption || "a photograph"} of “${image.source.title}”`,
    regions: regions.map(toExport),
  });
}

export async function regionAnnotationDocument(actor: Actor | null, regionId: number, opts: { proposed?: boolean } = {}): Promise<WebAnnotation> {
  const region = await getRegion(actor, regionId, opts);
  const { target } = await targetOf(actor, region.imageId);
  return regionAnnotation(toExport(region), target);
}

export async function sourceManifestDocument(actor: Actor | null, sourceId: number): Promise<Manifest> {
  const source = await getSource(actor, sourceId);
  const images = (await listImagesOfSource(actor, sourceId)).filter((i) => i.state === "ready" && i.width && i.height);
  // A manifest needs at least one canvas (IIIF Presentation 3.0 §3.2, items).
  if (images.length === 0) throw new AppError(404, "not_found", "This source has no processed photograph yet, so it has no manifest.");
  const withRegions = new Set((await listRegionsOfSource(actor, sourceId)).map((r) => r.imageId));
  const dating = source.datingEdtf ? readDating(source.datingEdtf, datingMargins()) : null;
  const place = source.place ? placeLine({ ...source.place, country: source.place.countryCode ? countryName(source.place.countryCode) : null }) : null;
  return sourceManifest({
    manifestId: manifestUrl(sourceId),
    title: source.title,
    summary: source.description,
    homepage: `${appUrl()}/sources/${sourceId}`,
    attribution: attributionInWords(source.attributionQualifier, source.artist),
    datingEdtf: dating?.ok ? dating.edtf : source.datingEdtf,
    place,
    collection: source.collection?.name ?? null,
    accessionNumber: source.accessionNumber,
    objectType: OBJECT_TYPE_LABELS[source.objectType],
    medium: source.medium,
    creditLine: source.creditLine,
    rightsUri: source.rightsUri,
    images: images.map((i, n) => ({
      id: i.id,
      label: i.caption || `Photograph ${n + 1}`,
      width: i.width!,
      height: i.height!,
      imageServiceId: imageServiceUrl(i.id),
      annotationPageId: withRegions.has(i.id) ? annotationPageUrl(i.id) : null,
    })),
    serviceProfile: "level2",
    limits: LIMITS,
  });
}
