"use client";
import { createContext, useCallback, useContext, useEffect, useMemo, useRef, type ReactNode } from "react";
import { usePhotoQueue, type PhotoOutcome } from "./use-photo-queue";
import { warmPhotoTools } from "./prepare-photo";

type Listener = (o: PhotoOutcome) => void;
type PhotoQueue = ReturnType<typeof usePhotoQueue> & { listen: (l: Listener) => () => void };

const PhotoQueueContext = createContext<PhotoQueue | null>(null);

/**
 * One photo queue for the whole install-day page: the day's photo panel and each checklist item's
 * photo button share it, so one IndexedDB entry holds every photo waiting on this phone.
 */
export function PhotoQueueProvider({ userId, projectId, children }: { userId: string; projectId: string; children: ReactNode }) {
  const listeners = useRef(new Set<Listener>());
  useEffect(() => warmPhotoTools(), []);
  const q = usePhotoQueue(userId, projectId, (o) => {
    for (const l of listeners.current) l(o);
  });
  const listen = useCallback((l: Listener) => {
    listeners.current.add(l);
    return () => {
      listeners.current.delete(l);
    };
  }, []);
  const { queue, add, holdTick, retryNow, lastError, refusals, dismissRefusal } = q;
  const value = useMemo(
    () => ({ queue, add, holdTick, retryNow, lastError, refusals, dismissRefusal, listen }),
    [queue, add, holdTick, retryNow, lastError, refusals, dismissRefusal, listen],
  );
  return <PhotoQueueContext.Provider value={value}>{children}</PhotoQueueContext.Provider>;
}

export function usePhotoQueueContext(): PhotoQueue {
  const q = useContext(PhotoQueueContext);
  if (!q) throw new Error("usePhotoQueueContext needs a PhotoQueueProvider above it.");
  return q;
}
