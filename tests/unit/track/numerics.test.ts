// Quadrature, Brent and the cumulative tables against outside values.
import { describe, expect, it } from "vitest";
import { brent } from "@/lib/track/brent";
import { Cumulative } from "@/lib/track/cumulative";
import { integrate } from "@/lib/track/quadrature";
import { pythonReference } from "./python-reference";

describe("numerics", () => {
  const ref = pythonReference([{ kind: "quad" }, { kind: "brent" }]);

  it("G7/K15 adaptive quadrature matches mpmath and QUADPACK", () => {
    // ∫₀¹ e^{−x²} dx = (√π/2) erf(1), mpmath 1.2 via tests/reference.
    const g = integrate((x) => Math.exp(-x * x), 0, 1);
    expect(Math.abs(g.value - ref[0].gauss)).toBeLessThan(1e-15);
    expect(g.error).toBeLessThan(1e-13);
    // ∫₀^{π/4} sec t dt = ln(1 + √2) (the square's half period, HW92; SciPy quad recomputes it).
    const s = integrate((t) => 1 / Math.cos(t), 0, Math.PI / 4);
    expect(Math.abs(s.value - ref[0].sec)).toBeLessThan(1e-15);
    expect(Math.abs(s.value - Math.log(1 + Math.SQRT2))).toBeLessThan(1e-15);
  });

  it("splits at breaks: |x − 1/3| on [0, 1] integrates exactly", () => {
    // Elementary: ∫₀¹ |x − 1/3| dx = 1/18 + 2/9 = 5/18.
    const r = integrate((x) => Math.abs(x - 1 / 3), 0, 1, [1 / 3]);
    expect(Math.abs(r.value - 5 / 18)).toBeLessThan(1e-16);
    expect(r.evals).toBe(30);
  });

  it("Brent finds the root of cos x = x as SciPy brentq does", () => {
    const r = brent((x) => Math.cos(x) - x, 0, 1);
    expect(Math.abs(r.root - ref[1].root)).toBeLessThan(2e-16);
  });

  it("refuses an unbracketed root with a typed error", () => {
    expect(() => brent((x) => x * x + 1, -1, 1)).toThrow(/not bracketed/);
  });

  it("cumulative table and its inverse agree to rounding", () => {
    const f = (x: number) => 1 / (64 - 10 * Math.sin((2 * Math.PI * x) / 100));
    const c = new Cumulative([{ a: 0, b: 100, f }]);
    // Standard integral tables: ∫₀ᴾ dx/(h − A sin(2πx/P)) = P/√(h² − A²).
    expect(Math.abs(c.total - 100 / Math.sqrt(64 * 64 - 100))).toBeLessThan(1e-15);
    let worst = 0;
    for (let i = 1; i < 200; i++) {
      const v = (c.total * i) / 200 + 1e-7 * Math.sin(i);
      worst = Math.max(worst, Math.abs(c.value(c.inverse(v)) - v));
    }
    expect(worst).toBeLessThan(1e-15);
  });
});
