import "server-only";
import { getAccountState, type AccountState } from "../db/queries/sessions";

/**
 * Each instance keeps what it read about a person for a few seconds, so a burst of requests costs
 * one query. A sign-out, deactivation or role change made on another instance therefore takes
 * effect here within TTL_MS; on the instance that made it, at once (it calls forgetAccount).
 */
export const ACCOUNT_CACHE_TTL_MS = 5_000;
const MAX_ENTRIES = 10_000;

type Entry = { at: number; value: Promise<AccountState | null> };
// On globalThis: route handlers and pages are bundled separately but must share one cache.
const store = globalThis as unknown as { __tankwrightAccounts?: Map<string, Entry> };
const entries = () => (store.__tankwrightAccounts ??= new Map());

export function accountState(userId: string): Promise<AccountState | null> {
  const map = entries();
  const now = Date.now();
  const hit = map.get(userId);
  if (hit && now - hit.at < ACCOUNT_CACHE_TTL_MS) return hit.value;
  if (map.size >= MAX_ENTRIES) map.clear();
  const value = getAccountState(userId);
  map.set(userId, { at: now, value });
  // A failed read is not remembered.
  value.catch(() => map.get(userId)?.value === value && map.delete(userId));
  return value;
}

export function forgetAccount(userId: string): void {
  entries().delete(userId);
}
