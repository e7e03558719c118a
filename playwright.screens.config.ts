import { defineConfig } from "@playwright/test";
import base from "./playwright.config";

// Screenshots of the main screens for the README, taken against the test server and its demo data.
// Pages can be slow to answer on a busy shared machine: a roomy timeout.
export default defineConfig({ ...base, testDir: "tests/screens", retries: 0, timeout: 240_000 });
