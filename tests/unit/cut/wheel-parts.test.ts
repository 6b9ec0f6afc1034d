// Wheel parts against the engine's outlines and closed forms; lightening holes against an
// independent distance computation (jsts DistanceOp).
import { describe, expect, it } from "vitest";
import { solve } from "@/lib/track";
import { buildCutParts } from "@/lib/cut/plan";
import { parseCutSettings } from "@/lib/cut/settings";
import { buildWheelParts } from "@/lib/cut/wheel-parts";
import { ringArea, signedArea } from "@/lib/geometry/ring";
import { CutError } from "@/lib/cut/errors";
import { DEMO_SETTINGS, font, SQUARE_SPEC, squareResult } from "./support/fixtures";
import { jDistance, jPoint, jPolygon, jRing } from "./support/geometry-check";

describe("wheel parts", () => {
  it("the square wheel's outline is the engine's, with a round bore", () => {
    const r = squareResult();
    const plan = buildCutParts(SQUARE_SPEC, r, DEMO_SETTINGS, { font: font() });
    const w = plan.parts.find((p) => p.id === "W1")!;
    expect(w.kind).toBe("wheel");
    expect(w.quantity).toBe(2); // wheelCount default
    const engine = r.wheel.points.slice(0, -1); // closed polyline, first point repeated
    expect(w.region.outer).toHaveLength(engine.length);
    for (const p of engine) expect(w.region.outer.some((q) => Math.hypot(q[0] - p[0], q[1] - p[1]) < 1e-12)).toBe(true);
    expect(signedArea(w.region.outer)).toBeGreaterThan(0);
    expect(ringArea(w.region.outer)).toBeCloseTo(400 * 400, 6); // a 400 mm square
    const bore = w.region.holes[0];
    expect(signedArea(bore)).toBeLessThan(0);
    // Inscribed polygon of a 12.5 mm circle with chords within 0.005 mm: area within 2/3·s·2πR of πR².
    expect(Math.PI * 12.5 ** 2 - ringArea(bore)).toBeGreaterThan(0);
    expect(Math.PI * 12.5 ** 2 - ringArea(bore)).toBeLessThan((2 / 3) * 0.005 * 2 * Math.PI * 12.5);
    expect(w.engrave.length).toBeGreaterThan(0);
  });

  it("lightening holes keep the rim to the outline, the bore and each other", () => {
    const r = squareResult();
    const rim = 25;
    const s = parseCutSettings({ ...DEMO_SETTINGS, lightening: { count: 4, rim } });
    const { parts } = buildWheelParts(r, s, 1, font());
    const w = parts[0];
    const holes = w.region.holes.slice(1);
    expect(holes).toHaveLength(4);
    const outline = jRing(w.region.outer);
    const bore = jRing(w.region.holes[0]);
    for (const [i, h] of holes.entries()) {
      const g = jPolygon({ outer: h, holes: [] });
      expect(jDistance(g, outline)).toBeGreaterThanOrEqual(rim - 0.01);
      expect(jDistance(g, bore)).toBeGreaterThanOrEqual(rim - 0.01);
      const next = jPolygon({ outer: holes[(i + 1) % holes.length], holes: [] });
      expect(jDistance(g, next)).toBeGreaterThanOrEqual(rim - 0.01);
    }
    // As large as the rims allow: the binding rim is met within the polygon's chord tolerance.
    const gaps = holes.flatMap((h, i) => {
      const g = jPolygon({ outer: h, holes: [] });
      return [
        jDistance(g, outline),
        jDistance(g, bore),
        jDistance(g, jPolygon({ outer: holes[(i + 1) % holes.length], holes: [] })),
      ];
    });
    expect(Math.min(...gaps)).toBeLessThan(rim + 0.02);
    // The label stays clear of every hole.
    for (const s2 of w.engrave)
      for (const p of s2) for (const h of w.region.holes) expect(jDistance(jPoint(p), jRing(h))).toBeGreaterThan(1);
  });

  it("partner and twin modes: two wheel parts and no track", () => {
    const spec = {
      mode: "partner-wheel",
      wheel: { kind: "ellipse", semiMajor: 100, semiMinor: 60, axle: "focus" },
      lobes: 1,
    } as const;
    const r = solve(spec);
    const plan = buildCutParts(spec, r, { wheelCount: 1, boreDiameter: 10 });
    expect(plan.run).toBeNull();
    expect(plan.parts.map((p) => [p.id, p.kind])).toEqual([
      ["W1", "wheel"],
      ["P1", "partner"],
    ]);
    // Both outlines about their own axle: the partner's radii lie in [a − rMax, a − rMin] (Litvin et al. 2009: r₂ = a − r₁).
    const p1 = plan.parts[1].region.outer.map(([x, y]) => Math.hypot(x, y));
    expect(Math.min(...p1)).toBeCloseTo(r.centreDistance! - r.wheel.rMax, 6);
    expect(Math.max(...p1)).toBeCloseTo(r.centreDistance! - r.wheel.rMin, 6);
    const tw = { mode: "twin-wheels", track: { kind: "sine", amplitude: 20, period: 200 }, periodsPerTurn: 4 } as const;
    const t = buildCutParts(tw, solve(tw), {});
    expect(t.run).toBeNull();
    expect(t.parts.map((p) => p.kind)).toEqual(["wheel", "partner"]);
  });

  it("a scaled run scales the wheel too", () => {
    const r = squareResult();
    const plan = buildCutParts(SQUARE_SPEC, r, { ...DEMO_SETTINGS, runLength: 2000, endTreatment: "scale" });
    const k = plan.run!.scale;
    const w = plan.parts.find((p) => p.id === "W1")!;
    expect(ringArea(w.region.outer)).toBeCloseTo(400 * 400 * k * k, 6);
  });

  it("refuses a bore that does not fit the wheel", () => {
    const r = squareResult();
    let err: unknown;
    try {
      buildCutParts(SQUARE_SPEC, r, { ...DEMO_SETTINGS, boreDiameter: 500 });
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(CutError);
    expect((err as CutError).field).toBe("boreDiameter");
    expect((err as CutError).message).toMatch(/500 mm axle bore does not fit/);
  });
});
