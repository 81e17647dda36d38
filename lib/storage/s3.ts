import "server-only";
import { HeadBucketCommand, S3Client } from "@aws-sdk/client-s3";
import { config } from "@/lib/config";

// The one adapter for object storage. The same settings reach s3rver here and a real S3 store elsewhere.
let client: S3Client | undefined;

export function s3(): S3Client {
  const c = config();
  client ??= new S3Client({
    endpoint: c.S3_ENDPOINT,
    region: c.S3_REGION,
    forcePathStyle: c.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: c.S3_ACCESS_KEY_ID, secretAccessKey: c.S3_SECRET_ACCESS_KEY },
    // Without these, streamed uploads are stored with the SDK's chunk framing and presigned URLs
    // carry a checksum of an empty body.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    maxAttempts: 2,
  });
  return client;
}

export const bucket = () => config().S3_BUCKET;

export async function storageHealth(): Promise<void> {
  await s3().send(new HeadBucketCommand({ Bucket: bucket() }), { abortSignal: AbortSignal.timeout(3000) });
}
