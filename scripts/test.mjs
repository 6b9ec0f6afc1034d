// `npm test`: the same preparation as `npm start`, against a throw-away database on its own port
// and folder, then every test: unit and integration (vitest), then browser tests in Chromium.
// Exits non-zero when anything fails, and stops every process it started.
import path from "node:path";
import { testSettings } from "./lib/env.mjs";
import {
  buildApp,
  createAppDatabase,
  debian,
  ensureDebianPackages,
  ensureNodeModules,
  log,
  onInterrupt,
  root,
  run,
  startApp,
  startMailSink,
  startMariaDb,
  startObjectStore,
  startPaymentService,
  tsx,
  waitForStopped,
} from "./lib/services.mjs";

const vitest = path.join(root, "node_modules/.bin/vitest");
// `npm test -- --no-browser` stops after the unit and integration tests (quicker while working);
// any other arguments are handed to vitest as file filters, e.g. `npm test -- role-matrix`.
const args = process.argv.slice(2);
const noBrowser = args.includes("--no-browser");
// `--skip-checks` leaves out tsc and eslint (quicker while working on one file; CI never uses it).
const skipChecks = args.includes("--skip-checks");
const filters = args.filter((a) => !a.startsWith("--"));
// With a filter, a run that matches no file is not a failure (the filter may aim at the other run).
const filterArgs = filters.length ? ["--passWithNoTests", ...filters] : [];

async function main() {
  ensureNodeModules();
  ensureDebianPackages([
    debian.mariadb,
    debian.chromium,
    debian.mpmath,
    debian.scipy,
    debian.ezdxf,
    debian.unzip,
    debian.poppler,
  ]);
  const s = testSettings();
  const env = { ...s.env, AXLEWRIGHT_TEST_OUTPUT: path.join(root, "test-results") };
  onInterrupt(() => waitForStopped());

  const server = await startMariaDb({ dataDir: s.dataDir, port: s.dbPort, fresh: true });
  createAppDatabase(server, {
    database: s.database,
    user: s.dbUser,
    password: s.dbPassword,
    scratchPrefix: `${s.database}_scratch_`,
  });
  tsx("scripts/db/migrate.ts", env);
  await startObjectStore(env, { fresh: true });
  tsx("scripts/db/seed.ts", env);
  await startMailSink(env);
  await startPaymentService(env);

  if (!skipChecks) {
    log("type check (tsc --noEmit)…");
    run(path.join(root, "node_modules/.bin/tsc"), ["--noEmit", "-p", "tsconfig.json"], { env });
    log("lint (eslint)…");
    run(path.join(root, "node_modules/.bin/eslint"), ["."], { env });
    log("formatting (prettier --check)…");
    run(path.join(root, "node_modules/.bin/prettier"), ["--check", "--log-level", "warn", "."], { env });
    log("import cycles (madge) and dead code (knip)…");
    run(
      path.join(root, "node_modules/.bin/madge"),
      [
        "--circular",
        "--extensions",
        "ts,tsx",
        "--ts-config",
        "tsconfig.json",
        "app",
        "components",
        "lib",
        "db",
        "scripts",
        "auth.ts",
        "proxy.ts",
      ],
      { env },
    );
    run(path.join(root, "node_modules/.bin/knip"), ["--no-progress"], { env });
  }
  log("unit and integration tests…");
  run(vitest, ["run", "--config", "vitest.config.mts", ...filterArgs], { env });
  if (noBrowser) return;

  // AXLEWRIGHT_TEST_DIST: the build folder, for a second test stack in the same tree.
  const dist = process.env.AXLEWRIGHT_TEST_DIST ?? ".next-test";
  buildApp(env, dist);
  await startApp({ ...env, NEXT_DIST_DIR: dist }, s.appPort);
  log("browser tests in Chromium…");
  // The build folder too, for the tests that start a second instance (tests/e2e/support/instance.ts).
  run(vitest, ["run", "--config", "vitest.e2e.config.mts", ...filterArgs], {
    env: { ...env, AXLEWRIGHT_TEST_DIST_DIR: dist },
  });
}

let exitCode = 0;
try {
  await main();
  log("all tests passed");
} catch (error) {
  console.error(`\n[axlewright] ${error instanceof Error ? error.message : String(error)}`);
  exitCode = 1;
} finally {
  await waitForStopped();
}
process.exit(exitCode);
