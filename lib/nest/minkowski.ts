// Minkowski sum of two simple polygons, and the no-fit polygon built from it (Bennell & Oliveira 2008,
// "The geometry of nesting problems: a tutorial", EJOR 184:397–415, §4: the NFP of B orbiting A is
// A ⊕ (−B), with B's reference point at its origin).
//
// The sum distributes over union, so with A and B cut into convex pieces (convex-parts.ts) it is the
// union of the pieces' pairwise sums, each found in linear time by merging edges (Bennell & Oliveira
// 2008, §4.2, the decomposition approach). Clipper's own MinkowskiSum forms a quadrilateral for
// every pair of edges and unions them all (docs/fabrication.md §6.3); its cost grew faster than the
// product of the vertex counts on long notched parts such as track segments (over a second for two
// outlines of 130 vertices), where a handful of convex pieces each keep it to milliseconds.
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clipper } from "@/lib/geometry/clipper";
import { convexParts, convexSum } from "./convex-parts";
import { shiftPath } from "./paths";

/** Convex pieces of each path, computed once per path object. */
const piecesOf = new WeakMap<clipper.ReadonlyPath, clipper.IntPoint[][]>();
function pieces(path: clipper.ReadonlyPath): clipper.IntPoint[][] {
  let p = piecesOf.get(path);
  if (!p) {
    p = convexParts(path);
    piecesOf.set(path, p);
  }
  return p;
}

/** The convex pieces of −B (each piece reflected: a half turn keeps it counter-clockwise), once per path. */
const reflectedOf = new WeakMap<clipper.ReadonlyPath, clipper.IntPoint[][]>();
function reflectedPieces(path: clipper.ReadonlyPath): clipper.IntPoint[][] {
  let p = reflectedOf.get(path);
  if (!p) {
    p = pieces(path).map(reflect);
    reflectedOf.set(path, p);
  }
  return p;
}

/** A ⊕ P as outer rings (counter-clockwise) and holes (clockwise). Both inputs counter-clockwise. */
export function minkowskiSum(lib: ClipperLib, a: clipper.ReadonlyPath, p: clipper.ReadonlyPath): clipper.Paths {
  return sumOfPieces(lib, pieces(a), pieces(p));
}

function sumOfPieces(lib: ClipperLib, as: clipper.IntPoint[][], ps: clipper.IntPoint[][]): clipper.Paths {
  const sums: clipper.Path[] = [];
  for (const pa of as) for (const pp of ps) sums.push(convexSum(pa, pp));
  return lib.clipToPaths({
    clipType: clipper.ClipType.Union,
    subjectInputs: [{ data: sums, closed: true }],
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
    clipInputs: [{ data: shiftPath(moving, dx, dy) }],
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
  const sum = sumOfPieces(lib, pieces(fixed), reflectedPieces(orbiting));
  if (sum.length <= 1) return sum;
  const tolerance = 1e-6 * Math.min(Math.abs(lib.area(fixed)), Math.abs(lib.area(orbiting)));
  return sum.filter(
    (path) => lib.area(path) > 0 || path.every((q) => overlapArea(lib, fixed, orbiting, q.x, q.y) <= tolerance),
  );
}
