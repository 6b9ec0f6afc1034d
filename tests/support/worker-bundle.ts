// Vitest's global set-up: the worker threads' bundle (scripts/build-worker.mjs) that the server code
// under test hands its solves and renders to, built fresh from the sources into the test build folder.
import { buildWorker } from "../../scripts/build-worker.mjs";
import { TEST_WORKER_DIST } from "./worker-file";

export default async function setup() {
  await buildWorker(TEST_WORKER_DIST);
}
