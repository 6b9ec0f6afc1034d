import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";
import { TEST_WORKER_FILE } from "./tests/support/worker-file";

// Unit tests (engine, pure code) and integration tests (real MariaDB, started by scripts/test.mjs).
// Browser tests have their own config: vitest.e2e.config.mts.
export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    alias: { "server-only": fileURLToPath(new URL("./tests/support/server-only-stub.ts", import.meta.url)) },
  },
  test: {
    environment: "node",
    // The server code under test runs its heavy work on worker threads: their bundle, built first.
    globalSetup: ["tests/support/worker-bundle.ts"],
    env: { AXLEWRIGHT_WORKER_FILE: TEST_WORKER_FILE },
    include: ["tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    // Integration files share one database; run files one after another to keep them independent.
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
