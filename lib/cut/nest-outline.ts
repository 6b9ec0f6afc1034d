// The outline the nester packs: the tool path's outer ring, coarsened so that no-fit polygons stay
// cheap (Minkowski sums cost the product of the two vertex counts, and a track segment drawn to
// 0.01 mm has over a thousand). Douglas–Peucker simplification (D. H. Douglas & T. K. Peucker,
// "Algorithms for the reduction of the number of points required to represent a digitized line or
// its caricature", The Canadian Cartographer 10(2):112–122, 1973) keeps every original vertex within
// ε of the simplified ring; growing that ring by ε (Clipper, mitred) then contains the whole
// original, since each original edge lies within ε of one simplified edge. So a nest of these
// outlines is a valid nest of the parts, at the cost of at most 2ε extra spacing.
import { clipper, fromPath, loadClipper, toPath, SCALE_PER_MM } from "@/lib/geometry/clipper";
import type { Pt } from "@/lib/geometry/point";
import { ringArea, type Ring } from "@/lib/geometry/ring";
import { distToSegment } from "@/lib/geometry/segment";

/** Simplification tolerance, mm: far below any part spacing a shop uses. */
export const NEST_OUTLINE_TOLERANCE = 1.5;

/** Douglas–Peucker on an open polyline, iteratively (no recursion depth limit). */
export function simplifyPolyline(points: Pt[], epsilon: number): Pt[] {
  if (points.length < 3) return points.slice();
  const keep = new Uint8Array(points.length);
  keep[0] = keep[points.length - 1] = 1;
  const stack: [number, number][] = [[0, points.length - 1]];
  while (stack.length) {
    const [i, j] = stack.pop()!;
    let worst = -1;
    let at = -1;
    for (let k = i + 1; k < j; k++) {
      const d = distToSegment(points[k], points[i], points[j]);
      if (d > worst) {
        worst = d;
        at = k;
      }
    }
    if (at >= 0 && worst > epsilon) {
      keep[at] = 1;
      stack.push([i, at], [at, j]);
    }
  }
  return points.filter((_, k) => keep[k]);
}

/** A closed ring simplified to ε: split at its two farthest-apart-ish vertices so both halves are open polylines. */
export function simplifyRing(ring: Ring, epsilon: number): Ring {
  if (ring.length <= 8) return ring.slice();
  let far = 0;
  let best = -1;
  for (let k = 1; k < ring.length; k++) {
    const d = Math.hypot(ring[k][0] - ring[0][0], ring[k][1] - ring[0][1]);
    if (d > best) {
      best = d;
      far = k;
    }
  }
  const first = simplifyPolyline(ring.slice(0, far + 1), epsilon);
  const second = simplifyPolyline([...ring.slice(far), ring[0]], epsilon);
  return [...first, ...second.slice(1, -1)];
}

/** The coarse outline that contains `ring` (see above). */
export async function nestOutline(ring: Ring, epsilon = NEST_OUTLINE_TOLERANCE): Promise<Ring> {
  const simple = simplifyRing(ring, epsilon);
  if (simple.length === ring.length) return ring.slice();
  const lib = await loadClipper();
  const grown = lib.offsetToPaths({
    delta: epsilon * SCALE_PER_MM,
    miterLimit: 2,
    arcTolerance: 0.25 * SCALE_PER_MM,
    offsetInputs: [
      { data: toPath(simple, SCALE_PER_MM), joinType: clipper.JoinType.Miter, endType: clipper.EndType.ClosedPolygon },
    ],
  });
  const rings = (grown ?? []).map((p) => fromPath(p, SCALE_PER_MM));
  return rings.sort((a, b) => ringArea(b) - ringArea(a))[0] ?? ring.slice();
}
