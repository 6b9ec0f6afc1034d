// Rings against outside values: areas worked by hand with the shoelace formula or known by
// decomposition, the regular polygon's area (n/2)·r²·sin(2π/n) (any geometry handbook), the
// 3-4-5 right triangle, and the chord sag r(1 − cos(π/n)) of a circle's polygon.
import { describe, expect, it } from "vitest";
import type { Pt } from "@/lib/geometry/point";
import {
  circleRing,
  cleanRing,
  normaliseRing,
  orient,
  perimeter,
  pointInRing,
  regionArea,
  ringArea,
  signedArea,
} from "@/lib/geometry/ring";

describe("signed area (shoelace formula)", () => {
  it("a clockwise pentagon worked by hand: Σ(xᵢyᵢ₊₁ − xᵢ₊₁yᵢ) = 13 − 92 − 12 + 29 + 2 = −60, area −30", () => {
    const pentagon: Pt[] = [
      [3, 4],
      [5, 11],
      [12, 8],
      [9, 5],
      [5, 6],
    ];
    expect(signedArea(pentagon)).toBe(-30);
    expect(ringArea(pentagon)).toBe(30);
    expect(signedArea(pentagon.slice().reverse())).toBe(30);
  });

  it("an L-shape is the sum of its two rectangles (6 × 2 + 2 × 4 = 20)", () => {
    const L: Pt[] = [
      [0, 0],
      [6, 0],
      [6, 2],
      [2, 2],
      [2, 6],
      [0, 6],
    ];
    expect(signedArea(L)).toBe(20);
  });

  it.each([3, 5, 8, 100])("a regular %i-gon of circumradius 7: (n/2)·r²·sin(2π/n)", (n) => {
    const r = 7;
    const ring: Pt[] = Array.from({ length: n }, (_, i) => [
      r * Math.cos((2 * Math.PI * i) / n),
      r * Math.sin((2 * Math.PI * i) / n),
    ]);
    expect(signedArea(ring)).toBeCloseTo((n / 2) * r * r * Math.sin((2 * Math.PI) / n), 10);
  });

  it("an outline less its holes: a 10 × 10 square with a 2 × 3 hole leaves 94", () => {
    const outer: Pt[] = [
      [0, 0],
      [10, 0],
      [10, 10],
      [0, 10],
    ];
    const hole: Pt[] = [
      [1, 1],
      [1, 4],
      [3, 4],
      [3, 1],
    ];
    expect(regionArea({ outer, holes: [hole] })).toBe(94);
    expect(regionArea({ outer, holes: [] })).toBe(100);
  });
});

describe("orientation and clean-up", () => {
  const cw: Pt[] = [
    [0, 0],
    [0, 1],
    [1, 1],
    [1, 0],
  ];

  it("orient turns a ring the asked way and leaves the input alone", () => {
    expect(signedArea(orient(cw, true))).toBe(1);
    expect(signedArea(orient(cw, false))).toBe(-1);
    expect(cw[1]).toEqual([0, 1]);
  });

  it("normaliseRing drops exactly repeated closing points and makes the ring counter-clockwise", () => {
    const out = normaliseRing([...cw, [0, 0], [0, 0]]);
    expect(out).toHaveLength(4);
    expect(signedArea(out)).toBe(1);
  });

  it("cleanRing drops near-duplicate vertices and the closing point within eps", () => {
    const out = cleanRing(
      [
        [0, 0],
        [1, 0],
        [1 + 1e-6, 0],
        [1, 1],
        [0, 1],
        [1e-7, 0],
      ],
      1e-4,
    );
    expect(out).toEqual([
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 1],
    ]);
  });
});

describe("perimeter, point in ring, circles", () => {
  it("the 3-4-5 right triangle has perimeter 12; open (no closing edge), 4 + 3 = 7", () => {
    const t: Pt[] = [
      [0, 0],
      [4, 0],
      [4, 3],
    ];
    expect(perimeter(t)).toBe(12);
    expect(perimeter(t, false)).toBe(7);
  });

  it("crossing number: inside and outside a concave ring", () => {
    const L: Pt[] = [
      [0, 0],
      [6, 0],
      [6, 2],
      [2, 2],
      [2, 6],
      [0, 6],
    ];
    expect(pointInRing([1, 5], L)).toBe(true);
    expect(pointInRing([5, 1], L)).toBe(true);
    expect(pointInRing([4, 4], L)).toBe(false); // in the notch
    expect(pointInRing([-1, 1], L)).toBe(false);
  });

  it("a circle's polygon keeps every chord within the tolerance: sag r(1 − cos(π/n)) ≤ tol", () => {
    const r = 50;
    const tol = 0.01;
    const ring = circleRing(3, -2, r, tol);
    const n = ring.length;
    expect(r * (1 - Math.cos(Math.PI / n))).toBeLessThanOrEqual(tol);
    for (const [x, y] of ring) expect(Math.hypot(x - 3, y + 2)).toBeCloseTo(r, 12);
    expect(signedArea(ring)).toBeGreaterThan(0);
    // The inscribed polygon's area (n/2)·r²·sin(2π/n) is just under πr².
    expect(signedArea(ring)).toBeCloseTo((n / 2) * r * r * Math.sin((2 * Math.PI) / n), 8);
  });
});
