import { afterEach, describe, expect, it, vi } from "vitest";

// env.ts reads process.env once; each case loads the modules afresh with its own public address.
async function load(appUrl: string) {
  vi.resetModules();
  vi.stubEnv("APP_URL", appUrl);
  vi.stubEnv("NEXTAUTH_URL", "");
  delete process.env.NEXTAUTH_URL;
  const { authOptions } = await import("@/server/auth-options");
  const { sessionCookieName } = await import("@/server/session-token");
  return { secure: authOptions.useSecureCookies, name: sessionCookieName() };
}

afterEach(() => {
  vi.unstubAllEnvs();
});

describe("session cookies", () => {
  it("are Secure, under the __Secure- name next-auth uses, when the public address is HTTPS", async () => {
    expect(await load("https://tanks.example.test")).toEqual({ secure: true, name: "__Secure-next-auth.session-token" });
  });

  it("are plain over HTTP (local development and the test server)", async () => {
    expect(await load("http://127.0.0.1:3000")).toEqual({ secure: false, name: "next-auth.session-token" });
  });
});
