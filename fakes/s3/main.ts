// Runs the S3 fake on its own: S3_FAKE_PORT, S3_FAKE_DIR, S3_BUCKET.
import { startS3Fake } from "./server";

const fake = await startS3Fake({
  host: process.env.S3_FAKE_HOST ?? "127.0.0.1",
  port: Number(process.env.S3_FAKE_PORT ?? 4569),
  dataDir: process.env.S3_FAKE_DIR ?? ".data/s3",
  bucket: process.env.S3_BUCKET ?? "cordarium",
});
console.log(`s3 fake listening on ${fake.url}`);

const stop = () => void fake.close().then(() => process.exit(0));
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
