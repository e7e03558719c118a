/**
 * `npm run backup [-- <folder>]`: a consistent copy of the database (pg_dump's custom format) and
 * a list of the bucket's objects, with each table's row count and digest taken from the same
 * snapshot as the dump, so `npm run restore` can prove that every row came back.
 *
 * Reads DATABASE_URL and the S3_* settings like the app (default: the local cluster of `npm start`).
 */
import { spawnSync } from "node:child_process";
import { mkdirSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { Client } from "pg";
import { env } from "../env";
import { s3 } from "../server/storage";
import { pgTool, safeUrl, tableSums, type Manifest } from "./backup/shared";

const stamp = new Date().toISOString().replaceAll(":", "-").replace(/\.\d+Z$/, "Z");
const folder = resolve(process.argv[2] ?? join("backups", stamp));
mkdirSync(folder, { recursive: true });
const { DATABASE_URL, S3_BUCKET } = env();

const client = new Client({ connectionString: DATABASE_URL });
try {
  await client.connect();
} catch (e) {
  console.error(`Can't reach PostgreSQL at ${safeUrl(DATABASE_URL)} (${(e as Error).message}). Start it with \`npm start\`, or set DATABASE_URL.`);
  process.exit(1);
}

// One snapshot for the dump and the digests: writes that land meanwhile are in neither.
await client.query("begin isolation level repeatable read read only");
const { rows } = await client.query<{ snapshot: string }>("select pg_export_snapshot() as snapshot");
const dumpFile = join(folder, "database.dump");
const dump = spawnSync(pgTool("pg_dump"), ["--format=custom", "--no-owner", "--no-acl", `--snapshot=${rows[0].snapshot}`, `--file=${dumpFile}`, `--dbname=${DATABASE_URL}`], {
  stdio: ["ignore", "inherit", "inherit"],
});
if (dump.status !== 0) {
  console.error(`pg_dump failed (exit ${dump.status ?? dump.signal}). Its client must be at least the server's version.`);
  process.exit(1);
}
const tables = await tableSums(client);
await client.query("commit");
await client.end();

// The objects the database's attachments point at live in the bucket; the list records what was there.
const objects: { key: string; size: number; etag?: string; lastModified?: string }[] = [];
let token: string | undefined;
do {
  const page = await s3().send(new ListObjectsV2Command({ Bucket: S3_BUCKET, ContinuationToken: token }));
  for (const o of page.Contents ?? []) objects.push({ key: o.Key!, size: o.Size ?? 0, etag: o.ETag, lastModified: o.LastModified?.toISOString() });
  token = page.IsTruncated ? page.NextContinuationToken : undefined;
} while (token);
writeFileSync(join(folder, "objects.json"), JSON.stringify({ bucket: S3_BUCKET, objects }, null, 1));

const manifest: Manifest = {
  createdAt: new Date().toISOString(),
  database: safeUrl(DATABASE_URL),
  tables,
  objects: { bucket: S3_BUCKET, count: objects.length, bytes: objects.reduce((n, o) => n + o.size, 0) },
};
writeFileSync(join(folder, "manifest.json"), JSON.stringify(manifest, null, 1));
const rowsTotal = tables.reduce((n, t) => n + t.rows, 0);
console.log(`Backed up ${tables.length} tables (${rowsTotal} rows) and listed ${objects.length} objects in ${S3_BUCKET} to ${folder}`);
