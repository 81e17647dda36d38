// Uploads through presigned URLs, the checks on what arrived, the processing queue and the refusals:
// every kind of bad file gets a clear outcome, and nothing half-stored stays behind.
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { call, DEMO, signedIn, unique, type Jar } from "../support/app";
import { decompressionBomb, picture, settled, startUpload, upload } from "../support/images";

const s3 = new S3Client({
  endpoint: process.env.S3_ENDPOINT,
  region: process.env.S3_REGION ?? "us-east-1",
  forcePathStyle: true,
  credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "S3RVER", secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "S3RVER" },
});
async function objectCount(): Promise<number> {
  let n = 0;
  let token: string | undefined;
  do {
    const res = await s3.send(new ListObjectsV2Command({ Bucket: process.env.S3_BUCKET ?? "cordarium", Prefix: "images/", ContinuationToken: token }));
    n += res.KeyCount ?? 0;
    token = res.IsTruncated ? res.NextContinuationToken : undefined;
  } while (token);
  return n;
}

let contributor: Jar, editor: Jar, reader: Jar;
let sourceId: number;
beforeAll(async () => {
  [contributor, editor, reader] = await Promise.all([signedIn(DEMO.contributor), signedIn(DEMO.editor), signedIn(DEMO.reader)]);
  const res = await call("/api/sources", { jar: contributor, json: { title: unique("Photographed"), objectType: "painting" } });
  sourceId = ((await res.json()) as { source: { id: number } }).source.id;
});

async function refusedWithNothingLeft(name: string, bytes: Buffer, pattern: RegExp, contentType = "image/jpeg", declaredSize?: number) {
  const before = await objectCount();
  const { complete, imageId } = await upload(contributor, sourceId, name, bytes, contentType, declaredSize);
  expect(complete?.status).toBe(400);
  expect(((await complete!.json()) as { error: { message: string } }).error.message).toMatch(pattern);
  const { images } = (await (await call(`/api/sources/${sourceId}/images`, { jar: contributor })).json()) as { images: { id: number }[] };
  expect(images.map((i) => i.id)).not.toContain(imageId);
  expect(await objectCount()).toBe(before);
}

describe("accepted uploads", () => {
  it("processes a JPEG into tiles, a thumbnail and a preview, and serves it through IIIF", async () => {
    const { complete, imageId } = await upload(contributor, sourceId, "whole.jpg", await picture(1, 2400, 1600));
    expect(complete?.status).toBe(200);
    const image = await settled(contributor, sourceId, imageId!);
    expect(image).toMatchObject({ state: "ready", width: 2400, height: 1600 });
    const tile = await call(`/iiif/3/${imageId}/0,0,512,512/512,512/0/default.jpg`, { jar: contributor });
    expect(tile.status).toBe(200);
    expect(tile.headers.get("content-type")).toBe("image/jpeg");
  });

  it("turns an EXIF-rotated photograph upright (orientation 6: stored landscape, shown portrait)", async () => {
    const rotated = await sharp(await picture(2, 1800, 1200)).withMetadata({ orientation: 6 }).jpeg().toBuffer();
    const { imageId } = await upload(contributor, sourceId, "sideways.jpg", rotated);
    expect(await settled(contributor, sourceId, imageId!)).toMatchObject({ state: "ready", width: 1200, height: 1800 });
  });

  it("converts a CMYK JPEG to sRGB and reads a 16-bit PNG", async () => {
    const cmyk = await sharp(await picture(3, 1200, 900)).toColourspace("cmyk").jpeg().toBuffer();
    expect((await sharp(cmyk).metadata()).space).toBe("cmyk");
    const deep = await sharp(await picture(4, 1000, 800, "png")).toColourspace("rgb16").png().toBuffer();
    expect((await sharp(deep).metadata()).depth).toBe("ushort");
    for (const [name, bytes, type] of [["cmyk.jpg", cmyk, "image/jpeg"], ["deep.png", deep, "image/png"]] as const) {
      const { imageId } = await upload(contributor, sourceId, name, bytes, type);
      expect(await settled(contributor, sourceId, imageId!), name).toMatchObject({ state: "ready" });
      const thumb = Buffer.from(await (await call(`/iiif/3/${imageId}/full/!200,200/0/default.jpg`, { jar: contributor })).arrayBuffer());
      const meta = await sharp(thumb).metadata();
      expect(meta.space, name).toBe("srgb");
      expect(meta.depth, name).toBe("uchar");
    }
  });

  it("sends a large file in parts (S3 multipart upload) and keeps it intact", async () => {
    const noisy = await sharp({ create: { width: 3000, height: 2200, channels: 3, background: "#808080", noise: { type: "gaussian", mean: 128, sigma: 40 } } })
      .png({ compressionLevel: 1 })
      .toBuffer();
    expect(noisy.length).toBeGreaterThan(16 * 1024 * 1024);
    const { started, complete, imageId } = await upload(contributor, sourceId, "noise.png", noisy, "image/png");
    expect(started?.upload.kind).toBe("multipart");
    expect(complete?.status).toBe(200);
    expect(await settled(contributor, sourceId, imageId!)).toMatchObject({ state: "ready", width: 3000, height: 2200 });
  });

  it("accepts another photograph of the same picture with a near-duplicate warning", async () => {
    const shot = await picture(9 + Math.floor(Math.random() * 1000), 2000, 1500);
    const first = await upload(contributor, sourceId, "shot-a.jpg", shot);
    await settled(contributor, sourceId, first.imageId!);
    const variant = await sharp(shot).resize(1500).modulate({ brightness: 1.05 }).jpeg({ quality: 60 }).toBuffer();
    const second = await upload(contributor, sourceId, "shot-b.jpg", variant);
    expect(second.complete?.status).toBe(200);
    const image = await settled(contributor, sourceId, second.imageId!);
    expect(image?.nearDuplicateOf).toBe(first.imageId);
    expect(image?.nearDuplicate?.imageId).toBe(first.imageId);
  });
});

describe("refused uploads leave nothing behind", () => {
  it("a PDF renamed to .jpg", async () => {
    await refusedWithNothingLeft("photo.jpg", Buffer.from("%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n"), /PDF file \(application\/pdf\), whatever its name says/);
  });

  it("an SVG, which is text, not a photograph", async () => {
    await refusedWithNothingLeft("drawing.svg", Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"/>'), /not a file type Cordarium can read/, "image/svg+xml");
  });

  it("a decompression bomb: a tiny PNG that would decode to ten gigapixels", async () => {
    const bomb = decompressionBomb();
    expect(bomb.length).toBeLessThan(2000);
    await refusedWithNothingLeft("bomb.png", bomb, /100000 × 100000 pixels/, "image/png");
  });

  it("an exact duplicate, with a link to the image that exists", async () => {
    const bytes = await picture(21, 1200, 900);
    const first = await upload(contributor, sourceId, "once.jpg", bytes);
    expect(first.complete?.status).toBe(200);
    await settled(contributor, sourceId, first.imageId!);
    const before = await objectCount();
    const second = await upload(contributor, sourceId, "twice.jpg", bytes);
    expect(second.complete?.status).toBe(400);
    const body = (await second.complete!.json()) as { error: { message: string; duplicateOf: { imageId: number; url: string } } };
    expect(body.error.message).toMatch(/exact file is already in the archive/);
    expect(body.error.duplicateOf.imageId).toBe(first.imageId);
    expect(body.error.duplicateOf.url).toBe(`/sources/${sourceId}/images/${first.imageId}`);
    expect(await objectCount()).toBe(before);
  });

  it("a zero-byte file, and a file over the size limit, declared or not", async () => {
    const empty = await startUpload(contributor, sourceId, "empty.jpg", 0);
    expect(empty.status).toBe(400);
    expect(((await empty.json()) as { error: { message: string } }).error.message).toMatch(/empty/);
    const huge = await startUpload(contributor, sourceId, "huge.jpg", 40 * 1024 * 1024);
    expect(huge.status).toBe(400);
    expect(((await huge.json()) as { error: { message: string } }).error.message).toMatch(/the limit is 32 MB/);
    // Declared small, but the bytes that arrive are more than the limit (IMAGE_MAX_BYTES is 32 MB in the tests).
    const big = Buffer.concat([await picture(5, 800, 600), Buffer.alloc(33 * 1024 * 1024)]);
    await refusedWithNothingLeft("liar.jpg", big, /the limit is 32 MB/, "image/jpeg", 1000);
  });

  it("a truncated JPEG fails processing with a plain reason, and its files are removed", async () => {
    const whole = await picture(6, 2400, 1800);
    const { complete, imageId } = await upload(contributor, sourceId, "cut.jpg", whole.subarray(0, Math.floor(whole.length / 2)));
    expect(complete?.status).toBe(200);
    const image = await settled(contributor, sourceId, imageId!);
    expect(image?.state).toBe("failed");
    expect(image?.failureReason).toMatch(/damaged or incomplete/);
    const reprocess = await call(`/api/images/${imageId}/reprocess`, { jar: editor, method: "POST" });
    expect(reprocess.status).toBe(400);
    expect(((await reprocess.json()) as { error: { message: string } }).error.message).toMatch(/upload the file again/);
  });

  it("an upload to a source the user may not change", async () => {
    const theirs = await call("/api/sources", { jar: editor, json: { title: unique("Editor's source"), objectType: "print", state: "published" } });
    const id = ((await theirs.json()) as { source: { id: number } }).source.id;
    expect((await startUpload(contributor, id, "mine.jpg", 1000)).status).toBe(403);
    expect((await startUpload(reader, id, "mine.jpg", 1000)).status).toBe(403);
    expect((await startUpload(editor, id, "ok.jpg", 1000)).status).toBe(200);
  });

  it("a cancelled upload", async () => {
    const before = await objectCount();
    const res = await startUpload(contributor, sourceId, "half.jpg", 5000);
    const { image } = (await res.json()) as { image: { id: number } };
    expect((await call(`/api/images/${image.id}/upload`, { jar: contributor, method: "DELETE" })).status).toBe(200);
    expect((await call(`/api/images/${image.id}`, { jar: contributor })).status).toBe(404);
    expect(await objectCount()).toBe(before);
  });
});

describe("who sees images", () => {
  it("images of a draft source are not served to readers or visitors", async () => {
    const { imageId } = await upload(contributor, sourceId, "private.jpg", await picture(31, 1000, 700));
    await settled(contributor, sourceId, imageId!);
    expect((await call(`/iiif/3/${imageId}/info.json`, { jar: contributor })).status).toBe(200);
    expect((await call(`/iiif/3/${imageId}/info.json`, { jar: reader })).status).toBe(404);
    expect((await call(`/iiif/3/${imageId}/full/max/0/default.jpg`)).status).toBe(404);
  });
});
