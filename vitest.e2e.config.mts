import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// Browser tests: Debian's Chromium driven by playwright-core against the server scripts/test.mjs started.
export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // Tests that check the database themselves import the queries, which are server-only in the app.
    alias: { "server-only": fileURLToPath(new URL("./tests/support/server-only-stub.ts", import.meta.url)) },
  },
  test: {
    environment: "node",
    include: ["tests/e2e/**/*.test.ts"],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
