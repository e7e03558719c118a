import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// The unit tests alone, for the mutation run: Stryker's vitest runner starts one config, and the
// integration project would need the database and the app.
export default defineConfig({
  resolve: {
    alias: {
      "@": fileURLToPath(new URL(".", import.meta.url)),
      "server-only": fileURLToPath(new URL("./tests/support/empty.ts", import.meta.url)),
    },
  },
  test: { include: ["tests/unit/**/*.test.ts"], environment: "node" },
});
