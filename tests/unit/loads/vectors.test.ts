// The load-path checks against the test vectors T1–T12 of docs/safety.md §6, each with its own
// source beside it, and a circle on a flat track against the Hertz closed form.
import { describe, expect, it } from "vitest";
import { checkLoads } from "@/lib/loads";
import { deflectionLimit, deflections, longestSpan } from "@/lib/loads/beam";
import { alphaAt, omegaRatio, polarSecondMoment } from "@/lib/loads/dynamics";
import { frictionNeeded, frictionNeededSigned, muFromTilt } from "@/lib/loads/grip";
import { contactModulus, lineContact, radiusFor } from "@/lib/loads/hertz";
import { inToMm, lbfToN, plfToNPerM, psfToKpa, psiToMpa } from "@/lib/loads/units";
import { solve } from "@/lib/track";
import { loadsInputSchema, type LoadsInputDraft } from "@/lib/validation/loads";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

/** A check input with plain figures; the design and what the test is about are overridden. */
function input(over: Partial<LoadsInputDraft>) {
  return loadsInputSchema.parse({
    spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 150 } },
    use: "push-along",
    traction: 0,
    wheel: { modulusGpa: 210, poisson: 0.3, treadWidthMm: 50 },
    track: { modulusGpa: 210, poisson: 0.3, widthMm: 50, depthMm: 20, supportSpanMm: 300 },
    ...over,
  });
}

describe("Hertz line contact", () => {
  it("T1: Norton, Machine Design 4th ed., Example 7-2 (12 in wheel on a flat rail, 5000 lbf on 0.875 in, steel)", () => {
    // Inch-pound in, inch-pound out: the formulas hold in any consistent units.
    const steel = { modulus: 30e6, poisson: 0.28 };
    const c = lineContact(5000, 0.875, 6, contactModulus(steel, steel));
    expect(Math.abs(c.halfWidth - 0.0518)).toBeLessThan(0.00005); // a = 0.0518 in (Norton Ex. 7-2)
    expect(Math.abs(c.pMax - 70243)).toBeLessThan(1); // p_max = 70 243 psi (Norton Ex. 7-2)
    expect(Math.abs(c.tauMax - 21354)).toBeLessThan(1); // τ₁₃ = 21 354 psi (Norton Ex. 7-2)
    expect(Math.abs(c.depth - 0.041)).toBeLessThan(0.0005); // at 0.041 in (Norton Ex. 7-2)
  });

  it("T2: the same in SI (Norton Ex. 7-2 converted, docs/safety.md T2): a = 1.315 mm, p_max = 484.3 MPa", () => {
    const steel = { modulus: psiToMpa(30e6), poisson: 0.28 }; // 206.84 GPa
    const c = lineContact(lbfToN(5000), inToMm(0.875), inToMm(6), contactModulus(steel, steel));
    expect(Math.abs(c.halfWidth - 1.315)).toBeLessThan(0.0005);
    expect(Math.abs(c.pMax - 484.3)).toBeLessThan(0.05);
  });

  it("T3: Johnson's radius form equals Shigley's diameter form (Shigley, Mechanical Engineering Design, §3-19)", () => {
    for (const [F, l, d1, d2, E1, n1, E2, n2] of [
      [800, 2, 6, Infinity, 14.5e6, 0.211, 30e6, 0.292], // Shigley's cast-iron wheel problem, Table A-5 figures from memory
      [1000, 50, 300, 500, 210e3, 0.3, 70e3, 0.33],
      [22241, 22.225, 304.8, Infinity, 206.84e3, 0.28, 206.84e3, 0.28],
    ]) {
      const b = Math.sqrt(((2 * F) / (Math.PI * l)) * (((1 - n1 ** 2) / E1 + (1 - n2 ** 2) / E2) / (1 / d1 + 1 / d2)));
      const pmax = (2 * F) / (Math.PI * b * l);
      const R = 1 / (2 / d1 + 2 / d2);
      const c = lineContact(F, l, R, contactModulus({ modulus: E1, poisson: n1 }, { modulus: E2, poisson: n2 }));
      expect(rel(c.halfWidth, b)).toBeLessThan(1e-12);
      expect(rel(c.pMax, pmax)).toBeLessThan(1e-12);
    }
  });

  it("a circle of 150 mm on its flat road, steel on steel, 1000 N over 50 mm (the derived vector of docs/safety.md §2.3: E* 115.4 GPa, a 0.182 mm, p₀ 70.0 MPa, τ 21.0 MPa at 0.143 mm)", () => {
    const report = checkLoads(
      input({ spec: { mode: "track-for-wheel", wheel: { kind: "circle", radius: 150 } }, load: { wheelLoadN: 1000 } }),
    );
    const c = report.contact;
    expect(rel(c.radiusMm, 150)).toBeLessThan(1e-9);
    // Closed form a = √(4P′R/(πE*)), p₀ = √(P′E*/(πR)) (Johnson 1985 §4.2), worked here by hand:
    const eStar = 1 / ((2 * (1 - 0.09)) / 210e3);
    expect(Math.abs(eStar - 115.4e3)).toBeLessThan(50);
    expect(rel(c.halfWidthMm, Math.sqrt((4 * 20 * 150) / (Math.PI * eStar)))).toBeLessThan(1e-9);
    expect(rel(c.pMaxMpa!, Math.sqrt((20 * eStar) / (Math.PI * 150)))).toBeLessThan(1e-9);
    expect(Math.abs(c.halfWidthMm - 0.182)).toBeLessThan(0.0005);
    expect(Math.abs(c.pMaxMpa! - 70.0)).toBeLessThan(0.05);
    expect(Math.abs(c.tauMaxMpa! - 21.0)).toBeLessThan(0.3);
    expect(Math.abs(c.depthMm - 0.143)).toBeLessThan(0.0005);
  });

  it("the radius that just meets an allowable gives p_max equal to it", () => {
    const eStar = 5000;
    const R = radiusFor(1000, 20, eStar, 30);
    expect(rel(lineContact(1000, 20, R, eStar).pMax, 30)).toBeLessThan(1e-12);
  });
});

describe("grip", () => {
  it("T4: the square's road (Hall and Wagon, Math. Mag. 65 (1992)): period 1.762747, hump 0.414214, 45° at the trough", () => {
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 1 } });
    expect(Math.abs(r.period! - 1.762747)).toBeLessThan(5e-7);
    expect(Math.abs(r.depth! - 0.414214)).toBeLessThan(5e-7);
    expect(Math.abs((Math.atan(r.check.frictionDemand.max) * 180) / Math.PI - 45)).toBeLessThan(1e-6);
  });

  it.each([
    [3, 1.7321],
    [4, 1.0],
    [5, 0.7265],
    [6, 0.5774],
    [8, 0.4142],
  ])(
    "T5: a regular %i-gon under a vertical load needs μ = tan(π/n) = %f (friction cone; docs/safety.md T5)",
    (n, mu) => {
      const report = checkLoads(
        input({ spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: n, inradius: 100 } } }),
      );
      expect(Math.abs(report.grip.needed - mu)).toBeLessThan(5e-5);
    },
  );

  it("T6: an ellipse about its centre, a/b = 2, needs 0.75 = (a² − b²)/(2ab) at a tilt of 36.87°", () => {
    const report = checkLoads(
      input({
        spec: { mode: "track-for-wheel", wheel: { kind: "ellipse", semiMajor: 200, semiMinor: 100, axle: "centre" } },
      }),
    );
    expect(Math.abs(report.grip.needed - 0.75)).toBeLessThan(1e-6);
    expect(Math.abs((Math.atan(report.grip.needed) * 180) / Math.PI - 36.87)).toBeLessThan(0.005);
  });

  it("T7: at the square's corner (φ = 45°) with H/V = 0.1 and 0.2: 1.2222 and 1.5000 ((1 + h)/(1 − h))", () => {
    expect(Math.abs(frictionNeeded(Math.PI / 4, 0.1) - 1.2222)).toBeLessThan(5e-5);
    expect(Math.abs(frictionNeeded(Math.PI / 4, 0.2) - 1.5)).toBeLessThan(1e-12);
    // The general form |H cos φ + V sin φ| / (V cos φ − H sin φ) agrees on the worse side.
    expect(Math.abs(frictionNeededSigned(Math.PI / 4, 0.1, 1) - 1.2222)).toBeLessThan(5e-5);
    const report = checkLoads(input({ traction: 0.2 }));
    expect(Math.abs(report.grip.needed - 1.5)).toBeLessThan(1e-6);
  });

  it("a measured tilt angle is μ = tan θ (the tilt test); a square needs 45°", () => {
    expect(Math.abs(muFromTilt(45) - 1)).toBeLessThan(1e-15);
    const ok = checkLoads(input({ tiltDeg: 53, traction: 0 }));
    expect(ok.grip.available).toBeCloseTo(Math.tan((53 * Math.PI) / 180), 12);
    expect(ok.grip.ok).toBe(true); // tan 53° = 1.327 ≥ 1.3 × 1
    expect(checkLoads(input({ tiltDeg: 50, traction: 0 })).grip.ok).toBe(false); // 1.19 < 1.3
  });
});

describe("dynamics", () => {
  it("T8: a square at constant speed turns at ω_min/ω_max = cos(π/4) = 0.70711", () => {
    const report = checkLoads(input({ speedMps: 1 }));
    expect(Math.abs(report.dynamics!.omegaRatio - 0.70711)).toBeLessThan(5e-6);
    expect(omegaRatio(1, Math.SQRT2)).toBeCloseTo(0.70711, 5);
  });

  it("T9: r = 0.15 m, v = 1 m/s: α = ±22.22 rad/s² either side of the corner, a step of 44.44", () => {
    const alpha = alphaAt(1, 0.15 * Math.SQRT2, 1);
    expect(Math.abs(alpha - 22.22)).toBeLessThan(0.005);
    expect(Math.abs(2 * alpha - 44.44)).toBeLessThan(0.01);
    const report = checkLoads(input({ speedMps: 1 }));
    expect(Math.abs(report.dynamics!.alphaPeak - 22.22)).toBeLessThan(0.005);
  });

  it("the polar second moment of a disc is πR⁴/2 and of a square s⁴/6 (standard section tables)", () => {
    const disc = Array.from({ length: 4000 }, (_, i): [number, number] => [
      Math.cos((2 * Math.PI * i) / 4000),
      Math.sin((2 * Math.PI * i) / 4000),
    ]);
    expect(rel(polarSecondMoment(disc), Math.PI / 2)).toBeLessThan(1e-5);
    expect(
      rel(
        polarSecondMoment([
          [-1, -1],
          [1, -1],
          [1, 1],
          [-1, 1],
        ]),
        16 / 6,
      ),
    ).toBeLessThan(1e-14);
  });

  it("the wheel's own inertia adds to the traction the corner needs (the example of docs/safety.md §2.1: I 0.5 kg·m², 1.5 m/s, r 0.15 m, 400 N → h 0.29)", () => {
    // H = I·α/ρ with α = v² tan ψ / ρ² at the corner ρ = r√2: 0.5 × 50 / 0.2121 / 400 = 0.295.
    const h = (0.5 * alphaAt(1.5, 0.15 * Math.SQRT2, 1)) / (0.15 * Math.SQRT2) / 400;
    expect(Math.abs(h - 0.29)).toBeLessThan(0.01);
    const still = checkLoads(
      input({ speedMps: 0.01, wheel: { modulusGpa: 9, poisson: 0.3, treadWidthMm: 18, densityKgM3: 680 } }),
    );
    const fast = checkLoads(
      input({ speedMps: 3, wheel: { modulusGpa: 9, poisson: 0.3, treadWidthMm: 18, densityKgM3: 680 } }),
    );
    expect(still.grip.tractionShare).toBeLessThan(1e-4);
    expect(fast.grip.tractionShare).toBeGreaterThan(0.01);
    expect(fast.grip.needed).toBeGreaterThan(still.grip.needed);
  });
});

describe("track deflection", () => {
  it("T10: 18 × 300 mm plywood, L = 600 mm, E = 9 GPa, P = 500 N: 1.715 mm against L/360 = 1.667 (fails)", () => {
    const beam = { width: 300, depth: 18, modulus: 9000, density: 0 };
    const d = deflections(beam, 600, 500);
    expect(Math.abs(d.point - 1.715)).toBeLessThan(0.0005); // PL³/48EI (Gere, Table G-2)
    expect(Math.abs(deflectionLimit(600, null) - 1.667)).toBeLessThan(0.0005); // IBC Table 1604.3
    const report = checkLoads(
      input({
        load: { wheelLoadN: 500 },
        spec: { mode: "track-for-wheel", wheel: { kind: "circle", radius: 100 } },
        track: { modulusGpa: 9, poisson: 0.3, widthMm: 300, depthMm: 18, supportSpanMm: 600 },
      }),
    );
    expect(report.deflection.ok).toBe(false);
    expect(report.cautions.some((c) => c.check === "deflection")).toBe(true);
    // The longest span that passes: PL³/48EI = L/360 → L = √(48EI/(360P)) = 587.9 mm (solved by hand).
    expect(
      Math.abs(longestSpan(beam, 500, null) - Math.sqrt((48 * 9000 * ((300 * 18 ** 3) / 12)) / (360 * 500))),
    ).toBeLessThan(0.1);
  });

  it("its own weight: 5wL⁴/384EI (Gere, Table G-2), w from the density", () => {
    const beam = { width: 300, depth: 18, modulus: 9000, density: 680 };
    const w = (680 * 9.80665 * 300 * 18) / 1e9;
    expect(
      rel(deflections(beam, 600, 0).self, (5 * w * 600 ** 4) / (384 * 9000 * ((300 * 18 ** 3) / 12))),
    ).toBeLessThan(1e-12);
  });

  it("the hump's share: a shallow hump tightens the limit below L/360 (5 % of the hump: common practice)", () => {
    expect(deflectionLimit(600, 10)).toBe(0.5);
    expect(deflectionLimit(600, 1000)).toBeCloseTo(600 / 360, 12);
  });
});

describe("interference and units", () => {
  it("T11: the triangle's vertex cuts the next hump (the sampled check of docs/safety.md T11: 0.095 r), and it is flagged", () => {
    const report = checkLoads(
      input({ spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 3, inradius: 1 } } }),
    );
    const c = report.cautions.find((x) => x.check === "interference");
    expect(c).toBeDefined();
    expect(c!.signal).toBe("CAUTION"); // push-along; WARNING on a ride-on
    expect(
      checkLoads(
        input({ use: "ride-on", spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 3, inradius: 1 } } }),
      ).cautions.find((x) => x.check === "interference")!.signal,
    ).toBe("WARNING");
    // The 0.095 r of docs/safety.md T11 is how far the vertex dips below the road, measured straight down; the
    // engine measures along the ray from the axle, which is shorter for a vertex coming in at a
    // slant (0.064 r), and more than the shortest distance to the road (0.032 r, sampled by hand).
    const depth = Number(c!.figure.replace(/ mm$/, ""));
    expect(depth).toBeGreaterThan(0.032);
    expect(depth).toBeLessThanOrEqual(0.095);
    // The square only touches at the trough: nothing to flag.
    expect(checkLoads(input({})).cautions.some((x) => x.check === "interference")).toBe(false);
  });

  it("T12: 50 plf = 729.7 N/m, 200 lb = 889.6 N, 3.5 in = 88.9 mm, 9 in = 228.6 mm (NIST SP 811 factors)", () => {
    expect(Math.abs(plfToNPerM(50) - 729.7)).toBeLessThan(0.05);
    expect(Math.abs(lbfToN(200) - 889.6)).toBeLessThan(0.05);
    expect(Math.abs(inToMm(3.5) - 88.9)).toBeLessThan(1e-12);
    expect(Math.abs(inToMm(9) - 228.6)).toBeLessThan(1e-12);
    expect(Math.abs(psfToKpa(100) - 4.79)).toBeLessThan(0.005); // ASCE 7 Table 4.3-1: 100 psf (4.79 kPa)
  });
});
