/**
 * What may be uploaded to a project: the file types we can show or preview, a size limit, and a
 * file name made safe to store and to show back (the storage key never uses it).
 */

export const UPLOAD_TYPES = {
  "image/jpeg": { label: "JPEG photo", image: true },
  "image/png": { label: "PNG image", image: true },
  "image/webp": { label: "WebP image", image: true },
  // An iPhone's default. Never stored as such: the server converts it and keeps a JPEG.
  "image/heic": { label: "HEIC photo", image: true },
  "application/pdf": { label: "PDF document", image: false },
} as const;

export type UploadType = keyof typeof UPLOAD_TYPES;

/** Large enough for a full-resolution phone photo or a scanned certificate. */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;
export const MAX_FILE_NAME_CHARS = 120;

export function isUploadType(value: string): value is UploadType {
  return Object.prototype.hasOwnProperty.call(UPLOAD_TYPES, value);
}

export function isImageType(value: string): boolean {
  return isUploadType(value) && UPLOAD_TYPES[value].image;
}

/** The sentence shown when a type is refused. */
export function typeRefusal(_contentType: string): string {
  return "Only JPEG, PNG, WebP or HEIC photos and PDF documents can be uploaded.";
}

/** What the `accept` attribute of a file picker offers. */
export const PHOTO_ACCEPT = "image/jpeg,image/png,image/webp,image/heic,image/heif,.heic,.heif";

const HEIF_DECLARED = /^image\/hei[cf](-sequence)?$/;
const HEIF_NAME = /\.hei[cf]$/i;
const UNTYPED = new Set(["", "application/octet-stream"]);

/**
 * The type a file is taken to claim. Phones label HEIC photos image/heic, image/heif, or nothing at
 * all (then only the name says so); all of these are taken as one HEIC claim, which the bytes must
 * then bear out. Other types are taken as declared.
 */
export function claimedType(contentType: string, fileName: string): string {
  const declared = contentType.toLowerCase().split(";")[0].trim();
  if (HEIF_DECLARED.test(declared)) return "image/heic";
  if (UNTYPED.has(declared) && HEIF_NAME.test(fileName)) return "image/heic";
  return declared;
}

/** A converted HEIC photo keeps its name with a .jpg ending, so a download opens anywhere. */
export function convertedFileName(name: string): string {
  const base = name.replace(HEIF_NAME, "");
  return `${base || "photo"}.jpg`;
}

export function sizeRefusal(sizeBytes: number): string | null {
  if (!(sizeBytes > 0)) return "The file is empty.";
  if (sizeBytes > MAX_UPLOAD_BYTES) return `The file is ${(sizeBytes / 1024 / 1024).toFixed(1)} MB; the limit is ${MAX_UPLOAD_BYTES / 1024 / 1024} MB.`;
  return null;
}

// Control characters (C0, DEL, C1) and the bidirectional overrides that can disguise an extension.
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/;

export type NameCheck = { ok: true; name: string } | { ok: false; message: string };

/**
 * A file name safe to keep and show: any folder part is dropped (only the last segment after a
 * slash or backslash is kept), characters outside letters, digits, space, dot, dash, underscore and
 * brackets become "_", and leading dots go so the name can't hide or climb folders. Control
 * characters are refused outright rather than cleaned, because they only appear in crafted names.
 */
export function sanitiseFileName(raw: string): NameCheck {
  if (CONTROL.test(raw)) return { ok: false, message: "The file name has control characters in it. Rename the file and try again." };
  const last = raw.split(/[\\/]/).pop() ?? "";
  let name = last
    .normalize("NFC")
    .replace(/[^\p{L}\p{N} ._\-()]/gu, "_")
    .replace(/^[.\s]+/, "")
    .replace(/\s+/g, " ")
    .trim();
  if (!name || /^[_.\s]*$/.test(name)) return { ok: false, message: "The file needs a name with at least one letter or digit." };
  if (name.length > MAX_FILE_NAME_CHARS) {
    const dot = name.lastIndexOf(".");
    const ext = dot > 0 && name.length - dot <= 10 ? name.slice(dot) : "";
    name = name.slice(0, MAX_FILE_NAME_CHARS - ext.length) + ext;
  }
  return { ok: true, name };
}

/**
 * HEIF brands a still photo from a phone or camera carries as its major brand (ISO/IEC 23008-12
 * annex; the list libheif and file-type recognise). An ISO box file begins with a box size, then "ftyp".
 */
export const HEIF_BRANDS = new Set(["heic", "heix", "heim", "heis", "hevc", "hevx", "mif1", "msf1", "heif"]);

export function isHeifHead(head: Uint8Array): boolean {
  if (head.byteLength < 12) return false;
  const text = (from: number) => String.fromCharCode(head[from], head[from + 1], head[from + 2], head[from + 3]);
  return text(4) === "ftyp" && HEIF_BRANDS.has(text(8));
}

/** The type the file's first bytes show, from each format's signature; null when none matches. */
export function sniffType(head: Uint8Array): UploadType | null {
  const at = (i: number, bytes: number[]) => bytes.every((b, k) => head[i + k] === b);
  if (at(0, [0xff, 0xd8, 0xff])) return "image/jpeg";
  if (at(0, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "image/png";
  if (at(0, [0x52, 0x49, 0x46, 0x46]) && at(8, [0x57, 0x45, 0x42, 0x50])) return "image/webp";
  if (at(0, [0x25, 0x50, 0x44, 0x46, 0x2d])) return "application/pdf";
  if (isHeifHead(head)) return "image/heic";
  return null;
}

export type UploadMeta = { fileName: string; contentType: string; sizeBytes: number };

/** Checks a proposed upload; on failure, the field and the sentence to show. */
export function checkUpload(meta: UploadMeta): { ok: true; fileName: string; contentType: UploadType } | { ok: false; field: keyof UploadMeta; message: string } {
  const contentType = claimedType(meta.contentType, meta.fileName);
  if (!isUploadType(contentType)) return { ok: false, field: "contentType", message: typeRefusal(contentType) };
  const size = sizeRefusal(meta.sizeBytes);
  if (size) return { ok: false, field: "sizeBytes", message: size };
  const name = sanitiseFileName(meta.fileName);
  if (!name.ok) return { ok: false, field: "fileName", message: name.message };
  return { ok: true, fileName: name.name, contentType };
}

/**
 * The most pixels a photo may have. A phone's full-resolution photo is 12 to 50 million pixels
 * (common practice); past that the decoded image alone runs to hundreds of megabytes.
 */
export const MAX_UPLOAD_PIXELS = 50_000_000;

export function pixelRefusal(width: number, height: number): string | null {
  if (!(width > 0 && height > 0)) return "The photo couldn't be read; it may be damaged. Take it again or export it as JPEG.";
  if (width * height > MAX_UPLOAD_PIXELS) {
    return `The photo is ${width} × ${height} pixels; the limit is ${MAX_UPLOAD_PIXELS / 1_000_000} million pixels. Export a smaller copy and upload that.`;
  }
  return null;
}

// Markup that would make a browser treat the bytes as a page if it ever guessed the type.
const MARKUP = /<\s*(!doctype|html|head|body|script|iframe|svg|object|embed|meta)\b/i;

/**
 * Why a file that starts like a PDF is refused, or null: a PDF ends with its end-of-file marker
 * (allowing trailing whitespace), and its opening carries no web-page markup.
 */
export function pdfRefusal(bytes: Uint8Array): string | null {
  const head = new TextDecoder("latin1").decode(bytes.subarray(0, 2048));
  const tail = new TextDecoder("latin1").decode(bytes.subarray(Math.max(0, bytes.byteLength - 1024)));
  if (MARKUP.test(head) || !tail.includes("%%EOF")) {
    return "That PDF isn't complete or isn't a real PDF. Save it again from the program that made it and upload the new copy.";
  }
  return null;
}
