"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { holdTick as withHeldTick, newPhotoKey, photoQueueKey, sendOutcome, withoutPhoto, type HeldTick } from "@/lib/install/photo-queue";
import { useSendLoop } from "@/components/offline/use-send-loop";
import { readPhotos, writePhotos, type StoredPhoto } from "./photo-store";
import { preparePhoto } from "./prepare-photo";

export type SentPhoto = { id: string; fileName: string; caption: string | null; url: string; thumbUrl: string | null };

/** How a queued photo left the queue: the server took it, or refused it for good. */
export type PhotoOutcome = { kind: "sent"; photo: SentPhoto; entry: StoredPhoto } | { kind: "refused"; message: string; entry: StoredPhoto };

/**
 * Keeps photos taken on install day on the phone (IndexedDB) until the server has them, sending them
 * one at a time, each with its own key so a retry after a lost answer returns the first upload.
 * `onOutcome` hears of each photo sent or refused (with its queue entry as it stood) before it leaves
 * the queue, so a tick waiting for it is queued first and a closed page in between loses nothing.
 */
export function usePhotoQueue(userId: string, projectId: string, onOutcome: (o: PhotoOutcome) => void) {
  const storageKey = photoQueueKey(userId, projectId);
  const [queue, setQueue] = useState<StoredPhoto[]>([]);
  const [lastError, setLastError] = useState<string | null>(null);
  const [refusals, setRefusals] = useState<{ key: string; fileName: string; message: string }[]>([]);
  const queueRef = useRef<StoredPhoto[]>([]);
  const onOutcomeRef = useRef(onOutcome);
  useEffect(() => {
    onOutcomeRef.current = onOutcome;
  });

  const store = useCallback(
    async (next: StoredPhoto[]) => {
      queueRef.current = next;
      setQueue(next);
      try {
        await writePhotos(storageKey, next);
      } catch {
        setLastError("This phone couldn't keep the photo for later (its storage is full or blocked). Keep the page open until it is sent.");
      }
    },
    [storageKey],
  );

  const sendNow = useSendLoop(async () => {
    while (queueRef.current.length) {
      const p = queueRef.current[0];
      const form = new FormData();
      form.set("file", new File([p.blob], p.fileName, { type: p.contentType }));
      form.set("stage", p.stage);
      form.set("clientKey", p.clientKey);
      if (p.caption) form.set("caption", p.caption);
      if (p.takenAt) form.set("takenAt", p.takenAt);
      let status = 0;
      let data: { attachment?: SentPhoto; error?: string } | null = null;
      try {
        const res = await fetch(`/api/projects/${projectId}/uploads`, { method: "POST", body: form });
        status = res.status;
        data = await res.json().catch(() => null);
      } catch {
        status = 0;
      }
      const outcome = sendOutcome(status);
      if (outcome === "retry") {
        setLastError(status === 0 ? "No connection. Photos are kept on this phone and sent when the signal returns." : (data?.error ?? `The server answered ${status}.`));
        return false;
      }
      setLastError(null);
      // The entry as it stands now: "Mark done" may have held a tick on it while it was being sent.
      const entry = queueRef.current.find((x) => x.clientKey === p.clientKey) ?? p;
      if (outcome === "sent" && data?.attachment) onOutcomeRef.current({ kind: "sent", photo: data.attachment, entry });
      if (outcome === "refused") {
        const message = data?.error ?? `The server refused it (${status}).`;
        setRefusals((r) => [...r, { key: p.clientKey, fileName: p.fileName, message }]);
        onOutcomeRef.current({ kind: "refused", message, entry });
      }
      await store(withoutPhoto(queueRef.current, p.clientKey));
    }
    return true;
  });

  useEffect(() => {
    let live = true;
    void readPhotos(storageKey)
      .then((saved) => {
        if (!live) return;
        queueRef.current = saved;
        setQueue(saved);
        if (saved.length) sendNow();
      })
      .catch(() => setLastError("Photos kept on this phone couldn't be read."));
    return () => {
      live = false;
    };
  }, [storageKey, sendNow]);

  /** Shrinks and keeps a photo, then tries to send it; answers with its key. */
  const add = useCallback(
    async (file: File, stage: string, caption: string | null, forItemId: string | null = null) => {
      const prepared = await preparePhoto(file);
      const photo: StoredPhoto = {
        clientKey: newPhotoKey(),
        stage,
        caption,
        fileName: prepared.fileName,
        contentType: prepared.contentType,
        takenAt: prepared.takenAt,
        queuedAt: new Date().toISOString(),
        forItemId,
        blob: prepared.blob,
      };
      await store([...queueRef.current, photo]);
      sendNow();
      return photo.clientKey;
    },
    [store, sendNow],
  );

  /** Holds a tick on a waiting photo; false when the photo has already left the queue. */
  const holdTick = useCallback(
    (photoKey: string, tick: HeldTick) => {
      const next = withHeldTick(queueRef.current, photoKey, tick);
      if (!next) return false;
      void store(next);
      return true;
    },
    [store],
  );

  const dismissRefusal = useCallback((key: string) => setRefusals((r) => r.filter((x) => x.key !== key)), []);

  return { queue, add, holdTick, retryNow: sendNow, lastError, refusals, dismissRefusal };
}
