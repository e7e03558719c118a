/** A local S3-compatible store for development and tests, holding files under a folder of ours. */
import fs from "node:fs";
// s3rver ships CommonJS without types.
// @ts-expect-error no type declarations
import S3rver from "s3rver";

export async function startObjectStore({ port, directory, bucket }: { port: number; directory: string; bucket: string }) {
  fs.mkdirSync(directory, { recursive: true });
  const server = new S3rver({
    address: "127.0.0.1",
    port,
    directory,
    silent: true,
    configureBuckets: [{ name: bucket, configs: [] }],
    allowMismatchedSignatures: false,
  });
  await server.run();
  return { close: () => server.close() as Promise<void> };
}
