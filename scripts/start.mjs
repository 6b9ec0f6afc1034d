// `npm start`: everything a fresh machine needs, then the app on http://127.0.0.1:3000.
// Ctrl-C stops what this started (MariaDB, the mail sink, the app), by process id.
import { demoSettings } from "./lib/env.mjs";
import {
  buildApp,
  createAppDatabase,
  readJson,
  debian,
  ensureDebianPackages,
  ensureNodeModules,
  fail,
  log,
  onInterrupt,
  startApp,
  startMailSink,
  startMariaDb,
  startObjectStore,
  startPaymentService,
  tsx,
  waitForStopped,
} from "./lib/services.mjs";
import { buildWorker } from "./build-worker.mjs";

// `npm start -- --dev` serves with `next dev` (rebuilds on change) instead of a production build.
const dev = process.argv.includes("--dev");

async function main() {
  ensureNodeModules();
  ensureDebianPackages([debian.mariadb]);
  const s = demoSettings();
  onInterrupt(async () => {
    log("stopping…");
    await waitForStopped();
  });

  const server = await startMariaDb({ dataDir: s.dataDir, port: s.dbPort });
  createAppDatabase(server, { database: s.database, user: s.dbUser, password: s.dbPassword });
  tsx("scripts/db/migrate.ts", s.env);
  await startObjectStore(s.env);
  tsx("scripts/db/seed.ts", s.env);
  await startMailSink(s.env);
  await startPaymentService(s.env);
  if (dev) {
    await startApp({ ...s.env, NEXT_DIST_DIR: ".next-dev" }, s.appPort, { dev: true });
    // The worker threads' bundle, rebuilt on every change while next dev runs (after it has set up .next-dev).
    await buildWorker(".next-dev", { watch: true });
  } else {
    buildApp(s.env, ".next");
    await startApp(s.env, s.appPort);
  }

  log(`Axlewright is running at ${s.env.APP_URL}`);
  const demo = readJson("db/demo-data.json");
  log(`demo sign-ins (password for all: ${demo.password}):`);
  for (const u of demo.users) log(`  ${u.role.padEnd(10)} ${u.email}  (${u.name}, ${u.organisation})`);
  log("press Ctrl-C to stop");
}

main().catch((error) => fail(error instanceof Error ? error.message : String(error)));
