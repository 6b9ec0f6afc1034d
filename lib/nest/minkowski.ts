// Minkowski sum of two simple polygons with Clipper, and the no-fit polygon built from it
// (Bennell & Oliveira 2008, "The geometry of nesting problems: a tutorial", EJOR 184:397–415, §4:
// the NFP of B orbiting A is A ⊕ (−B), with B's reference point at its origin).
//
// Clipper's MinkowskiSum(pattern, path, closed) returns only the region swept while the pattern's
// boundary moves along the path's boundary (docs/fabrication.md §6.3): for two squares an annulus. Every point
// of A ⊕ P is either on that swept region, or in A + p (P's boundary wholly inside A), or in a + P
// (A wholly inside P), for any fixed p ∈ P and a ∈ A; so the full sum is the union of the three.
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper } from "@/lib/geometry/clipper";

const shift = (path: clipper.ReadonlyPath, dx: number, dy: number): clipper.Path =>
  path.map((p) => ({ x: p.x + dx, y: p.y + dy }));

/** A ⊕ P as outer rings (counter-clockwise) and holes (clockwise). Both inputs counter-clockwise. */
export function minkowskiSum(lib: ClipperLib, a: clipper.ReadonlyPath, p: clipper.ReadonlyPath): clipper.Paths {
  const swept = lib.minkowskiSumPath(p, a, true);
  return lib.clipToPaths({
    clipType: clipper.ClipType.Union,
    subjectInputs: [
      { data: swept, closed: true },
      { data: shift(a, p[0].x, p[0].y), closed: true },
      { data: shift(p, a[0].x, a[0].y), closed: true },
    ],
    subjectFillType: clipper.PolyFillType.NonZero,
  });
}

/** −B: B reflected through its reference point (a half turn, so still counter-clockwise). */
export function reflect(b: clipper.ReadonlyPath): clipper.Path {
  return b.map((q) => ({ x: -q.x, y: -q.y }));
}

/** Area of `fixed` ∩ (`moving` translated by (dx, dy)). */
function overlapArea(
  lib: ClipperLib,
  fixed: clipper.ReadonlyPath,
  moving: clipper.ReadonlyPath,
  dx: number,
  dy: number,
): number {
  const out = lib.clipToPaths({
    clipType: clipper.ClipType.Intersection,
    subjectInputs: [{ data: fixed, closed: true }],
    clipInputs: [{ data: shift(moving, dx, dy) }],
    subjectFillType: clipper.PolyFillType.NonZero,
  });
  return out.reduce((s, p) => s + Math.abs(lib.area(p)), 0);
}

/**
 * No-fit polygon of `orbiting` around `fixed`, both in their own frames: the orbiting shape's
 * reference point placed strictly inside it overlaps `fixed` (placed at the origin), on its
 * boundary touches, outside is clear.
 *
 * A hole of the sum is a pocket where the orbiting shape fits inside the fixed one, or a sliver
 * left by rounding where it does not. Each hole is tried at its vertices; a hole where the shapes
 * overlap there is a sliver and is filled.
 */
export function noFitPolygon(
  lib: ClipperLib,
  fixed: clipper.ReadonlyPath,
  orbiting: clipper.ReadonlyPath,
): clipper.Paths {
  const sum = minkowskiSum(lib, fixed, reflect(orbiting));
  if (sum.length <= 1) return sum;
  const tolerance = 1e-6 * Math.min(Math.abs(lib.area(fixed)), Math.abs(lib.area(orbiting)));
  return sum.filter(
    (path) => lib.area(path) > 0 || path.every((q) => overlapArea(lib, fixed, orbiting, q.x, q.y) <= tolerance),
  );
}
