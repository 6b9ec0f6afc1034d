// Engine figures against published closed forms. Sources are named beside each value.
import { describe, expect, it } from "vitest";
import { solve, type SolveResult } from "@/lib/track";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** Largest vertical distance from the output polyline's vertices to a closed-form curve. */
function maxDev(points: [number, number][], y: (x: number) => number): number {
  return Math.max(...points.map(([x, v]) => Math.abs(v - y(x))));
}

describe("track for a regular n-gon (Hall & Wagon 1992: y = −A cosh(x/A))", () => {
  it.each([3, 4, 5, 6, 8, 12])("n = %i: period 2A·asinh(tan(π/n)), depth A(sec(π/n) − 1)", (n) => {
    const A = 200;
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: n, inradius: A } });
    expect(rel(r.period!, 2 * A * Math.asinh(Math.tan(Math.PI / n)))).toBeLessThan(1e-12);
    expect(rel(r.depth!, A * (1 / Math.cos(Math.PI / n) - 1))).toBeLessThan(1e-12);
    // Profile: crest at x = 0, cusp at x = P/2; y = −A cosh((x − jP)/A) on each arc.
    const P = r.period!;
    const dev = maxDev(r.track!.points, (x) => -A * Math.cosh((x - (x > P / 2 ? P : 0)) / A));
    expect(dev).toBeLessThan(1e-9 * A);
    expect(r.check.axleDeviation).toBeLessThan(1e-6 * A);
    expect(r.check.closureError).toBeLessThan(1e-10);
  });

  it("docs/math.md §2.2 check values (mpmath 1.3.0): square period 1.762747174039086050, hexagon ln 3", () => {
    expect(
      Math.abs(
        solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 1 } }).period! -
          1.76274717403908605,
      ),
    ).toBeLessThan(1e-15);
    expect(
      Math.abs(
        solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 6, inradius: 1 } }).period! - Math.log(3),
      ),
    ).toBeLessThan(1e-15);
    // Side 400 mm square (the demo of docs/product.md §3): bump height (s/2)(√2 − 1), docs/math.md §2.2.
    const s = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, side: 400 } });
    expect(rel(s.depth!, 200 * (Math.SQRT2 - 1))).toBeLessThan(1e-13);
  });

  it("the triangle cuts into the next hump (MathWorld 'Roulette'; Wagon 2000); the square only touches", () => {
    const tri = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 3, inradius: 1 } });
    expect(tri.check.interference.depth).toBeGreaterThan(0.05);
    expect(tri.warnings.map((w) => w.code)).toContain("interference");
    const sq = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 1 } });
    expect(sq.check.interference.depth).toBe(0);
    expect(sq.warnings.map((w) => w.code)).not.toContain("interference");
  });

  it("friction demand at the corners is tan(π/n) (the cusp slope, docs/math.md §2.1)", () => {
    const sq = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 1 } });
    expect(Math.abs(sq.check.frictionDemand.max - 1)).toBeLessThan(1e-9);
    expect(sq.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(["friction", "sharp-corner"]));
  });
});

describe("ellipse about a focus (Hall & Wagon 1992): y = −a + a·e·cos(x/b), period 2πb", () => {
  it.each([
    [1, 0.5],
    [2, 0.3],
    [1, 0.9],
  ])("a = %f, e = %f", (a, e) => {
    const b = a * Math.sqrt(1 - e * e);
    const r = solve({
      mode: "track-for-wheel",
      wheel: { kind: "ellipse", semiMajor: a, semiMinor: b, axle: "focus" },
      tolerance: 1e-4 * a,
    });
    expect(rel(r.period!, 2 * Math.PI * b)).toBeLessThan(1e-12);
    expect(rel(r.depth!, 2 * a * e)).toBeLessThan(1e-12);
    expect(maxDev(r.track!.points, (x) => -a + a * e * Math.cos(x / b))).toBeLessThan(1e-9 * a);
    expect(r.check.axleDeviation).toBeLessThan(1e-6 * a);
    // Curvature radii: ellipse b²/a at the vertices; road b²/(a e) at crest and trough (docs/math.md §3.1).
    expect(rel(r.check.minCurvatureRadius.wheel, (b * b) / a)).toBeLessThan(1e-6);
    expect(rel(r.check.minCurvatureRadius.track!, (b * b) / (a * e))).toBeLessThan(1e-6);
    // Friction demand max |r′|/r = e/√(1 − e²) for the focal ellipse (derived: r'/r = e sin t/(1 + e cos t)).
    expect(rel(r.check.frictionDemand.max, e / Math.sqrt(1 - e * e))).toBeLessThan(1e-7);
  });

  it("docs/math.md §4 centred ellipse a = 2, b = 1: period 4.3130312949992864709 (mpmath 1.3.0)", () => {
    const r = solve({
      mode: "track-for-wheel",
      wheel: { kind: "ellipse", semiMajor: 2, semiMinor: 1, axle: "centre" },
    });
    expect(Math.abs(r.period! - 4.3130312949992864709)).toBeLessThan(1e-13);
  });

  it("docs/math.md §1.8 generic polar wheel 1 + 0.3cos + 0.1 sin 2θ: x(1) = 1.323248637269726 (mpmath 1.3.0)", () => {
    const r = solve({
      mode: "track-for-wheel",
      wheel: { kind: "polar", r: "1 + 0.3*cos(theta) + 0.1*sin(2*theta)" },
      tolerance: 1e-5,
    });
    expect(Math.abs(r.period! - 2 * Math.PI)).toBeLessThan(1e-13);
    const row = r.motion!.reduce((p, q) => (Math.abs(q.angle - 1) < Math.abs(p.angle - 1) ? q : p));
    const exact = row.angle + 0.3 * Math.sin(row.angle) + 0.05 * (1 - Math.cos(2 * row.angle)); // docs/math.md §1.8 closed form x(θ)
    expect(Math.abs(row.x - exact)).toBeLessThan(1e-12);
    expect(r.wheel.symmetry).toBe(1);
  });
});

describe("wheel for a track", () => {
  it.each([1, 2, 3, 4, 5])(
    "sine y = A sin(2πx/P), k = %i: h = √((kP/2π)² + A²) (integral tables: ∫dx/(h − A sin) = P/√(h² − A²))",
    (k) => {
      const A = 10;
      const P = 100;
      const r = solve({ mode: "wheel-for-track", track: { kind: "sine", amplitude: A, period: P }, periodsPerTurn: k });
      const h = Math.sqrt(((k * P) / (2 * Math.PI)) ** 2 + A * A);
      expect(rel(r.axleHeight!, h)).toBeLessThan(1e-13);
      expect(r.check.closureError).toBeLessThan(1e-10);
      expect(r.check.axleDeviation).toBeLessThan(1e-6 * (h + A));
      const opt = r.options!.find((o) => o.periodsPerTurn === k)!;
      expect(rel(opt.axleHeight!, h)).toBeLessThan(1e-13);
      expect(rel(opt.rMax, h + A)).toBeLessThan(1e-13);
    },
  );

  it("cosine road, docs/math.md §4 (mpmath 1.3.0): d = √(1 + k²) and the wheel k²/(d + cos kθ)", () => {
    // y = cos x − d with datum y = 0 at the axle... expressed as the function track y = cos(x) and h = d.
    for (const [k, d] of [
      [1, 1.4142135623730950488],
      [2, 2.2360679774997896964],
      [3, 3.162277660168379332],
      [4, 4.1231056256176605498],
    ]) {
      const r = solve({
        mode: "wheel-for-track",
        track: { kind: "function", y: "cos(x)", period: 2 * Math.PI },
        periodsPerTurn: k,
        tolerance: 1e-4,
      });
      expect(Math.abs(r.axleHeight! - d)).toBeLessThan(1e-14);
      // Wheel radius against the wheel angle (motion rows): r = k²/(d + cos kθ), θ from the crest contact.
      const worst = Math.max(
        ...r.motion!.map(({ x, angle }) => Math.abs(d - Math.cos(x) - (k * k) / (d + Math.cos(k * angle)))),
      );
      expect(worst).toBeLessThan(1e-12);
    }
  });

  it("catenary row of scale c with the square's period gives h = c with 4 periods per turn (Hall & Wagon 1992)", () => {
    const c = 200;
    const r = solve({
      mode: "wheel-for-track",
      track: { kind: "catenary", scale: c, period: 2 * c * Math.asinh(1) },
      periodsPerTurn: 4,
    });
    expect(rel(r.axleHeight!, c)).toBeLessThan(1e-13);
    expect(rel(r.wheel.rMax, c * Math.SQRT2)).toBeLessThan(1e-13);
  });

  it("cycloid: h = 2R(1 − 1/k)²/(1 − (1 − 1/k)²) (derived here from ∫dφ/(h + R − R cos φ) = 2π/√(h² + 2hR))", () => {
    for (const k of [2, 3, 4]) {
      const q = (1 - 1 / k) ** 2;
      const r = solve({
        mode: "wheel-for-track",
        track: { kind: "cycloid", radius: 1 },
        periodsPerTurn: k,
        tolerance: 1e-3,
      });
      expect(rel(r.axleHeight!, (2 * q) / (1 - q))).toBeLessThan(1e-12);
    }
    // k = 1 would need r = 0 at the cusps (the cardioid, docs/math.md §4): refused.
    expect(() => solve({ mode: "wheel-for-track", track: { kind: "cycloid", radius: 1 }, periodsPerTurn: 1 })).toThrow(
      /r = 0/,
    );
  });
});

describe("partner wheels (Litvin et al. 2009; Schwamb & Merrill 1904)", () => {
  it.each([0.3, 0.5, 0.8])(
    "two equal ellipses about their foci, e = %f: a = 2A, speed ratio (1−e)/(1+e) … (1+e)/(1−e)",
    (e) => {
      const A = 100;
      const r = solve({
        mode: "partner-wheel",
        wheel: { kind: "ellipse", semiMajor: A, semiMinor: A * Math.sqrt(1 - e * e), axle: "focus" },
        lobes: 1,
        tolerance: 0.01,
      });
      expect(rel(r.centreDistance!, 2 * A)).toBeLessThan(1e-12);
      expect(rel(r.check.speedRatio!.min, (1 - e) / (1 + e))).toBeLessThan(1e-11);
      expect(rel(r.check.speedRatio!.max, (1 + e) / (1 - e))).toBeLessThan(1e-11);
      expect(r.check.axleDeviation).toBeLessThan(1e-6 * A);
      expect(r.check.closureError).toBeLessThan(1e-10);
      expect(r.check.interference.depth).toBe(0);
      // The partner is the same ellipse (docs/math.md §5.4): same rMin and rMax.
      expect(rel(r.partner!.rMin, A * (1 - e))).toBeLessThan(1e-12);
      expect(rel(r.partner!.rMax, A * (1 + e))).toBeLessThan(1e-12);
    },
  );

  it("docs/math.md §5.4 follower table, A = 1, e = 0.5 (mpmath 1.3.0): θ₂(π/2) = 2.4980915447965088517", () => {
    const r = solve({
      mode: "partner-wheel",
      wheel: { kind: "ellipse", semiMajor: 1, semiMinor: Math.sqrt(0.75), axle: "focus" },
      lobes: 1,
      tolerance: 1e-4,
    });
    // Closed form θ₂ = 2·atan(((1+e)/(1−e))·tan(θ₁/2)) in this engine's phase (near vertex first): ((1−e)/(1+e)).
    for (const row of r.follower!.filter((f) => f.driver < 3)) {
      expect(Math.abs(row.follower - 2 * Math.atan((1 / 3) * Math.tan(row.driver / 2)))).toBeLessThan(1e-12);
    }
  });

  it("circle R = 1: a = k + 1; limaçon 1 + 0.2 cos θ closed form (docs/math.md §5.4, mpmath 1.3.0)", () => {
    // An axle offset makes the limaçon-like offset circle; the plain circle with offset 0 is the check.
    for (const k of [1, 2, 3]) {
      const r = solve({ mode: "partner-wheel", wheel: { kind: "circle", radius: 1 }, lobes: k });
      expect(Math.abs(r.centreDistance! - (k + 1))).toBeLessThan(1e-12);
    }
    const lim = [2.0388670162838908241, 3.029634091915151806, 4.026462424197464751];
    lim.forEach((a, i) => {
      const r = solve({
        mode: "partner-wheel",
        wheel: { kind: "polar", r: "1 + 0.2*cos(theta)" },
        lobes: i + 1,
        tolerance: 1e-3,
      });
      expect(Math.abs(r.centreDistance! - a)).toBeLessThan(1e-13);
    });
  });
});

describe("twin wheels (docs/math.md §6.3, mpmath 1.3.0): sine road −a/2 + s sin x closes at a/2 = √(k² + s²)", () => {
  it.each([
    [1, 0.5, 2.2360679774997896964],
    [2, 1, 4.4721359549995793928],
    [3, 0.5, 6.082762530298219689],
  ])("k = %i, s = %f: a = %f; the two wheels are congruent", (k, s, a) => {
    const r: SolveResult = solve({
      mode: "twin-wheels",
      track: { kind: "sine", amplitude: s, period: 2 * Math.PI },
      periodsPerTurn: k,
      tolerance: 1e-3,
    });
    expect(Math.abs(r.centreDistance! - a)).toBeLessThan(1e-13);
    expect(Math.abs(r.partner!.rMin - r.wheel.rMin)).toBeLessThan(1e-13);
    expect(Math.abs(r.partner!.rMax - r.wheel.rMax)).toBeLessThan(1e-13);
    expect(r.check.symmetryError!).toBeLessThan(1e-12);
    expect(r.warnings.map((w) => w.code)).not.toContain("not-point-symmetric");
    expect(r.check.axleDeviation).toBeLessThan(1e-6 * a);
  });

  it("says how far off a track is when it is not point-symmetric", () => {
    // sin x + 0.2 cos 2x: the cos 2x term is even about the sine's centres, so it breaks the symmetry by 2·0.2.
    const r = solve({
      mode: "twin-wheels",
      track: { kind: "function", y: "sin(x) + 0.2*cos(2*x)", period: 2 * Math.PI },
      periodsPerTurn: 2,
      tolerance: 1e-3,
    });
    expect(r.check.symmetryError!).toBeGreaterThan(0.1);
    expect(r.warnings.find((w) => w.code === "not-point-symmetric")?.message).toMatch(/off by up to/);
  });
});
