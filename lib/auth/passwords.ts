/**
 * Password hashes. New hashes use scrypt through Node's asynchronous API, which runs in libuv's
 * thread pool, so checking a password never stalls other requests. Hashes made earlier with bcrypt
 * still verify and are flagged for replacement on the person's next successful sign-in.
 *
 * Stored form: `scrypt$<log2 N>$<r>$<p>$<salt, base64url>$<key, base64url>`, so the cost can be
 * raised later without breaking existing hashes.
 */
import { randomBytes, scrypt, timingSafeEqual } from "node:crypto";
import bcrypt from "bcryptjs";

export type ScryptCost = { log2N: number; r: number; p: number };

/**
 * N = 2^15, r = 8, p = 1: 32 MiB and a noticeable fraction of a second per hash on a small server.
 * OWASP's Password Storage Cheat Sheet lists N = 2^17, r = 8, p = 1 as its minimum; we stay one
 * step lower to keep memory per concurrent sign-in at 32 MiB. The cost is stored in each hash.
 */
export const DEFAULT_COST: ScryptCost = { log2N: 15, r: 8, p: 1 };
const KEY_BYTES = 32;

function derive(password: string, salt: Buffer, cost: ScryptCost): Promise<Buffer> {
  const N = 2 ** cost.log2N;
  // scrypt needs 128·N·r bytes; Node refuses above maxmem (32 MiB by default), so allow twice that.
  const maxmem = 256 * N * cost.r;
  return new Promise((resolve, reject) =>
    scrypt(password.normalize("NFC"), salt, KEY_BYTES, { N, r: cost.r, p: cost.p, maxmem }, (err, key) => (err ? reject(err) : resolve(key))),
  );
}

export async function hashPassword(password: string, cost: ScryptCost = DEFAULT_COST): Promise<string> {
  const salt = randomBytes(16);
  const key = await derive(password, salt, cost);
  return ["scrypt", cost.log2N, cost.r, cost.p, salt.toString("base64url"), key.toString("base64url")].join("$");
}

export type Verdict = { ok: boolean; needsRehash: boolean };

/** Checks a password against a stored hash of either kind. A malformed hash never matches. */
export async function verifyPassword(password: string, stored: string): Promise<Verdict> {
  if (stored.startsWith("scrypt$")) {
    const [, n, r, p, salt, key] = stored.split("$");
    const cost = { log2N: Number(n), r: Number(r), p: Number(p) };
    if (![cost.log2N, cost.r, cost.p].every((x) => Number.isInteger(x) && x > 0) || cost.log2N > 22 || !salt || !key) {
      return { ok: false, needsRehash: false };
    }
    const expected = Buffer.from(key, "base64url");
    const actual = await derive(password, Buffer.from(salt, "base64url"), cost);
    const ok = expected.length === actual.length && timingSafeEqual(expected, actual);
    return { ok, needsRehash: false };
  }
  if (/^\$2[aby]\$/.test(stored)) {
    // bcryptjs's async compare yields between rounds; only old hashes take this path, once each.
    return { ok: await bcrypt.compare(password, stored), needsRehash: true };
  }
  return { ok: false, needsRehash: false };
}

let dummy: Promise<string> | null = null;
/** A hash at the current cost, checked when the e-mail is unknown so that case does the same work. */
export const dummyHash = () => (dummy ??= hashPassword("not-a-password-of-anyone"));
