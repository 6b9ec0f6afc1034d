// Distances to line segments: from a point to a segment by its projection onto the segment's line,
// clamped to the segment's ends, and to a ring's edges (common practice; the vector projection of
// any linear-algebra text).
import type { Pt } from "./point";

export function distToSegment(p: readonly [number, number], a: Pt, b: Pt): number {
  const ex = b[0] - a[0];
  const ey = b[1] - a[1];
  const L2 = ex * ex + ey * ey;
  const t = L2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * ex + (p[1] - a[1]) * ey) / L2));
  return Math.hypot(p[0] - a[0] - t * ex, p[1] - a[1] - t * ey);
}

/** Smallest distance from p to the ring's edges (to the polyline's, when not closed). */
export function distToRing(p: readonly [number, number], ring: readonly Pt[], closed = true): number {
  let d = Infinity;
  const n = ring.length;
  for (let i = closed ? 0 : 1; i < n; i++) d = Math.min(d, distToSegment(p, ring[(i + n - 1) % n], ring[i]));
  return d;
}
