/** A fingerprint of every row in the app's tables, to check that a refused request changed nothing. */
import { sql } from "drizzle-orm";
import { db } from "@/db";

let tables: string[] | null = null;

// The worker marks notices sent in the background; what counts for "nothing changed" is that no
// notice was added, so only their ids go into the fingerprint.
const ROW_TEXT: Record<string, string> = { notices: "x.id::text" };

export async function dbDigest(): Promise<Record<string, string>> {
  if (!tables) {
    const rows = await db().execute<{ name: string }>(
      sql`select quote_ident(table_name) as name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' order by table_name`,
    );
    tables = rows.rows.map((r) => r.name);
  }
  const parts = tables.map((t) => {
    const row = ROW_TEXT[t] ?? "x::text";
    return `select '${t}' as t, count(*)::text || ':' || coalesce(md5(string_agg(md5(${row}), '' order by md5(${row}))), '') as d from ${t} x`;
  });
  const res = await db().execute<{ t: string; d: string }>(sql.raw(parts.join(" union all ")));
  return Object.fromEntries(res.rows.map((r) => [r.t, r.d]));
}
