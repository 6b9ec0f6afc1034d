// Bounding boxes against boxes worked by hand: a w × h rectangle turned by θ spans
// w·|cos θ| + h·|sin θ| along x and w·|sin θ| + h·|cos θ| along y (its corners, by the rotation
// matrix; common practice).
import { describe, expect, it } from "vitest";
import {
  bounds,
  boundsOfXY,
  boxHeight,
  boxRing,
  boxWidth,
  emptyBox,
  inflate,
  intersection,
  union,
} from "@/lib/geometry/box";
import { rotateRing } from "@/lib/geometry/place";
import type { Pt } from "@/lib/geometry/point";
import { signedArea } from "@/lib/geometry/ring";

describe("bounds", () => {
  it("of points and of Clipper's {x, y} points", () => {
    const pts: Pt[] = [
      [3, -1],
      [-2, 4],
      [0, 0],
      [5, 2],
    ];
    expect(bounds(pts)).toEqual({ minX: -2, minY: -1, maxX: 5, maxY: 4 });
    expect(boundsOfXY(pts.map(([x, y]) => ({ x, y })))).toEqual({ minX: -2, minY: -1, maxX: 5, maxY: 4 });
    expect(boxWidth(bounds(pts))).toBe(7);
    expect(boxHeight(bounds(pts))).toBe(5);
  });

  it("of no points is the empty box, which a union leaves out", () => {
    expect(bounds([])).toEqual(emptyBox());
    const b = { minX: 1, minY: 2, maxX: 3, maxY: 4 };
    expect(union(emptyBox(), b)).toEqual(b);
  });

  it.each([10, 30, 45, 60, 135, 200])(
    "a 40 × 10 rectangle turned %i°: w|cos θ| + h|sin θ| by w|sin θ| + h|cos θ|",
    (deg) => {
      const [w, h] = [40, 10];
      const t = (deg * Math.PI) / 180;
      const b = bounds(
        rotateRing(
          [
            [0, 0],
            [w, 0],
            [w, h],
            [0, h],
          ],
          deg,
        ),
      );
      expect(boxWidth(b)).toBeCloseTo(w * Math.abs(Math.cos(t)) + h * Math.abs(Math.sin(t)), 12);
      expect(boxHeight(b)).toBeCloseTo(w * Math.abs(Math.sin(t)) + h * Math.abs(Math.cos(t)), 12);
    },
  );
});

describe("box operations", () => {
  const a = { minX: 0, minY: 0, maxX: 4, maxY: 3 };
  const b = { minX: 2, minY: -1, maxX: 6, maxY: 2 };

  it("union, intersection and inflate", () => {
    expect(union(a, b)).toEqual({ minX: 0, minY: -1, maxX: 6, maxY: 3 });
    expect(intersection(a, b)).toEqual({ minX: 2, minY: 0, maxX: 4, maxY: 2 });
    expect(boxWidth(intersection(a, { minX: 5, minY: 0, maxX: 6, maxY: 1 }))).toBeLessThan(0); // apart
    expect(inflate(a, 1)).toEqual({ minX: -1, minY: -1, maxX: 5, maxY: 4 });
  });

  it("as a counter-clockwise ring of its area", () => {
    const r = boxRing(a);
    expect(r[0]).toEqual([0, 0]);
    expect(signedArea(r)).toBe(12);
  });
});
