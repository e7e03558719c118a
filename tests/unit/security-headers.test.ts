import { describe, expect, it } from "vitest";
import { contentSecurityPolicy, storageOrigins, STATIC_SECURITY_HEADERS } from "@/lib/http/security-headers";

const base = { nonce: "abc123", dev: false, https: false, storageOrigins: ["http://127.0.0.1:4569"] };

describe("content security policy", () => {
  it("allows scripts only by nonce in production, and no framing", () => {
    const csp = contentSecurityPolicy(base);
    expect(csp).toContain("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).not.toMatch(/script-src[^;]*unsafe-inline/);
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("img-src 'self' data: blob: http://127.0.0.1:4569");
    expect(csp).not.toContain("upgrade-insecure-requests");
  });

  it("adds eval only for development builds and upgrades requests over HTTPS", () => {
    expect(contentSecurityPolicy({ ...base, dev: true })).toContain("'unsafe-eval'");
    expect(contentSecurityPolicy({ ...base, https: true })).toContain("upgrade-insecure-requests");
  });

  it("names the object store's origin for presigned links", () => {
    expect(storageOrigins({ endpoint: "https://objects.example.test/some/path", bucket: "b", region: "r" })).toEqual(["https://objects.example.test"]);
    expect(storageOrigins({ bucket: "tank-files", region: "eu-west-2" })).toContain("https://tank-files.s3.eu-west-2.amazonaws.com");
  });

  it("sends nosniff, frame protection and a referrer policy everywhere", () => {
    const h = Object.fromEntries(STATIC_SECURITY_HEADERS.map((x) => [x.key, x.value]));
    expect(h).toMatchObject({ "X-Content-Type-Options": "nosniff", "X-Frame-Options": "DENY", "Referrer-Policy": "strict-origin-when-cross-origin" });
  });
});
