import "server-only";
import { inArray } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { regions } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { dateInWords } from "@/lib/exports/citation";
import { selectRegionViews } from "@/lib/regions/queries";
import { observationSentence } from "@/lib/regions/types";
import type { RegionVisibility } from "@/lib/regions/visibility";
import { sourceSummaries } from "@/lib/sources/summaries";
import { attributionInWords } from "@/lib/sources/vocab";
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

/** The catalogue facts of a caption, for the sources the caller may see (read as exports read them). */
async function sourceCaptions(tx: Executor, actor: Actor | null, ids: number[]): Promise<Map<number, LightTableSource>> {
  const summaries = await sourceSummaries(tx, actor, ids);
  return new Map(
    [...summaries.values()].map((s): [number, LightTableSource] => [
      s.id,
      {
        id: s.id,
        title: s.title,
        attribution: attributionInWords(s.attributionQualifier, s.artist),
        dating: dateInWords(s.datingEdtf),
        datingEdtf: s.datingEdtf,
        place: s.place,
        collection: s.collectionName ? [s.collectionName, s.collectionCity].filter(Boolean).join(", ") : null,
        accessionNumber: s.accessionNumber,
      },
    ]),
  );
}
