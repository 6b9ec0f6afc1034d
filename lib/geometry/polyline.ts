// Polylines that run left to right (x never decreasing), as the engine samples a track's profile:
// y at any x by linear interpolation between the vertices (within the engine's chord tolerance of
// the exact curve), and the stretch between two x with exact end points.
import type { Pt } from "./point";

/** y of a left-to-right polyline at x, found by bisection; held flat past either end. */
export function yAt(poly: readonly Pt[], x: number): number {
  let lo = 0;
  let hi = poly.length - 1;
  if (x <= poly[0][0]) return poly[0][1];
  if (x >= poly[hi][0]) return poly[hi][1];
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (poly[mid][0] <= x) lo = mid;
    else hi = mid;
  }
  const [x0, y0] = poly[lo];
  const [x1, y1] = poly[hi];
  return x1 === x0 ? Math.max(y0, y1) : y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

/** The part of a left-to-right polyline with a ≤ x ≤ b, with exact end points at a and b. */
export function sliceByX(poly: readonly Pt[], a: number, b: number, eps = 1e-9): Pt[] {
  const out: Pt[] = [[a, yAt(poly, a)]];
  for (const p of poly) if (p[0] > a + eps && p[0] < b - eps) out.push([p[0], p[1]]);
  out.push([b, yAt(poly, b)]);
  return out;
}
