import "server-only";
import { randomUUID } from "node:crypto";
import sharp from "sharp";
import { checkUpload, isImageType, sniffType } from "@/lib/install/upload-rules";
import { badRequest, unprocessable } from "@/server/errors";
import { putObject } from "@/server/storage";
import type { UploadBody } from "./upload.schema";

/** Keys say which project a file belongs to and nothing else guessable. */
export function newObjectKey(projectId: string): string {
  return `projects/${projectId}/${randomUUID()}`;
}

/** The checked name and type, or a 400 naming the field; nothing is stored before this passes. */
export function vetUpload(input: UploadBody) {
  const check = checkUpload(input);
  if (!check.ok) throw badRequest(check.message, { [check.field]: check.message });
  return check;
}

/** Refuses bytes that aren't what the file claims to be (a renamed program, a text file called .jpg). */
export function vetBytes(bytes: Uint8Array, claimed: string) {
  const actual = sniffType(bytes.subarray(0, 16));
  if (actual !== claimed) {
    throw unprocessable("The file's contents don't match its type. Upload the original photo or PDF, not a renamed file.");
  }
}

/** Makes and stores a small preview of a photo; PDFs get none. Returns the preview's key. */
export async function storeThumbnail(key: string, bytes: Uint8Array, contentType: string): Promise<string | null> {
  if (!isImageType(contentType)) return null;
  let thumb: Buffer;
  try {
    thumb = await sharp(bytes, { limitInputPixels: 80_000_000 }).rotate().resize(480, 480, { fit: "inside", withoutEnlargement: true }).webp({ quality: 72 }).toBuffer();
  } catch {
    throw unprocessable("The photo couldn't be read; it may be damaged. Take it again or export it as JPEG.");
  }
  const thumbKey = `${key}-thumb`;
  await putObject(thumbKey, thumb, "image/webp");
  return thumbKey;
}
