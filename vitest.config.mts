import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// Unit tests (engine, pure code) and integration tests (real MariaDB, started by scripts/test.mjs).
// Browser tests have their own config: vitest.e2e.config.mts.
export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    alias: { "server-only": fileURLToPath(new URL("./tests/support/server-only-stub.ts", import.meta.url)) },
  },
  test: {
    environment: "node",
    include: ["tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    // Integration files share one database; run files one after another to keep them independent.
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
