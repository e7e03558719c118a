import "server-only";
import { createHash } from "node:crypto";
import { RateLimiterPostgres, type RateLimiterRes } from "rate-limiter-flexible";
import { pool } from "../db";
import { env } from "../env";

/**
 * Sign-in throttling, per account and per address, with counters in PostgreSQL so every app
 * instance sees the same ones. Only wrong sign-ins count; a right one clears the account's count.
 * An unknown e-mail is counted exactly like a known one, so the answers never tell them apart.
 */
const WINDOW_SECONDS = 15 * 60; // OWASP Authentication Cheat Sheet: lock out for a period, not for good (common practice: 15 minutes)

type Limiters = { account: RateLimiterPostgres; address: RateLimiterPostgres };
const cache = globalThis as unknown as { __tankwrightSignInLimits?: Limiters };

function limiters(): Limiters {
  if (cache.__tankwrightSignInLimits) return cache.__tankwrightSignInLimits;
  const make = (keyPrefix: string, points: number) =>
    new RateLimiterPostgres({
      storeClient: pool(),
      storeType: "pool",
      tableName: "sign_in_limits",
      // The table comes from the migrations; the library must not try to create it.
      tableCreated: true,
      clearExpiredByTimeout: true,
      keyPrefix,
      points,
      duration: WINDOW_SECONDS,
      blockDuration: WINDOW_SECONDS,
    });
  cache.__tankwrightSignInLimits = {
    account: make("account", env().SIGN_IN_LIMIT_PER_ACCOUNT),
    address: make("address", env().SIGN_IN_LIMIT_PER_ADDRESS),
  };
  return cache.__tankwrightSignInLimits;
}

/** The account key: a digest of the normalised e-mail, so no address is stored in the counters. */
const accountKey = (email: string) => createHash("sha256").update(email.trim().toLowerCase()).digest("hex");

/**
 * The caller's address. `TRUSTED_PROXY_HOPS` proxies each append the address they saw to
 * X-Forwarded-For; the entry the outermost of them added is the caller. Without a proxy the app
 * server fills the header with the connection's address when the caller sent none.
 */
export function callerAddress(headers: Headers): string {
  const entries = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  const hops = Math.max(1, env().TRUSTED_PROXY_HOPS);
  return entries[Math.max(0, entries.length - hops)] ?? "unknown";
}

export type SignInAttempt = { account: string; address: string };
export const signInAttempt = (email: string, headers: Headers): SignInAttempt => ({ account: accountKey(email), address: callerAddress(headers) });

/** Seconds until this attempt may be made, or 0 when it may be made now. */
export async function secondsUntilAllowed(attempt: SignInAttempt): Promise<number> {
  const { account, address } = limiters();
  const [a, b] = await Promise.all([account.get(attempt.account), address.get(attempt.address)]);
  const wait = (res: RateLimiterRes | null, points: number) => (res && res.consumedPoints >= points ? res.msBeforeNext : 0);
  const ms = Math.max(wait(a, account.points), wait(b, address.points));
  return ms > 0 ? Math.ceil(ms / 1000) : 0;
}

/** Counts a wrong sign-in against the account and the address. */
export async function recordFailure(attempt: SignInAttempt): Promise<void> {
  const { account, address } = limiters();
  // consume() rejects once the limit is passed; the count is kept either way.
  await Promise.all([account.consume(attempt.account).catch(swallowLimit), address.consume(attempt.address).catch(swallowLimit)]);
}

/** A right sign-in clears the account's count (not the address's: one good account mustn't unlock guessing at others). */
export async function recordSuccess(attempt: SignInAttempt): Promise<void> {
  await limiters().account.delete(attempt.account);
}

function swallowLimit(err: unknown) {
  if (err instanceof Error) throw err; // a database failure, not a limit
}
