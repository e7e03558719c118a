import "server-only";
import { createHash } from "node:crypto";
import type { SQL } from "drizzle-orm";
import { PgDialect } from "drizzle-orm/pg-core";
import { pool } from "../index";

const dialect = new PgDialect();

/**
 * Runs a hot read as a named prepared statement, so PostgreSQL parses and plans it once per
 * connection instead of on every request. The name carries a hash of the text, so two texts never share one.
 */
export async function queryPrepared<T>(base: string, query: SQL): Promise<T[]> {
  const { sql: text, params } = dialect.sqlToQuery(query);
  const name = `${base}-${createHash("sha1").update(text).digest("hex").slice(0, 12)}`;
  const res = await pool().query({ name, text, values: params as unknown[] });
  return res.rows as T[];
}
