"use client";
import { SEND_LONG_SIDE_PX, plausibleTakenAt, shrinkPlan } from "@/lib/install/photo-queue";

export type PreparedPhoto = { blob: Blob; fileName: string; contentType: string; takenAt: string | null };

/**
 * Reads when the camera took the photo, then shrinks it for a weak signal. The canvas draws the photo
 * upright (browsers apply its orientation tag when drawing), so the smaller copy needs no tag. HEIC
 * goes as it is: the server converts it. If shrinking fails the original is sent. The shrinker and
 * the camera-record reader load on the first photo, not with the page (the service worker keeps them
 * with the page's other built files, so they load without a signal too).
 */
export async function preparePhoto(file: File): Promise<PreparedPhoto> {
  let takenAt: string | null = null;
  try {
    const { default: exifr } = await import("exifr");
    const tags = await exifr.parse(file, ["DateTimeOriginal"]);
    takenAt = plausibleTakenAt(tags?.DateTimeOriginal);
  } catch {
    // No readable camera record: the upload time stands in.
  }
  const plan = shrinkPlan(file);
  if (!plan.shrink) return { blob: file, fileName: file.name, contentType: file.type, takenAt };
  try {
    const { default: imageCompression } = await import("browser-image-compression");
    const smaller = await imageCompression(file, {
      maxWidthOrHeight: SEND_LONG_SIDE_PX,
      fileType: plan.toType,
      initialQuality: 0.85,
      // The worker version loads its script from elsewhere, which neither the page's policy nor a
      // basement's signal allows.
      useWebWorker: false,
    });
    return { blob: smaller, fileName: file.name, contentType: plan.toType, takenAt };
  } catch {
    return { blob: file, fileName: file.name, contentType: file.type, takenAt };
  }
}

/**
 * Loads the shrinker and the camera-record reader once the page is idle, so they are on the phone
 * (and saved with the page) before the first photo, which may be taken without a signal.
 */
export function warmPhotoTools(): () => void {
  const load = () => {
    void import("exifr").catch(() => undefined);
    void import("browser-image-compression").catch(() => undefined);
  };
  if (typeof window.requestIdleCallback === "function") {
    const id = window.requestIdleCallback(load, { timeout: 3000 });
    return () => window.cancelIdleCallback(id);
  }
  const id = window.setTimeout(load, 1000);
  return () => window.clearTimeout(id);
}
