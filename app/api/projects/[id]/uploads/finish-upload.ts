import "server-only";
import { randomUUID } from "node:crypto";
import sharp, { type Metadata } from "sharp";
import { MAX_UPLOAD_PIXELS, checkUpload, isImageType, pdfRefusal, pixelRefusal, sniffType } from "@/lib/install/upload-rules";
import { badRequest, unprocessable } from "@/server/errors";
import { putObject } from "@/server/storage";
import type { UploadBody } from "./upload.schema";
import { heicToJpeg } from "./heic";

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
    throw unprocessable(
      claimed === "image/heic"
        ? "That file is called a HEIC photo but isn't one. Upload the photo straight from the camera, or share it as JPEG."
        : "The file's contents don't match its type. Upload the original photo or PDF, not a renamed file.",
    );
  }
}

const DAMAGED = "The photo couldn't be read; it may be damaged. Take it again or export it as JPEG.";

/**
 * The bytes to store. The first bytes must match the type; a PDF must look like a whole PDF and
 * not a web page behind a PDF header; a photo's size in pixels is read from its header before
 * anything is decoded, then the photo is re-encoded, which drops whatever was appended after the
 * image (such as HTML) and the metadata (a phone's location among it). A HEIC photo is decoded
 * and stored as a JPEG, so the answer says which type was stored.
 */
export async function prepareFile(bytes: Uint8Array, claimed: string): Promise<{ bytes: Uint8Array; contentType: string }> {
  vetBytes(bytes, claimed);
  if (claimed === "image/heic") return { bytes: await heicToJpeg(bytes), contentType: "image/jpeg" };
  if (!isImageType(claimed)) {
    const refusal = pdfRefusal(bytes);
    if (refusal) throw unprocessable(refusal);
    return { bytes, contentType: claimed };
  }
  let meta: Metadata;
  try {
    meta = await sharp(bytes).metadata();
  } catch {
    throw unprocessable(DAMAGED);
  }
  const tooBig = pixelRefusal(meta.width ?? 0, meta.height ?? 0);
  if (tooBig) throw unprocessable(tooBig);
  try {
    const image = sharp(bytes, { limitInputPixels: MAX_UPLOAD_PIXELS }).rotate();
    const out =
      claimed === "image/png" ? image.png({ compressionLevel: 9 }) : claimed === "image/webp" ? image.webp({ quality: 90 }) : image.jpeg({ quality: 90 });
    return { bytes: new Uint8Array(await out.toBuffer()), contentType: claimed };
  } catch {
    throw unprocessable(DAMAGED);
  }
}

/** Makes and stores a small preview of a photo; PDFs get none. Returns the preview's key. */
export async function storeThumbnail(key: string, bytes: Uint8Array, contentType: string): Promise<string | null> {
  if (!isImageType(contentType)) return null;
  let thumb: Buffer;
  try {
    thumb = await sharp(bytes, { limitInputPixels: MAX_UPLOAD_PIXELS }).resize(480, 480, { fit: "inside", withoutEnlargement: true }).webp({ quality: 72 }).toBuffer();
  } catch {
    throw unprocessable(DAMAGED);
  }
  const thumbKey = `${key}-thumb`;
  await putObject(thumbKey, thumb, "image/webp");
  return thumbKey;
}
