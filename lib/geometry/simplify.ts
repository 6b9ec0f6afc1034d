// Douglas–Peucker simplification (D. H. Douglas & T. K. Peucker, "Algorithms for the reduction of the
// number of points required to represent a digitized line or its caricature", The Canadian
// Cartographer 10(2):112–122, 1973): the kept points are a subset of the original, and every dropped
// point lies within ε of the chord that replaced it. Iterative, so a long outline cannot overflow the
// call stack.
import type { Pt } from "./point";
import type { Ring } from "./ring";
import { distToSegment } from "./segment";

/** The indices Douglas–Peucker keeps on an open polyline, first and last included. */
function keptIndices(points: readonly Pt[], epsilon: number): Uint8Array {
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
  return keep;
}

export function simplifyPolyline(points: readonly Pt[], epsilon: number): Pt[] {
  if (points.length < 3) return points.slice();
  const keep = keptIndices(points, epsilon);
  return points.filter((_, k) => keep[k]);
}

/**
 * A closed ring simplified to ε: split at the vertex farthest from the first, so both halves are
 * open polylines whose ends are kept.
 */
export function simplifyRing(ring: readonly Pt[], epsilon: number): Ring {
  if (ring.length <= 4) return ring.slice();
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
