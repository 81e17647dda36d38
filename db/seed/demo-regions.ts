// Marks the demo pictures with invented regions and observations in every review state, as the
// regions API would have left them (db/seed/regions/plan.ts decides what; this file writes it).
// The seed runs outside Next, so it cannot call the server-only mutations: it writes the same rows
// they write (a region, its versions, their observations, the editors' decisions) in one transaction
// per picture, with a "region.seeded" audit event per region. Idempotent: a picture that has any
// region already is left alone.
//
// Size of the pictures: regions are in full-image pixels and need the image's width and height. The
// demo-images seed stores both when it inserts the row, from the JPEG it rendered (the drawing's fixed
// canvas, images/compose.ts `canvasSize`), before the worker processes it; processing later reads the
// same size back from the file. The evidence rectangles are measured on that same canvas, so the plan
// uses them as they are. A row whose size differs (a picture replaced by hand) is skipped.
import { and, eq, inArray, isNull } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import { boundingBox, fitShape } from "../../lib/regions/geometry";
import * as schema from "../schema";
import { DEMO_SCENES } from "./images";
import { planDemoRegions, regionSummary, type Account, type PlannedObservation, type PlannedRegion } from "./regions/plan";

type SeedDatabase = MySql2Database<typeof schema>;
type Tx = Parameters<Parameters<SeedDatabase["transaction"]>[0]>[0];
type Vocabulary = { aspects: Map<string, number>; terms: Map<string, number> };

const EMAILS: Record<Account, string> = { admin: "admin@cordarium.test", editor: "editor@cordarium.test", contributor: "contributor@cordarium.test" };
const HOUR = 3600_000;

async function accounts(db: SeedDatabase): Promise<Record<Account, number>> {
  const rows = await db.select({ id: schema.users.id, email: schema.users.email }).from(schema.users).where(inArray(schema.users.email, Object.values(EMAILS)));
  const byEmail = new Map(rows.map((r) => [r.email, r.id]));
  const out = {} as Record<Account, number>;
  for (const [account, email] of Object.entries(EMAILS) as [Account, string][]) {
    const id = byEmail.get(email);
    if (!id) throw new Error(`demo account ${email} is missing`);
    out[account] = id;
  }
  return out;
}

/** Aspects and terms by key; deprecated ones stay usable here, as for values already stored. */
async function vocabulary(db: SeedDatabase): Promise<Vocabulary> {
  const aspects = await db.select({ id: schema.aspects.id, key: schema.aspects.key, kind: schema.aspects.kind }).from(schema.aspects);
  const terms = await db.select({ id: schema.aspectTerms.id, key: schema.aspectTerms.key, aspectId: schema.aspectTerms.aspectId }).from(schema.aspectTerms);
  const aspectKey = new Map(aspects.map((a) => [a.id, a.key]));
  return {
    aspects: new Map(aspects.map((a) => [`${a.key}:${a.kind}`, a.id])),
    terms: new Map(terms.map((t) => [`${aspectKey.get(t.aspectId)}:${t.key}`, t.id])),
  };
}

const kindOf = (o: PlannedObservation) => (o.term !== undefined ? "terms" : o.count !== undefined ? "count" : "text");

/** The observation rows of a version; one whose aspect or term an editor has removed or retyped is left out. */
function observationRows(vocab: Vocabulary, versionId: number, planned: PlannedObservation[], skipped: Set<string>) {
  const rows: (typeof schema.observations.$inferInsert)[] = [];
  for (const o of planned) {
    const aspectId = vocab.aspects.get(`${o.aspect}:${kindOf(o)}`);
    const termId = o.term === undefined ? null : (vocab.terms.get(`${o.aspect}:${o.term}`) ?? null);
    if (!aspectId || (o.term !== undefined && !termId)) {
      skipped.add(o.term ? `${o.aspect}/${o.term}` : o.aspect);
      continue;
    }
    rows.push({
      regionVersionId: versionId,
      aspectId,
      termId,
      countValue: o.count ?? null,
      textValue: o.text ?? null,
      confidence: o.confidence,
      note: o.note ?? null,
      position: rows.length,
    });
  }
  return rows;
}

async function writeRegion(tx: Tx, imageId: number, image: { width: number; height: number }, plan: PlannedRegion, who: Record<Account, number>, vocab: Vocabulary, now: number, skipped: Set<string>) {
  const at = (hoursAgo: number | null) => (hoursAgo === null ? null : new Date(now - hoursAgo * HOUR));
  const summary = regionSummary(plan);
  const authorId = who[plan.author];
  const [{ id: regionId }] = await tx
    .insert(schema.regions)
    .values({ imageId, authorId, state: "draft", createdAt: at(summary.createdAgo)!, updatedAt: at(summary.createdAgo)! })
    .$returningId();
  const ids = new Map<number, number>();
  for (const v of plan.versions) {
    const fitted = fitShape(v.shape, image);
    if ("error" in fitted) throw new Error(`${plan.key} v${v.number}: ${fitted.error}`);
    const box = boundingBox(fitted.shape);
    const [{ id }] = await tx
      .insert(schema.regionVersions)
      .values({
        regionId,
        number: v.number,
        state: v.state,
        shape: fitted.shape,
        boxX: box.x,
        boxY: box.y,
        boxW: box.w,
        boxH: box.h,
        label: v.label,
        createdBy: authorId,
        proposedAt: at(v.proposedAgo),
        decidedAt: at(v.decidedAgo),
        createdAt: at(v.createdAgo)!,
        updatedAt: at(v.changedAgo)!,
      })
      .$returningId();
    ids.set(v.number, id);
    const rows = observationRows(vocab, id, v.observations, skipped);
    if (rows.length) await tx.insert(schema.observations).values(rows.map((r) => ({ ...r, createdAt: at(v.createdAgo)!, updatedAt: at(v.createdAgo)! })));
    if (v.review) {
      await tx.insert(schema.regionReviews).values({
        regionId,
        regionVersionId: id,
        reviewerId: who[v.review.reviewer],
        decision: v.review.decision,
        comment: v.review.comment,
        createdAt: at(v.decidedAgo)!,
      });
    }
  }
  await tx
    .update(schema.regions)
    .set({
      workingVersionId: ids.get(summary.workingNumber)!,
      vettedVersionId: summary.vettedNumber === null ? null : ids.get(summary.vettedNumber)!,
      state: summary.state,
      proposedAt: at(summary.proposedAgo),
      // The lock as the API would have left it: bumped by each new version's edit, proposal and decision.
      version: plan.versions.reduce((n, v) => n + (v.number > 1 ? 1 : 0) + (v.state === "draft" ? 0 : v.state === "proposed" ? 1 : 2), 1),
      updatedAt: at(summary.updatedAgo)!,
    })
    .where(eq(schema.regions.id, regionId));
  await tx.insert(schema.auditEvents).values({
    actorId: authorId,
    action: "region.seeded",
    entityType: "region",
    entityId: String(regionId),
    after: {
      id: regionId,
      imageId,
      author: EMAILS[plan.author],
      state: summary.state,
      versions: plan.versions.map((v) => ({ number: v.number, state: v.state, label: v.label, shape: v.shape, observations: v.observations, review: v.review })),
    },
  });
}

export async function seedDemoRegions(db: SeedDatabase): Promise<void> {
  const who = await accounts(db);
  const vocab = await vocabulary(db);
  const skipped = new Set<string>();
  for (const [index, scene] of DEMO_SCENES.entries()) {
    const [image] = await db
      .select({ id: schema.images.id, width: schema.images.width, height: schema.images.height })
      .from(schema.images)
      .innerJoin(schema.sources, eq(schema.sources.id, schema.images.sourceId))
      .where(and(eq(schema.sources.title, scene.sourceTitle), eq(schema.images.originalFilename, `${scene.slug}.jpg`), isNull(schema.images.deletedAt)))
      .limit(1);
    if (!image) continue;
    const size = scene.evidence.image;
    if (image.width !== size.width || image.height !== size.height) {
      console.log(`  regions: skipped ${scene.sourceTitle} (the photograph is ${image.width}×${image.height}, the drawing ${size.width}×${size.height})`);
      continue;
    }
    const [marked] = await db.select({ id: schema.regions.id }).from(schema.regions).where(eq(schema.regions.imageId, image.id)).limit(1);
    if (marked) continue;
    const plan = planDemoRegions(scene, index);
    const now = Date.now();
    await db.transaction(async (tx) => {
      for (const region of plan) await writeRegion(tx, image.id, size, region, who, vocab, now, skipped);
    });
    console.log(`  regions for ${scene.sourceTitle} (${plan.length})`);
  }
  if (skipped.size) console.log(`  regions: left out observations the vocabulary no longer has: ${[...skipped].join(", ")}`);
}
