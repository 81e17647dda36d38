import "server-only";
import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import type { Executor } from "@/db/client";
import { collections, images, places, sources } from "@/db/schema";
import type { Actor } from "@/lib/auth/policy";
import { countryName } from "@/lib/catalogue/countries";
import type { SourceSummary } from "@/lib/exports/cited-items";
import { placeLine } from "@/lib/places/format";
import { sourceCaptionColumns } from "./queries";
import { visibleSources } from "./visibility";

/**
 * The caption facts of the given sources, only of those the caller may see (visibleSources inside the
 * query), with each one's first processed photograph for a thumbnail: what dossiers and search exports
 * cite and caption, one query for any number of sources.
 */
export async function sourceSummaries(tx: Executor, actor: Actor | null, ids: number[]): Promise<Map<number, SourceSummary>> {
  if (ids.length === 0) return new Map();
  const rows = await tx
    .select({
      ...sourceCaptionColumns,
      medium: sources.medium,
      placeName: places.name,
      placeSubdivision: places.subdivisionCode,
      placeCountry: places.countryCode,
      collectionName: collections.name,
      collectionCity: collections.city,
      accessionNumber: sources.accessionNumber,
    })
    .from(sources)
    .leftJoin(collections, eq(collections.id, sources.collectionId))
    .leftJoin(places, eq(places.id, sources.placeId))
    .where(and(inArray(sources.id, ids), visibleSources(actor)));
  const visibleIds = rows.map((r) => r.id);
  const photos = visibleIds.length
    ? await tx
        .select({ id: images.id, sourceId: images.sourceId })
        .from(images)
        .where(and(inArray(images.sourceId, visibleIds), eq(images.state, "ready"), isNull(images.deletedAt)))
        .orderBy(asc(images.sourceId), asc(images.position), asc(images.id))
    : [];
  const firstPhoto = new Map<number, number>();
  for (const p of photos) if (!firstPhoto.has(p.sourceId)) firstPhoto.set(p.sourceId, p.id);
  return new Map(
    rows.map((r) => [
      r.id,
      {
        id: r.id,
        title: r.title,
        objectType: r.objectType,
        artist: r.artist,
        attributionQualifier: r.attributionQualifier,
        datingEdtf: r.datingEdtf,
        medium: r.medium,
        place: r.placeName
          ? placeLine({ name: r.placeName, subdivisionCode: r.placeSubdivision, countryCode: r.placeCountry, country: countryName(r.placeCountry) })
          : null,
        collectionName: r.collectionName,
        collectionCity: r.collectionCity,
        accessionNumber: r.accessionNumber,
        imageId: firstPhoto.get(r.id) ?? null,
      },
    ]),
  );
}
