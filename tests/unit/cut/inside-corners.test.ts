// Concave-corner detection, dogbones (docs/fabrication.md §4.2) and the rolling-surface warnings.
import { describe, expect, it } from "vitest";
import type { Pt } from "@/lib/track";
import { concaveCorners, jointNeedsRelief } from "@/lib/cut/inside-corners";
import { addDogbones, reflexVertices } from "@/lib/cut/dogbone";
import { ringArea } from "@/lib/geometry/ring";
import { distToRing } from "@/lib/geometry/segment";
import { buildCutParts } from "@/lib/cut/plan";
import { parseCutSettings } from "@/lib/cut/settings";
import { DEMO_SETTINGS, SQUARE_SPEC, squareResult } from "./support/fixtures";

// An L: 100 × 100 with the top-right 50 × 50 removed; the reflex vertex is (50, 50).
const L: Pt[] = [
  [0, 0],
  [100, 0],
  [100, 50],
  [50, 50],
  [50, 100],
  [0, 100],
];

describe("inside corners", () => {
  it("finds the L's one concave corner and calls it sharp", () => {
    expect(reflexVertices(L)).toEqual([3]);
    const c = concaveCorners(L, { closed: true, material: "left", limit: 3 });
    expect(c).toHaveLength(1);
    expect(c[0].at).toEqual([50, 50]);
    expect(c[0].radius).toBe(0);
  });

  it("measures a rounded concave corner's radius", () => {
    // The L with its inside corner filleted by a quarter circle of radius 2 about (52, 52), 12 chords.
    const rho = 2;
    const arc: Pt[] = [];
    for (let j = 0; j <= 12; j++) {
      const a = -Math.PI / 2 - (j * Math.PI) / 2 / 12; // from (52, 50) round to (50, 52), clockwise about (52, 52)
      arc.push([52 + rho * Math.cos(a), 52 + rho * Math.sin(a)]);
    }
    const ring: Pt[] = [[0, 0], [100, 0], [100, 50], ...arc, [50, 100], [0, 100]];
    const c = concaveCorners(ring, { closed: true, material: "left", limit: 3 });
    expect(c).toHaveLength(1);
    expect(c[0].radius).toBeCloseTo((rho * (12 * Math.sin(Math.PI / 48))) / (Math.PI / 4), 6); // chord length over turn
    expect(Math.abs(c[0].radius - rho) / rho).toBeLessThan(0.002);
    expect(concaveCorners(ring, { closed: true, material: "left", limit: 1.5 })).toHaveLength(0);
  });

  it("a dogbone's circle passes through the corner and removes r²(π/2 − 1)", () => {
    const r = 3;
    const { ring } = addDogbones(L, [3], r, 0.0005);
    // Circle-segment area: the circle bites two 90° segments, r²/2(π/2 − 1) each, into the material.
    const removed = ringArea(L) - ringArea(ring);
    expect(removed).toBeCloseTo(r * r * (Math.PI / 2 - 1), 2);
    expect(distToRing([50, 50], ring)).toBeLessThan(0.0005 + 1e-9); // the corner lies on the arc (to its chord tolerance)
    // The centre sits r from the corner along the open side's bisector (45° here): (50 + r/√2, 50 + r/√2).
    const C: Pt = [50 + r / Math.SQRT2, 50 + r / Math.SQRT2];
    const arc = ring.filter((p) => !L.some((q) => q[0] === p[0] && q[1] === p[1]));
    for (const p of arc) expect(Math.hypot(p[0] - C[0], p[1] - C[1])).toBeCloseTo(r, 9);
  });

  it("warns about the demo's troughs with the radius the 6 mm cutter leaves, and relieves nothing there", () => {
    const plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS);
    const w = plan.warnings.find((x) => x.code === "inside-corner")!;
    const P = 2 * 200 * Math.asinh(1); // Hall & Wagon 1992
    expect(w.at).toHaveLength(17);
    w.at!.forEach((x, k) => expect(x).toBeCloseTo(plan.run!.eachEnd + (k + 0.5) * P, 9)); // the cusps, half way between crests
    expect(w.message).toMatch(/6 mm cutter leaves a 3 mm radius/);
    expect(w.message).toMatch(/round the wheel's corners/i);
  });

  it("a laser leaves half its kerf and needs no relief in the joints", () => {
    const laser = { ...DEMO_SETTINGS, machine: { kind: "laser", kerf: 0.2 }, joint: { clearance: 0.2 } } as const;
    const s = parseCutSettings(laser);
    expect(jointNeedsRelief(s)).toBe(false);
    expect(jointNeedsRelief(parseCutSettings(DEMO_SETTINGS))).toBe(true);
    const plan = buildCutParts(SQUARE_SPEC, squareResult(), laser);
    expect(plan.warnings.find((x) => x.code === "inside-corner")!.message).toMatch(/0\.1 mm radius/);
    const router = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS);
    // Same joints, no dogbone arcs: the laser's first segment has fewer vertices by the arcs' samples.
    expect(plan.parts[0].region.outer.length).toBeLessThan(router.parts[0].region.outer.length);
    expect(reflexVertices(plan.parts[0].region.outer).length).toBeGreaterThanOrEqual(4);
  });
});
