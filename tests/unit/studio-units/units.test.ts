// Units switching keeps the design: solving before and after gives the same geometry, scaled by
// exactly 25.4 (the international inch, 1959 yard and pound agreement).
import { describe, expect, it } from "vitest";
import { convertSpec, MM_PER_INCH } from "@/lib/studio/units";
import { solve } from "@/lib/track";

describe("convertSpec", () => {
  it("scales every length of a polygon wheel", () => {
    const spec = convertSpec(
      { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 254, cornerRadius: 12.7 } },
      "in",
    );
    expect(spec.units).toBe("in");
    expect(spec.wheel).toEqual({ kind: "polygon", sides: 4, side: 10, cornerRadius: 0.5 });
  });

  it("goes there and back without drift", () => {
    const original = {
      mode: "wheel-for-track" as const,
      units: "mm" as const,
      track: { kind: "sine" as const, amplitude: 10, period: 100 },
      periodsPerTurn: 4,
      tolerance: 0.01,
    };
    expect(convertSpec(convertSpec(original, "in"), "mm")).toEqual(original);
  });

  it("rewrites a track formula so the solved track is the same curve in inches", () => {
    const mm = {
      mode: "wheel-for-track" as const,
      units: "mm" as const,
      track: { kind: "function" as const, y: "10*sin(2*pi*x/100)", period: 100 },
      periodsPerTurn: 4,
    };
    const a = solve(mm);
    const b = solve(convertSpec(mm, "in"));
    // Sine track closed form (standard integral tables): ∫₀ᴾ dx/(h − A sin(2πx/P)) = P/√(h² − A²),
    // so h = √((kP/2π)² + A²) for k periods per turn.
    const h = Math.sqrt(((4 * 100) / (2 * Math.PI)) ** 2 + 10 ** 2);
    expect(a.axleHeight).toBeCloseTo(h, 6);
    expect(b.axleHeight! * MM_PER_INCH).toBeCloseTo(h, 6);
    expect(b.period! * MM_PER_INCH).toBeCloseTo(100, 9);
  });

  it("rewrites a polar formula so the wheel keeps its size", () => {
    const mm = {
      mode: "track-for-wheel" as const,
      units: "mm" as const,
      wheel: { kind: "polar" as const, r: "100 + 20*cos(3*theta)" },
    };
    const a = solve(mm);
    const b = solve(convertSpec(mm, "in"));
    // r = 100 + 20 cos 3θ has rMax = 120 and rMin = 80 (read off the formula).
    expect(a.wheel.rMax).toBeCloseTo(120, 6);
    expect(b.wheel.rMax * MM_PER_INCH).toBeCloseTo(120, 6);
    expect(b.wheel.rMin * MM_PER_INCH).toBeCloseTo(80, 6);
  });
});
