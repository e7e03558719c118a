"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { newPhotoKey, photoQueueKey, sendOutcome, withoutPhoto } from "@/lib/install/photo-queue";
import { retryDelayMs } from "@/lib/install/tick-queue";
import { readPhotos, writePhotos, type StoredPhoto } from "./photo-store";
import { preparePhoto } from "./prepare-photo";

export type SentPhoto = { id: string; fileName: string; caption: string | null; url: string; thumbUrl: string | null };

/**
 * Keeps photos taken on install day on the phone (IndexedDB) until the server has them, sending them
 * one at a time, each with its own key so a retry after a lost answer returns the first upload.
 * Network failures retry with backoff, and at once when the browser says it is back online.
 */
export function usePhotoQueue(userId: string, projectId: string, onSent: (p: SentPhoto) => void) {
  const storageKey = photoQueueKey(userId, projectId);
  const [queue, setQueue] = useState<StoredPhoto[]>([]);
  const [lastError, setLastError] = useState<string | null>(null);
  const [refusals, setRefusals] = useState<{ key: string; fileName: string; message: string }[]>([]);
  const queueRef = useRef<StoredPhoto[]>([]);
  const sending = useRef(false);
  const attempt = useRef(0);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const onSentRef = useRef(onSent);
  useEffect(() => {
    onSentRef.current = onSent;
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

  const flush = useCallback(async () => {
    if (sending.current) return;
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    sending.current = true;
    try {
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
          timer.current = setTimeout(() => void flush(), retryDelayMs(attempt.current++));
          return;
        }
        attempt.current = 0;
        setLastError(null);
        await store(withoutPhoto(queueRef.current, p.clientKey));
        if (outcome === "sent" && data?.attachment) onSentRef.current(data.attachment);
        if (outcome === "refused") {
          setRefusals((r) => [...r, { key: p.clientKey, fileName: p.fileName, message: data?.error ?? `The server refused it (${status}).` }]);
        }
      }
    } finally {
      sending.current = false;
    }
  }, [projectId, store]);

  useEffect(() => {
    let live = true;
    void readPhotos(storageKey)
      .then((saved) => {
        if (!live) return;
        queueRef.current = saved;
        setQueue(saved);
        if (saved.length) void flush();
      })
      .catch(() => setLastError("Photos kept on this phone couldn't be read."));
    const online = () => {
      attempt.current = 0;
      void flush();
    };
    window.addEventListener("online", online);
    return () => {
      live = false;
      window.removeEventListener("online", online);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [storageKey, flush]);

  const add = useCallback(
    async (file: File, stage: string, caption: string | null) => {
      const prepared = await preparePhoto(file);
      const photo: StoredPhoto = {
        clientKey: newPhotoKey(),
        stage,
        caption,
        fileName: prepared.fileName,
        contentType: prepared.contentType,
        takenAt: prepared.takenAt,
        queuedAt: new Date().toISOString(),
        blob: prepared.blob,
      };
      await store([...queueRef.current, photo]);
      attempt.current = 0;
      void flush();
    },
    [store, flush],
  );

  const retryNow = useCallback(() => {
    attempt.current = 0;
    void flush();
  }, [flush]);

  const dismissRefusal = useCallback((key: string) => setRefusals((r) => r.filter((x) => x.key !== key)), []);

  return { queue, add, retryNow, lastError, refusals, dismissRefusal };
}
