// A source as a IIIF Presentation API 3.0 Manifest: one Canvas per image, the image painted on it from
// our Image API service, and the image's regions referred to as an Annotation Page in the Canvas's
// `annotations` (the page itself comes from web-annotation.ts). Sections cited are of
// iiif.io/api/presentation/3.0, read from the stored copy of IIIF/api source/presentation/3.0/index.md.
// Pure: the route gathers what the caller may see and the absolute URLs.
import { rightsLabel } from "@/lib/catalogue/rights";
import { readDating } from "@/lib/dating";
import type { Level } from "@/lib/iiif/capabilities";
import { parseImageRequest, type Limits } from "@/lib/iiif/request";
import {
  IIIF_PRESENTATION_CONTEXT, canvasIdFor, fullImageUrl, iiifRightsUri, labelValue, languageMap, plainText,
  type LabelValue, type LanguageMap,
} from "./context";

export interface ManifestImage {
  id: number;
  label: string;
  /** Full size in pixels; the Canvas gets the same size, so region coordinates apply to it unchanged. */
  width: number;
  height: number;
  imageServiceId: string;
  /** The image's annotation page; leave it out when the image has no regions to show (W3C §5.2). */
  annotationPageId?: string | null;
}

export interface ManifestInput {
  /** Absolute URL of the manifest, e.g. https://host/iiif/3/manifests/7. */
  manifestId: string;
  title: string;
  summary?: string | null;
  /** The source's page in the archive. */
  homepage: string;
  /** "Attributed to …", as the source page words it. */
  attribution?: string | null;
  datingEdtf?: string | null;
  place?: string | null;
  collection?: string | null;
  accessionNumber?: string | null;
  objectType?: string | null;
  medium?: string | null;
  creditLine?: string | null;
  rightsUri?: string | null;
  provider?: { id: string; label: string; homepage?: string | null } | null;
  images: ManifestImage[];
  /** What info.json says of the service (lib/iiif/serve.ts); the route's features make it level2. */
  serviceProfile?: Level;
  /** The service's size limits, so the painted image's size is what full/max really returns. */
  limits?: Limits;
}

type ImageService = { id: string; type: "ImageService3"; profile: Level };
type ImageResource = { id: string; type: "Image"; format: "image/jpeg"; width: number; height: number; service: ImageService[] };
type Reference = { id: string; type: "AnnotationPage" };

export interface Canvas {
  id: string;
  type: "Canvas";
  label: LanguageMap;
  width: number;
  height: number;
  thumbnail: ImageResource[];
  items: { id: string; type: "AnnotationPage"; items: PaintingAnnotation[] }[];
  annotations?: Reference[];
}
export interface PaintingAnnotation { id: string; type: "Annotation"; motivation: "painting"; body: ImageResource; target: string }

export interface Manifest {
  "@context": typeof IIIF_PRESENTATION_CONTEXT;
  id: string;
  type: "Manifest";
  label: LanguageMap;
  summary?: LanguageMap;
  metadata: LabelValue[];
  requiredStatement?: LabelValue;
  rights?: string;
  provider?: { id: string; type: "Agent"; label: LanguageMap; homepage?: HomePage[] }[];
  homepage: HomePage[];
  thumbnail: ImageResource[];
  navDate?: string;
  items: Canvas[];
}
type HomePage = { id: string; type: "Text"; label: LanguageMap; format: "text/html"; language?: string[] };

const THUMBNAIL = 300;

/** An Image API request for this image, sized as the service will answer it (or an error, never a guess). */
function imageAt(image: ManifestImage, size: string, input: ManifestInput): ImageResource {
  const answer = parseImageRequest(
    { region: "full", size, rotation: "0", quality: "default", format: "jpg" },
    image,
    input.limits ?? {},
  );
  if (!answer.ok) throw new Error(`image ${image.id}: ${answer.message}`);
  const base = image.imageServiceId.replace(/\/+$/, "");
  return {
    id: size === "max" ? fullImageUrl(base) : `${base}/full/${size}/0/default.jpg`,
    type: "Image",
    format: "image/jpeg",
    width: answer.size.w,
    height: answer.size.h,
    service: [{ id: base, type: "ImageService3", profile: input.serviceProfile ?? "level2" }],
  };
}

/** At most 300 px on the long side, never upscaled (a size larger than the image needs `^`, §4.2). */
function thumbnailOf(image: ManifestImage, input: ManifestInput): ImageResource {
  const size = image.width >= image.height ? `${Math.min(THUMBNAIL, image.width)},` : `,${Math.min(THUMBNAIL, image.height)}`;
  return imageAt(image, size, input);
}

function canvasOf(image: ManifestImage, input: ManifestInput): Canvas {
  const id = canvasIdFor(input.manifestId, image.id);
  if (!(Number.isInteger(image.width) && Number.isInteger(image.height) && image.width > 0 && image.height > 0)) {
    throw new Error(`image ${image.id}: a Canvas's width and height MUST be positive integers (IIIF §3.2)`);
  }
  return {
    id,
    type: "Canvas",
    label: languageMap(image.label),
    width: image.width,
    height: image.height,
    thumbnail: [thumbnailOf(image, input)],
    // §5.3: painting annotations in `items`, everything else in `annotations`.
    items: [{
      id: `${id}/page`,
      type: "AnnotationPage",
      items: [{ id: `${id}/page/image`, type: "Annotation", motivation: "painting", body: imageAt(image, "max", input), target: id }],
    }],
    // §5.5: a referenced page has id and type and MUST NOT have items.
    ...(image.annotationPageId ? { annotations: [{ id: image.annotationPageId, type: "AnnotationPage" as const }] } : {}),
  };
}

function datingEntry(edtf: string): { entry: LabelValue; navDate?: string } {
  const reading = readDating(edtf);
  if (!reading.ok) return { entry: labelValue("Date", edtf) };
  return {
    entry: labelValue("Date", `${reading.words} (EDTF ${reading.edtf})`),
    // §3.1 navDate: xsd:dateTime with a timezone; the first day the dating allows.
    ...(reading.earliest ? { navDate: `${reading.earliest}T00:00:00Z` } : {}),
  };
}

function metadataOf(input: ManifestInput): { metadata: LabelValue[]; navDate?: string } {
  const metadata: LabelValue[] = [];
  const add = (label: string, value: string | null | undefined, language = "en") => {
    if (value?.trim()) metadata.push(labelValue(label, value.trim(), language));
  };
  add("Attribution", input.attribution);
  const dating = input.datingEdtf?.trim() ? datingEntry(input.datingEdtf.trim()) : null;
  if (dating) metadata.push(dating.entry);
  // Names and numbers have no language of their own (IIIF §4.4: the key "none").
  add("Place", input.place, "none");
  add("Collection", input.collection, "none");
  add("Accession number", input.accessionNumber, "none");
  add("Object type", input.objectType);
  add("Medium", input.medium);
  add("Rights", rightsLabel(input.rightsUri) ?? (iiifRightsUri(input.rightsUri) ? null : input.rightsUri));
  return { metadata, ...(dating?.navDate ? { navDate: dating.navDate } : {}) };
}

/** The manifest of a source. Throws when there is no image: §3.4, a Manifest MUST have at least one Canvas. */
export function sourceManifest(input: ManifestInput): Manifest {
  if (input.images.length === 0) throw new Error("a Manifest needs at least one image (IIIF Presentation 3.0 §3.4 items)");
  const { metadata, navDate } = metadataOf(input);
  const rights = iiifRightsUri(input.rightsUri);
  const items = input.images.map((image) => canvasOf(image, input));
  return {
    "@context": IIIF_PRESENTATION_CONTEXT,
    id: input.manifestId,
    type: "Manifest",
    label: languageMap(input.title),
    ...(input.summary?.trim() ? { summary: languageMap(plainText(input.summary.trim())) } : {}),
    metadata,
    ...(input.creditLine?.trim() ? { requiredStatement: labelValue("Attribution", input.creditLine.trim()) } : {}),
    ...(rights ? { rights } : {}),
    ...(input.provider ? {
      provider: [{
        id: input.provider.id,
        type: "Agent" as const,
        label: languageMap(input.provider.label),
        ...(input.provider.homepage ? { homepage: [homePage(input.provider.homepage, input.provider.label)] } : {}),
      }],
    } : {}),
    homepage: [homePage(input.homepage, input.title)],
    thumbnail: items[0].thumbnail,
    ...(navDate ? { navDate } : {}),
    items,
  };
}

function homePage(id: string, label: string): HomePage {
  return { id, type: "Text", label: languageMap(label), format: "text/html", language: ["en"] };
}
