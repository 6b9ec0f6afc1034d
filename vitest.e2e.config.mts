import { defineConfig } from "vitest/config";

// Browser tests: Debian's Chromium driven by playwright-core against the server scripts/test.mjs started.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    environment: "node",
    include: ["tests/e2e/**/*.test.ts"],
    fileParallelism: false,
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
