/** Shared by `npm run backup` and `npm run restore`: finding PostgreSQL's tools and reading tables. */
import { existsSync, readdirSync } from "node:fs";
import type { ClientBase } from "pg";

/** The newest installed PostgreSQL client tool (Debian keeps them per version), else the one on PATH. */
export function pgTool(name: "pg_dump" | "pg_restore"): string {
  const root = "/usr/lib/postgresql";
  const versions = existsSync(root) ? readdirSync(root).filter((v) => existsSync(`${root}/${v}/bin/${name}`)) : [];
  versions.sort((a, b) => Number(b) - Number(a));
  return versions.length ? `${root}/${versions[0]}/bin/${name}` : name;
}

export type TableSum = { table: string; rows: number; digest: string };

/**
 * Every table outside PostgreSQL's own schemas with its row count and a digest of its rows, in a
 * fixed time zone so the same rows read the same on any server.
 */
export async function tableSums(client: ClientBase): Promise<TableSum[]> {
  await client.query("set time zone 'UTC'");
  const { rows: tables } = await client.query<{ schema: string; name: string }>(
    `select table_schema as schema, table_name as name from information_schema.tables
      where table_type = 'BASE TABLE' and table_schema not in ('pg_catalog', 'information_schema')
      order by 1, 2`,
  );
  const out: TableSum[] = [];
  for (const t of tables) {
    const id = `${quoteIdent(t.schema)}.${quoteIdent(t.name)}`;
    const { rows } = await client.query<{ n: string; digest: string }>(
      `select count(*) as n, md5(coalesce(string_agg(md5(t::text), '' order by md5(t::text)), '')) as digest from ${id} t`,
    );
    out.push({ table: `${t.schema}.${t.name}`, rows: Number(rows[0].n), digest: rows[0].digest });
  }
  return out;
}

const quoteIdent = (s: string) => `"${s.replaceAll('"', '""')}"`;

export type Manifest = { createdAt: string; database: string; tables: TableSum[]; objects: { bucket: string; count: number; bytes: number } };

/** A connection string with any password hidden, for printing. */
export const safeUrl = (url: string) => url.replace(/\/\/([^:/@]+):[^@]*@/, "//$1:***@");
