// The contact's combined radius along the roll (check.contactRadius), the radius Hertz contact is
// worked at, against closed forms: each body's own radius of curvature at the contact from the
// standard curvature formulas, combined as 1/(1/R₁ + 1/R₂) (K. L. Johnson, "Contact Mechanics", 1985, §4.2).
import { describe, expect, it } from "vitest";
import { solve } from "@/lib/track";

const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe("tightest combined radius of the contact", () => {
  it("a circle of radius R on its flat road: R everywhere (flat road, 1/R₂ = 0)", () => {
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "circle", radius: 50 } });
    expect(rel(r.check.contactRadius.min, 50)).toBeLessThan(1e-9);
  });

  it.each([0.3, 0.5, 0.8])("an ellipse about a focus, e = %f, on its road: a(1 − e), at the crest (x = 0)", (e) => {
    // Ellipse vertex radius b²/a and road crest radius b²/(a e) (Hall & Wagon 1992; docs/math.md §3.1), both
    // convex towards each other: 1/(a/b² + a e/b²) = b²/(a(1 + e)) = a(1 − e).
    const a = 100;
    const b = a * Math.sqrt(1 - e * e);
    const r = solve({
      mode: "track-for-wheel",
      wheel: { kind: "ellipse", semiMajor: a, semiMinor: b, axle: "focus" },
      tolerance: 1e-3,
    });
    expect(rel(r.check.contactRadius.min, a * (1 - e))).toBeLessThan(1e-7);
    const at = r.check.contactRadius.at;
    expect(Math.min(Math.abs(at), Math.abs(at - r.period!))).toBeLessThan(1e-3 * r.period!);
  });

  it("a square: 0 at its corner, which meets the road's cusp at x = P/2 (Hall & Wagon 1992)", () => {
    const r = solve({ mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, inradius: 100 } });
    expect(r.check.contactRadius.min).toBe(0);
    expect(Math.abs(Math.abs(r.check.contactRadius.at) - r.period! / 2)).toBeLessThan(1e-9 * r.period!);
  });

  it.each([1, 2, 3])(
    "the wheel for y = A sin(2πx/P), k = %i: h − A, on the crest (the crest is flat-topped with radius P²/(4π²A))",
    (k) => {
      // At the crest y′ = 0; the road's radius P²/(4π²A) and the wheel's there combine to h − A by the
      // rolling identity κ_w − κ_road = 1/r (docs/math.md §1.7), with h = √((kP/2π)² + A²) (integral tables).
      const A = 10;
      const P = 100;
      const r = solve({ mode: "wheel-for-track", track: { kind: "sine", amplitude: A, period: P }, periodsPerTurn: k });
      const h = Math.sqrt(((k * P) / (2 * Math.PI)) ** 2 + A * A);
      expect(rel(r.check.contactRadius.min, h - A)).toBeLessThan(1e-7);
      expect(Math.abs(r.check.contactRadius.at - P / 4)).toBeLessThan(1e-3 * P);
    },
  );

  it("two equal ellipses about their foci (lobes 1, centre distance 2a): b²/(2a), the vertices meeting", () => {
    // Both bodies show a vertex of radius b²/a at the contact when the near and far vertices meet.
    const a = 1;
    const e = 0.5;
    const b = a * Math.sqrt(1 - e * e);
    const r = solve({
      mode: "partner-wheel",
      wheel: { kind: "ellipse", semiMajor: a, semiMinor: b, axle: "focus" },
      lobes: 1,
      tolerance: 1e-4,
    });
    expect(rel(r.check.contactRadius.min, (b * b) / (2 * a))).toBeLessThan(1e-7);
  });
});
