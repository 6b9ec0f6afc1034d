// The review's plain-word figures, view windows, sign-off reference and money: each figure the
// client reads is the engine's (solved here), and each rule is checked against an outside value.
import { describe, expect, it } from "vitest";
import { formatMoney, toMinor } from "@/lib/money/currency";
import { fitBox, followView, MM_PER_CSS_PX, PAD, scaleRatio, wholeView } from "@/lib/review/mock-up-view";
import { plainFigures } from "@/lib/review/plain-figures";
import { approvalLine, approvalReference, NOT_APPROVED } from "@/lib/review/reference";
import { runScene } from "@/lib/review/run-scene";
import { summarise } from "@/lib/revision-summary";
import { solve, specHash } from "@/lib/track";

const SQUARE = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 },
} as const;

describe("plain figures", () => {
  it("say the engine's figures, and mark a square's grip as needing care", () => {
    const r = solve(SQUARE);
    const f = plainFigures({ mode: r.mode, units: r.units, check: summarise(r).check });
    const grip = f.find((x) => x.key === "grip")!;
    // The friction a regular n-gon needs on its road is tan(π/n): 1 for a square (docs/safety.md §2.1, the friction cone).
    expect(grip.text).toContain(r.check.frictionDemand.max.toFixed(2));
    expect(r.check.frictionDemand.max).toBeCloseTo(1, 2);
    expect(grip.ok).toBe(false);
    expect(grip.text).toMatch(/wood on wood is about 0\.5/);
    const level = f.find((x) => x.key === "level")!;
    expect(level.ok).toBe(r.check.axleDeviation <= 0.01);
    expect(level.text).toContain(`${Math.max(r.check.axleDeviation, 0.001).toFixed(3)} mm`);
    expect(f.find((x) => x.key === "cut-in")!.ok).toBe(r.check.interference.depth === 0);
  });

  it("say how deep a wheel cuts in, where it does", () => {
    // A triangle on its own catenary road cuts in: its corners get "stuck in the ruts" (S. Wagon,
    // Mathematica in Action, 2nd ed., Springer/TELOS 2000).
    const r = solve({
      mode: "track-for-wheel",
      units: "mm",
      wheel: { kind: "polygon", sides: 3, circumradius: 100, cornerRadius: 0 },
    });
    expect(r.check.interference.depth).toBeGreaterThan(0);
    const cut = plainFigures({ mode: r.mode, units: r.units, check: r.check }).find((x) => x.key === "cut-in")!;
    expect(cut.ok).toBe(false);
    expect(cut.text).toContain(`${r.check.interference.depth.toFixed(3)} mm`);
  });

  it("speak of steady turning for a partner pair, and show inches with millimetres", () => {
    const pair = solve({
      mode: "partner-wheel",
      units: "mm",
      wheel: { kind: "ellipse", semiMajor: 120, semiMinor: 80, axle: "focus" },
      lobes: 1,
    });
    expect(plainFigures({ mode: pair.mode, units: "mm", check: pair.check })[0].label).toBe("Steady turning");
    const inch = solve({
      mode: "track-for-wheel",
      units: "in",
      wheel: { kind: "polygon", sides: 6, inradius: 4, cornerRadius: 0 },
    });
    const level = plainFigures({ mode: inch.mode, units: "in", check: inch.check })[0];
    expect(level.text).toMatch(/\d\.\d{4} in \(\d\.\d{3} mm\)/);
  });
});

describe("the view", () => {
  const scene = runScene(solve(SQUARE), { runLength: 6000, endTreatment: "flat" });

  it("keeps the run, the person and room for the labels on screen", () => {
    const { view, px } = wholeView(scene, { width: 1200, maxHeight: 600 });
    const b = scene.bounds;
    expect(view.x).toBeLessThanOrEqual(b.minX - PAD.left * px + 1e-6);
    expect(view.x + view.width).toBeGreaterThanOrEqual(b.maxX + PAD.right * px - 1e-6);
    expect(-view.y).toBeGreaterThanOrEqual(b.maxY);
    expect(view.width / px).toBeCloseTo(1200, 6);
    expect(view.height / px).toBeLessThanOrEqual(600 + 1e-6);
  });

  it("follows the wheel in a window at least 1.8 m wide that stays inside the drawing", () => {
    const whole = wholeView(scene, { width: 390, maxHeight: 500 });
    const near = followView(scene, 3000, { width: 390, maxHeight: 500 });
    expect(near.px).toBeLessThan(whole.px);
    const start = followView(scene, -5000, { width: 390, maxHeight: 500 });
    expect(start.view.x).toBeGreaterThanOrEqual(fitBox(scene.bounds, { width: 390, maxHeight: 500 }).view.x - 1);
  });

  it("states the scale on screen with 96 CSS px to the inch (CSS Values and Units 3 §5.2)", () => {
    expect(MM_PER_CSS_PX).toBeCloseTo(0.264583, 6);
    expect(scaleRatio(10 * MM_PER_CSS_PX)).toBe("1 : 10");
    expect(scaleRatio(40.4 * MM_PER_CSS_PX)).toBe("1 : 40");
    expect(scaleRatio(0)).toBe("");
  });
});

describe("the sign-off reference", () => {
  it("is the spec hash's first 12 hex digits and the UTC date", () => {
    const hash = specHash(SQUARE);
    expect(approvalReference({ specHash: hash, signedAt: "2026-11-20T23:59:59.999Z" })).toBe(
      `${hash.slice(0, 12)}/2026-11-20`,
    );
    const stamp = {
      reference: "0123456789ab/2026-11-20",
      revision: 3,
      typedName: "Ada Penröse",
      organisation: "Northfold Discovery Centre",
      signedAt: "2026-11-20T10:00:00.000Z",
    };
    expect(approvalLine(stamp)).toBe("APPROVED R3 0123456789ab/2026-11-20 by Ada Penröse, Northfold Discovery Centre");
    expect(approvalLine(stamp, { ascii: true })).toBe(
      "APPROVED R3 0123456789ab/2026-11-20 by Ada Penrose, Northfold Discovery Centre",
    );
    expect(approvalLine(null)).toBe(NOT_APPROVED);
    expect(approvalLine(null, { ascii: true })).toMatch(/^[\x20-\x7e]+$/);
  });
});

describe("money", () => {
  it("keeps whole minor units with ISO 4217's exponents (GBP 2, JPY 0)", () => {
    expect(toMinor(1500, "GBP")).toBe(150000);
    expect(toMinor(0.1 + 0.2, "GBP")).toBe(30);
    expect(toMinor(10.505, "GBP")).toBeNull();
    expect(toMinor(2000, "JPY")).toBe(2000);
    expect(toMinor(10.5, "JPY")).toBeNull();
    expect(formatMoney(150000, "GBP")).toBe("£1,500.00");
    expect(formatMoney(2000, "JPY")).toBe("JP¥2,000");
  });
});
