// The view's plain geometry: ray reach, interpolation, the view transform, grid rules, and the
// plot series read off engine outputs, checked against closed forms.

import { describe, expect, it } from "vitest";
import { solve } from "@/lib/track";
import {
  centreOn,
  curvatureSeries,
  fitView,
  gridRules,
  hermite,
  niceTicks,
  outlineFrictionSeries,
  rayReach,
  robustMax,
  rotateCw,
  speedRatioSeries,
  tileTrack,
  toScreen,
  toWorld,
  trackFrictionSeries,
  trackLookup,
  trackYAt,
  zoomAbout,
  type Pt,
} from "@/lib/studio/view-math";

const circle = (r: number, n: number, cx = 0, cy = 0): Pt[] =>
  Array.from(
    { length: n + 1 },
    (_, i) => [cx + r * Math.cos((2 * Math.PI * i) / n), cy + r * Math.sin((2 * Math.PI * i) / n)] as Pt,
  );

describe("geometry helpers", () => {
  it("turns clockwise with y up", () => {
    const [x, y] = rotateCw([0, 1], Math.PI / 2);
    expect(x).toBeCloseTo(1, 12);
    expect(y).toBeCloseTo(0, 12);
  });

  it("reads how far a closed outline reaches along a ray, also through a vertex", () => {
    const square: Pt[] = [
      [-1, -1],
      [1, -1],
      [1, 1],
      [-1, 1],
      [-1, -1],
    ];
    expect(rayReach(square, [0, -1])).toBeCloseTo(1, 12);
    expect(rayReach(square, [1, 1])).toBeCloseTo(Math.SQRT2, 12); // straight through a corner
    expect(rayReach(circle(5, 720), [0.3, -0.7])).toBeCloseTo(5, 3);
  });

  it("interpolates with Hermite exactly for a cubic", () => {
    const f = (x: number) => x * x * x - 2 * x;
    const df = (x: number) => 3 * x * x - 2;
    const xs = [0, 1, 2.5, 4];
    expect(hermite(xs, xs.map(f), xs.map(df), 1.7)).toBeCloseTo(f(1.7), 12);
  });

  it("tiles and reads a periodic track", () => {
    const one: Pt[] = [
      [0, 0],
      [1, 1],
      [2, 0],
    ];
    const run = tileTrack(one, 2, 3);
    expect(run).toHaveLength(7);
    expect(run[6]).toEqual([6, 0]);
    const t = trackLookup(one, 2);
    expect(trackYAt(t, 4.5)).toBeCloseTo(0.5, 12);
    expect(trackYAt(t, -0.5)).toBeCloseTo(0.5, 12);
  });
});

describe("view transform", () => {
  it("fits bounds, and zooms about the cursor without moving the point under it", () => {
    const v = fitView({ minX: 0, maxX: 1000, minY: -200, maxY: 100 }, 800, 400, 20);
    expect(toScreen(v, [500, -50])).toEqual([400, 200]);
    const at: Pt = [123, 77];
    const before = toWorld(v, at);
    const z = zoomAbout(v, 2.5, at);
    const after = toWorld(z, at);
    expect(after[0]).toBeCloseTo(before[0], 9);
    expect(after[1]).toBeCloseTo(before[1], 9);
    expect(toScreen(centreOn(z, [10, 20], [400, 200]), [10, 20])).toEqual([400, 200]);
  });

  it("shows only grid rules at least 6 px apart, in decades of the unit", () => {
    expect(gridRules(10, "mm")).toMatchObject({ fine: 1, major: 10 });
    expect(gridRules(1, "mm")).toMatchObject({ fine: 10, major: 100 });
    expect(gridRules(0.5, "mm").fine * 0.5).toBeGreaterThanOrEqual(6);
    expect(gridRules(100, "in").fine).toBeCloseTo(0.1, 12);
    const g = gridRules(2, "mm");
    expect(g.label * 2).toBeGreaterThanOrEqual(56);
  });

  it("picks round ticks", () => {
    expect(niceTicks(0, 1, 4)).toEqual([0, 0.2, 0.4, 0.6, 0.8, 1]);
    expect(niceTicks(0, 352.5, 4)).toEqual([0, 100, 200, 300]);
  });
});

describe("plot series from engine outputs", () => {
  it("square wheel: the track's steepest slope is 1, at the cusps", () => {
    // Hall & Wagon 1992: the square's catenary arcs meet at 45°, so the contact there needs μ = 1.
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, side: 400 } });
    const s = trackFrictionSeries(r.track!.points);
    // Read per chord, so the last chord before a cusp gives a little under 1 (0.99).
    expect(Math.max(...s.y)).toBeCloseTo(1, 1);
    expect(Math.max(...s.y)).toBeLessThanOrEqual(1 + 1e-9);
    expect(Math.max(...s.y)).toBeCloseTo(r.check.frictionDemand.max, 1);
  });

  it("ellipse pair: |r′|/r peaks at e/√(1 − e²) and the speed ratio spans (1 − e)/(1 + e) to its inverse", () => {
    // r = p/(1 + e cos θ) about a focus gives r′/r = e sin θ/(1 + e cos θ), largest at cos θ = −e:
    // e/√(1 − e²) = 0.75 for e = 0.6 (semi-axes 100 and 80). Ratio r₁/(a − r₁) for two equal
    // ellipses at a = 2·100 (Litvin et al. 2009): 0.25 … 4.
    const r = solve({
      mode: "partner-wheel",
      wheel: { kind: "ellipse", semiMajor: 100, semiMinor: 80, axle: "focus" },
      lobes: 1,
    });
    const f = outlineFrictionSeries(r.wheel.points, 2 * Math.PI);
    expect(Math.max(...f.y)).toBeCloseTo(0.75, 2);
    const s = speedRatioSeries(r.follower!);
    expect(Math.min(...s.y)).toBeCloseTo(0.25, 2);
    expect(Math.max(...s.y)).toBeCloseTo(4, 1);
  }, 30_000);

  it("curvature of a circle is 1/r, positive when it turns left", () => {
    const c = curvatureSeries(circle(50, 360), (p) => p[0]);
    for (const k of c.y) expect(k).toBeCloseTo(1 / 50, 6);
  });

  it("keeps a single spike from setting the plot range", () => {
    expect(robustMax([1, 2, 3, ...Array(200).fill(1), 1000], 0.02)).toBeLessThan(10);
  });
});
