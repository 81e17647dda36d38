import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { collections, places, regions, sources } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { countryName } from "@/lib/catalogue/countries";
import { readDating } from "@/lib/dating";
import { placeLine } from "@/lib/places/format";
import { selectRegionViews } from "@/lib/regions/queries";
import { observationSentence } from "@/lib/regions/types";
import type { RegionVisibility } from "@/lib/regions/visibility";
import { attributionInWords } from "@/lib/sources/vocab";
import { visibleSources } from "@/lib/sources/visibility";
import type { LightTable, LightTableItem, LightTableSource } from "./types";

/**
 * The regions of a light table as the caller may see them, in the order asked for. Which version each
 * caller sees (readers: the vetted one; with `proposed`, also proposed work without a vetted version)
 * is decided inside the region query; ids that come back empty are counted, never explained, so that a
 * table does not tell whether a hidden region exists.
 */
export async function lightTableRegions(actor: Actor | null, ids: number[], opts: RegionVisibility = {}): Promise<LightTable> {
  authorize(actor, "archive.read");
  if (opts.proposed) authorize(actor, "archive.read_proposed");
  if (ids.length === 0) return { items: [], hidden: 0 };
  const tx = db();
  const views = await selectRegionViews(tx, actor, inArray(regions.id, ids), opts);
  const captions = await sourceCaptions(tx, actor, [...new Set(views.map((v) => v.sourceId))]);
  const byId = new Map(views.map((v) => [v.id, v]));
  const items: LightTableItem[] = [];
  for (const id of ids) {
    const view = byId.get(id);
    const source = view && captions.get(view.sourceId);
    if (!view || !source) continue;
    items.push({
      regionId: view.id,
      imageId: view.imageId,
      box: view.box,
      shape: view.shape,
      label: view.label,
      authorName: view.authorName,
      observations: view.observations.map(observationSentence),
      state: view.state,
      shown: view.shown,
      versionNumber: view.versionNumber,
      pendingRevision: view.pendingRevision,
      source,
    });
  }
  return { items, hidden: ids.length - items.length };
}

/** The catalogue facts of a caption, for the sources the caller may see. */
async function sourceCaptions(tx: Executor, actor: Actor | null, ids: number[]): Promise<Map<number, LightTableSource>> {
  if (ids.length === 0) return new Map();
  const rows = await tx
    .select({
      id: sources.id,
      title: sources.title,
      artist: sources.artist,
      attributionQualifier: sources.attributionQualifier,
      datingEdtf: sources.datingEdtf,
      accessionNumber: sources.accessionNumber,
      placeName: places.name,
      placeSubdivision: places.subdivisionCode,
      placeCountry: places.countryCode,
      collectionName: collections.name,
      collectionCity: collections.city,
    })
    .from(sources)
    .leftJoin(collections, eq(collections.id, sources.collectionId))
    .leftJoin(places, eq(places.id, sources.placeId))
    .where(and(inArray(sources.id, ids), visibleSources(actor)));
  return new Map(
    rows.map((r) => {
      const reading = r.datingEdtf ? readDating(r.datingEdtf) : null;
      const caption: LightTableSource = {
        id: r.id,
        title: r.title,
        attribution: attributionInWords(r.attributionQualifier, r.artist),
        dating: reading?.ok ? reading.words : null,
        datingEdtf: r.datingEdtf,
        place: r.placeName
          ? placeLine({ name: r.placeName, subdivisionCode: r.placeSubdivision, countryCode: r.placeCountry, country: countryName(r.placeCountry) })
          : null,
        collection: r.collectionName ? [r.collectionName, r.collectionCity].filter(Boolean).join(", ") : null,
        accessionNumber: r.accessionNumber,
      };
      return [r.id, caption];
    }),
  );
}
