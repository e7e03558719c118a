"use client";
import { createStore, get, set, del } from "idb-keyval";
import { parsePhotoQueue, type QueuedPhoto } from "@/lib/install/photo-queue";

/** A queued photo with its bytes, as kept in IndexedDB (which stores Blobs as they are). */
export type StoredPhoto = QueuedPhoto & { blob: Blob };

let store: ReturnType<typeof createStore> | null = null;
const photos = () => (store ??= createStore("tankwright-photos", "queue"));

export async function readPhotos(key: string): Promise<StoredPhoto[]> {
  return parsePhotoQueue<StoredPhoto>(await get(key, photos()), (p) => p.blob instanceof Blob);
}

export async function writePhotos(key: string, queue: StoredPhoto[]): Promise<void> {
  if (queue.length) await set(key, queue, photos());
  else await del(key, photos());
}
