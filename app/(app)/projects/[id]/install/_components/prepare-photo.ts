"use client";
import imageCompression from "browser-image-compression";
import exifr from "exifr";
import { SEND_LONG_SIDE_PX, plausibleTakenAt, shrinkPlan } from "@/lib/install/photo-queue";

export type PreparedPhoto = { blob: Blob; fileName: string; contentType: string; takenAt: string | null };

/**
 * Reads when the camera took the photo, then shrinks it for a weak signal. The canvas draws the photo
 * upright (browsers apply its orientation tag when drawing), so the smaller copy needs no tag. HEIC
 * goes as it is: the server converts it. If shrinking fails the original is sent.
 */
export async function preparePhoto(file: File): Promise<PreparedPhoto> {
  let takenAt: string | null = null;
  try {
    const tags = await exifr.parse(file, ["DateTimeOriginal"]);
    takenAt = plausibleTakenAt(tags?.DateTimeOriginal);
  } catch {
    // No readable camera record: the upload time stands in.
  }
  const plan = shrinkPlan(file);
  if (!plan.shrink) return { blob: file, fileName: file.name, contentType: file.type, takenAt };
  try {
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
