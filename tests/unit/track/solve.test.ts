// The solve() contract: refusals with a clear message and place, the time limit, output sampling
// to the chord tolerance, and tiling.
import { describe, expect, it } from "vitest";
import { engineError } from "./engine-error";
import { EngineError, solve, tileRun } from "@/lib/track";

const ttw = (wheel: object) => () => solve({ mode: "track-for-wheel", wheel });

describe("refusals", () => {
  it("an outline that is not star-shaped about the axle names the point", () => {
    // A C-shape: rays from the axle cross the notch twice.
    const pts = [
      [-50, -50],
      [50, -50],
      [50, -20],
      [-10, -20],
      [-10, 20],
      [50, 20],
      [50, 50],
      [-50, 50],
    ];
    const e = engineError(ttw({ kind: "outline", points: pts, axle: { x: -30, y: 0 } }));
    expect(e.code).toBe("invalid-wheel");
    expect(e.message).toMatch(/not star-shaped/);
    expect(e.where).toMatch(/^wheel\.points\[\d+\]$/);
  });

  it("an axle outside the outline, or on it", () => {
    const sq = [
      [0, 0],
      [10, 0],
      [10, 10],
      [0, 10],
    ];
    expect(engineError(ttw({ kind: "outline", points: sq, axle: { x: 20, y: 5 } })).message).toMatch(/outside/);
    expect(engineError(ttw({ kind: "outline", points: sq, axle: { x: 0, y: 0 } })).message).toMatch(/on the outline/);
  });

  it("a polar formula that is not positive, not finite or does not close says where", () => {
    expect(engineError(ttw({ kind: "polar", r: "cos(theta)" })).message).toMatch(/positive.*theta = /);
    expect(engineError(ttw({ kind: "polar", r: "1/(theta - 1)" })).message).toMatch(/theta = /);
    expect(engineError(ttw({ kind: "polar", r: "1 + theta" })).message).toMatch(/does not close/);
    expect(engineError(ttw({ kind: "polar", r: "1 + import(1)" })).code).toBe("bad-formula");
  });

  it("an ellipse axle outside, a corner radius too large, a profile running backwards", () => {
    expect(engineError(ttw({ kind: "ellipse", semiMajor: 2, semiMinor: 1, axle: { x: 1, y: 0 } })).where).toBe(
      "wheel.axle",
    );
    expect(engineError(ttw({ kind: "polygon", sides: 4, inradius: 1, cornerRadius: 1 })).where).toBe(
      "wheel.cornerRadius",
    );
    const e = engineError(() =>
      solve({
        mode: "wheel-for-track",
        track: {
          kind: "profile",
          points: [
            [0, 0],
            [2, -1],
            [1, 0],
          ],
        },
        periodsPerTurn: 3,
      }),
    );
    expect(e.where).toBe("track.points[2]");
  });

  it("stops at the deadline with code timeout instead of running on", () => {
    const e = engineError(() =>
      solve(
        { mode: "twin-wheels", track: { kind: "sine", amplitude: 10, period: 100 }, periodsPerTurn: 3 },
        { deadlineMs: 1 },
      ),
    );
    expect(e.code).toBe("timeout");
  });

  it("refuses a tolerance that would need too many points", () => {
    expect(
      engineError(() => solve({ mode: "track-for-wheel", wheel: { kind: "circle", radius: 1000 }, tolerance: 1e-9 }))
        .code,
    ).toBe("too-fine");
  });
});

describe("output polylines", () => {
  it("stay within the chord tolerance of the exact curve, with fewer points than a fixed step needs", () => {
    const a = 100;
    const e = 0.5;
    const b = a * Math.sqrt(1 - e * e);
    const tol = 0.01;
    const r = solve({
      mode: "track-for-wheel",
      wheel: { kind: "ellipse", semiMajor: a, semiMinor: b, axle: "focus" },
      tolerance: tol,
    });
    const y = (x: number) => -a + a * e * Math.cos(x / b); // Hall & Wagon 1992
    const pts = r.track!.points;
    let worst = 0;
    for (let i = 0; i + 1 < pts.length; i++) {
      const [x0, y0] = pts[i];
      const [x1, y1] = pts[i + 1];
      // Distance from points of the exact curve between two vertices to the chord joining them.
      const L = Math.hypot(x1 - x0, y1 - y0);
      for (let j = 1; j < 20; j++) {
        const x = x0 + ((x1 - x0) * j) / 20;
        worst = Math.max(worst, Math.abs((x - x0) * (y1 - y0) - (y(x) - y0) * (x1 - x0)) / L);
      }
    }
    expect(worst).toBeLessThan(tol);
    expect(worst).toBeGreaterThan(tol / 20); // the sampler spends its tolerance instead of oversampling
    // A fixed step with the same worst chord error: h = √(8·tol/κmax), κmax = a e / b² (the crest).
    const fixed = Math.ceil(r.period! / Math.sqrt((8 * tol * b * b) / (a * e)));
    expect(pts.length).toBeLessThan(fixed);
    // The wheel outline is closed and carries its motion table.
    const w = r.wheel.points;
    expect(Math.hypot(w[0][0] - w[w.length - 1][0], w[0][1] - w[w.length - 1][1])).toBeLessThan(1e-12);
    expect(r.motion!.length).toBe(pts.length);
  });
});

describe("tiling", () => {
  it("fits whole periods of the 400 mm square's track to a 6.0 m run (period 400·asinh(1), Hall & Wagon 1992)", () => {
    const P = 400 * Math.asinh(1); // inradius 200
    const t = tileRun({ runLength: 6000, period: P, wheelSize: 200 * Math.SQRT2 });
    expect(t.periods).toBe(17);
    expect(t.residual).toBeCloseTo(6000 - 17 * P, 9);
    expect(t.flatRunOut.eachEnd).toBeCloseTo((6000 - 17 * P) / 2, 9);
    expect(t.halfPeriod.periods).toBe(17); // the 6.66 mm residual is less than half a period
    expect(t.scaled.periods).toBe(17);
    expect(t.scaled.period * 17).toBeCloseTo(6000, 9);
    expect(t.scaled.wheelSize).toBeCloseTo(200 * Math.SQRT2 * t.scaled.scale, 12);
    const h = tileRun({ runLength: 10.5 * P, period: P });
    expect(h.halfPeriod).toMatchObject({ periods: 10.5 });
    expect(h.halfPeriod.residual).toBeLessThan(1e-9);
    expect(() => tileRun({ runLength: -1, period: P })).toThrow(EngineError);
  });
});
