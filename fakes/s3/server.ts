// A local stand-in for S3-compatible object storage: s3rver, with the app's bucket and a CORS rule
// so that browsers can PUT to presigned URLs. The app reaches it only through @aws-sdk/client-s3.
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

const corsXml = `<CORSConfiguration>
  <CORSRule>
    <AllowedOrigin>*</AllowedOrigin>
    <AllowedMethod>GET</AllowedMethod>
    <AllowedMethod>HEAD</AllowedMethod>
    <AllowedMethod>PUT</AllowedMethod>
    <AllowedMethod>POST</AllowedMethod>
    <AllowedHeader>*</AllowedHeader>
    <ExposeHeader>ETag</ExposeHeader>
    <MaxAgeSeconds>3000</MaxAgeSeconds>
  </CORSRule>
</CORSConfiguration>`;

export type S3FakeOptions = { host?: string; port: number; dataDir: string; bucket: string };

export async function startS3Fake(opts: S3FakeOptions): Promise<{ url: string; close(): Promise<void> }> {
  mkdirSync(opts.dataDir, { recursive: true });
  const server = new S3rver({
    address: opts.host ?? "127.0.0.1",
    port: opts.port,
    directory: opts.dataDir,
    silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [corsXml] }],
  });
  const address = await server.run();
  return {
    url: `http://${address.address}:${address.port}`,
    close: () => server.close(),
  };
}
