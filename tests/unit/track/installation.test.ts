// Installation tolerances (lib/track/installation.ts, wired to a run by lib/assembly/tolerances.ts)
// checked against the engine's own roll over the track as built — every outline point, a fine
// sweep — with a joint moved by the stated tolerance (the bump must stay within the limit) and by
// twice it (the bump must exceed it), and against the square's closed form.
import { beforeAll, describe, expect, it } from "vitest";
import { installationBody, runTolerances } from "@/lib/assembly/tolerances";
import { runScene, type RunLayout } from "@/lib/review/run-scene";
import {
  axleBump,
  jointTolerance,
  loweredAt,
  polylineHeight,
  restingHeight,
  shiftedFrom,
  supportTolerance,
  TOLERANCE_STEP,
  type RollingBody,
  type TrackHeight,
} from "@/lib/track/installation";
import { solve, type SolveResult } from "@/lib/track";

const LIMIT = 1; // mm
const SQUARE = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 },
};
const HEXAGON = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 6, inradius: 100, cornerRadius: 0 },
};

interface Setup {
  r: SolveResult;
  scene: RunLayout;
  body: RollingBody;
  track: TrackHeight;
  reach: number;
}

function setup(spec: unknown, runLength: number): Setup {
  const r = solve(spec);
  const scene = runScene(r, { runLength, endTreatment: "flat" }) as RunLayout;
  return {
    r,
    scene,
    body: installationBody(r, scene),
    track: polylineHeight(scene.profile),
    reach: scene.dims.wheelAcross / 2,
  };
}

/** The bump with every outline point and a 0.25 mm sweep (finer than the tolerance search's): the check the tolerance must pass. */
const fineBump = (s: Setup, built: TrackHeight, from: number, to: number) =>
  axleBump(s.body, s.track, built, { from, to, step: 0.25 }).bump;

describe("installation tolerances", () => {
  let square: Setup;
  let hexagon: Setup;
  beforeAll(() => {
    square = setup(SQUARE, 6000);
    hexagon = setup(HEXAGON, 1200);
  });

  it("rest the wheel on the track as designed at its own axle line", () => {
    // On the track as designed the envelope height is the axle line (Hall & Wagon 1992: the axle stays level).
    for (let i = 0; i <= 40; i++) {
      const x = square.scene.rollStart + (i / 40) * (square.scene.rollEnd - square.scene.rollStart);
      expect(Math.abs(restingHeight(square.body, square.track, x) - square.scene.axleY)).toBeLessThan(0.02);
    }
  });

  for (const [name, pick] of [
    ["square", () => square],
    ["hexagon", () => hexagon],
  ] as const) {
    it(`${name}: a joint moved by its tolerance bumps the axle within the limit, and by twice it beyond`, () => {
      const s = pick();
      // A joint at a crest, as the cut stations are by default.
      const station = s.scene.rollStart + 2 * s.scene.period;
      const t = jointTolerance(s.body, s.track, station, { limit: LIMIT, reach: s.reach });
      expect(t.tolerance).toBeGreaterThan(0);
      // Stated rounded down, never over.
      expect(Math.abs(t.tolerance / TOLERANCE_STEP - Math.round(t.tolerance / TOLERANCE_STEP))).toBeLessThan(1e-9);
      for (const sign of [1, -1]) {
        const at = (k: number) =>
          fineBump(
            s,
            shiftedFrom(s.track, station, sign * k * t.tolerance),
            station - s.reach,
            station + s.reach + 3 * t.tolerance,
          );
        expect(at(1), `${name} joint ${sign > 0 ? "+" : "−"}tolerance`).toBeLessThanOrEqual(LIMIT);
        expect(at(2), `${name} joint ${sign > 0 ? "+" : "−"}2 × tolerance`).toBeGreaterThan(LIMIT);
      }
    });

    it(`${name}: a support low by its tolerance bumps the axle within the limit, and by twice it beyond`, () => {
      const s = pick();
      const at = s.scene.rollStart + 3.3 * s.scene.period;
      const span = { at, left: at - 600, right: at + 600 };
      const t = supportTolerance(s.body, s.track, span, { limit: LIMIT, reach: s.reach });
      const bump = (k: number) =>
        fineBump(s, loweredAt(s.track, at, k * t, span.left, span.right), span.left - s.reach, span.right + s.reach);
      expect(bump(1)).toBeLessThanOrEqual(LIMIT);
      expect(bump(2)).toBeGreaterThan(LIMIT);
    });
  }

  it("give the square's closed form: its road meets itself at right angles, so a shift δ lifts the axle by about δ", () => {
    // The catenary road y = −a·cosh(x/a) of a square of half-side a has slope ±sinh(asinh 1) = ±1
    // where two arcs meet under a corner (Hall & Wagon 1992): a corner arriving δ early or late lands
    // on a slope of 1 and lifts the axle by δ. So a 1 mm limit allows a joint close to ±1 mm.
    const station = square.scene.rollStart + 4 * square.scene.period;
    const t = jointTolerance(square.body, square.track, station, { limit: LIMIT, reach: square.reach });
    expect(t.tolerance).toBeGreaterThanOrEqual(0.9);
    expect(t.tolerance).toBeLessThanOrEqual(1.05);
    // And a low support lets the axle down by as much as the track goes: about the limit.
    const support = square.scene.rollStart + 1800;
    expect(
      supportTolerance(
        square.body,
        square.track,
        { at: support, left: support - 600, right: support + 600 },
        { limit: LIMIT, reach: square.reach },
      ),
    ).toBeCloseTo(1, 1);
  });

  it("work out every joint and support of a run as the assembly sheet asks", () => {
    const t = runTolerances(
      square.r,
      { runLength: 6000, endTreatment: "flat" },
      { joints: [square.scene.rollStart + 6 * square.scene.period], supports: [50, 640, 1230] },
    );
    expect(t.joints).toHaveLength(1);
    expect(t.supports.map((s) => s.station)).toEqual([50, 640, 1230]);
    for (const x of [...t.joints, ...t.supports]) expect(x.tolerance).toBeGreaterThan(0);
  });
});
