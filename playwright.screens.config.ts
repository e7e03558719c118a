import { defineConfig } from "@playwright/test";
import base from "./playwright.config";

// Screenshots of the main screens for the README, taken against the test server and its demo data.
export default defineConfig({ ...base, testDir: "tests/screens", retries: 0 });
