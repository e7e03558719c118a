/**
 * `npm run restore -- <folder> [--replace]`: loads a backup made by `npm run backup` into the
 * database at DATABASE_URL, then checks every table's row count and digest against the backup's
 * manifest and that every listed object is still in the bucket. Without --replace the database
 * must be empty (a fresh `createdb`), so a restore never overwrites data by mistake.
 */
import { spawnSync } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { HeadObjectCommand } from "@aws-sdk/client-s3";
import { Client } from "pg";
import { env } from "../env";
import { s3 } from "../server/storage";
import { pgTool, safeUrl, tableSums, type Manifest } from "./backup/shared";

const args = process.argv.slice(2);
const replace = args.includes("--replace");
const folderArg = args.find((a) => !a.startsWith("--"));
if (!folderArg || !existsSync(join(resolve(folderArg), "database.dump"))) {
  console.error("Usage: npm run restore -- <backup folder> [--replace]   (the folder holds database.dump, objects.json and manifest.json)");
  process.exit(2);
}
const folder = resolve(folderArg);
const manifest = JSON.parse(readFileSync(join(folder, "manifest.json"), "utf8")) as Manifest;
const { objects } = JSON.parse(readFileSync(join(folder, "objects.json"), "utf8")) as { objects: { key: string; size: number }[] };
const { DATABASE_URL, S3_BUCKET } = env();

const client = new Client({ connectionString: DATABASE_URL });
await client.connect();
const { rows } = await client.query<{ n: string }>("select count(*) as n from information_schema.tables where table_schema not in ('pg_catalog', 'information_schema')");
if (Number(rows[0].n) > 0 && !replace) {
  console.error(`${safeUrl(DATABASE_URL)} already has tables. Restore into a new, empty database, or add --replace to overwrite this one.`);
  process.exit(1);
}

const restore = spawnSync(
  pgTool("pg_restore"),
  ["--no-owner", "--no-acl", "--exit-on-error", ...(replace ? ["--clean", "--if-exists"] : []), `--dbname=${DATABASE_URL}`, join(folder, "database.dump")],
  { stdio: ["ignore", "inherit", "inherit"] },
);
if (restore.status !== 0) {
  console.error(`pg_restore failed (exit ${restore.status ?? restore.signal}).`);
  process.exit(1);
}

const now = new Map((await tableSums(client)).map((t) => [t.table, t]));
await client.end();
const wrong = manifest.tables.filter((t) => now.get(t.table)?.rows !== t.rows || now.get(t.table)?.digest !== t.digest);
for (const t of wrong) console.error(`  ${t.table}: backup had ${t.rows} rows, restored ${now.get(t.table)?.rows ?? "no table"}${now.get(t.table)?.rows === t.rows ? " (contents differ)" : ""}`);

let missing = 0;
for (const o of objects) {
  try {
    await s3().send(new HeadObjectCommand({ Bucket: S3_BUCKET, Key: o.key }));
  } catch {
    missing++;
    if (missing <= 20) console.error(`  missing from ${S3_BUCKET}: ${o.key}`);
  }
}

const rowsTotal = manifest.tables.reduce((n, t) => n + t.rows, 0);
if (wrong.length) {
  console.error(`Restore incomplete: ${wrong.length} of ${manifest.tables.length} tables differ from the backup.`);
  process.exit(1);
}
console.log(`Restored ${manifest.tables.length} tables; all ${rowsTotal} rows match the backup of ${manifest.createdAt}.`);
if (missing) {
  console.error(`${missing} of ${objects.length} listed objects are not in ${S3_BUCKET}: copy them back from the bucket's own backup or versioning.`);
  process.exit(3);
}
console.log(`All ${objects.length} listed objects are in ${S3_BUCKET}.`);
