// The studio half of `npm run bench` (issue 4 targets): in headless Chromium, the time from a
// parameter change to the redrawn result for each preset (target ≤ 100 ms) and the animation frame
// rate while it plays (target ≥ 50 frames per second). It starts its own throw-away stack (the same
// one `npm test` uses: database, mail sink, built app) and stops it afterwards. Figures, not a test:
// they depend on the machine and what else it is doing.
import path from "node:path";
import { chromium } from "playwright-core";
import { testSettings } from "./lib/env.mjs";
import {
  buildApp,
  createAppDatabase,
  debian,
  ensureDebianPackages,
  ensureNodeModules,
  log,
  readJson,
  root,
  startApp,
  startMailSink,
  startMariaDb,
  tsx,
  waitForStopped,
} from "./lib/services.mjs";

// Each preset, the field changed and the value typed (the readout must change in answer).
const CASES = [
  ["Square wheel", "Side (mm)", "300"],
  ["Hexagon", "Inradius (mm)", "120"],
  ["Rounded square", "Side (mm)", "320"],
  ["Ellipse, axle at a focus", "Semi-minor axis (mm)", "70"],
  ["Wheel for a sine track", "Amplitude (mm)", "12"],
  ["Wheel for a catenary row", "Period (mm)", "360"],
  ["Partner of an ellipse", "Semi-major axis (mm)", "110"],
  ["Twin wheels", "Amplitude (mm)", "25"],
];
const TARGET_MS = 100;
const TARGET_FPS = 50;

const RUNS = 8;

const median = (xs) => [...xs].sort((a, b) => a - b)[xs.length >> 1];

/**
 * Arms a stopwatch in the page: it starts at the next input event (the field being changed) and
 * stops at the first animation frame in which the canvas readout no longer reads `before`, the
 * frame that paints the redrawn design. The result waits in window.__benchRedraw (ms).
 */
function armStopwatch(page, before) {
  return page.evaluate((before) => {
    window.__benchRedraw = new Promise((resolve) => {
      let t0 = null;
      addEventListener("input", () => (t0 = performance.now()), { capture: true, once: true });
      const poll = () => {
        const text = document.querySelector("[data-testid=studio-view] dl")?.textContent;
        if (t0 !== null && text !== undefined && text !== before) resolve(performance.now() - t0);
        else requestAnimationFrame(poll);
      };
      requestAnimationFrame(poll);
    });
  }, before);
}

async function main() {
  ensureNodeModules();
  ensureDebianPackages([debian.mariadb, debian.chromium]);
  const s = testSettings();
  const server = await startMariaDb({ dataDir: path.join(root, ".data/bench-mariadb"), port: s.dbPort, fresh: true });
  createAppDatabase(server, { database: s.database, user: s.dbUser, password: s.dbPassword });
  tsx("scripts/db/migrate.ts", s.env);
  tsx("scripts/db/seed.ts", s.env);
  await startMailSink(s.env);
  buildApp(s.env, ".next-test");
  await startApp({ ...s.env, NEXT_DIST_DIR: ".next-test" }, s.appPort);

  const base = s.env.APP_URL;
  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: [
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
  await page.goto(`${base}/login`);
  await page.getByLabel("E-mail").fill("fabricator@example.test");
  await page.getByLabel("Password").fill(readJson("db/demo-data.json").password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/projects$/);

  console.log(
    `\nStudio in headless Chromium (${await browser.version()}); parameter change → redrawn readout, and frame rate while playing.`,
  );
  console.log(
    `${"preset".padEnd(28)} ${"redraw median".padStart(14)} ${"ratio to 100 ms".padStart(16)} ${"seen median".padStart(14)} ${"fps".padStart(6)} ${"ratio to 50".padStart(12)}`,
  );
  for (const [preset, field, value] of CASES) {
    await page.goto(`${base}/projects/1/designs/new`);
    await page.getByLabel("Design name").fill(`Bench ${preset}`);
    const select = page.getByLabel("Start from");
    const optionValue = await select.locator("option").filter({ hasText: preset }).first().getAttribute("value");
    await select.selectOption(optionValue);
    await page.getByRole("button", { name: "Create design" }).click();
    await page.waitForURL(/\/designs\/\d+$/);
    await page.waitForFunction(() => (window.__axlewrightStudio?.frames ?? 0) > 0, undefined, { timeout: 60_000 });
    const readout = page.locator("[data-testid=studio-view] dl").first();
    await readout.waitFor();
    const input = page.getByLabel(field, { exact: true });
    const original = await input.inputValue();
    const inPage = [];
    const seen = [];
    for (let i = 0; i < RUNS; i++) {
      const next = i % 2 === 0 ? value : original;
      await armStopwatch(page, await readout.evaluate((el) => el.textContent));
      const started = Date.now();
      await input.fill(next);
      inPage.push(await page.evaluate(() => window.__benchRedraw));
      seen.push(Date.now() - started);
      // Let the rolling check of this value finish, so each run starts from a settled studio.
      await page.getByTestId("check-figures").waitFor({ timeout: 20_000 });
    }
    await page.getByRole("button", { name: /Play/ }).click();
    await page.waitForTimeout(3000);
    const fps = await page.evaluate(() => window.__axlewrightStudio?.fps ?? 0);
    await page.getByRole("button", { name: /Pause/ }).click();
    const ms = Math.round(median(inPage));
    const outside = median(seen);
    console.log(
      `${preset.padEnd(28)} ${`${ms} ms`.padStart(14)} ${(ms / TARGET_MS).toFixed(2).padStart(16)} ${`${outside} ms`.padStart(14)} ${fps.toFixed(0).padStart(6)} ${(fps / TARGET_FPS).toFixed(2).padStart(12)}`,
    );
  }
  console.log(
    `(medians of ${RUNS} changes. redraw: in the page, from the input event of the changed field to the first frame showing the new readout; ` +
      "seen: the same as Playwright observes it, with its own round trips. Ratio ≤ 1 meets the redraw target, ≥ 1 the frame-rate target.)",
  );
  await browser.close();
}

try {
  await main();
} catch (error) {
  console.error(`[axlewright] studio bench failed: ${error instanceof Error ? error.message : error}`);
  process.exitCode = 1;
} finally {
  await waitForStopped();
  log("studio bench done");
}
