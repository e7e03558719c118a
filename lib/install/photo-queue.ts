/**
 * The device-side queue of photos not yet sent. Pure rules only; the install-day page keeps the
 * queue (with each photo's bytes) in IndexedDB, so a reload, a closed tab or a flat battery loses
 * nothing, and sends it in order when there is a connection.
 */
import { claimedType } from "./upload-rules";
import { isRetryable } from "./tick-queue";

export type QueuedPhoto = {
  /** Sent with the photo; the server answers a repeat with the first upload, never a second one. */
  clientKey: string;
  stage: string;
  caption: string | null;
  fileName: string;
  contentType: string;
  /** When the camera took it, as an ISO instant, if the photo said. */
  takenAt: string | null;
  queuedAt: string;
  /** Taken for a checklist item (the item's own photo button) rather than the day's photo panel. */
  forItemId?: string | null;
  /** "Mark done" pressed before the photo was sent: the tick waits for the photo's id, then follows it. */
  thenTick?: HeldTick | null;
};

/** A tick that can't be sent yet because the photo it needs is still on the phone. */
export type HeldTick = { itemId: string; note: string | null; value: number | null; heldAt: string };

/** The longest side a photo is shrunk to before it is sent: plenty for a record of the work. */
export const SEND_LONG_SIDE_PX = 2500;

/**
 * What the phone does to a photo before queueing it. HEIC is sent as it is: Chromium can't draw it
 * on a canvas, and the server converts it. A JPEG, PNG or WebP is shrunk to a JPEG (PNG and WebP keep
 * their own type, so a screenshot stays sharp).
 */
export function shrinkPlan(file: { type: string; name: string }): { shrink: false } | { shrink: true; toType: string } {
  const type = claimedType(file.type, file.name);
  if (type === "image/jpeg" || type === "image/png" || type === "image/webp") return { shrink: true, toType: type };
  return { shrink: false };
}

/**
 * The camera's own time as an ISO instant, or null when it is missing or can't be right (before 2000
 * or more than a day ahead of this phone's clock: a camera whose clock was never set).
 */
export function plausibleTakenAt(value: unknown, now: Date = new Date()): string | null {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) return null;
  if (value.getTime() < Date.UTC(2000, 0, 1)) return null;
  if (value.getTime() > now.getTime() + 24 * 3600 * 1000) return null;
  return value.toISOString();
}

export type SendOutcome = "sent" | "retry" | "refused";

/** A sent photo leaves the queue; a refusal leaves it too (and is shown); anything else waits. */
export function sendOutcome(status: number): SendOutcome {
  if (status >= 200 && status < 300) return "sent";
  return isRetryable(status) ? "retry" : "refused";
}

export function waitingPhotosLabel(count: number): string {
  return count === 1 ? "Waiting to send — 1 photo" : `Waiting to send — ${count} photos`;
}

/** Where a person's queue for one project is kept: per person, so a shared phone never mixes them. */
export const photoQueueKey = (userId: string, projectId: string) => `tankwright:photos:${userId}:${projectId}`;

/** A random key for one photo. getRandomValues works on plain-http pages too, unlike randomUUID. */
export function newPhotoKey(): string {
  const bytes = new Uint8Array(16);
  globalThis.crypto.getRandomValues(bytes);
  return `p-${Array.from(bytes, (b) => b.toString(16).padStart(2, "0")).join("")}`;
}

const KEY_SHAPE = /^[A-Za-z0-9_-]{8,80}$/;

/**
 * The key of the tick that follows a photo. Made from the photo's own key, so if the phone sends the
 * photo again (the answer was lost, or the page closed before the photo left the queue) the server
 * answers the repeat tick with the first one too.
 */
export const tickKeyForPhoto = (photoKey: string) => `t-${photoKey}`;

function isHeldTick(t: unknown): t is HeldTick {
  if (!t || typeof t !== "object") return false;
  const h = t as Record<string, unknown>;
  return (
    typeof h.itemId === "string" &&
    typeof h.heldAt === "string" &&
    (h.note === null || typeof h.note === "string") &&
    (h.value === null || (typeof h.value === "number" && Number.isFinite(h.value)))
  );
}

/** Reads a stored queue, dropping anything malformed rather than failing the page. */
export function parsePhotoQueue<T extends QueuedPhoto>(data: unknown, hasBytes: (entry: Record<string, unknown>) => boolean): T[] {
  if (!Array.isArray(data)) return [];
  return data.filter(
    (p): p is T =>
      !!p &&
      typeof p === "object" &&
      typeof p.clientKey === "string" &&
      KEY_SHAPE.test(p.clientKey) &&
      typeof p.stage === "string" &&
      typeof p.fileName === "string" &&
      typeof p.contentType === "string" &&
      typeof p.queuedAt === "string" &&
      (p.forItemId == null || typeof p.forItemId === "string") &&
      hasBytes(p),
  ).map((p) => (p.thenTick == null || isHeldTick(p.thenTick) ? p : { ...p, thenTick: null }));
}

/**
 * The queue with a tick held on one photo, or null when that photo is no longer waiting (it has been
 * sent, and the caller already has its id).
 */
export function holdTick<T extends QueuedPhoto>(queue: T[], photoKey: string, tick: HeldTick): T[] | null {
  if (!queue.some((p) => p.clientKey === photoKey)) return null;
  return queue.map((p) => (p.clientKey === photoKey ? { ...p, forItemId: tick.itemId, thenTick: tick } : p));
}

/** The photo still waiting for one checklist item, if any: the newest one taken for it. */
export function waitingPhotoFor<T extends QueuedPhoto>(queue: T[], itemId: string): T | null {
  const mine = queue.filter((p) => p.forItemId === itemId);
  return mine.length ? mine[mine.length - 1] : null;
}

/** The queue without one photo (sent or refused), keeping the order of the rest. */
export function withoutPhoto<T extends QueuedPhoto>(queue: T[], clientKey: string): T[] {
  return queue.filter((p) => p.clientKey !== clientKey);
}
