import "server-only";
import { env } from "../env";
import { AppError } from "./errors";

export type BodyKind = "json" | "multipart";

const MUTATING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

export function isMutating(method: string): boolean {
  return MUTATING.has(method.toUpperCase());
}

/**
 * A write must come from our own pages (or a client that sends no Origin at all, such as a script
 * holding a session): a browser always names the page's origin on a cross-site write, and a
 * foreign one is refused before anything else happens.
 */
export function checkOrigin(req: Request) {
  const origin = req.headers.get("origin");
  const site = req.headers.get("sec-fetch-site");
  if (site === "cross-site") throw new AppError(403, "Requests from other sites aren't accepted.");
  if (origin === null) return;
  const allowed = new Set([new URL(env().APP_URL).origin, new URL(req.url).origin]);
  if (!allowed.has(origin)) throw new AppError(403, "Requests from other sites aren't accepted.");
}

/**
 * Only JSON (and multipart where a route takes files) is read. A form or text/plain body, which
 * another site can send without asking first, is refused with 415.
 */
export function checkContentType(req: Request, accepts: BodyKind[], expectsBody: boolean): BodyKind | null {
  const raw = req.headers.get("content-type");
  const type = raw?.split(";")[0].trim().toLowerCase() ?? "";
  if (!type) {
    const length = req.headers.get("content-length");
    const empty = length === "0" || (length === null && !req.headers.get("transfer-encoding"));
    if (!expectsBody && empty) return null;
    throw new AppError(415, "Send the request as JSON (Content-Type: application/json).");
  }
  if (type === "application/json" && accepts.includes("json")) return "json";
  if (type === "multipart/form-data" && accepts.includes("multipart")) return "multipart";
  const names = accepts.map((k) => (k === "json" ? "application/json" : "multipart/form-data")).join(" or ");
  throw new AppError(415, `This address accepts ${names} only.`);
}
