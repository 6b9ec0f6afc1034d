// Cases with no closed form, against SciPy 1.10 (QUADPACK quad, brentq, Nelder–Mead) and mpmath 1.2
// run from tests/reference/rolling_reference.py on plain geometric definitions (ray–boundary
// intersections), to at least 1e-9 relative.
import { beforeAll, describe, expect, it } from "vitest";
import { solve } from "@/lib/track";
import { pythonReference } from "./python-reference";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

// An irregular, star-shaped pentagon with the axle off-centre (an uploaded outline).
const outline = {
  points: [
    [0, -90],
    [80, -40],
    [60, 70],
    [-40, 85],
    [-85, -20],
  ] as [number, number][],
  axle: { x: 5, y: 3 },
};

const cases = [
  { kind: "rounded", sides: 4, inradius: 200, cornerRadius: 30 },
  { kind: "rounded", sides: 6, inradius: 100, cornerRadius: 10 },
  { kind: "partner-polygon", sides: 4, inradius: 1, lobes: 4 },
  { kind: "partner-polygon", sides: 6, inradius: 1, lobes: 3 },
  { kind: "partner-rounded", sides: 4, inradius: 200, cornerRadius: 30, lobes: 2 },
  { kind: "outline", ...outline, lobes: 2 },
  { kind: "triangle-interference", inradius: 1 },
  { kind: "generic-driver", lobes: 1 },
  { kind: "generic-driver", lobes: 3 },
];

describe("against SciPy / mpmath references", () => {
  let ref: Record<string, number>[];
  beforeAll(() => {
    ref = pythonReference(cases);
  });

  it.each([
    [0, 4, 200, 30],
    [1, 6, 100, 10],
  ])("rounded %i: n = %i, inradius %f, corner radius %f — period and depth", (i, n, A, rho) => {
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: n, inradius: A, cornerRadius: rho } });
    expect(rel(r.period!, ref[i].period)).toBeLessThan(1e-9);
    expect(rel(r.depth!, ref[i].depth)).toBeLessThan(1e-9);
    expect(r.check.axleDeviation).toBeLessThan(1e-6 * A);
    expect(r.warnings.map((w) => w.code)).not.toContain("sharp-corner");
  });

  it.each([
    [2, 4, 4],
    [3, 6, 3],
  ])("partner %i of the n = %i polygon with %i lobes: centre distance", (i, n, m) => {
    const r = solve({
      mode: "partner-wheel",
      wheel: { kind: "polygon", sides: n, inradius: 1 },
      lobes: m,
      tolerance: 1e-3,
    });
    expect(rel(r.centreDistance!, ref[i].centreDistance)).toBeLessThan(1e-9);
    expect(r.check.closureError).toBeLessThan(1e-10);
    expect(r.check.axleDeviation).toBeLessThan(1e-6);
  });

  it("partner of a rounded square, 2 lobes", () => {
    const r = solve({
      mode: "partner-wheel",
      wheel: { kind: "polygon", sides: 4, inradius: 200, cornerRadius: 30 },
      lobes: 2,
    });
    expect(rel(r.centreDistance!, ref[4].centreDistance)).toBeLessThan(1e-9);
  });

  it("outline wheel: track period, depth and a 2-lobe partner", () => {
    const t = solve({ mode: "track-for-wheel", wheel: { kind: "outline", ...outline } });
    expect(t.wheel.symmetry).toBe(1);
    expect(rel(t.period!, ref[5].period)).toBeLessThan(1e-9);
    expect(rel(t.depth!, ref[5].depth)).toBeLessThan(1e-9);
    expect(t.check.axleDeviation).toBeLessThan(1e-6 * ref[5].rMax);
    const p = solve({ mode: "partner-wheel", wheel: { kind: "outline", ...outline }, lobes: 2 });
    expect(rel(p.centreDistance!, ref[5].centreDistance)).toBeLessThan(1e-9);
  });

  it("the triangle's interference depth on its own track", () => {
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 3, inradius: 1 } });
    expect(rel(r.check.interference.depth, ref[6].depth)).toBeLessThan(1e-6);
  });

  it("generic driver 1 + 0.3cos θ + 0.1 sin 2θ (docs/math.md §5.4 table, mpmath 1.3.0, recomputed here)", () => {
    const table = [2.0944760282156716107, 3.0730166125735512179, 4.0655111384308936829];
    for (const [i, k] of [
      [7, 1],
      [8, 3],
    ]) {
      const r = solve({
        mode: "partner-wheel",
        wheel: { kind: "polar", r: "1 + 0.3*cos(theta) + 0.1*sin(2*theta)" },
        lobes: k,
        tolerance: 1e-3,
      });
      expect(rel(r.centreDistance!, ref[i].centreDistance)).toBeLessThan(1e-12);
      expect(rel(r.centreDistance!, table[k - 1])).toBeLessThan(1e-12);
    }
  });
});
