// POST /api/solve: the engine behind a size limit and a time limit, with the engine's own words
// for bad specs, on the worker pool, with results kept by spec.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import * as solveRoute from "@/app/api/solve/route";
import { pool } from "@/db";
import { solveCacheStats } from "@/lib/server/designs";
import { closePool } from "@/lib/server/pool";
import { makeUser } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);

const post = (body: string) =>
  solveRoute.POST(new Request("http://t/api/solve", { method: "POST", body }), { params: Promise.resolve({}) });

beforeAll(async () => {
  actAs((await makeUser("client", "solver")).id);
});
afterAll(async () => {
  await pool.end();
  await closePool();
});

describe("POST /api/solve", () => {
  it("returns the engine's result for a square wheel", async () => {
    const res = await post(
      JSON.stringify({ mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 400 } }),
    );
    expect(res.status).toBe(200);
    const body = await res.json();
    // Hall & Wagon 1992: square of inradius A on y = −A cosh(x/A), period 2A·asinh(tan(π/4)) = 2A·ln(1+√2); A = 200 mm.
    expect(body.period).toBeCloseTo(2 * 200 * Math.log(1 + Math.SQRT2), 6);
  });

  it("refuses a malformed formula with the engine's message", async () => {
    const res = await post(
      JSON.stringify({ mode: "track-for-wheel", units: "mm", wheel: { kind: "polar", r: "100 + cos(theta" } }),
    );
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.status).toBe(400);
    expect(body.message.length).toBeGreaterThan(10);
  });

  it("refuses a spec that is not a spec", async () => {
    const res = await post(JSON.stringify({ mode: "fly" }));
    expect(res.status).toBe(400);
  });

  it("answers the same spec again from the cache, and a changed one afresh", async () => {
    const spec = { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 6, inradius: 123 } };
    const first = await (await post(JSON.stringify(spec))).json();
    const before = solveCacheStats();
    // The same spec with its keys in another order is the same input.
    const again = await post(
      JSON.stringify({ wheel: { inradius: 123, sides: 6, kind: "polygon" }, units: "mm", mode: spec.mode }),
    );
    expect(await again.json()).toEqual(first);
    expect(solveCacheStats().hits).toBe(before.hits + 1);
    const other = await (await post(JSON.stringify({ ...spec, wheel: { ...spec.wheel, inradius: 124 } }))).json();
    expect(solveCacheStats().misses).toBe(before.misses + 1);
    expect(other.period).not.toBe(first.period);
  });

  it("refuses a body over the size limit before parsing it", async () => {
    const res = await post(JSON.stringify({ mode: "track-for-wheel", pad: "x".repeat(600 * 1024) }));
    expect(res.status).toBe(413);
  });
});
