import "server-only";
import { createWriteStream } from "node:fs";
import { pipeline } from "node:stream/promises";
import type { Readable } from "node:stream";
import {
  AbortMultipartUploadCommand,
  CompleteMultipartUploadCommand,
  CreateMultipartUploadCommand,
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  UploadPartCommand,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { bucket, s3 } from "./s3";

// Object operations the image pipeline needs, all through the one S3 client.
const Bucket = () => bucket();

export async function presignPut(key: string, contentType: string, expiresIn = 3600): Promise<string> {
  return getSignedUrl(s3(), new PutObjectCommand({ Bucket: Bucket(), Key: key, ContentType: contentType }), {
    expiresIn,
    signableHeaders: new Set(["content-type"]),
  });
}

export async function startMultipart(key: string, contentType: string): Promise<string> {
  const res = await s3().send(new CreateMultipartUploadCommand({ Bucket: Bucket(), Key: key, ContentType: contentType }));
  return res.UploadId!;
}

export async function presignPart(key: string, uploadId: string, partNumber: number, expiresIn = 3600): Promise<string> {
  return getSignedUrl(s3(), new UploadPartCommand({ Bucket: Bucket(), Key: key, UploadId: uploadId, PartNumber: partNumber }), { expiresIn });
}

export async function completeMultipart(key: string, uploadId: string, parts: { partNumber: number; etag: string }[]) {
  await s3().send(
    new CompleteMultipartUploadCommand({
      Bucket: Bucket(),
      Key: key,
      UploadId: uploadId,
      MultipartUpload: { Parts: parts.map((p) => ({ PartNumber: p.partNumber, ETag: p.etag })) },
    }),
  );
}

export async function abortMultipart(key: string, uploadId: string) {
  await s3().send(new AbortMultipartUploadCommand({ Bucket: Bucket(), Key: key, UploadId: uploadId })).catch(() => undefined);
}

/** Size of an object, or null when there is none. */
export async function objectSize(key: string): Promise<number | null> {
  try {
    const head = await s3().send(new HeadObjectCommand({ Bucket: Bucket(), Key: key }));
    return head.ContentLength ?? 0;
  } catch (error) {
    if ((error as { name?: string }).name === "NotFound" || (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return null;
    throw error;
  }
}

export async function readRange(key: string, start: number, end: number): Promise<Buffer> {
  const res = await s3().send(new GetObjectCommand({ Bucket: Bucket(), Key: key, Range: `bytes=${start}-${end}` }));
  return Buffer.from(await res.Body!.transformToByteArray());
}

export async function getObject(key: string): Promise<{ body: Readable; contentType?: string; length?: number; etag?: string } | null> {
  try {
    const res = await s3().send(new GetObjectCommand({ Bucket: Bucket(), Key: key }));
    return { body: res.Body as Readable, contentType: res.ContentType, length: res.ContentLength, etag: res.ETag };
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchKey" || (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return null;
    throw error;
  }
}

export async function downloadTo(key: string, path: string): Promise<void> {
  const res = await s3().send(new GetObjectCommand({ Bucket: Bucket(), Key: key }));
  await pipeline(res.Body as Readable, createWriteStream(path));
}

export async function putObject(key: string, body: Buffer | Readable, contentType: string, length?: number): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: Bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: length }));
}

export async function listKeys(prefix: string): Promise<{ key: string; lastModified: Date }[]> {
  const out: { key: string; lastModified: Date }[] = [];
  let token: string | undefined;
  do {
    const res = await s3().send(new ListObjectsV2Command({ Bucket: Bucket(), Prefix: prefix, ContinuationToken: token }));
    for (const o of res.Contents ?? []) out.push({ key: o.Key!, lastModified: o.LastModified ?? new Date(0) });
    token = res.IsTruncated ? res.NextContinuationToken : undefined;
  } while (token);
  return out;
}

export async function deleteKeys(keys: string[]): Promise<void> {
  for (let i = 0; i < keys.length; i += 1000) {
    const chunk = keys.slice(i, i + 1000);
    if (chunk.length) await s3().send(new DeleteObjectsCommand({ Bucket: Bucket(), Delete: { Objects: chunk.map((Key) => ({ Key })), Quiet: true } }));
  }
}

export async function deletePrefix(prefix: string): Promise<number> {
  const keys = (await listKeys(prefix)).map((k) => k.key);
  await deleteKeys(keys);
  return keys.length;
}
