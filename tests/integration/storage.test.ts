// The S3 fake through the unmodified AWS SDK, with the settings the app uses: objects round-trip
// intact, a presigned PUT from outside stores the bytes as sent, and the bucket answers CORS preflights.
import { createHash, randomBytes } from "node:crypto";
import { DeleteObjectCommand, GetObjectCommand, HeadObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { describe, expect, it } from "vitest";
import { unique } from "../support/app";

const s3 = new S3Client({
  endpoint: process.env.S3_ENDPOINT ?? "http://127.0.0.1:4579",
  region: process.env.S3_REGION ?? "us-east-1",
  forcePathStyle: true,
  credentials: { accessKeyId: process.env.S3_ACCESS_KEY_ID ?? "S3RVER", secretAccessKey: process.env.S3_SECRET_ACCESS_KEY ?? "S3RVER" },
  requestChecksumCalculation: "WHEN_REQUIRED",
  responseChecksumValidation: "WHEN_REQUIRED",
});
const Bucket = process.env.S3_BUCKET ?? "cordarium";
const sha = (b: Uint8Array) => createHash("sha256").update(b).digest("hex");

describe("object storage (s3rver through @aws-sdk/client-s3)", () => {
  it("stores and returns an object byte for byte", async () => {
    const Key = `tests/${unique("blob")}.bin`;
    const body = randomBytes(300_000);
    await s3.send(new PutObjectCommand({ Bucket, Key, Body: body, ContentType: "application/octet-stream" }));
    const got = await s3.send(new GetObjectCommand({ Bucket, Key }));
    const bytes = await got.Body!.transformToByteArray();
    expect(sha(bytes)).toBe(sha(body));
    await s3.send(new DeleteObjectCommand({ Bucket, Key }));
    await expect(s3.send(new HeadObjectCommand({ Bucket, Key }))).rejects.toMatchObject({ name: "NotFound" });
  });

  it("accepts a presigned PUT and keeps the bytes intact", async () => {
    const Key = `tests/${unique("upload")}.jpg`;
    const url = await getSignedUrl(s3, new PutObjectCommand({ Bucket, Key, ContentType: "image/jpeg" }), { expiresIn: 300 });
    const body = randomBytes(50_000);
    const put = await fetch(url, { method: "PUT", body, headers: { "content-type": "image/jpeg" } });
    expect(put.status).toBe(200);
    const got = await s3.send(new GetObjectCommand({ Bucket, Key }));
    expect(sha(await got.Body!.transformToByteArray())).toBe(sha(body));
  });

  it("answers a browser's CORS preflight for uploads", async () => {
    const res = await fetch(`${process.env.S3_ENDPOINT ?? "http://127.0.0.1:4579"}/${Bucket}/tests/preflight.jpg`, {
      method: "OPTIONS",
      headers: { origin: "http://localhost:3100", "access-control-request-method": "PUT", "access-control-request-headers": "content-type" },
    });
    expect(res.status).toBe(200);
    expect(res.headers.get("access-control-allow-methods")).toMatch(/PUT/);
  });
});
