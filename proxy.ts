import { NextResponse, type NextRequest } from "next/server";
import { env, servedOverHttps } from "./env";
import { HSTS, contentSecurityPolicy, storageOrigins } from "./lib/http/security-headers";

/**
 * Gives every page a fresh CSP nonce: Next reads it from the request's Content-Security-Policy
 * header and puts it on the scripts it renders. Pages are rendered per request, so each has its own.
 * Role checks stay on the server (requirePageUser); this only sets headers.
 */
export function proxy(request: NextRequest) {
  const e = env();
  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString("base64");
  const csp = contentSecurityPolicy({
    nonce,
    dev: e.NODE_ENV === "development",
    https: servedOverHttps(),
    storageOrigins: storageOrigins({ endpoint: e.S3_ENDPOINT, bucket: e.S3_BUCKET, region: e.S3_REGION }),
  });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("Content-Security-Policy", csp);
  if (servedOverHttps()) response.headers.set("Strict-Transport-Security", HSTS);
  return response;
}

export const config = {
  matcher: [
    {
      // Pages only: API answers, build assets and prefetches carry the static headers from next.config.
      source: "/((?!api|_next/static|_next/image|favicon.ico|fonts/).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};
