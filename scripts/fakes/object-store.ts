/** A local S3-compatible store for development and tests, holding files under a folder of ours. */
import fs from "node:fs";
// s3rver ships CommonJS without types.
// @ts-expect-error no type declarations
import S3rver from "s3rver";

/**
 * Lets the app's pages PUT to presigned URLs and show presigned images from another origin, as a
 * real bucket's CORS rules would. Any origin is fine for a store that only listens on 127.0.0.1.
 */
const CORS = `<CORSConfiguration>
  <CORSRule>
    <AllowedOrigin>*</AllowedOrigin>
    <AllowedMethod>GET</AllowedMethod>
    <AllowedMethod>HEAD</AllowedMethod>
    <AllowedMethod>PUT</AllowedMethod>
    <AllowedHeader>*</AllowedHeader>
    <ExposeHeader>ETag</ExposeHeader>
    <MaxAgeSeconds>3000</MaxAgeSeconds>
  </CORSRule>
</CORSConfiguration>`;

export async function startObjectStore({ port, directory, bucket }: { port: number; directory: string; bucket: string }) {
  fs.mkdirSync(directory, { recursive: true });
  const server = new S3rver({
    address: "127.0.0.1",
    port,
    directory,
    silent: true,
    configureBuckets: [{ name: bucket, configs: [CORS] }],
    allowMismatchedSignatures: false,
  });
  await server.run();
  return { close: () => server.close() as Promise<void> };
}
