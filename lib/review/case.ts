import "server-only";
import { asc, eq } from "drizzle-orm";
import { db } from "@/db/client";
import { regionReviews, users } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { readDating } from "@/lib/dating";
import { getImageForViewer } from "@/lib/images/queries";
import { getRegion, regionVersionsWithObservations } from "@/lib/regions/queries";
import type { Box, ObservationView, RegionShape, RegionView } from "@/lib/regions/types";
import { getSource } from "@/lib/sources/queries";
import { compareVersions, type VersionChanges } from "./changes";

export type CaseVersion = { id: number; number: number; shape: RegionShape; box: Box; label: string | null; observations: ObservationView[] };
export type EarlierDecision = CaseVersion & { decision: "vetted" | "returned"; comment: string | null; reviewerName: string; decidedAt: string };

export type ReviewCase = {
  region: RegionView;
  image: { id: number; width: number; height: number };
  source: { id: number; title: string; datingEdtf: string | null; datingWords: string | null; collection: string | null; accessionNumber: string | null };
  /** The version under review (the working one an editor sees). */
  current: CaseVersion;
  /** The last version an editor decided on before it, or null for a first review. */
  previous: EarlierDecision | null;
  changes: VersionChanges | null;
};

/**
 * Everything the review page shows about one region: the source, the version in review, and the last
 * version an editor vetted or returned before it, with what changed between the two.
 */
export async function getReviewCase(actor: Actor | null, regionId: number): Promise<ReviewCase> {
  authorize(actor, "review.read_desk");
  const region = await getRegion(actor, regionId);
  const source = await getSource(actor, region.sourceId);
  const image = await getImageForViewer(actor, region.imageId);
  const versions = await regionVersionsWithObservations(db(), regionId);
  const reviews = await db()
    .select({ versionId: regionReviews.regionVersionId, decision: regionReviews.decision, comment: regionReviews.comment, reviewerName: users.name, at: regionReviews.createdAt })
    .from(regionReviews)
    .innerJoin(users, eq(users.id, regionReviews.reviewerId))
    .where(eq(regionReviews.regionId, regionId))
    .orderBy(asc(regionReviews.createdAt), asc(regionReviews.id));

  const asCase = (v: (typeof versions)[number]): CaseVersion => ({
    id: v.id,
    number: v.number,
    shape: v.shape,
    box: { x: v.boxX, y: v.boxY, w: v.boxW, h: v.boxH },
    label: v.label,
    observations: v.observations,
  });
  const shownVersion = versions.find((v) => v.number === region.versionNumber)!;
  const current = asCase(shownVersion);
  const earlier = reviews.filter((r) => versions.find((v) => v.id === r.versionId)!.number < current.number).at(-1);
  const earlierVersion = earlier ? versions.find((v) => v.id === earlier.versionId)! : null;
  const previous: EarlierDecision | null =
    earlier && earlierVersion
      ? { ...asCase(earlierVersion), decision: earlier.decision, comment: earlier.comment, reviewerName: earlier.reviewerName, decidedAt: earlier.at.toISOString() }
      : null;

  const dating = source.datingEdtf ? readDating(source.datingEdtf) : null;
  return {
    region,
    image: { id: image.id, width: image.width ?? 0, height: image.height ?? 0 },
    source: {
      id: source.id,
      title: source.title,
      datingEdtf: source.datingEdtf,
      datingWords: dating?.ok ? dating.words : null,
      collection: source.collection?.name ?? null,
      accessionNumber: source.accessionNumber,
    },
    current,
    previous,
    changes: previous ? compareVersions(previous, current) : null,
  };
}
