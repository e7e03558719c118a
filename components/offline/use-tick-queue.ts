"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { sendJson } from "@/lib/http/send-json";
import { isRetryable, newTickKey, parseQueue, queueStorageKey, type QueuedTick } from "@/lib/install/tick-queue";
import { useSendLoop } from "./use-send-loop";

export type SavedTick = { itemId: string; done: boolean; note: string | null; value: number | null; attachmentId: string | null; at: string };

/**
 * Keeps unsaved ticks on the device and sends them in order, each with its own key so a save that
 * reached the server before the connection dropped isn't applied twice. A refusal is handed back to show.
 */
export function useTickQueue<T = SavedTick>(
  projectId: string,
  handlers: { onSaved: (t: T, q: QueuedTick) => void; onRefused: (q: QueuedTick, error: string) => void },
  /** Another list of ticks (a service visit's tasks): its own address, its own stored queue, its own body. */
  target?: { url: string; storageKey: string; body: (q: QueuedTick) => Record<string, unknown> },
) {
  const storageKey = target?.storageKey ?? queueStorageKey(projectId);
  const url = target?.url ?? `/api/projects/${projectId}/checklist/ticks`;
  const bodyRef = useRef(target?.body);
  const handlersRef = useRef(handlers);
  // The latest handlers and body, for sends that outlive a render.
  useEffect(() => {
    bodyRef.current = target?.body;
    handlersRef.current = handlers;
  });
  const [queue, setQueue] = useState<QueuedTick[]>([]);
  const [lastError, setLastError] = useState<string | null>(null);
  const queueRef = useRef<QueuedTick[]>([]);

  const store = useCallback(
    (next: QueuedTick[]) => {
      queueRef.current = next;
      setQueue(next);
      try {
        if (next.length) localStorage.setItem(storageKey, JSON.stringify(next));
        else localStorage.removeItem(storageKey);
      } catch {
        // Storage full or blocked: the queue still lives in memory until the tab closes.
      }
    },
    [storageKey],
  );

  const sendNow = useSendLoop(async () => {
    while (queueRef.current.length) {
      const q = queueRef.current[0];
      const body = bodyRef.current
        ? { ...bodyRef.current(q), clientKey: q.clientKey }
        : { itemId: q.itemId, done: q.done, note: q.note, value: q.value, attachmentId: q.attachmentId, clientKey: q.clientKey };
      const res = await sendJson<{ tick: T }>(url, "POST", body);
      if (!res.ok && isRetryable(res.status)) {
        setLastError(res.status === 0 ? "No connection. Ticks are kept on this phone and sent when the signal returns." : res.error);
        return false;
      }
      setLastError(null);
      store(queueRef.current.filter((x) => x.clientKey !== q.clientKey));
      if (res.ok) handlersRef.current.onSaved(res.data.tick, q);
      else handlersRef.current.onRefused(q, res.fields ? Object.values(res.fields)[0] : res.error);
    }
    return true;
  });

  useEffect(() => {
    const saved = parseQueue(localStorage.getItem(storageKey));
    queueRef.current = saved;
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the saved queue lives in localStorage, readable only after mount
    setQueue(saved);
    if (saved.length) sendNow();
  }, [storageKey, sendNow]);

  /** Queues a tick; `clientKey` may be given when the tick must keep one key across tries (a tick that follows its photo). */
  const enqueue = useCallback(
    (t: Omit<QueuedTick, "clientKey" | "queuedAt"> & { clientKey?: string }) => {
      const key = t.clientKey ?? newTickKey();
      const existing = queueRef.current.find((x) => x.clientKey === key);
      if (existing) return existing;
      const q: QueuedTick = { ...t, clientKey: key, queuedAt: new Date().toISOString() };
      store([...queueRef.current, q]);
      sendNow();
      return q;
    },
    [store, sendNow],
  );

  return { queue, enqueue, retryNow: sendNow, lastError };
}
