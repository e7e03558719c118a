/**
 * The device-side queue of checklist ticks not yet saved. Pure helpers; the component keeps the
 * queue in localStorage so a closed tab or a dead battery loses nothing.
 */

export type QueuedTick = {
  clientKey: string;
  itemId: string;
  done: boolean;
  note: string | null;
  value: number | null;
  attachmentId: string | null;
  queuedAt: string;
};

/** Wait before the next try: 1, 2, 4, 8 s, then every 8 s; short enough to notice a returning signal. */
export function retryDelayMs(attempt: number): number {
  return Math.min(8000, 1000 * 2 ** Math.max(0, attempt));
}

/** Statuses worth retrying: no connection, the server busy or failing. Anything else is an answer. */
export function isRetryable(status: number): boolean {
  return status === 0 || status === 408 || status === 429 || status >= 500;
}

export function pendingLabel(count: number): string {
  return count === 1 ? "Waiting to save — 1 tick" : `Waiting to save — ${count} ticks`;
}

/** Reads a stored queue, dropping anything malformed rather than failing the page. */
export function parseQueue(raw: string | null): QueuedTick[] {
  if (!raw) return [];
  try {
    const data = JSON.parse(raw);
    if (!Array.isArray(data)) return [];
    return data.filter((t) => t && typeof t.clientKey === "string" && typeof t.itemId === "string" && typeof t.done === "boolean");
  } catch {
    return [];
  }
}

export const queueStorageKey = (projectId: string) => `tankwright:ticks:${projectId}`;

/** A random key for one tick. getRandomValues works on plain-http pages too, unlike randomUUID. */
export function newTickKey(): string {
  const bytes = new Uint8Array(16);
  globalThis.crypto.getRandomValues(bytes);
  return `t-${Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("")}`;
}
