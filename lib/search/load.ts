import "server-only";
import { and, asc, eq, inArray, isNull, sql } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { collections, images, places, regions, regionVersions, sources } from "@/db/schema";
import { readDating } from "@/lib/dating";
import { observationsOf } from "@/lib/regions/observations";
import { attributionInWords } from "@/lib/sources/vocab";
import type { RegionFacts, SourceFacts, VersionFacts } from "./documents";

// Reads what the documents are built from, many entities at a time. Anything not found here (deleted,
// or on a deleted photograph or source) has no documents, and the delivery deletes those it had.

/** Live sources by id, with their collection, place and photographs. */
export async function loadSources(ex: Executor, ids: number[]): Promise<Map<number, SourceFacts>> {
  const out = new Map<number, SourceFacts>();
  if (ids.length === 0) return out;
  const rows = await ex
    .select({
      source: sources,
      collectionName: collections.name,
      collectionCity: collections.city,
      placeName: places.name,
      latitude: places.latitude,
      longitude: places.longitude,
    })
    .from(sources)
    .leftJoin(collections, eq(collections.id, sources.collectionId))
    .leftJoin(places, eq(places.id, sources.placeId))
    .where(and(inArray(sources.id, ids), isNull(sources.deletedAt)));
  const pictures = await ex
    .select({ sourceId: images.sourceId, n: sql<number>`COUNT(*)`, first: sql<number>`MIN(${images.id})` })
    .from(images)
    .where(and(inArray(images.sourceId, ids), eq(images.state, "ready"), isNull(images.deletedAt)))
    .groupBy(images.sourceId);
  const pictureOf = new Map(pictures.map((p) => [p.sourceId, p]));
  for (const { source: s, ...r } of rows) {
    const reading = s.datingEdtf ? readDating(s.datingEdtf) : null;
    out.set(s.id, {
      id: s.id,
      title: s.title,
      artist: s.artist,
      attribution: attributionInWords(s.attributionQualifier, s.artist),
      objectType: s.objectType,
      medium: s.medium,
      state: s.state,
      createdBy: s.createdBy,
      collectionId: s.collectionId,
      collection: r.collectionName ? (r.collectionCity ? `${r.collectionName}, ${r.collectionCity}` : r.collectionName) : null,
      accessionNumber: s.accessionNumber,
      placeId: s.placeId,
      place: r.placeName,
      latitude: r.latitude === null ? null : Number(r.latitude),
      longitude: r.longitude === null ? null : Number(r.longitude),
      countryCode: s.countryCode,
      datingEdtf: s.datingEdtf,
      datingWords: reading?.ok ? reading.words : null,
      datingSearchEarliest: s.datingSearchEarliest,
      datingSearchLatest: s.datingSearchLatest,
      description: s.description,
      reliabilityNote: s.reliabilityNote,
      imageCount: Number(pictureOf.get(s.id)?.n ?? 0),
      firstImageId: pictureOf.has(s.id) ? Number(pictureOf.get(s.id)!.first) : null,
      updatedAt: s.updatedAt,
    });
  }
  return out;
}

/** Live regions by id on live photographs of live sources, with the versions their documents show. */
export async function loadRegions(ex: Executor, ids: number[]): Promise<Map<number, RegionFacts>> {
  const out = new Map<number, RegionFacts>();
  if (ids.length === 0) return out;
  const rows = await ex
    .select({ region: regions, sourceId: images.sourceId })
    .from(regions)
    .innerJoin(images, eq(images.id, regions.imageId))
    .where(and(inArray(regions.id, ids), isNull(regions.deletedAt), isNull(images.deletedAt)));
  const versionIds = [...new Set(rows.flatMap(({ region: r }) => [r.workingVersionId, r.vettedVersionId]).filter((v): v is number => v !== null))];
  const versionRows = versionIds.length ? await ex.select().from(regionVersions).where(inArray(regionVersions.id, versionIds)) : [];
  const obs = await observationsOf(ex, versionIds);
  const versions = new Map<number, VersionFacts>(
    versionRows.map((v) => [
      v.id,
      { id: v.id, number: v.number, state: v.state, label: v.label, box: { x: v.boxX, y: v.boxY, w: v.boxW, h: v.boxH }, observations: obs.get(v.id) ?? [] },
    ]),
  );
  const sourceFacts = await loadSources(ex, [...new Set(rows.map((r) => r.sourceId))]);
  for (const { region: r, sourceId } of rows) {
    const source = sourceFacts.get(sourceId);
    if (!source) continue;
    out.set(r.id, {
      id: r.id,
      imageId: r.imageId,
      authorId: r.authorId,
      state: r.state,
      working: r.workingVersionId ? (versions.get(r.workingVersionId) ?? null) : null,
      vetted: r.vettedVersionId ? (versions.get(r.vettedVersionId) ?? null) : null,
      updatedAt: r.updatedAt,
      source,
    });
  }
  return out;
}

/** Every region ever marked on a photograph of these sources, deleted or not (their documents follow the source). */
export async function regionIdsOfSources(ex: Executor, sourceIds: number[]): Promise<number[]> {
  if (sourceIds.length === 0) return [];
  const rows = await ex
    .select({ id: regions.id })
    .from(regions)
    .innerJoin(images, eq(images.id, regions.imageId))
    .where(inArray(images.sourceId, sourceIds))
    .orderBy(asc(regions.id));
  return rows.map((r) => r.id);
}
