// The IIIF Image API 3.0 endpoints checked against the specification (iiif.io/api/image/3.0), with
// its worked example of a 300 × 200 full image (§4.1 Region, §4.2 Size), and the storage sweep.
import { PutObjectCommand, HeadObjectCommand, S3Client } from "@aws-sdk/client-s3";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";
import { picture, settled, upload } from "../support/images";

let jar: Jar;
let imageId: number;
beforeAll(async () => {
  jar = await signedIn(DEMO.contributor);
  const res = await call("/api/sources", { jar, json: { title: unique("Spec example"), objectType: "print", state: "published" } });
  const sourceId = ((await res.json()) as { source: { id: number } }).source.id;
  const up = await upload(jar, sourceId, "spec.png", await picture(77, 300, 200, "png"), "image/png");
  imageId = up.imageId!;
  await settled(jar, sourceId, imageId);
});

async function sizeOf(path: string) {
  const res = await call(`/iiif/3/${imageId}/${path}`);
  expect(res.status, path).toBe(200);
  const meta = await sharp(Buffer.from(await res.arrayBuffer())).metadata();
  return [meta.width, meta.height];
}

describe("IIIF Image API 3.0: info.json (§5)", () => {
  it("has the required properties, and tiles and sizes it declares are served", async () => {
    const res = await call(`/iiif/3/${imageId}/info.json`);
    expect(res.status).toBe(200);
    expect(res.headers.get("access-control-allow-origin")).toBe("*");
    const info = (await res.json()) as Record<string, unknown> & { tiles: { width: number; scaleFactors: number[] }[]; sizes: { width: number; height: number }[] };
    expect(info["@context"]).toBe("http://iiif.io/api/image/3/context.json");
    expect(info.id).toMatch(new RegExp(`/iiif/3/${imageId}$`));
    expect(info.type).toBe("ImageService3");
    expect(info.protocol).toBe("http://iiif.io/api/image");
    expect(["level0", "level1", "level2"]).toContain(info.profile);
    expect([info.width, info.height]).toEqual([300, 200]);
    for (const s of info.sizes) expect(await sizeOf(`full/${s.width},${s.height}/0/default.jpg`)).toEqual([s.width, s.height]);
    expect(await sizeOf(`0,0,${info.tiles[0].width},${info.tiles[0].width}/${300},${200}/0/default.jpg`)).toEqual([300, 200]);
  });

  it("answers JSON-LD with the context profile when asked (§7.1), and the base URI redirects to info.json (§2.2)", async () => {
    const ld = await call(`/iiif/3/${imageId}/info.json`, { headers: { accept: "application/ld+json" } });
    expect(ld.headers.get("content-type")).toBe('application/ld+json;profile="http://iiif.io/api/image/3/context.json"');
    const base = await call(`/iiif/3/${imageId}`);
    expect(base.status).toBe(303);
    expect(base.headers.get("location")).toMatch(new RegExp(`/iiif/3/${imageId}/info.json$`));
  });
});

describe("IIIF Image API 3.0: the specification's 300 × 200 examples", () => {
  it.each([
    ["full/max/0/default.jpg", [300, 200]],
    ["125,15,120,140/max/0/default.jpg", [120, 140]],
    ["pct:41.6,7.5,40,70/max/0/default.jpg", [120, 140]],
    ["125,15,200,200/max/0/default.jpg", [175, 185]],
    ["full/150,/0/default.jpg", [150, 100]],
    ["full/,150/0/default.jpg", [225, 150]],
    ["full/pct:50/0/default.jpg", [150, 100]],
    ["full/225,100/0/default.jpg", [225, 100]],
    ["full/!225,100/0/default.jpg", [150, 100]],
    ["full/^360,/0/default.jpg", [360, 240]],
    ["full/150,/90/default.png", [100, 150]],
    ["full/150,/!0/gray.webp", [150, 100]],
  ] as const)("%s → %j", async (path, expected) => {
    expect(await sizeOf(path)).toEqual(expected);
  });

  it.each([
    ["full/360,/0/default.jpg", 400, "upscaling without ^"],
    ["0,0,0,10/max/0/default.jpg", 400, "a zero-width region"],
    ["400,300,10,10/max/0/default.jpg", 400, "a region outside the image"],
    ["full/max/0/sepia.jpg", 400, "an unknown quality"],
  ] as const)("%s → %i (%s)", async (path, status, _why) => {
    expect((await call(`/iiif/3/${imageId}/${path}`)).status).toBe(status);
  });

  it("a gray request is grey", async () => {
    const res = await call(`/iiif/3/${imageId}/full/max/0/gray.png`);
    const stats = await sharp(Buffer.from(await res.arrayBuffer())).stats();
    expect(stats.isOpaque).toBe(true);
    expect(stats.channels.length === 1 || Math.abs(stats.channels[0].mean - stats.channels[1].mean) < 1).toBe(true);
  });
});

describe("storage sweep", () => {
  it("removes objects no image refers to once they are past the grace period, and keeps the rest", async () => {
    const s3 = new S3Client({
      endpoint: process.env.S3_ENDPOINT,
      region: process.env.S3_REGION ?? "us-east-1",
      forcePathStyle: true,
      credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "S3RVER", secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "S3RVER" },
    });
    const Bucket = process.env.S3_BUCKET ?? "cordarium";
    const orphan = `images/00000000-0000-4000-8000-${Date.now().toString().padStart(12, "0").slice(-12)}/original`;
    await s3.send(new PutObjectCommand({ Bucket, Key: orphan, Body: "left behind by a crash" }));
    const { sweepStorage } = await import("@/lib/images/sweep");
    await sweepStorage(Date.now());
    await expect(s3.send(new HeadObjectCommand({ Bucket, Key: orphan }))).resolves.toBeTruthy();
    const result = await sweepStorage(Date.now() + 2 * 3600_000);
    expect(result.objectsDeleted).toBeGreaterThanOrEqual(1);
    await expect(s3.send(new HeadObjectCommand({ Bucket, Key: orphan }))).rejects.toMatchObject({ name: "NotFound" });
    expect((await call(`/iiif/3/${imageId}/full/max/0/default.jpg`)).status).toBe(200);
  });
});
