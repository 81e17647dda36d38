import "server-only";
import { and, asc, eq, inArray, isNotNull, isNull, sql, type SQL } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { images, regions, regionVersions, sources, users } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { NotFoundError } from "@/lib/errors";
import { getImageForViewer } from "@/lib/images/queries";
import { visibleSources } from "@/lib/sources/visibility";
import { observationsOf } from "./observations";
import type { RegionView } from "./types";
import { regionPermissions, shownVersionId, type RegionVisibility } from "./visibility";

/** Regions as the caller may see them, under any extra condition (an image, one region, a source). */
export async function selectRegionViews(tx: Executor, actor: Actor | null, where: SQL, opts: RegionVisibility = {}): Promise<RegionView[]> {
  const shown = shownVersionId(actor, opts);
  const rows = await tx
    .select({
      id: regions.id,
      imageId: regions.imageId,
      sourceId: images.sourceId,
      authorId: regions.authorId,
      authorName: users.name,
      version: regions.version,
      regionState: regions.state,
      workingVersionId: regions.workingVersionId,
      vettedVersionId: regions.vettedVersionId,
      createdAt: regions.createdAt,
      updatedAt: regions.updatedAt,
      versionId: regionVersions.id,
      versionNumber: regionVersions.number,
      versionState: regionVersions.state,
      shape: regionVersions.shape,
      boxX: regionVersions.boxX,
      boxY: regionVersions.boxY,
      boxW: regionVersions.boxW,
      boxH: regionVersions.boxH,
      label: regionVersions.label,
    })
    .from(regions)
    .innerJoin(images, eq(images.id, regions.imageId))
    .innerJoin(sources, eq(sources.id, images.sourceId))
    .innerJoin(users, eq(users.id, regions.authorId))
    .innerJoin(regionVersions, eq(regionVersions.id, shown))
    .where(and(where, isNull(regions.deletedAt), isNull(images.deletedAt), visibleSources(actor)))
    .orderBy(asc(regionVersions.boxY), asc(regionVersions.boxX), asc(regions.id));
  const obs = await observationsOf(tx, rows.map((r) => r.versionId));
  return rows.map((r) => {
    const shownWhich = r.versionId === r.vettedVersionId ? "vetted" : "working";
    const isWorking = r.versionId === r.workingVersionId;
    const hasVetted = r.vettedVersionId !== null;
    const view = {
      id: r.id,
      imageId: r.imageId,
      sourceId: r.sourceId,
      authorId: r.authorId,
      authorName: r.authorName,
      version: r.version,
      state: r.versionState,
      shown: shownWhich,
      versionNumber: r.versionNumber,
      shape: r.shape,
      box: { x: r.boxX, y: r.boxY, w: r.boxW, h: r.boxH },
      label: r.label,
      observations: obs.get(r.versionId) ?? [],
      hasVetted,
      pendingRevision: hasVetted && r.workingVersionId !== r.vettedVersionId,
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
    } as const;
    return { ...view, can: regionPermissions(actor, { authorId: r.authorId, state: r.versionState, hasVetted, isWorking }) };
  });
}

/** The regions of one photograph the caller may see, top to bottom. */
export async function listRegionsOfImage(actor: Actor | null, imageId: number, opts: RegionVisibility = {}): Promise<RegionView[]> {
  authorize(actor, "archive.read");
  if (opts.proposed) authorize(actor, "archive.read_proposed");
  await getImageForViewer(actor, imageId);
  return selectRegionViews(db(), actor, eq(regions.imageId, imageId), opts);
}

/** The regions of every photograph of a source the caller may see (for exports and the stringing check). */
export async function listRegionsOfSource(actor: Actor | null, sourceId: number, opts: RegionVisibility = {}): Promise<RegionView[]> {
  authorize(actor, "archive.read");
  if (opts.proposed) authorize(actor, "archive.read_proposed");
  return selectRegionViews(db(), actor, eq(images.sourceId, sourceId), opts);
}

export async function getRegion(actor: Actor | null, id: number, opts: RegionVisibility = {}, tx: Executor = db()): Promise<RegionView> {
  authorize(actor, "archive.read");
  const [view] = await selectRegionViews(tx, actor, eq(regions.id, id), opts);
  if (!view) throw new NotFoundError("region");
  return view;
}

/** Every version of a region with its observations, oldest first, for the reviewer's comparison. */
export async function regionVersionsWithObservations(tx: Executor, regionId: number) {
  const versions = await tx.select().from(regionVersions).where(eq(regionVersions.regionId, regionId)).orderBy(asc(regionVersions.number));
  const obs = await observationsOf(tx, versions.map((v) => v.id));
  return versions.map((v) => ({ ...v, observations: obs.get(v.id) ?? [] }));
}

/** Ids of regions with a vetted version on the given images (used by counts on the source page). */
export async function countVettedRegions(imageIds: number[]): Promise<Map<number, number>> {
  if (imageIds.length === 0) return new Map();
  const rows = await db()
    .select({ imageId: regions.imageId, n: sql<number>`COUNT(*)` })
    .from(regions)
    .where(and(inArray(regions.imageId, imageIds), isNotNull(regions.vettedVersionId), isNull(regions.deletedAt)))
    .groupBy(regions.imageId);
  return new Map(rows.map((r) => [r.imageId, Number(r.n)]));
}
