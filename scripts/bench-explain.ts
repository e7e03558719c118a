/**
 * Prints PostgreSQL's plan, with timings, for every query one board read runs, as the bench lead:
 * the tool to look at when the bench's breakdown says a query is slow. Run against the bench
 * database while its cluster is up, e.g.
 *   DATABASE_URL=postgres://tankwright@127.0.0.1:54349/tankwright_bench node --conditions=react-server --import tsx scripts/bench-explain.ts
 */
import { eq } from "drizzle-orm";
import { closeDb, db, pool } from "../db";
import { users } from "../db/schema";
import { getBoard } from "../db/queries/board";
import { LEAD } from "./lib/bench-http";

const p = pool();
const original = p.query.bind(p);
const seen: { text: string; values: unknown[] }[] = [];
p.query = ((...args: unknown[]) => {
  const [q, v] = args as [string | { text: string; values?: unknown[] }, unknown[] | undefined];
  seen.push(typeof q === "string" ? { text: q, values: v ?? [] } : { text: q.text, values: q.values ?? v ?? [] });
  return (original as (...a: unknown[]) => unknown)(...args);
}) as typeof p.query;
const [lead] = await db().select().from(users).where(eq(users.email, process.env.BENCH_EXPLAIN_EMAIL ?? LEAD.email));
seen.length = 0;
await getBoard(lead);
p.query = original;
for (const q of [...seen]) {
  const res = await p.query(`explain (analyze, buffers, costs off) ${q.text}`, q.values);
  console.log(`\n== ${q.text.replace(/\s+/g, " ").slice(0, 120)}…`);
  for (const row of res.rows as { "QUERY PLAN": string }[]) console.log(row["QUERY PLAN"]);
}
await closeDb();
