// Kerf offsets (Clipper) against closed forms and a second, independent library (jsts buffer,
// the JTS Topology Suite's offset, and its discrete Hausdorff distance).
import { beforeAll, describe, expect, it } from "vitest";
import { loadClipper, type ClipperLib } from "@/lib/geometry/clipper";
import { ARC_TOLERANCE, kerfParts, kerfRegion } from "@/lib/cut/kerf";
import { circleRing, orient, perimeter, ringArea, signedArea, type Ring } from "@/lib/geometry/ring";
import { buildCutParts } from "@/lib/cut/plan";
import type { Part } from "@/lib/cut/types";
import { DEMO_SETTINGS, SQUARE_SPEC, squareResult } from "./support/fixtures";
import { jBuffer, jDistance, jHausdorff, jPoint, jPolygon, jRing } from "./support/geometry-check";

let lib: ClipperLib;
beforeAll(async () => {
  lib = await loadClipper();
});

const rect: Ring = [
  [0, 0],
  [100, 0],
  [100, 50],
  [0, 50],
];

describe("kerf offsets", () => {
  it("grows a 100 × 50 rectangle by d = 1.5 to A + P·d + πd² = 5457.0686 (docs/fabrication.md §6.1)", () => {
    const t = kerfRegion(lib, { outer: rect, holes: [] }, 3);
    const exact = 5000 + 300 * 1.5 + Math.PI * 1.5 ** 2; // 5457.0686, the closed form for a round-joined offset of a convex ring
    expect(exact).toBeCloseTo(5457.0686, 4);
    // docs/fabrication.md §6.1: |A − A_exact| ≤ P · arcTolerance.
    expect(Math.abs(ringArea(t.outer) - exact)).toBeLessThanOrEqual(perimeter(t.outer) * ARC_TOLERANCE);
    expect(signedArea(t.outer)).toBeGreaterThan(0);
    const j = jBuffer(jPolygon({ outer: rect, holes: [] }), 1.5).getArea();
    expect(Math.abs(ringArea(t.outer) - j)).toBeLessThanOrEqual(perimeter(t.outer) * ARC_TOLERANCE);
    // Every point of the tool path is k/2 from the part's edge.
    expect(jHausdorff(jRing(t.outer), jRing(rect), 0.05)).toBeCloseTo(1.5, 3);
  });

  it("shrinks holes towards their inside by k/2", () => {
    const hole = orient(circleRing(0, 0, 12.5, 0.0005), false);
    const t = kerfRegion(lib, { outer: orient(circleRing(0, 0, 100), true), holes: [hole] }, 6);
    expect(t.holes).toHaveLength(1);
    expect(signedArea(t.holes[0])).toBeLessThan(0);
    for (const [x, y] of t.holes[0]) expect(Math.abs(Math.hypot(x, y) - 9.5)).toBeLessThan(0.002); // 12.5 − 6/2, within the 0.5 µm polygon + 1 µm grid
    expect(ringArea(t.holes[0])).toBeCloseTo(Math.PI * 9.5 ** 2, 1);
    expect(jHausdorff(jRing(t.holes[0]), jRing(hole), 0.05)).toBeCloseTo(3, 2);
  });

  it("offsets the demo's track parts as jsts does, each ring by exactly k/2", async () => {
    const plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS);
    const { paths } = await kerfParts(plan.parts, plan.settings);
    for (const p of plan.parts) {
      const t = paths.get(p.id)!;
      const A = ringArea(p.region.outer);
      const Ak = ringArea(t.outer);
      const P = perimeter(p.region.outer);
      // Outer ring area grows by about perimeter × k/2 (docs/fabrication.md §4.1's sign check).
      expect((Ak - A) / (P * 3)).toBeGreaterThan(0.98);
      expect((Ak - A) / (P * 3)).toBeLessThan(1.02);
      const j = jBuffer(jPolygon({ outer: p.region.outer, holes: [] }), 3);
      expect(Math.abs(Ak - j.getArea())).toBeLessThanOrEqual(perimeter(t.outer) * ARC_TOLERANCE);
      // Every vertex of the tool path lies k/2 from the part's edge (one-sided: at a concave corner
      // the part's own vertex is farther, k/2 ÷ sin of the half angle, from the path).
      const edge = jRing(p.region.outer);
      let lo = Infinity;
      let hi = 0;
      for (const q of t.outer) {
        const d = jDistance(jPoint(q), edge);
        lo = Math.min(lo, d);
        hi = Math.max(hi, d);
      }
      expect(lo).toBeGreaterThan(3 - 0.002); // the 1 µm integer grid, both ways
      expect(hi).toBeLessThan(3 + 0.002);
    }
  });

  it("warns about a hole the cutter cannot enter", async () => {
    const part: Part = {
      id: "X1",
      kind: "wheel",
      name: "test",
      quantity: 1,
      region: { outer: rect, holes: [orient(circleRing(50, 25, 2), false)] },
      drill: [],
      engrave: [],
      grainAlongX: false,
    };
    const { paths, warnings } = await kerfParts([part], {
      machine: { kind: "router", kerf: 6, bed: { length: 2500, width: 1250 }, minInsideRadius: 0 },
    });
    expect(paths.get("X1")!.holes).toHaveLength(0); // a 4 mm hole under a 6 mm cutter
    expect(warnings[0].code).toBe("hole-too-small");
  });
});
