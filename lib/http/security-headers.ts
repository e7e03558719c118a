/**
 * The content security policy and the other security headers, as pure functions of the settings,
 * so the proxy (pages) and next.config (everything else) agree and the unit tests can read them.
 */
export type CspSettings = {
  nonce: string;
  /** Development builds evaluate code for their error overlay and fast refresh. */
  dev: boolean;
  /** Public address is HTTPS: ask the browser to upgrade any stray http:// request. */
  https: boolean;
  /** Where presigned photo and document links point (the object store's origins). */
  storageOrigins: string[];
};

export function contentSecurityPolicy({ nonce, dev, https, storageOrigins }: CspSettings): string {
  const storage = storageOrigins.join(" ");
  const directives = [
    "default-src 'self'",
    // Next puts the nonce on its own scripts; 'strict-dynamic' lets the chunks they load run.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    `style-src 'self' 'nonce-${nonce}'`,
    `style-src-elem 'self' 'nonce-${nonce}'`,
    // Inline style attributes (chart geometry, drag positions) carry no script; <style> elements still need the nonce.
    "style-src-attr 'unsafe-inline'",
    `img-src 'self' data: blob: ${storage}`.trim(),
    `media-src 'self' blob: ${storage}`.trim(),
    "font-src 'self'",
    `connect-src 'self' ${storage}`.trim(),
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ];
  return directives.join("; ");
}

/** Two years with subdomains: the value hstspreload.org asks for (common practice). */
export const HSTS = "max-age=63072000; includeSubDomains";

/** Headers every response carries, pages and API alike. */
export const STATIC_SECURITY_HEADERS: { key: string; value: string }[] = [
  { key: "X-Frame-Options", value: "DENY" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(self), microphone=(), geolocation=(), payment=()" },
];

/**
 * For API answers, which are never documents: nothing may load from them or frame them, and one
 * opened directly (a stored file) runs sandboxed, so an upload can never act as one of our pages.
 */
export const API_CSP = "default-src 'none'; frame-ancestors 'none'; sandbox";

/** The object store's origins as the browser sees presigned links. */
export function storageOrigins(s3: { endpoint?: string; bucket: string; region: string }): string[] {
  if (s3.endpoint) return [new URL(s3.endpoint).origin];
  return [`https://${s3.bucket}.s3.${s3.region}.amazonaws.com`, `https://s3.${s3.region}.amazonaws.com`];
}
