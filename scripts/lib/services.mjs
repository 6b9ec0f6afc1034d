// The pieces `npm start` and `npm test` share: install what is missing, run MariaDB on loopback
// from a data folder inside the project, start the local fakes and the app, and stop every process
// they started, by process id. Only Node built-ins here: this runs before node_modules exists.
import { spawn, spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, rmSync, statSync, readdirSync } from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const isRoot = typeof process.getuid === "function" && process.getuid() === 0;

const started = [];

export function log(message) {
  console.log(`[axlewright] ${message}`);
}

export function fail(message) {
  console.error(`\n[axlewright] ${message}\n`);
  stopAll();
  process.exit(1);
}

/** Runs a command to completion with inherited output; throws on a non-zero exit. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { stdio: "inherit", cwd: root, ...options });
  if (result.error) throw result.error;
  if (result.status !== 0) throw new Error(`${command} ${args.join(" ")} exited with ${result.status}`);
}

function findExecutable(name) {
  for (const dir of [...(process.env.PATH ?? "").split(":"), "/usr/sbin", "/usr/bin", "/sbin", "/usr/local/sbin"]) {
    const candidate = path.join(dir, name);
    if (dir && existsSync(candidate)) return candidate;
  }
  return null;
}

/** node packages from the lockfile, when node_modules is missing or older than the lockfile. */
export function ensureNodeModules() {
  const marker = path.join(root, "node_modules/.package-lock.json");
  const lock = path.join(root, "package-lock.json");
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  log("installing node packages from package-lock.json (npm ci)…");
  run("npm", ["ci", "--no-audit", "--no-fund"]);
}

let aptUpdated = false;
/**
 * Debian packages the project needs, each found by a file it installs. As root they are installed
 * with apt-get; otherwise the message names the command to run.
 */
export function ensureDebianPackages(packages) {
  const missing = packages.filter((p) => !p.present());
  if (missing.length === 0) return;
  const names = missing.map((p) => p.name);
  if (!isRoot) {
    fail(
      `missing Debian packages: ${names.join(", ")}.\nInstall them with:  sudo apt-get install --no-install-recommends ${names.join(" ")}`,
    );
  }
  log(`installing Debian packages: ${names.join(", ")}…`);
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  if (!aptUpdated) {
    run("apt-get", ["update", "-qq"], { env });
    aptUpdated = true;
  }
  run("apt-get", ["install", "-y", "-qq", "--no-install-recommends", ...names], { env });
}

export const debian = {
  mariadb: {
    name: "mariadb-server",
    present: () => !!findExecutable("mariadbd") && !!findExecutable("mariadb-install-db"),
  },
  chromium: { name: "chromium", present: () => existsSync("/usr/bin/chromium") },
  mpmath: { name: "python3-mpmath", present: () => pythonHas("mpmath") },
  scipy: { name: "python3-scipy", present: () => pythonHas("scipy") },
  ezdxf: { name: "python3-ezdxf", present: () => pythonHas("ezdxf") },
  unzip: { name: "unzip", present: () => existsSync("/usr/bin/unzip") },
  poppler: { name: "poppler-utils", present: () => existsSync("/usr/bin/pdftotext") },
};

function pythonHas(module) {
  if (!existsSync("/usr/bin/python3")) return false;
  return spawnSync("/usr/bin/python3", ["-c", `import ${module}`], { stdio: "ignore" }).status === 0;
}

export function portIsFree(port) {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once("error", () => resolve(false));
    server.listen(port, "127.0.0.1", () => server.close(() => resolve(true)));
  });
}

export async function waitFor(what, check, { timeoutMs = 60_000, intervalMs = 250 } = {}) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (await check()) return;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, intervalMs));
  }
}

function canConnect(port) {
  return new Promise((resolve) => {
    const socket = net.connect(port, "127.0.0.1");
    socket.once("connect", () => {
      socket.destroy();
      resolve(true);
    });
    socket.once("error", () => resolve(false));
  });
}

/** Starts a long-running child and remembers its pid so stopAll() can end it. */
export function startProcess(name, command, args, options = {}) {
  const child = spawn(command, args, { cwd: root, stdio: options.stdio ?? "inherit", env: options.env ?? process.env });
  started.push({ name, child });
  child.on("exit", (code, signal) => {
    if (!child.stoppedOnPurpose && options.onUnexpectedExit) options.onUnexpectedExit(code, signal);
  });
  return child;
}

export function stopAll() {
  for (const { name, child } of started.reverse()) {
    if (child.exitCode === null && child.signalCode === null) {
      child.stoppedOnPurpose = true;
      try {
        process.kill(child.pid, "SIGTERM");
        log(`stopped ${name} (pid ${child.pid})`);
      } catch {
        /* already gone */
      }
    }
  }
  started.length = 0;
}

/** Waits for every started child to exit (after stopAll), so ports and files are free again. */
export async function waitForStopped(timeoutMs = 30_000) {
  const children = started.map((s) => s.child);
  stopAll();
  await Promise.race([
    Promise.all(
      children.map((c) =>
        c.exitCode !== null || c.signalCode !== null ? null : new Promise((r) => c.once("exit", r)),
      ),
    ),
    new Promise((r) => setTimeout(r, timeoutMs)),
  ]);
}

/** Unix socket paths are limited to about 100 bytes; deep checkouts get one in the temp folder. */
function socketPath(dataDir) {
  const inside = path.join(dataDir, "mariadb.sock");
  if (inside.length < 100) return inside;
  return path.join(os.tmpdir(), `axlewright-${createHash("sha1").update(dataDir).digest("hex").slice(0, 12)}.sock`);
}

/**
 * MariaDB on 127.0.0.1:port with its data in dataDir. A fresh folder is initialised first; an
 * existing one is reused with its data. Returns the socket and a function for admin SQL.
 */
export async function startMariaDb({ dataDir, port, fresh = false }) {
  if (fresh) rmSync(dataDir, { recursive: true, force: true });
  mkdirSync(dataDir, { recursive: true });
  const socket = socketPath(dataDir);
  const userArgs = isRoot ? ["--user=root"] : [];
  const mariadbd = findExecutable("mariadbd");

  if (!existsSync(path.join(dataDir, "mysql"))) {
    log(`creating the database folder ${path.relative(root, dataDir)}…`);
    const init = spawnSync(
      findExecutable("mariadb-install-db"),
      [
        "--no-defaults",
        `--datadir=${dataDir}`,
        "--auth-root-authentication-method=socket",
        "--skip-test-db",
        ...userArgs,
      ],
      { cwd: root, encoding: "utf8" },
    );
    if (init.status !== 0) fail(`mariadb-install-db failed:\n${init.stdout}\n${init.stderr}`);
  }
  if (!(await portIsFree(port))) {
    fail(
      `port ${port} on 127.0.0.1 is already taken. Stop what holds it, or choose another port (AXLEWRIGHT_DB_PORT / AXLEWRIGHT_TEST_DB_PORT).`,
    );
  }
  log(`starting MariaDB on 127.0.0.1:${port}…`);
  startProcess(
    "MariaDB",
    mariadbd,
    [
      "--no-defaults",
      `--datadir=${dataDir}`,
      `--port=${port}`,
      "--bind-address=127.0.0.1",
      `--socket=${socket}`,
      `--pid-file=${path.join(dataDir, "mariadbd.pid")}`,
      `--log-error=${path.join(dataDir, "mariadbd.err")}`,
      "--skip-name-resolve",
      "--character-set-server=utf8mb4",
      "--collation-server=utf8mb4_unicode_ci",
      "--innodb-buffer-pool-size=128M",
      ...userArgs,
    ],
    {
      stdio: "ignore",
      onUnexpectedExit: (code) => fail(`MariaDB exited (code ${code}); see ${path.join(dataDir, "mariadbd.err")}`),
    },
  );
  await waitFor("MariaDB", async () => (await canConnect(port)) && existsSync(socket), { timeoutMs: 90_000 });
  const adminUser = isRoot ? "root" : os.userInfo().username;
  return {
    socket,
    sql(statements) {
      const result = spawnSync(
        findExecutable("mariadb") ?? "mysql",
        [`--socket=${socket}`, `--user=${adminUser}`, "--batch"],
        {
          input: statements,
          encoding: "utf8",
        },
      );
      if (result.status !== 0) throw new Error(`SQL failed: ${result.stderr}`);
      return result.stdout;
    },
  };
}

/**
 * The application's database and user, for both loopback spellings MariaDB distinguishes. With
 * `scratchPrefix` (the test stack only) the user may also make and drop databases whose names start
 * with it (the backup test restores into one).
 */
export function createAppDatabase(server, { database, user, password, scratchPrefix }) {
  const q = (s) => s.replace(/[^A-Za-z0-9_]/g, "");
  const pw = password.replace(/'/g, "''");
  // In GRANT a database name's "_" is a wildcard: escaped, then "%" for any ending.
  const scratch = scratchPrefix ? `${q(scratchPrefix).replace(/_/g, "\\_")}%` : null;
  server.sql(
    [
      `CREATE DATABASE IF NOT EXISTS \`${q(database)}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
      ...["127.0.0.1", "localhost"].flatMap((host) => [
        `CREATE USER IF NOT EXISTS '${q(user)}'@'${host}' IDENTIFIED BY '${pw}';`,
        `ALTER USER '${q(user)}'@'${host}' IDENTIFIED BY '${pw}';`,
        `GRANT ALL PRIVILEGES ON \`${q(database)}\`.* TO '${q(user)}'@'${host}';`,
        ...(scratch ? [`GRANT ALL PRIVILEGES ON \`${scratch}\`.* TO '${q(user)}'@'${host}';`] : []),
      ]),
      "FLUSH PRIVILEGES;",
    ].join("\n"),
  );
}

export function tsx(script, env) {
  run(path.join(root, "node_modules/.bin/tsx"), [script], { env });
}

export async function startMailSink(env) {
  const smtpPort = Number(env.SMTP_PORT);
  const httpPort = Number(env.MAIL_SINK_HTTP_PORT);
  for (const port of [smtpPort, httpPort]) {
    if (!(await portIsFree(port))) fail(`port ${port} on 127.0.0.1 is taken (the mail sink wants it).`);
  }
  startProcess("mail sink", process.execPath, [path.join(root, "scripts/fakes/mail-sink.mjs")], {
    env,
    onUnexpectedExit: (code) => fail(`the mail sink exited (code ${code})`),
  });
  await waitFor("the mail sink", () => canConnect(httpPort));
  log(`mail sink: SMTP 127.0.0.1:${smtpPort}, messages at http://127.0.0.1:${httpPort}/messages`);
}

/** The local payment service (scripts/fakes/payment-service.mjs), which the stripe SDK is pointed at. */
export async function startPaymentService(env) {
  const port = Number(env.PAYMENT_SERVICE_PORT);
  if (!(await portIsFree(port))) fail(`port ${port} on 127.0.0.1 is taken (the local payment service wants it).`);
  startProcess("payment service", process.execPath, [path.join(root, "scripts/fakes/payment-service.mjs")], {
    env,
    onUnexpectedExit: (code) => fail(`the local payment service exited (code ${code})`),
  });
  await waitFor("the local payment service", () => canConnect(port));
  log(`payment service (local fake): http://127.0.0.1:${port}`);
}

/** The local object store (scripts/fakes/object-store.mjs, s3rver) with its data in env.S3_DATA_DIR; `fresh` empties it first. */
export async function startObjectStore(env, { fresh = false } = {}) {
  const port = Number(env.S3_PORT);
  if (fresh) rmSync(env.S3_DATA_DIR, { recursive: true, force: true });
  mkdirSync(env.S3_DATA_DIR, { recursive: true });
  if (!(await portIsFree(port))) fail(`port ${port} on 127.0.0.1 is taken (the local object store wants it).`);
  // s3rver makes ListObjectsV2's continuation tokens with DES, which OpenSSL 3 keeps in its legacy
  // provider: without it, any listing longer than one page fails with an internal error.
  const args = ["--openssl-legacy-provider", path.join(root, "scripts/fakes/object-store.mjs")];
  startProcess("object store", process.execPath, args, {
    env,
    onUnexpectedExit: (code) => fail(`the local object store exited (code ${code})`),
  });
  await waitFor("the local object store", () => canConnect(port));
  log(
    `object store (local fake): http://127.0.0.1:${port}, bucket ${env.S3_BUCKET}, data in ${path.relative(root, env.S3_DATA_DIR)}`,
  );
}

function newestMtime(entries) {
  let newest = 0;
  const visit = (p) => {
    if (!existsSync(p)) return;
    const s = statSync(p);
    if (s.isDirectory()) {
      for (const child of readdirSync(p)) visit(path.join(p, child));
    } else newest = Math.max(newest, s.mtimeMs);
  };
  for (const e of entries) visit(path.join(root, e));
  return newest;
}

/** `next build` into distDir unless that build is newer than every source it depends on. */
export function buildApp(env, distDir) {
  const buildId = path.join(root, distDir, "BUILD_ID");
  const sources = [
    "app",
    "components",
    "lib",
    "db",
    "public",
    "fonts",
    "auth.ts",
    "auth.config.ts",
    "proxy.ts",
    "package-lock.json",
    "next.config.mjs",
    "tailwind.config.ts",
    "postcss.config.mjs",
    "tsconfig.json",
  ];
  if (existsSync(buildId) && statSync(buildId).mtimeMs > newestMtime(sources)) {
    log(`the build in ${distDir} is up to date`);
  } else {
    log(`building the app (next build → ${distDir})…`);
    run(path.join(root, "node_modules/.bin/next"), ["build"], {
      env: { ...env, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: "1" },
    });
  }
  // The worker threads' bundle (a second or two): after next build, which empties distDir.
  run(process.execPath, [path.join(root, "scripts/build-worker.mjs"), distDir], { env });
}

export async function startApp(env, port, { dev = false } = {}) {
  if (!(await portIsFree(port)))
    fail(`port ${port} on 127.0.0.1 is taken (the app wants it). Set PORT to use another.`);
  // Run next's own entry with node, so the pid we hold is the server itself.
  startProcess(
    "app",
    process.execPath,
    [path.join(root, "node_modules/next/dist/bin/next"), dev ? "dev" : "start", "-H", "127.0.0.1", "-p", String(port)],
    {
      env,
      onUnexpectedExit: (code) => fail(`the app exited (code ${code})`),
    },
  );
  await waitFor(
    "the app",
    async () => {
      try {
        const res = await fetch(`http://127.0.0.1:${port}/api/health`);
        return res.ok;
      } catch {
        return false;
      }
    },
    { timeoutMs: dev ? 300_000 : 120_000 },
  );
}

export function readJson(file) {
  return JSON.parse(readFileSync(path.join(root, file), "utf8"));
}

export function onInterrupt(handler) {
  for (const signal of ["SIGINT", "SIGTERM", "SIGHUP"]) {
    process.on(signal, async () => {
      await handler(signal);
      process.exit(130);
    });
  }
}
