import "server-only";
import { and, eq, inArray, isNull, sql } from "drizzle-orm";
import { db, type Transaction } from "@/db/client";
import { images, regions, regionVersions, type Region, type RegionVersion } from "@/db/schema";
import { recordAudit } from "@/lib/audit/record";
import { atLeast, authorize, type Actor } from "@/lib/auth/policy";
import { ConflictError, NotFoundError, ValidationError } from "@/lib/errors";
import { getImageForViewer } from "@/lib/images/queries";
import { outbox } from "@/lib/search/outbox";
import { boundingBox, fitShape } from "./geometry";
import { checkObservations, copyObservations, observationSignature, observationsOf, writeObservations } from "./observations";
import { notifyProposals } from "./letters";
import { getRegion } from "./queries";
import type { RegionCreate, RegionUpdate } from "./schemas";
import type { RegionShape, RegionView } from "./types";

async function imageForRegions(actor: Actor | null, imageId: number) {
  const image = await getImageForViewer(actor, imageId);
  if (image.state !== "ready" || !image.width || !image.height) throw new ValidationError("Regions can be marked once the photograph has been processed.");
  return { id: image.id, width: image.width, height: image.height, sourceId: image.sourceId };
}

function fitted(shape: RegionShape, image: { width: number; height: number }): RegionShape {
  const result = fitShape(shape, image);
  if ("error" in result) throw new ValidationError(result.error, { shape: [result.error] });
  return result.shape;
}

const shapeColumns = (shape: RegionShape) => {
  const box = boundingBox(shape);
  return { shape, boxX: box.x, boxY: box.y, boxW: box.w, boxH: box.h };
};

/** What the audit trail keeps of a region: its row, the version edited and its observations. */
async function snapshot(tx: Transaction, regionId: number) {
  const [region] = await tx.select().from(regions).where(eq(regions.id, regionId));
  const [working] = region.workingVersionId ? await tx.select().from(regionVersions).where(eq(regionVersions.id, region.workingVersionId)) : [];
  const obs = working ? ((await observationsOf(tx, [working.id])).get(working.id) ?? []) : [];
  return { region, working: working ?? null, observations: obs.map(({ aspectKey, termKey, count, text, confidence, note }) => ({ aspectKey, termKey, count, text, confidence, note })) };
}

export async function createRegion(actor: Actor | null, imageId: number, input: RegionCreate): Promise<RegionView> {
  authorize(actor, "region.create");
  const image = await imageForRegions(actor, imageId);
  const shape = fitted(input.shape, image);
  return db().transaction(async (tx) => {
    const checked = await checkObservations(tx, input.observations ?? []);
    const [{ id }] = await tx.insert(regions).values({ imageId, authorId: actor!.id, state: "draft" }).$returningId();
    const [{ id: versionId }] = await tx
      .insert(regionVersions)
      .values({ regionId: id, number: 1, state: "draft", label: input.label ?? null, createdBy: actor!.id, ...shapeColumns(shape) })
      .$returningId();
    await tx.update(regions).set({ workingVersionId: versionId }).where(eq(regions.id, id));
    await writeObservations(tx, versionId, checked);
    await recordAudit(tx, { actorId: actor!.id, action: "region.created", entityType: "region", entityId: id, after: await snapshot(tx, id) });
    await outbox(tx, "region", id);
    return getRegion(actor, id, {}, tx);
  });
}

/** Locks the region for the change, checks it exists, is live and was read at `version`. */
export async function lockRegion(tx: Transaction, actor: Actor, id: number, version: number | null): Promise<{ region: Region; working: RegionVersion }> {
  const [region] = await tx.select().from(regions).where(eq(regions.id, id)).for("update");
  if (!region || region.deletedAt) throw new NotFoundError("region");
  if (version !== null && region.version !== version) {
    const current = await getRegion(actor, id, {}, tx).catch(() => undefined);
    throw new ConflictError("Someone changed this region after you opened it. Compare their version with yours before saving again.", current);
  }
  const [working] = await tx.select().from(regionVersions).where(eq(regionVersions.id, region.workingVersionId!));
  return { region, working };
}

const bump = { version: sql`${regions.version} + 1` };

/**
 * Edits the working version. A version an editor has decided on is frozen: the edit starts a new
 * draft version from it, and the vetted one stays what readers see until its successor is vetted.
 * A proposed version is edited in place and stays proposed (the reviewer sees the latest).
 */
export async function updateRegion(actor: Actor | null, id: number, change: RegionUpdate): Promise<RegionView> {
  authorize(actor, "region.edit");
  return db().transaction(async (tx) => {
    const { region, working } = await lockRegion(tx, actor!, id, change.version);
    authorize(actor, "region.edit", { authorId: region.authorId });
    const before = await snapshot(tx, id);
    let target = working;
    if (working.decidedAt) {
      const [{ id: newId }] = await tx
        .insert(regionVersions)
        .values({
          regionId: id,
          number: working.number + 1,
          state: "draft",
          label: working.label,
          createdBy: actor!.id,
          ...shapeColumns(working.shape),
        })
        .$returningId();
      await copyObservations(tx, working.id, newId);
      [target] = await tx.select().from(regionVersions).where(eq(regionVersions.id, newId));
      await tx.update(regions).set({ workingVersionId: newId, state: "draft", proposedAt: null }).where(eq(regions.id, id));
    }
    const set: Partial<typeof regionVersions.$inferInsert> = {};
    if (change.shape) {
      const [image] = await tx.select({ width: images.width, height: images.height }).from(images).where(eq(images.id, region.imageId));
      Object.assign(set, shapeColumns(fitted(change.shape, { width: image.width ?? 0, height: image.height ?? 0 })));
    }
    if (change.label !== undefined) set.label = change.label;
    if (Object.keys(set).length) await tx.update(regionVersions).set(set).where(eq(regionVersions.id, target.id));
    if (change.observations) {
      const stored = (await observationsOf(tx, [target.id])).get(target.id) ?? [];
      const kept = new Set(stored.map((o) => observationSignature({ aspectId: o.aspectId, termId: o.termId, countValue: o.count, textValue: o.text })));
      await writeObservations(tx, target.id, await checkObservations(tx, change.observations, kept));
    }
    await tx.update(regions).set(bump).where(eq(regions.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "region.updated", entityType: "region", entityId: id, before, after: await snapshot(tx, id) });
    await outbox(tx, "region", id);
    return getRegion(actor, id, {}, tx);
  });
}

/** Soft delete, so that it can be undone. A vetted region stays in the archive unless an admin removes it. */
export async function deleteRegion(actor: Actor | null, id: number, version: number): Promise<{ version: number }> {
  authorize(actor, "region.edit");
  return db().transaction(async (tx) => {
    const { region } = await lockRegion(tx, actor!, id, version);
    authorize(actor, "region.edit", { authorId: region.authorId });
    if (region.vettedVersionId && !atLeast(actor, "admin")) {
      throw new ValidationError("A vetted region stays in the archive: edit it (the change goes back to review) or ask an admin to remove it.");
    }
    const before = await snapshot(tx, id);
    await tx.update(regions).set({ deletedAt: new Date(), ...bump }).where(eq(regions.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "region.deleted", entityType: "region", entityId: id, before, after: await snapshot(tx, id) });
    await outbox(tx, "region", id);
    return { version: region.version + 1 };
  });
}

export async function restoreRegion(actor: Actor | null, id: number, version: number): Promise<RegionView> {
  authorize(actor, "region.edit");
  return db().transaction(async (tx) => {
    const [region] = await tx.select().from(regions).where(eq(regions.id, id)).for("update");
    if (!region || !region.deletedAt) throw new NotFoundError("deleted region");
    authorize(actor, "region.edit", { authorId: region.authorId });
    if (region.version !== version) throw new ConflictError("This region changed after it was deleted; reload the page.");
    await tx.update(regions).set({ deletedAt: null, ...bump }).where(eq(regions.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "region.restored", entityType: "region", entityId: id, after: await snapshot(tx, id) });
    await outbox(tx, "region", id);
    return getRegion(actor, id, {}, tx);
  });
}

const PROPOSABLE = ["draft", "returned", "withdrawn"] as const;

async function markProposed(tx: Transaction, actor: Actor, region: Region, working: RegionVersion) {
  const count = (await observationsOf(tx, [working.id])).get(working.id)?.length ?? 0;
  if (count === 0) throw new ValidationError("Record at least one observation before proposing the region for review.");
  const now = new Date();
  await tx.update(regionVersions).set({ state: "proposed", proposedAt: now }).where(eq(regionVersions.id, working.id));
  await tx.update(regions).set({ state: "proposed", proposedAt: now, ...bump }).where(eq(regions.id, region.id));
  await outbox(tx, "region", region.id);
}

export async function proposeRegion(actor: Actor | null, id: number, version: number): Promise<RegionView> {
  authorize(actor, "region.propose");
  return db().transaction(async (tx) => {
    const { region, working } = await lockRegion(tx, actor!, id, version);
    authorize(actor, "region.propose", { authorId: region.authorId });
    if (!(PROPOSABLE as readonly string[]).includes(working.state)) throw new ValidationError(`A ${working.state} region cannot be proposed; edit it first.`);
    const before = await snapshot(tx, id);
    await markProposed(tx, actor!, region, working);
    await recordAudit(tx, { actorId: actor!.id, action: "region.proposed", entityType: "region", entityId: id, before, after: await snapshot(tx, id) });
    await notifyProposals(tx, actor!, [id]);
    return getRegion(actor, id, {}, tx);
  });
}

/** Proposes every region of the photograph that the caller authored and that is ready to go. */
export async function proposeAllOfImage(actor: Actor | null, imageId: number): Promise<{ proposed: number[]; skipped: { id: number; reason: string }[] }> {
  authorize(actor, "region.propose");
  await imageForRegions(actor, imageId);
  return db().transaction(async (tx) => {
    const mine = await tx
      .select({ id: regions.id })
      .from(regions)
      .where(and(eq(regions.imageId, imageId), eq(regions.authorId, actor!.id), isNull(regions.deletedAt), inArray(regions.state, [...PROPOSABLE])));
    const proposed: number[] = [];
    const skipped: { id: number; reason: string }[] = [];
    for (const { id } of mine) {
      const { region, working } = await lockRegion(tx, actor!, id, null);
      const before = await snapshot(tx, id);
      try {
        await markProposed(tx, actor!, region, working);
      } catch (error) {
        if (!(error instanceof ValidationError)) throw error;
        skipped.push({ id, reason: error.message });
        continue;
      }
      await recordAudit(tx, { actorId: actor!.id, action: "region.proposed", entityType: "region", entityId: id, before, after: await snapshot(tx, id) });
      proposed.push(id);
    }
    await notifyProposals(tx, actor!, proposed);
    return { proposed, skipped };
  });
}

export async function withdrawRegion(actor: Actor | null, id: number, version: number): Promise<RegionView> {
  authorize(actor, "region.withdraw");
  return db().transaction(async (tx) => {
    const { region, working } = await lockRegion(tx, actor!, id, version);
    authorize(actor, "region.withdraw", { authorId: region.authorId });
    if (working.state !== "proposed") throw new ValidationError("Only a proposed region can be withdrawn from review.");
    const before = await snapshot(tx, id);
    await tx.update(regionVersions).set({ state: "withdrawn" }).where(eq(regionVersions.id, working.id));
    await tx.update(regions).set({ state: "withdrawn", proposedAt: null, ...bump }).where(eq(regions.id, id));
    await recordAudit(tx, { actorId: actor!.id, action: "region.withdrawn", entityType: "region", entityId: id, before, after: await snapshot(tx, id) });
    await outbox(tx, "region", id);
    return getRegion(actor, id, {}, tx);
  });
}

export { snapshot as regionSnapshot };
