// Attaches the project's own drawn demo pictures to the demo sources: each is rendered, stored as an
// original in object storage and queued for processing like any upload (the app's worker does the rest).
// Idempotent: a source that has an image already is left alone.
import { createHash, randomUUID } from "node:crypto";
import { PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { and, eq, isNull } from "drizzle-orm";
import type { MySql2Database } from "drizzle-orm/mysql2";
import * as schema from "../schema";
import { DEMO_SCENES, renderScene } from "./images";

const CC0 = "https://creativecommons.org/publicdomain/zero/1.0/";

function storage() {
  return new S3Client({
    endpoint: process.env.S3_ENDPOINT,
    region: process.env.S3_REGION ?? "us-east-1",
    forcePathStyle: (process.env.S3_FORCE_PATH_STYLE ?? "true") === "true",
    credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "", secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "" },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}

export async function seedDemoImages(db: MySql2Database<typeof schema>, uploaderId: number) {
  const s3 = storage();
  for (const scene of DEMO_SCENES) {
    const [source] = await db.select({ id: schema.sources.id }).from(schema.sources).where(eq(schema.sources.title, scene.sourceTitle));
    if (!source) continue;
    const [has] = await db
      .select({ id: schema.images.id })
      .from(schema.images)
      .where(and(eq(schema.images.sourceId, source.id), isNull(schema.images.deletedAt)))
      .limit(1);
    if (has) continue;
    const started = Date.now();
    const { jpeg, width, height } = await renderScene(scene);
    const storageKey = randomUUID();
    await s3.send(new PutObjectCommand({ Bucket: process.env.S3_BUCKET ?? "cordarium", Key: `images/${storageKey}/original`, Body: jpeg, ContentType: "image/jpeg" }));
    await db.transaction(async (tx) => {
      const values = {
        sourceId: source.id,
        storageKey,
        kind: "whole" as const,
        caption: "Whole view",
        photoCredit: "Drawn by Cordarium for the demo (an invented picture)",
        rightsUri: CC0,
        originalFilename: `${scene.slug}.jpg`,
        declaredType: "image/jpeg",
        mimeType: "image/jpeg",
        byteSize: jpeg.length,
        width,
        height,
        sha256: createHash("sha256").update(jpeg).digest("hex"),
        state: "waiting" as const,
        uploadedBy: uploaderId,
      };
      const [{ id }] = await tx.insert(schema.images).values(values).$returningId();
      await tx.insert(schema.jobs).values({ kind: "image.process", payload: { imageId: id } });
      const { storageKey: _hidden, ...logged } = values;
      await tx.insert(schema.auditEvents).values({ actorId: uploaderId, action: "image.uploaded", entityType: "image", entityId: String(id), after: { id, ...logged } });
    });
    console.log(`  image for ${scene.sourceTitle} (${width}×${height}, ${((Date.now() - started) / 1000).toFixed(1)} s)`);
  }
}
