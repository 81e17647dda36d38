// Test images made on the spot with sharp (no binary fixtures in the repository), and the upload dance
// a browser does: start, PUT to the presigned URL (or parts), complete.
import { deflateSync } from "node:zlib";
import sharp from "sharp";
import { call, type Jar } from "./app";

/** A distinct picture per seed; a random speck in a corner makes every call a different file (SHA-256). */
export async function picture(seed: number, width = 1600, height = 1200, format: "jpeg" | "png" = "jpeg"): Promise<Buffer> {
  const hue = (seed * 67) % 360;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">
    <rect width="100%" height="100%" fill="hsl(${hue},40%,30%)"/>
    <circle cx="${(seed * 211) % width}" cy="${(seed * 97) % height}" r="${height / 4}" fill="hsl(${(hue + 120) % 360},60%,60%)"/>
    <rect x="${(seed * 53) % (width / 2)}" y="${height / 3}" width="${width / 3}" height="${height / 5}" fill="hsl(${(hue + 240) % 360},50%,45%)"/>
    <path d="M0 ${height} L${width / 2} ${(seed * 31) % height} L${width} ${height} Z" fill="hsl(${(hue + 60) % 360},30%,20%)"/>
    <rect x="2" y="2" width="6" height="6" fill="rgb(${Math.floor(Math.random() * 255)},${Math.floor(Math.random() * 255)},0)"/>
  </svg>`;
  const img = sharp(Buffer.from(svg));
  return format === "png" ? img.png().toBuffer() : img.jpeg({ quality: 90 }).toBuffer();
}

const crcTable = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
const crc32 = (buf: Buffer) => {
  let c = 0xffffffff;
  for (const b of buf) c = crcTable[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
};
const chunk = (type: string, data: Buffer) => {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
};

/** A PNG of a few hundred bytes whose header claims width × height pixels (PNG spec, ISO/IEC 15948, §11.2.2 IHDR). */
export function decompressionBomb(width = 100_000, height = 100_000): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // truecolour
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk("IHDR", ihdr),
    chunk("IDAT", deflateSync(Buffer.alloc(1024))),
    chunk("IEND", Buffer.alloc(0)),
  ]);
}

type Started = { image: { id: number }; upload: { kind: "single"; url: string; headers: Record<string, string> } | { kind: "multipart"; partSize: number; parts: { partNumber: number; url: string }[] } };

export async function startUpload(jar: Jar, sourceId: number, filename: string, size: number, contentType = "image/jpeg") {
  return call(`/api/sources/${sourceId}/images`, { jar, json: { filename, size, contentType, kind: "whole", caption: filename } });
}

/** Uploads bytes the way the browser does; answers the completion response. */
export async function upload(jar: Jar, sourceId: number, filename: string, bytes: Buffer, contentType = "image/jpeg", declaredSize = bytes.length) {
  const res = await startUpload(jar, sourceId, filename, declaredSize, contentType);
  if (res.status !== 200) return { response: res, started: null, complete: null, imageId: null };
  const started = (await res.json()) as Started;
  let parts: { partNumber: number; etag: string }[] | undefined;
  if (started.upload.kind === "single") {
    const put = await fetch(started.upload.url, { method: "PUT", body: new Uint8Array(bytes), headers: started.upload.headers });
    if (!put.ok) throw new Error(`PUT failed: ${put.status}`);
  } else {
    const { partSize } = started.upload;
    parts = [];
    for (const p of started.upload.parts) {
      const put = await fetch(p.url, { method: "PUT", body: new Uint8Array(bytes.subarray((p.partNumber - 1) * partSize, p.partNumber * partSize)) });
      if (!put.ok) throw new Error(`part PUT failed: ${put.status}`);
      parts.push({ partNumber: p.partNumber, etag: put.headers.get("etag")! });
    }
  }
  const complete = await call(`/api/images/${started.image.id}/complete`, { jar, json: { parts } });
  return { response: res, started, complete, imageId: started.image.id };
}

export type ImageState = { id: number; state: string; width: number | null; height: number | null; failureReason: string | null; nearDuplicate: { imageId: number } | null; nearDuplicateOf: number | null };

/** Waits until the worker has finished with the image (ready or failed). */
export async function settled(jar: Jar, sourceId: number, imageId: number, timeoutMs = 60_000): Promise<ImageState | undefined> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const { images } = (await (await call(`/api/sources/${sourceId}/images`, { jar })).json()) as { images: ImageState[] };
    const image = images.find((i) => i.id === imageId);
    if (!image || image.state === "ready" || image.state === "failed") return image;
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`image ${imageId} still not processed after ${timeoutMs} ms`);
}
