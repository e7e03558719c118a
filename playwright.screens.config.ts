import { defineConfig } from "@playwright/test";
import base from "./playwright.config";

// Screenshots of the main screens for the README, taken against the test server and its demo data.
// A first visit to each page compiles nothing but can be slow on a busy machine: a roomy timeout.
export default defineConfig({ ...base, testDir: "tests/screens", retries: 0, timeout: 240_000 });
