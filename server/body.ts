import "server-only";
import { AppError } from "./errors";

/** A JSON body is small: the largest form (the site survey) is a few kilobytes. */
export const JSON_BODY_LIMIT = 64 * 1024;

const tooLarge = (limit: number) =>
  new AppError(413, `The request is too large: the limit here is ${formatBytes(limit)}. Send less, or a smaller file.`);

function formatBytes(n: number): string {
  return n >= 1024 * 1024 ? `${(n / 1024 / 1024).toFixed(0)} MB` : `${Math.ceil(n / 1024)} KB`;
}

/**
 * Refuses a body whose declared length is over the limit without reading any of it. Called before
 * the session check, so an anonymous flood costs nothing but its headers.
 */
export function checkDeclaredLength(req: Request, limit: number) {
  const declared = req.headers.get("content-length");
  if (declared === null) return;
  const n = Number(declared);
  if (!Number.isFinite(n) || n < 0) throw new AppError(400, "The request's length header is not a number.");
  if (n > limit) throw tooLarge(limit);
}

/**
 * Reads the body chunk by chunk and stops at the limit, so a body sent without a length (or with
 * a false one) is never held whole in memory; the rest of the stream is cancelled.
 */
export async function readLimitedBody(req: Request, limit: number): Promise<Uint8Array> {
  checkDeclaredLength(req, limit);
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limit) {
        await reader.cancel().catch(() => undefined);
        throw tooLarge(limit);
      }
      chunks.push(value);
    }
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw new AppError(400, "The request was cut off before it arrived whole. Try again.");
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** Parses a JSON body that must be valid UTF-8; anything else is a 400, never a crash. */
export function parseJsonBytes(bytes: Uint8Array): unknown {
  try {
    const text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
    return JSON.parse(text);
  } catch {
    throw new AppError(400, "The request body must be JSON.");
  }
}

/** Parses a multipart form from bytes already read within the limit. */
export async function parseFormBytes(bytes: Uint8Array, contentType: string): Promise<FormData> {
  try {
    return await new Response(bytes as BodyInit, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw new AppError(400, "The upload was cut off or malformed. Try again.");
  }
}
