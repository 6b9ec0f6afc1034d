// The worker threads' code (lib/work/worker.ts) as one CommonJS file beside the app's build:
// DIST/worker/pool-worker.cjs, where lib/server/pool.ts looks for it. Packages stay external (they
// load from node_modules, as the app's own server code does); our code is bundled with the
// tsconfig's "@/" paths. `node scripts/build-worker.mjs [DIST]` builds it; `npm run build` and the
// start and test scripts call it after `next build` (which empties DIST first).
import path from "node:path";
import { fileURLToPath } from "node:url";
import * as esbuild from "esbuild";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");

export const workerFileIn = (distDir) => path.join(root, distDir, "worker", "pool-worker.cjs");

// The worker must never load server-only code (the database, the session): fail the build if it would.
const noServerOnly = {
  name: "no-server-only",
  setup(build) {
    build.onResolve({ filter: /^server-only$/ }, (args) => ({
      errors: [{ text: `${args.importer} imports server-only code, which cannot run on a worker thread` }],
    }));
  },
};

function options(outfile) {
  return {
    absWorkingDir: root,
    entryPoints: ["lib/work/worker.ts"],
    outfile,
    bundle: true,
    platform: "node",
    format: "cjs",
    target: "node20",
    packages: "external",
    tsconfig: "tsconfig.json",
    sourcemap: "linked",
    logLevel: "warning",
    plugins: [noServerOnly],
  };
}

/** Builds the worker into distDir; with `watch`, rebuilds on every change until the process ends. */
export async function buildWorker(distDir, { watch = false } = {}) {
  const outfile = workerFileIn(distDir);
  if (!watch) {
    await esbuild.build(options(outfile));
    return outfile;
  }
  const ctx = await esbuild.context(options(outfile));
  await ctx.rebuild();
  await ctx.watch();
  return outfile;
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const out = await buildWorker(process.argv[2] ?? process.env.NEXT_DIST_DIR ?? ".next");
  console.log(`worker → ${path.relative(root, out)}`);
}
