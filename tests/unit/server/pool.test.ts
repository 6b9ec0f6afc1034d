// The worker pool (lib/server/pool.ts) on its real bundle (built by the tests' global set-up): the
// same answers as the engine on this thread, refusals that keep their field across the thread, a
// full queue that answers 503 with Retry-After, deadlines, and a caller going away ending the work.
// One thread and one waiting place, so the queue's edge is reached with three tasks.
process.env.AXLEWRIGHT_POOL_THREADS = "1";
process.env.AXLEWRIGHT_POOL_QUEUE_PER_THREAD = "1";

import { afterAll, describe, expect, it } from "vitest";
import { AppError } from "@/lib/server/errors";
import { closePool, poolState, runTask } from "@/lib/server/pool";
import { route } from "@/lib/server/route";
import { solve } from "@/lib/track";

const SQUARE = { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 100 } };
// A one-lobe partner of a many-lobed polar wheel at a fine tolerance: the slowest ordinary solve
// at hand (over a second on the 2-core test machine, measured below rather than assumed).
const SLOW = {
  mode: "partner-wheel",
  wheel: { kind: "polar", r: "100 + 20*sin(7*theta) + 5*cos(13*theta) + 3*sin(29*theta)" },
  lobes: 1,
  tolerance: 0.0005,
};
const LONG = { deadlineMs: 60_000 };

const refusal = async (p: Promise<unknown>): Promise<AppError> => {
  const e = await p.then(
    () => null,
    (error: unknown) => error,
  );
  expect(e).toBeInstanceOf(AppError);
  return e as AppError;
};

afterAll(() => closePool());

describe("the worker pool", () => {
  it("gives the engine's own result, to the last digit", async () => {
    const here = solve(SQUARE);
    const there = await runTask("solve", { spec: SQUARE }, LONG);
    expect(there.specHash).toBe(here.specHash);
    expect(there.period).toBe(here.period);
    expect(there.track!.points).toEqual(here.track!.points);
  });

  it("keeps an engine refusal's words and field across the thread", async () => {
    const bad = { mode: "track-for-wheel", wheel: { kind: "polar", r: "100 + t" } };
    const e = await refusal(runTask("solve", { spec: bad }, { ...LONG, place: { spec: "spec" } }));
    expect(e.status).toBe(400);
    expect(e.message).toMatch(/Unknown name "t"/);
    expect(Object.keys(e.fields ?? {})).toEqual(["spec.wheel.r"]);
  });

  it("keeps a cut refusal's settings field across the thread", async () => {
    const e = await refusal(
      runTask(
        "checkCutPlan",
        {
          spec: SQUARE,
          settings: { runLength: 5 },
          nest: { sheets: [], unplaced: [], seconds: 0, cancelled: false },
          names: { material: "m", sheet: "s", machine: "c" },
          gate: { purpose: "review", approvalReference: null, unapprovedReason: null },
        },
        { ...LONG, place: { settings: "settings" } },
      ),
    );
    expect(e.status).toBe(400);
    expect(Object.keys(e.fields ?? {})[0]).toMatch(/^settings\.runLength$/);
  });

  it("ends a task whose caller goes away, on its thread, and goes on with the next", async () => {
    const t0 = performance.now();
    await runTask("solve", { spec: { ...SLOW, tolerance: 0.00051 } }, LONG);
    const took = performance.now() - t0;
    const before = poolState()!.threadIds;
    const caller = new AbortController();
    const asked = runTask("solve", { spec: SLOW }, { ...LONG, signal: caller.signal });
    // A tenth of the time the same work took: the task is surely running by then, and far from done.
    setTimeout(() => caller.abort(), took / 10);
    const e = await refusal(asked);
    expect(e.message).toBe("The request was cancelled.");
    // The thread that ran it was ended and a new one started in its place.
    await expect.poll(() => poolState()!.threadIds.some((id) => !before.includes(id)), { timeout: 10_000 }).toBe(true);
    expect((await runTask("solve", { spec: SQUARE }, LONG)).mode).toBe("track-for-wheel");
  });

  it("stops a task at its deadline with a 408 that says what to change", async () => {
    const e = await refusal(runTask("solve", { spec: { ...SLOW, tolerance: 0.00052 } }, { deadlineMs: 20 }));
    expect(e.status).toBe(408);
    expect(e.message).toMatch(/coarser tolerance/);
  });

  it("answers a full queue at once with 503 and Retry-After, and nothing is lost", async () => {
    // One running, one waiting: the third finds no place.
    const specs = [0.00053, 0.00054, 0.00055].map((tolerance) => ({ ...SLOW, tolerance }));
    const handler = route(async (_req: Request, p: { i: string }) => runTask("solve", { spec: specs[+p.i] }, LONG));
    const answers = await Promise.all(
      specs.map((_, i) => handler(new Request("http://x/"), { params: Promise.resolve({ i: String(i) }) })),
    );
    const statuses = answers.map((a) => a.status);
    expect(statuses).toEqual([200, 200, 503]);
    expect(answers[2].headers.get("retry-after")).toBe("2");
    expect((await answers[2].json()).message).toMatch(/busy/);
    // The two it took were solved in full, and the places are free again.
    for (const a of answers.slice(0, 2)) expect((await a.json()).mode).toBe("partner-wheel");
    expect(poolState()!.tasks).toBe(0);
  });
});
