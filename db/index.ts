import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { env } from "../env";
import * as schema from "./schema";

export type Db = NodePgDatabase<typeof schema>;

type Cache = { pool?: Pool; db?: Db };
// Cached on globalThis so hot reload and repeated imports share one pool.
const cache = globalThis as unknown as { __tankwrightDb?: Cache };

function state(): Cache {
  cache.__tankwrightDb ??= {};
  return cache.__tankwrightDb;
}

export function pool(): Pool {
  const s = state();
  s.pool ??= new Pool({ connectionString: env().DATABASE_URL, max: env().DATABASE_POOL_MAX });
  return s.pool;
}

/** The Drizzle client. A function, so importing this module never opens a connection. */
export function db(): Db {
  const s = state();
  s.db ??= drizzle(pool(), { schema });
  return s.db;
}

export async function closeDb(): Promise<void> {
  const s = state();
  const p = s.pool;
  s.pool = undefined;
  s.db = undefined;
  if (p) await p.end();
}

export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
