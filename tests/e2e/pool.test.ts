// The worker pool on a real server (next start, the production build): a solve whose caller hangs
// up is ended there and then, not run to its end for nobody. Next.js aborts a route handler's
// request.signal when the response closes unfinished; lib/server/pool.ts ends the task and logs one
// line, which this test reads from the instance's output. One thread, so the solve is surely the one
// running when the caller goes away.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser } from "./support/browser";
import { AppInstance } from "./support/instance";
import { signedIn } from "./support/session";

// The same slow spec as tests/unit/server/pool.test.ts: a one-lobe partner of a many-lobed polar wheel.
const SLOW = {
  mode: "partner-wheel",
  wheel: { kind: "polar", r: "100 + 20*sin(7*theta) + 5*cos(13*theta) + 3*sin(29*theta)" },
  lobes: 1,
  tolerance: 0.0005,
};

let browser: Browser;
let app: AppInstance;
let cookie: string;

const solve = (spec: unknown, signal?: AbortSignal) =>
  fetch(`${app.url}/api/solve`, {
    method: "POST",
    headers: { cookie, "content-type": "application/json" },
    body: JSON.stringify(spec),
    signal,
  });

beforeAll(async () => {
  browser = await launchBrowser();
  app = await AppInstance.start({ AXLEWRIGHT_POOL_THREADS: "1" });
  const { context } = await signedIn(browser, "fabricator@example.test");
  const c = (await context.cookies()).find((x) => x.name.endsWith("authjs.session-token"))!;
  cookie = `${c.name}=${c.value}`;
  await context.close();
});

afterAll(async () => {
  await app?.kill();
  await browser?.close();
});

describe("a solve whose caller goes away", () => {
  it("is ended on the server, and the next solve is answered", async () => {
    // How long the same work takes here, measured rather than assumed (a spec a hair different, so no cache answers).
    const t0 = performance.now();
    const first = await solve({ ...SLOW, tolerance: 0.00051 });
    expect(first.status).toBe(200);
    const took = performance.now() - t0;
    expect(app.output).not.toContain("solve ended: its caller went away");

    const caller = new AbortController();
    const asked = solve(SLOW, caller.signal);
    // A quarter of the time the same work took: the solve is running by then and far from done.
    setTimeout(() => caller.abort(), took / 4);
    await expect(asked).rejects.toThrow();
    await expect.poll(() => app.output, { timeout: 10_000 }).toContain("solve ended: its caller went away");

    const after = await solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 150 } });
    expect(after.status).toBe(200);
    expect((await after.json()).mode).toBe("track-for-wheel");
  });
});
