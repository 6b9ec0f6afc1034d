// The run's profile against the closed form and the engine's tiling. For the square of half-side A
// on its road the track is the catenary y = −A cosh(u/A) about each crest, period P = 2A·asinh(1)
// (Hall & Wagon 1992, "Roads and Wheels", Math. Magazine 65(5):283–301).
import { describe, expect, it } from "vitest";
import { tileRun } from "@/lib/track";
import { buildRun } from "@/lib/cut/run-length";
import { parseCutSettings } from "@/lib/cut/settings";
import { CutError } from "@/lib/cut/errors";
import { yAt } from "@/lib/geometry/polyline";
import { squareResult } from "./support/fixtures";

const A = 200;
const P = 2 * A * Math.asinh(1); // Hall & Wagon 1992: 352.549… mm for a 400 mm square
const catenary = (x: number, x0: number, scale = 1) => {
  const v = x - x0;
  const w = v - P * scale * Math.round(v / (P * scale));
  return -A * scale * Math.cosh(w / (A * scale));
};
/**
 * The engine samples to a chord tolerance of 0.01 mm (the spec default), measured across the chord;
 * read vertically that is up to 0.01·√(1 + y′²), and the catenary's steepest slope is
 * sinh(asinh 1) = 1 at the cusps, so 0.01·√2.
 */
const TOL = 0.01 * Math.SQRT2 * (1 + 1e-9);

describe("run length", () => {
  it("flat run-out: 17 periods of the catenary, flats at crest level, as tileRun counts them", () => {
    const r = squareResult();
    expect(r.period!).toBeCloseTo(P, 9);
    const { run } = buildRun(r, parseCutSettings({ runLength: 6000 }));
    const tile = tileRun({ runLength: 6000, period: r.period! }); // the engine's own tiling
    expect(run.periods).toBe(tile.flatRunOut.periods);
    expect(run.periods).toBe(17); // floor(6000 / 352.549) = 17
    expect(run.residual).toBeCloseTo(tile.residual, 9);
    expect(run.residual).toBeCloseTo(6000 - 17 * P, 9); // closed form
    expect(run.eachEnd).toBeCloseTo((6000 - 17 * P) / 2, 9);
    expect(run.extraForNextPeriod).toBeCloseTo(18 * P - 6000, 9);
    expect(run.crestLevel).toBeCloseTo(-A, 9); // a crest of y = −A cosh(u/A) is at u = 0
    expect(run.minY).toBeCloseTo(-A * Math.SQRT2, 9); // trough: −A cosh(asinh 1) = −A√2
    expect(run.profile[0]).toEqual([0, run.crestLevel]);
    expect(run.profile[run.profile.length - 1][0]).toBe(6000);
    let worst = 0;
    for (let x = 0; x <= 6000; x += 0.5) {
      const inFlat = x < run.eachEnd || x > run.eachEnd + 17 * P;
      const exact = inFlat ? -A : catenary(x, run.eachEnd);
      worst = Math.max(worst, Math.abs(yAt(run.profile, x) - exact));
    }
    expect(worst).toBeLessThan(TOL);
    expect(run.troughs).toHaveLength(17);
    run.troughs.forEach((t, k) => expect(t).toBeCloseTo(run.eachEnd + (k + 0.5) * P, 9));
  });

  it("half period: ends half way through a period", () => {
    const r = squareResult();
    const L = 3.6 * P;
    const { run } = buildRun(r, parseCutSettings({ runLength: L, endTreatment: "half" }));
    const tile = tileRun({ runLength: L, period: r.period! });
    expect(run.periods).toBe(tile.halfPeriod.periods);
    expect(run.periods).toBe(3.5); // floor(2 · 3.6) / 2
    expect(run.eachEnd).toBeCloseTo((0.1 * P) / 2, 9);
    // The profile's last periodic point is a trough, at −A√2.
    expect(yAt(run.profile, run.eachEnd + 3.5 * P)).toBeCloseTo(-A * Math.SQRT2, 6);
  });

  it("scaled: whole periods exactly, the wheel size reported", () => {
    const r = squareResult();
    const L = 2000;
    const { run, warnings } = buildRun(r, parseCutSettings({ runLength: L, endTreatment: "scale" }));
    const tile = tileRun({ runLength: L, period: r.period!, wheelSize: r.wheel.rMax });
    const N = Math.round(L / P); // 6
    expect(run.periods).toBe(N);
    expect(run.scale).toBeCloseTo(L / (N * P), 12);
    expect(run.scale).toBeCloseTo(tile.scaled.scale, 12);
    expect(run.period * N).toBeCloseTo(L, 9);
    expect(run.residual).toBe(0);
    expect(run.wheelSize.after).toBeCloseTo(A * Math.SQRT2 * run.scale, 9); // rMax of the square is its half-diagonal
    expect(run.wheelSize.change).toBeCloseTo(A * Math.SQRT2 * (run.scale - 1), 9);
    expect(warnings.map((w) => w.code)).toContain("scaled");
    let worst = 0;
    for (let x = 0; x <= L; x += 0.5)
      worst = Math.max(worst, Math.abs(yAt(run.profile, x) - catenary(x, 0, run.scale)));
    expect(worst).toBeLessThan(TOL * run.scale + 1e-9);
  });

  it("starts a wheel-for-track run at a crest (the sine's crest is at P/4)", async () => {
    const { solve } = await import("@/lib/track");
    const r = solve({
      mode: "wheel-for-track",
      track: { kind: "sine", amplitude: 20, period: 200 },
      periodsPerTurn: 4,
    });
    const { run } = buildRun(r, parseCutSettings({ runLength: 1000 }));
    expect(run.phase).toBeCloseTo(50, 6); // y = 20 sin(2πx/200) peaks at x = 50
    expect(run.crestLevel).toBeCloseTo(20, 6);
    expect(run.periods).toBe(5);
    expect(run.eachEnd).toBe(0);
    for (const x of [0, 37, 100, 555, 1000])
      expect(yAt(run.profile, x)).toBeCloseTo(20 * Math.sin((2 * Math.PI * (x + 50)) / 200), 1);
  });

  it("inches: converts the design ×25.4", async () => {
    const { solve } = await import("@/lib/track");
    const r = solve({ mode: "track-for-wheel", units: "in", wheel: { kind: "polygon", sides: 4, side: 400 / 25.4 } });
    const { run } = buildRun(r, parseCutSettings({ runLength: 6000 }));
    expect(run.designPeriod).toBeCloseTo(P, 6); // the same square, drawn in inches
    expect(run.periods).toBe(17);
  });

  it("refuses a run shorter than one period", () => {
    const r = squareResult();
    let err: unknown;
    try {
      buildRun(r, parseCutSettings({ runLength: 300 }));
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(CutError);
    expect((err as CutError).code).toBe("run-too-short");
    expect((err as CutError).field).toBe("runLength");
    expect((err as CutError).message).toMatch(/300 mm.*shorter than one period.*352\.5 mm/);
  });
});
