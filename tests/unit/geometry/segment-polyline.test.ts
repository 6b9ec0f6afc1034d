// Distances to segments and readings of a polyline, against values worked by hand (the clamped
// projection onto a segment; linear interpolation between vertices).
import { describe, expect, it } from "vitest";
import type { Pt } from "@/lib/geometry/point";
import { distance } from "@/lib/geometry/point";
import { sliceByX, yAt } from "@/lib/geometry/polyline";
import { distToRing, distToSegment } from "@/lib/geometry/segment";

describe("distances", () => {
  it("between points: the 3-4-5 triangle", () => {
    expect(distance([1, 1], [4, 5])).toBe(5);
  });

  it("to a segment: perpendicular inside, to the nearer end outside, to the point when degenerate", () => {
    expect(distToSegment([0, 2], [-1, 0], [1, 0])).toBe(2);
    expect(distToSegment([4, 4], [-1, 0], [1, 0])).toBe(5);
    expect(distToSegment([3, 4], [0, 0], [0, 0])).toBe(5);
  });

  it("to a ring's edges, closed or open", () => {
    const square: Pt[] = [
      [0, 0],
      [4, 0],
      [4, 4],
      [0, 4],
    ];
    expect(distToRing([1, 2], square)).toBe(1);
    // Open, the closing edge from (0, 4) back to (0, 0) is not there.
    expect(distToRing([1, 2], square, false)).toBe(2);
  });
});

describe("a left-to-right polyline", () => {
  const poly: Pt[] = [
    [0, 0],
    [10, 5],
    [20, 5],
    [30, -5],
  ];

  it("y at x by linear interpolation, held flat past the ends", () => {
    expect(yAt(poly, 5)).toBe(2.5);
    expect(yAt(poly, 15)).toBe(5);
    expect(yAt(poly, 25)).toBe(0);
    expect(yAt(poly, -3)).toBe(0);
    expect(yAt(poly, 40)).toBe(-5);
  });

  it("the stretch between two x, with exact end points", () => {
    expect(sliceByX(poly, 5, 25)).toEqual([
      [5, 2.5],
      [10, 5],
      [20, 5],
      [25, 0],
    ]);
  });
});
