// The load half of `npm run bench` (issue 14 targets): with 50 signed-in clients each posting
// /api/solve in a loop with specs no two alike, `/api/health` and a server-rendered page answer with
// p95 ≤ 50 ms, nothing fails except deliberate 503s (a full solve queue answering with
// Retry-After), and the solves per second come within 20 % of cores ÷ single-solve time. It starts
// its own throw-away stack (database, object store, mail sink, payment service, built app) and stops
// it afterwards. Figures, not a test: it exits 0 when a target is missed (and says MISSED), non-zero
// only when the stack cannot start. The clients and the prober run in this process, on the same
// machine as the app, so they take a little of its CPU too.
//
//   node scripts/bench-load.mjs [--clients 50] [--seconds 20] [--spec sine|square|hexagon|catenary|partner|twins]
//
// The stack honours the test-stack overrides: AXLEWRIGHT_TEST_DATA (data folder),
// AXLEWRIGHT_TEST_DIST (build folder, default .next-bench) and the AXLEWRIGHT_TEST_*_PORT variables.
import http from "node:http";
import os from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { parseArgs } from "node:util";
import { testSettings } from "./lib/env.mjs";
import {
  buildApp,
  createAppDatabase,
  debian,
  ensureDebianPackages,
  ensureNodeModules,
  log,
  onInterrupt,
  readJson,
  root,
  startApp,
  startMailSink,
  startMariaDb,
  startObjectStore,
  startPaymentService,
  tsx,
  waitForStopped,
} from "./lib/services.mjs";

const TARGET_P95_MS = 50;
const TARGET_RATE_TOLERANCE = 0.2;
const SINGLE_SOLVES = 15;
const WARM_UP_SOLVES = 3;
const PROBE_EVERY_MS = 100;
const REQUEST_TIMEOUT_MS = 60_000;
const PAGE = "/projects";

/**
 * Spec families, each a studio preset (lib/studio/presets.ts) with one size moved by a tiny step per
 * request, so no two requests carry the same spec and no cache can answer one.
 */
const SPECS = {
  sine: {
    label: "wheel for a sine track (4 periods per turn), amplitude varied",
    spec: (k) => ({
      mode: "wheel-for-track",
      units: "mm",
      track: { kind: "sine", amplitude: 10 + k * 1e-4, period: 100 },
      periodsPerTurn: 4,
    }),
  },
  square: {
    label: "track for a square wheel, inradius varied",
    spec: (k) => ({
      mode: "track-for-wheel",
      units: "mm",
      wheel: { kind: "polygon", sides: 4, inradius: 200 + k * 1e-3, cornerRadius: 0 },
    }),
  },
  hexagon: {
    label: "track for a hexagon wheel, inradius varied",
    spec: (k) => ({
      mode: "track-for-wheel",
      units: "mm",
      wheel: { kind: "polygon", sides: 6, inradius: 100 + k * 1e-3, cornerRadius: 0 },
    }),
  },
  catenary: {
    label: "wheel for a catenary row (4 periods per turn), scale varied",
    spec: (k) => ({
      mode: "wheel-for-track",
      units: "mm",
      track: { kind: "catenary", scale: 200 + k * 1e-3, period: 352.5 },
      periodsPerTurn: 4,
    }),
  },
  partner: {
    label: "partner of an ellipse turning about its focus, semi-minor axis varied",
    spec: (k) => ({
      mode: "partner-wheel",
      units: "mm",
      wheel: { kind: "ellipse", semiMajor: 100, semiMinor: 80 - k * 1e-4, axle: "focus" },
      lobes: 1,
    }),
  },
  twins: {
    label: "twin wheels from a sine track, amplitude varied",
    spec: (k) => ({
      mode: "twin-wheels",
      units: "mm",
      track: { kind: "sine", amplitude: 20 + k * 1e-4, period: 300 },
      periodsPerTurn: 2,
    }),
  },
};

const { values: options } = parseArgs({
  options: {
    clients: { type: "string", default: "50" },
    seconds: { type: "string", default: "20" },
    spec: { type: "string", default: "sine" },
  },
});
const CLIENTS = Number(options.clients);
const SECONDS = Number(options.seconds);
const family = SPECS[options.spec];
if (!family || !(CLIENTS >= 1) || !(SECONDS > 0)) {
  console.error(
    `usage: node scripts/bench-load.mjs [--clients N] [--seconds S] [--spec ${Object.keys(SPECS).join("|")}]`,
  );
  process.exit(2);
}

let nextSpec = 0;
/** A spec no request has carried before. */
const freshSpec = () => JSON.stringify(family.spec(nextSpec++));

// Ctrl-C (or SIGTERM/SIGHUP): the clients stop asking, their sockets close (so the app is not kept
// busy while it shuts down), every process started here is stopped, and the exit code is 130.
let interrupted = false;
const agents = [];
onInterrupt(async (signal) => {
  if (!interrupted) log(`${signal}: stopping everything…`);
  interrupted = true;
  for (const agent of agents) agent.destroy();
  await waitForStopped();
});

const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Nearest-rank percentile (p in 0..100) of a list of numbers; NaN for an empty list. */
function percentile(xs, p) {
  if (xs.length === 0) return NaN;
  const sorted = [...xs].sort((a, b) => a - b);
  return sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)];
}
const median = (xs) => percentile(xs, 50);
const mean = (xs) => xs.reduce((a, b) => a + b, 0) / xs.length;

/**
 * One HTTP request over a keep-alive agent; resolves with the status, headers, body and the time
 * from sending to the last byte. Rejects on a network error or after REQUEST_TIMEOUT_MS.
 */
function request(agent, base, method, pathname, { headers = {}, body } = {}) {
  const url = new URL(pathname, base);
  return new Promise((resolve, reject) => {
    const started = performance.now();
    const req = http.request(
      {
        host: url.hostname,
        port: url.port,
        path: url.pathname + url.search,
        method,
        agent,
        headers: body === undefined ? headers : { ...headers, "content-length": Buffer.byteLength(body) },
      },
      (res) => {
        const chunks = [];
        res.on("data", (c) => chunks.push(c));
        res.on("end", () =>
          resolve({
            status: res.statusCode,
            headers: res.headers,
            body: Buffer.concat(chunks),
            ms: performance.now() - started,
          }),
        );
        res.on("error", reject);
      },
    );
    req.setTimeout(REQUEST_TIMEOUT_MS, () => req.destroy(Object.assign(new Error("timeout"), { code: "timeout" })));
    req.on("error", reject);
    if (body !== undefined) req.write(body);
    req.end();
  });
}

/** name=value pairs of the Set-Cookie headers of a response, added to `jar` (a Map). */
function keepCookies(jar, res) {
  for (const line of res.headers["set-cookie"] ?? []) {
    const [pair] = line.split(";");
    const eq = pair.indexOf("=");
    if (eq > 0) jar.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim());
  }
}
const cookieHeader = (jar) => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");

/** Signs in over plain HTTP the way the sign-in form does (Auth.js credentials); returns the Cookie header. */
async function signIn(agent, base, email, password) {
  const jar = new Map();
  const csrf = await request(agent, base, "GET", "/api/auth/csrf");
  if (csrf.status !== 200) throw new Error(`GET /api/auth/csrf answered ${csrf.status}`);
  keepCookies(jar, csrf);
  const { csrfToken } = JSON.parse(csrf.body.toString("utf8"));
  const form = new URLSearchParams({ csrfToken, email, password, callbackUrl: `${base}${PAGE}` }).toString();
  const res = await request(agent, base, "POST", "/api/auth/callback/credentials", {
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: cookieHeader(jar) },
    body: form,
  });
  keepCookies(jar, res);
  const session = [...jar.keys()].some((k) => k.startsWith("authjs.session-token"));
  if (!session) {
    throw new Error(`signing in as ${email} gave no session cookie (${res.status} ${res.headers.location ?? ""})`);
  }
  const cookie = cookieHeader(jar);
  const check = await request(agent, base, "GET", "/api/auth/session", { headers: { cookie } });
  const who = JSON.parse(check.body.toString("utf8") || "null");
  if (who?.user?.email !== email) throw new Error(`the session of ${email} does not say who it is`);
  return cookie;
}

/** Posts one solve; classifies the answer as ok, a deliberate 503 (with its wait in ms) or another error. */
async function postSolve(agent, base, cookie) {
  const body = freshSpec();
  try {
    const res = await request(agent, base, "POST", "/api/solve", {
      headers: { "content-type": "application/json", cookie },
      body,
    });
    if (res.status === 200) return { kind: "ok", ms: res.ms };
    const retryAfter = res.headers["retry-after"];
    if (res.status === 503 && retryAfter !== undefined) {
      const seconds = Number(retryAfter);
      const waitMs = Number.isFinite(seconds) ? seconds * 1000 : Math.max(0, Date.parse(retryAfter) - Date.now());
      return { kind: "busy", ms: res.ms, waitMs: Number.isFinite(waitMs) ? waitMs : 1000 };
    }
    let message = "";
    try {
      message = JSON.parse(res.body.toString("utf8")).message ?? "";
    } catch {
      /* not JSON */
    }
    return { kind: "error", ms: res.ms, what: `HTTP ${res.status}${message ? ` (${message.slice(0, 80)})` : ""}` };
  } catch (error) {
    return { kind: "error", what: error.code ?? error.message };
  }
}

/**
 * GETs `pathname` on a fixed schedule (every PROBE_EVERY_MS from `offsetMs`), whether or not the
 * last one has answered, until `until` (performance.now()); a slow answer does not thin the samples.
 */
async function probe(agent, base, pathname, headers, offsetMs, until) {
  const result = { ms: [], errors: new Map() };
  const pending = [];
  const fail = (what) => result.errors.set(what, (result.errors.get(what) ?? 0) + 1);
  const start = performance.now() + offsetMs;
  for (let i = 0; ; i++) {
    const due = start + i * PROBE_EVERY_MS;
    if (due >= until || interrupted) break;
    await sleep(Math.max(0, due - performance.now()));
    pending.push(
      request(agent, base, "GET", pathname, { headers }).then(
        (res) => {
          if (res.status === 200) result.ms.push(res.ms);
          else fail(`HTTP ${res.status}`);
        },
        (error) => fail(error.code ?? error.message),
      ),
    );
  }
  await Promise.all(pending);
  return result;
}

const fmtMs = (ms) => (Number.isFinite(ms) ? `${ms.toFixed(ms < 10 ? 1 : 0)} ms` : "—");
const missed = (ok) => (ok ? "" : "  MISSED");

async function main() {
  ensureNodeModules();
  ensureDebianPackages([debian.mariadb]);
  const s = testSettings();
  const dataRoot = path.join(root, process.env.AXLEWRIGHT_TEST_DATA ?? ".data");
  const env = { ...s.env, S3_DATA_DIR: path.join(dataRoot, "load-objects") };
  const dist = process.env.AXLEWRIGHT_TEST_DIST ?? ".next-bench";

  const server = await startMariaDb({ dataDir: path.join(dataRoot, "load-mariadb"), port: s.dbPort, fresh: true });
  createAppDatabase(server, { database: s.database, user: s.dbUser, password: s.dbPassword });
  tsx("scripts/db/migrate.ts", env);
  await startObjectStore(env, { fresh: true });
  tsx("scripts/db/seed.ts", env);
  await startMailSink(env);
  await startPaymentService(env);
  buildApp(env, dist);
  await startApp({ ...env, NEXT_DIST_DIR: dist }, s.appPort);
  const base = env.APP_URL;

  const solveAgent = new http.Agent({ keepAlive: true, maxSockets: CLIENTS + 8 });
  // No socket limit for the prober: a probe waits for the app, never for a free socket here.
  const probeAgent = new http.Agent({ keepAlive: true });
  agents.push(solveAgent, probeAgent);

  // 1. Sign in every client, a few at a time (each sign-in checks an Argon2id hash).
  const demo = readJson("db/demo-data.json");
  const emails = demo.users.map((u) => u.email);
  const cookies = new Array(CLIENTS);
  for (let i = 0; i < CLIENTS; i += 5) {
    await Promise.all(
      Array.from({ length: Math.min(5, CLIENTS - i) }, async (_, j) => {
        cookies[i + j] = await signIn(solveAgent, base, emails[(i + j) % emails.length], demo.password);
      }),
    );
  }
  const probeCookie = await signIn(probeAgent, base, "fabricator@example.test", demo.password);
  log(`${CLIENTS} clients signed in (${emails.length} demo accounts)`);

  // Warm up: the page, the health route and the solve route answer once before anything is timed.
  for (let i = 0; i < 3; i++) {
    await request(probeAgent, base, "GET", "/api/health");
    await request(probeAgent, base, "GET", PAGE, { headers: { cookie: probeCookie } });
  }
  for (let i = 0; i < WARM_UP_SOLVES; i++) {
    const r = await postSolve(solveAgent, base, cookies[0]);
    if (r.kind !== "ok") throw new Error(`a warm-up solve failed: ${r.what ?? r.kind}`);
  }

  // 2. Single-solve time: one client, one request at a time, nothing else running.
  const single = [];
  while (single.length < SINGLE_SOLVES) {
    const r = await postSolve(solveAgent, base, cookies[0]);
    if (r.kind === "ok") single.push(r.ms);
    else if (r.kind === "busy") await sleep(r.waitMs);
    else throw new Error(`a single solve failed: ${r.what}`);
  }
  const singleMs = median(single);
  log(`single-solve time ${fmtMs(singleMs)} (median of ${SINGLE_SOLVES}); now ${CLIENTS} clients for ${SECONDS} s…`);

  // 3. The load: every client posts solves in a loop; the prober asks for health and the page.
  const loadBefore = os.loadavg()[0];
  const t0 = performance.now();
  const until = t0 + SECONDS * 1000;
  const solves = { ms: [], okInWindow: 0, busy: 0, errors: new Map() };
  const client = async (cookie) => {
    while (performance.now() < until && !interrupted) {
      const r = await postSolve(solveAgent, base, cookie);
      const end = performance.now();
      if (r.kind === "ok") {
        solves.ms.push(r.ms);
        if (end <= until) solves.okInWindow++;
      } else if (r.kind === "busy") {
        solves.busy++;
        await sleep(Math.min(r.waitMs, Math.max(0, until - end)));
      } else {
        solves.errors.set(r.what, (solves.errors.get(r.what) ?? 0) + 1);
      }
    }
  };
  const [, health, page] = await Promise.all([
    Promise.all(cookies.map(client)),
    probe(probeAgent, base, "/api/health", {}, 0, until),
    probe(probeAgent, base, PAGE, { cookie: probeCookie }, PROBE_EVERY_MS / 2, until),
  ]);
  const finished = performance.now();
  solveAgent.destroy();
  probeAgent.destroy();
  if (interrupted) return;

  // 4. The figures, each beside its target.
  const cores = os.availableParallelism();
  const expected = cores / (singleMs / 1000);
  const rate = solves.okInWindow / SECONDS;
  const ratio = rate / expected;
  const otherErrors = [...solves.errors.values()].reduce((a, b) => a + b, 0);
  const probeErrors = (p) => [...p.errors.values()].reduce((a, b) => a + b, 0);
  const row = (name, value, target = "") => console.log(`${name.padEnd(34)} ${value.padStart(20)}   ${target}`);
  const latencies = (p) => `${fmtMs(percentile(p.ms, 50))} / ${fmtMs(percentile(p.ms, 95))}`;
  const p95Target = (p) =>
    `p95 ≤ ${TARGET_P95_MS} ms${missed(percentile(p.ms, 95) <= TARGET_P95_MS && probeErrors(p) === 0)}`;

  console.log(
    `\nLoad: ${CLIENTS} signed-in clients posting /api/solve for ${SECONDS} s, each spec a new one ` +
      `(${family.label}); GET /api/health and GET ${PAGE} every ${PROBE_EVERY_MS} ms each meanwhile.`,
  );
  row("cores (os.availableParallelism)", String(cores));
  row(
    "single-solve time",
    fmtMs(singleMs),
    `median of ${SINGLE_SOLVES} sequential solves (mean ${fmtMs(mean(single))}, min ${fmtMs(Math.min(...single))})`,
  );
  row("machine load average before", loadBefore.toFixed(2), "(1 min; other work on the machine skews every figure)");
  row("expected rate (cores ÷ single)", `${expected.toFixed(1)} /s`);
  row(
    "solves per second",
    `${rate.toFixed(1)} /s`,
    `within ${TARGET_RATE_TOLERANCE * 100} % of ${expected.toFixed(1)} /s${missed(Math.abs(ratio - 1) <= TARGET_RATE_TOLERANCE)}`,
  );
  row(
    "ratio achieved / expected",
    ratio.toFixed(2),
    `0.80 – 1.20${missed(Math.abs(ratio - 1) <= TARGET_RATE_TOLERANCE)}`,
  );
  row("solve latency p50 / p95", latencies(solves));
  row("solves answered 200", String(solves.ms.length), `${solves.okInWindow} within the ${SECONDS} s`);
  row("deliberate 503s (Retry-After)", String(solves.busy));
  row("other solve errors", String(otherErrors), `0${missed(otherErrors === 0)}`);
  for (const [what, n] of solves.errors) row(`  ${what}`.slice(0, 34), String(n));
  row("/api/health p50 / p95", latencies(health), p95Target(health));
  row(`${PAGE} p50 / p95`, latencies(page), p95Target(page));
  for (const [name, p] of [
    ["/api/health", health],
    [PAGE, page],
  ]) {
    row(`${name} answers / errors`, `${p.ms.length} / ${probeErrors(p)}`, probeErrors(p) ? "0 errors  MISSED" : "");
    for (const [what, n] of p.errors) row(`  ${what}`.slice(0, 34), String(n));
  }
  console.log(
    `(latencies from sending to the last byte; the clients and the prober run beside the app on this machine. ` +
      `The last solves finished ${((finished - until) / 1000).toFixed(1)} s after the window closed; ` +
      "only those that finished within it count toward the rate.)",
  );
}

let exitCode = 0;
try {
  await main();
} catch (error) {
  if (!interrupted) {
    console.error(`[axlewright] load bench failed: ${error instanceof Error ? error.message : error}`);
    exitCode = 1;
  }
}
// After an interrupt the signal handler stops everything and exits (130); this path leaves it be.
if (!interrupted) {
  await waitForStopped();
  log("load bench done");
  process.exit(exitCode);
}
