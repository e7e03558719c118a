import "server-only";
import { hkdf } from "node:crypto";
import { jwtDecrypt } from "jose";
import { authSecret, servedOverHttps } from "../env";

/**
 * Reads next-auth's session cookie without rebuilding the session: one decryption with a key
 * derived once per secret. next-auth 4 encrypts the token as a JWE (dir, A256GCM) under a key
 * derived with HKDF-SHA256 from the secret and this fixed label (next-auth/jwt's own derivation).
 */
let derived: { secret: string; key: Promise<Uint8Array> } | null = null;

function encryptionKey(): Promise<Uint8Array> {
  const secret = authSecret();
  if (derived?.secret !== secret) {
    const key = new Promise<Uint8Array>((resolve, reject) =>
      hkdf("sha256", secret, "", "NextAuth.js Generated Encryption Key", 32, (err, bytes) => (err ? reject(err) : resolve(new Uint8Array(bytes)))),
    );
    derived = { secret, key };
  }
  return derived.key;
}

/** The session cookie's name: next-auth adds the `__Secure-` prefix when the app is served over HTTPS. */
export const sessionCookieName = () => `${servedOverHttps() ? "__Secure-" : ""}next-auth.session-token`;

export type SessionClaims = { uid: string; sv: number };

type CookieReader = { get(name: string): { value: string } | undefined; getAll(): { name: string; value: string }[] };

/** The session cookie's value, joining the numbered chunks next-auth writes for a large token. */
export function sessionCookieValue(jar: CookieReader): string | undefined {
  const name = sessionCookieName();
  const whole = jar.get(name)?.value;
  if (whole) return whole;
  const chunks = jar
    .getAll()
    .filter((c) => c.name.startsWith(`${name}.`))
    .sort((a, b) => Number(a.name.slice(name.length + 1)) - Number(b.name.slice(name.length + 1)));
  return chunks.length ? chunks.map((c) => c.value).join("") : undefined;
}

/** The person and session version in a token, or null for a missing, expired, foreign or pre-version token. */
export async function readSessionToken(token: string | undefined): Promise<SessionClaims | null> {
  if (!token) return null;
  try {
    // The same clock tolerance next-auth's own decode allows.
    const { payload } = await jwtDecrypt(token, await encryptionKey(), { clockTolerance: 15 });
    if (typeof payload.uid !== "string" || typeof payload.sv !== "number") return null;
    return { uid: payload.uid, sv: payload.sv };
  } catch {
    return null;
  }
}
