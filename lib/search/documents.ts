// The search documents, built from what the database says (pure: the loader in load.ts reads the rows).
//
// Regions index: one document per version an audience may be shown, so that who sees what is a
// filter inside the query the server sends (see visibility.ts), never a pass over the results:
//   `${regionId}-vetted`   the last vetted version (isVetted), what readers and visitors see;
//   `${regionId}-working`  the version in progress, only while it differs from the vetted one
//                          (isWorking), for its author, editors once it is in review, admins, and
//                          readers who ask for proposed work that has no vetted version yet.
// When the working version is the vetted one, the single `-vetted` document has both flags. Every
// document carries the region's current state (`regionState`, the working version's), its author and
// its source's state and creator, which the visibility filter reads. Deleted regions, regions on
// deleted photographs and regions of deleted sources have no documents.
//
// Sources index: one document per live source (`${sourceId}`), with its state and creator.
//
// Facets: `t_<aspect key>` lists the term keys observed for a terms aspect, `n_<aspect key>` the
// numbers observed for a count aspect; `decade` and `century` list every decade (1640 = 1640–1649)
// and century (1600 = 1600–1699) the widened dating overlaps; `dateFrom` / `dateTo` are the widened
// bounds as YYYYMMDD numbers (absent when open), so a date overlap is two numeric comparisons.
import type { RegionState } from "@/db/schema/regions";
import type { ObservationView } from "@/lib/regions/types";

/** A decade or century list longer than this says nothing useful for faceting; it is left empty. */
export const MAX_DECADES = 100;

/** What a document needs of an observation: the region view's fields without the ids and labels it shows. */
export type ObservationFacts = Pick<ObservationView, "aspectKey" | "kind" | "termKey" | "termLabel" | "count" | "text" | "confidence" | "note">;

export type VersionFacts = {
  id: number;
  number: number;
  state: RegionState;
  label: string | null;
  box: { x: number; y: number; w: number; h: number };
  observations: ObservationFacts[];
};

export type SourceFacts = {
  id: number;
  title: string;
  artist: string | null;
  attribution: string;
  objectType: string;
  medium: string | null;
  state: "draft" | "published";
  createdBy: number;
  collectionId: number | null;
  collection: string | null;
  accessionNumber: string | null;
  placeId: number | null;
  place: string | null;
  latitude: number | null;
  longitude: number | null;
  countryCode: string | null;
  datingEdtf: string | null;
  datingWords: string | null;
  /** Widened bounds, ISO days; null = open (or undated when datingEdtf is null). */
  datingSearchEarliest: string | null;
  datingSearchLatest: string | null;
  description: string | null;
  reliabilityNote: string | null;
  imageCount: number;
  firstImageId: number | null;
  updatedAt: Date;
};

export type RegionFacts = {
  id: number;
  imageId: number;
  authorId: number;
  state: RegionState;
  working: VersionFacts | null;
  vetted: VersionFacts | null;
  updatedAt: Date;
  source: SourceFacts;
};

/** "1650-06-15" → 16500615: ISO days as numbers keep their order, so range filters work on them. */
export function dayNumber(isoDay: string): number {
  return Number(isoDay.replaceAll("-", ""));
}

const yearOfDay = (isoDay: string) => Number(isoDay.slice(0, 4));

function spans(earliest: string | null, latest: string | null, width: number): number[] {
  if (!earliest || !latest) return [];
  const first = Math.floor(yearOfDay(earliest) / width) * width;
  const last = Math.floor(yearOfDay(latest) / width) * width;
  if (last < first || (last - first) / width + 1 > MAX_DECADES) return [];
  const out: number[] = [];
  for (let start = first; start <= last; start += width) out.push(start);
  return out;
}

/** Every decade (by its first year) that the bounds overlap; none for an open or very long span. */
export const decadesOf = (earliest: string | null, latest: string | null) => spans(earliest, latest, 10);

/** Every century (1600 = 1600–1699) that the bounds overlap. */
export const centuriesOf = (earliest: string | null, latest: string | null) => spans(earliest, latest, 100);

const uniq = <T>(values: T[]) => [...new Set(values)];
const present = <T>(values: (T | null | undefined)[]) => values.filter((v): v is T => v !== null && v !== undefined && v !== "");

/** Where, when and what the source is: shared by its own document and its regions' documents. */
function sourceFields(s: SourceFacts) {
  return {
    sourceId: s.id,
    sourceTitle: s.title,
    artist: s.artist,
    attribution: s.attribution,
    objectType: s.objectType,
    sourceState: s.state,
    sourceCreatorId: s.createdBy,
    collectionId: s.collectionId,
    collection: s.collection,
    placeId: s.placeId,
    place: s.place,
    country: s.countryCode,
    ...(s.latitude !== null && s.longitude !== null ? { _geo: { lat: s.latitude, lng: s.longitude } } : {}),
    dating: s.datingEdtf,
    datingWords: s.datingWords,
    dated: s.datingEdtf !== null,
    ...(s.datingEdtf && s.datingSearchEarliest ? { dateFrom: dayNumber(s.datingSearchEarliest) } : {}),
    ...(s.datingEdtf && s.datingSearchLatest ? { dateTo: dayNumber(s.datingSearchLatest) } : {}),
    decade: s.datingEdtf ? decadesOf(s.datingSearchEarliest, s.datingSearchLatest) : [],
    century: s.datingEdtf ? centuriesOf(s.datingSearchEarliest, s.datingSearchLatest) : [],
    description: s.description,
  };
}

export type AspectFacets = { [field: `t_${string}`]: string[] } & { [field: `n_${string}`]: number[] };

/** The facet fields of one version's observations: `t_<aspect>` term keys, `n_<aspect>` counts. */
export function observationFacets(observations: ObservationFacts[]): AspectFacets {
  const out: Record<string, (string | number)[]> = {};
  for (const o of observations) {
    if (o.kind === "terms" && o.termKey) (out[`t_${o.aspectKey}`] ??= []).push(o.termKey);
    if (o.kind === "count" && o.count !== null) (out[`n_${o.aspectKey}`] ??= []).push(o.count);
  }
  return Object.fromEntries(Object.entries(out).map(([k, v]) => [k, uniq(v)])) as AspectFacets;
}

export type RegionDocument = ReturnType<typeof versionDocument> & AspectFacets;

function versionDocument(r: RegionFacts, v: VersionFacts, copy: "vetted" | "working") {
  const isWorking = r.working?.id === v.id;
  const isVetted = r.vetted?.id === v.id;
  return {
    id: `${r.id}-${copy}`,
    regionId: r.id,
    copy,
    isVetted,
    isWorking,
    state: v.state,
    regionState: r.state,
    hasVetted: r.vetted !== null,
    pendingRevision: r.vetted !== null && !isWorking,
    authorId: r.authorId,
    imageId: r.imageId,
    versionNumber: v.number,
    box: v.box,
    label: v.label,
    observations: v.observations.map(({ aspectKey, termKey, termLabel, count, text, confidence, note }) => ({ aspectKey, termKey, termLabel, count, text, confidence, note })),
    aspects: uniq(v.observations.map((o) => o.aspectKey)),
    ...observationFacets(v.observations),
    confidence: uniq(v.observations.map((o) => o.confidence)),
    terms: uniq(present(v.observations.map((o) => o.termLabel))),
    notes: present(v.observations.flatMap((o) => [o.text, o.note])),
    ...sourceFields(r.source),
    updatedAt: r.updatedAt.getTime(),
  };
}

/** The documents a region should have now: its vetted version, and its working one when that differs. */
export function regionDocuments(r: RegionFacts): RegionDocument[] {
  const docs: RegionDocument[] = [];
  if (r.vetted) docs.push(versionDocument(r, r.vetted, "vetted"));
  if (r.working && r.working.id !== r.vetted?.id) docs.push(versionDocument(r, r.working, "working"));
  return docs;
}

/** Every document id a region can have, so that the ones it should no longer have are deleted. */
export const regionDocumentIds = (regionId: number) => [`${regionId}-vetted`, `${regionId}-working`];

export type SourceDocument = ReturnType<typeof sourceDocument>;

export function sourceDocument(s: SourceFacts) {
  const { sourceId, sourceTitle, ...rest } = sourceFields(s);
  return {
    id: String(sourceId),
    sourceId,
    title: sourceTitle,
    ...rest,
    medium: s.medium,
    accessionNumber: s.accessionNumber,
    reliabilityNote: s.reliabilityNote,
    imageCount: s.imageCount,
    firstImageId: s.firstImageId,
    updatedAt: s.updatedAt.getTime(),
  };
}
