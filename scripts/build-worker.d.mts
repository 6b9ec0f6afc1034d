// Types of build-worker.mjs for the TypeScript that calls it (tests/support/worker-bundle.ts).
export function workerFileIn(distDir: string): string;
export function buildWorker(distDir: string, options?: { watch?: boolean }): Promise<string>;
