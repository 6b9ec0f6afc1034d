import path from "node:path";
import { fileURLToPath } from "node:url";

/** Where the unit and integration tests build the worker bundle: beside the browser tests' build. */
export const TEST_WORKER_DIST = `${process.env.AXLEWRIGHT_TEST_DIST ?? ".next-test"}-vitest`;
export const TEST_WORKER_FILE = path.join(
  fileURLToPath(new URL("../..", import.meta.url)),
  TEST_WORKER_DIST,
  "worker",
  "pool-worker.cjs",
);
