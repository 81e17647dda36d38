// What the Web Annotation and IIIF Presentation exports share: the JSON-LD contexts, language maps,
// xsd:dateTime values, the IRIs one export builds and the other refers to, and the rights URIs IIIF
// accepts. Sections cited are of the W3C Web Annotation Data Model (Recommendation, 23 February 2017)
// and IIIF Presentation API 3.0 (read from stored copies of both). Pure: no I/O.

export const ANNO_CONTEXT = "http://www.w3.org/ns/anno.jsonld";
export const IIIF_PRESENTATION_CONTEXT = "http://iiif.io/api/presentation/3/context.json";
export const MEDIA_FRAGMENTS = "http://www.w3.org/TR/media-frags/";
export const SVG_NAMESPACE = "http://www.w3.org/2000/svg";

/**
 * The @context of a document that is both a W3C Annotation Page and a IIIF one. W3C §5.2: a page not
 * embedded in a collection MUST list anno.jsonld. IIIF §4.6: its own context MUST be the last item,
 * other contexts go before it. The IIIF context also decides what `label` means (§4.7: a language map).
 */
export const PAGE_CONTEXT: readonly [typeof ANNO_CONTEXT, typeof IIIF_PRESENTATION_CONTEXT] = [
  ANNO_CONTEXT,
  IIIF_PRESENTATION_CONTEXT,
];

/** IIIF §4.4: `{ "en": ["…"] }`; the key is a BCP 47 tag, or "none" for text with no language. */
export type LanguageMap = Record<string, string[]>;
export type LabelValue = { label: LanguageMap; value: LanguageMap };

export function languageMap(text: string, language = "en"): LanguageMap {
  return { [language]: [text] };
}

/**
 * IIIF §4.5: summary and metadata values may carry HTML, recognised by a first "<" and a last ">".
 * Our values are plain text; one that happens to look like HTML gets the trailing space the
 * specification recommends, so that clients do not parse it.
 */
export function plainText(text: string): string {
  return text.startsWith("<") && text.endsWith(">") ? `${text} ` : text;
}

/** A metadata or requiredStatement entry (IIIF §3.1); the value is plain text. */
export function labelValue(label: string, value: string, valueLanguage = "en"): LabelValue {
  return { label: languageMap(label), value: languageMap(plainText(value), valueLanguage) };
}

const HAS_ZONE = /(?:Z|[+-]\d{2}:?\d{2})$/i;
const NO_ZONE = /^\d{4}-\d{2}-\d{2}[ T]\d{2}:\d{2}(?::\d{2}(?:\.\d+)?)?$/;

/**
 * W3C §3.3.1: created and modified MUST be xsd:dateTime in UTC, written with "Z". A string without a
 * zone is read as UTC, which is what the database connection uses (timezone "Z" in db/client.ts).
 */
export function xsdDateTime(value: Date | string): string {
  let date: Date;
  if (value instanceof Date) date = value;
  else {
    const text = value.trim();
    if (!HAS_ZONE.test(text) && !NO_ZONE.test(text)) throw new Error(`"${value}" is not a date and time`);
    date = new Date(HAS_ZONE.test(text) ? text : `${text.replace(" ", "T")}Z`);
  }
  if (Number.isNaN(date.getTime())) throw new Error(`"${String(value)}" is not a date and time`);
  return date.toISOString().replace(/\.000Z$/, "Z");
}

/** IIIF §5.3: a Canvas has its own HTTP(S) URI without a fragment, so that `#xywh=` can address parts of it. */
export function canvasIdFor(manifestId: string, imageId: number | string): string {
  if (manifestId.includes("#")) throw new Error("a manifest URI with a fragment cannot give Canvas URIs (IIIF §5.3)");
  return `${manifestId.replace(/\/+$/, "")}/canvas/${imageId}`;
}

/** The whole image at the largest size the service gives (IIIF Image API 3.0, §4: full/max/0/default). */
export function fullImageUrl(imageServiceId: string): string {
  return `${imageServiceId.replace(/\/+$/, "")}/full/max/0/default.jpg`;
}

const RIGHTS_STATEMENT = /^https?:\/\/rightsstatements\.org\/vocab\/([A-Za-z-]+)\/1\.0\/?$/;
const CREATIVE_COMMONS = /^https?:\/\/creativecommons\.org\/((?:licenses|publicdomain)\/[a-z-]+\/\d+\.\d+(?:\/[a-z]{2})?)\/?$/;

/**
 * IIIF §3.1 `rights`: a Creative Commons or RightsStatements.org URI, written as that body defines it.
 * Both publish their machine-actionable URIs with `http` (the note under `rights`), so the `https`
 * form we store for Creative Commons is rewritten. Anything else is null: the property is left out.
 */
export function iiifRightsUri(uri: string | null | undefined): string | null {
  if (!uri) return null;
  const rs = RIGHTS_STATEMENT.exec(uri.trim());
  if (rs) return `http://rightsstatements.org/vocab/${rs[1]}/1.0/`;
  const cc = CREATIVE_COMMONS.exec(uri.trim());
  return cc ? `http://creativecommons.org/${cc[1]}/` : null;
}
