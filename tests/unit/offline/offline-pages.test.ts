import { describe, expect, it } from "vitest";
import { isOfflinePage, isShellAsset, savedCopyNotice } from "@/lib/offline/offline-pages";

describe("pages kept for offline use", () => {
  it("keeps a project's install-day page", () => {
    expect(isOfflinePage("/projects/2b1f0c1e-7c1d-4a35-9d55-0d3f2c1a9e10/install")).toBe(true);
    expect(isOfflinePage("/projects/abc/install/")).toBe(true);
  });
  it("keeps a service visit's report page", () => {
    expect(isOfflinePage("/projects/abc/service/visits/2b1f0c1e-7c1d-4a35-9d55-0d3f2c1a9e10")).toBe(true);
    expect(isOfflinePage("/projects/abc/service")).toBe(false);
    expect(isOfflinePage("/projects/abc/service/visits/x/extra")).toBe(false);
  });
  it("keeps no other page, and no API answer", () => {
    for (const path of ["/board", "/projects/abc", "/projects/abc/photos", "/projects/abc/install/extra", "/api/projects/abc/install", "/portal", "/projects//install"]) {
      expect(isOfflinePage(path)).toBe(false);
    }
  });
  it("keeps the built bundles only", () => {
    expect(isShellAsset("/_next/static/chunks/app-123.js")).toBe(true);
    expect(isShellAsset("/_next/static/media/font.woff2")).toBe(true);
    expect(isShellAsset("/api/attachments/1")).toBe(false);
    expect(isShellAsset("/_next/image")).toBe(false);
  });
});

describe("the saved-copy banner", () => {
  it("says when the copy was saved and what happens to new work", () => {
    expect(savedCopyNotice(new Date("2026-12-02T10:42:30Z"), "UTC")).toBe(
      "No signal — showing the page as it was at 10:42. Ticks and photos wait and send when you're back online.",
    );
  });
});
