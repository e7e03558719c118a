import { defineConfig, devices } from "@playwright/test";

// Runs against the app that `npm test` builds and starts; Chromium comes from Debian's package.
export default defineConfig({
  testDir: "tests/e2e",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  fullyParallel: false,
  // Two at a time: the page sweep (which only reads) beside the other tests, and two sweeps at once
  // when the flows are done.
  workers: 2,
  retries: process.env.CI ? 1 : 0,
  reporter: [["list"]],
  use: {
    baseURL: process.env.TEST_APP_URL ?? "http://127.0.0.1:3100",
    trace: "retain-on-failure",
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
      args: ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
    },
  },
  projects: [
    // The flows write to the shared test database one at a time; the sweeps read the demo beside them.
    { name: "flows", testIgnore: /sweep\.spec\.ts/, workers: 1, use: { ...devices["Desktop Chrome"], channel: undefined } },
    // No trace for the sweeps: a trace of thirty pages costs more than the check, and a sweep's
    // failure lists each page and finding by itself.
    { name: "sweep", testMatch: /sweep\.spec\.ts/, use: { ...devices["Desktop Chrome"], channel: undefined, trace: "off" } },
  ],
});
