// Plane geometry on rings and polylines, in plain floating point: the shoelace area, orientation,
// bounds, rigid motions, point-in-ring by crossing number, segment distances and intersections
// (J. O'Rourke, "Computational Geometry in C", 2nd ed., Cambridge UP 1998, ch. 1 and 7).
// Offsets and booleans are not done here: they go through Clipper (lib/cut/kerf.ts).
import type { Pt } from "@/lib/track";
import type { Ring } from "./types";

export { ringArea, signedArea, type Box } from "@/lib/geometry/ring";
import { signedArea, type Box } from "@/lib/geometry/ring";

export function perimeter(ring: readonly Pt[], closed = true): number {
  let s = 0;
  for (let i = 1; i < ring.length; i++) s += Math.hypot(ring[i][0] - ring[i - 1][0], ring[i][1] - ring[i - 1][1]);
  if (closed && ring.length > 1) s += Math.hypot(ring[0][0] - ring[ring.length - 1][0], ring[0][1] - ring[ring.length - 1][1]);
  return s;
}

export function orient(ring: readonly Pt[], ccw: boolean): Ring {
  const a = signedArea(ring);
  return (a > 0) === ccw ? ring.slice() : ring.slice().reverse();
}

/**
 * Drops the repeated closing point and any vertex closer than `eps` to the one before, so no
 * zero-length edge reaches a cut file.
 */
export function cleanRing(ring: readonly Pt[], eps = 1e-4): Ring {
  const out: Ring = [];
  for (const p of ring) {
    const q = out[out.length - 1];
    if (!q || Math.hypot(p[0] - q[0], p[1] - q[1]) > eps) out.push([p[0], p[1]]);
  }
  while (out.length > 1 && Math.hypot(out[0][0] - out[out.length - 1][0], out[0][1] - out[out.length - 1][1]) <= eps) out.pop();
  return out;
}

export function bounds(points: Iterable<readonly [number, number]>): Box {
  let minX = Infinity, minY = Infinity, maxX = -Infinity, maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (y < minY) minY = y;
    if (x > maxX) maxX = x;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY };
}

export const translate = (ring: readonly Pt[], dx: number, dy: number): Ring => ring.map(([x, y]) => [x + dx, y + dy]);
export const scaleRing = (ring: readonly Pt[], k: number): Ring => ring.map(([x, y]) => [x * k, y * k]);

/** Rotation by `deg` degrees counter-clockwise about the origin, then translation: the nester's placement. */
export function placer(deg: number, dx: number, dy: number): (p: readonly [number, number]) => Pt {
  const a = (deg * Math.PI) / 180;
  // Exact quarter turns, so a 90° placement does not leave 1e-17 noise on straight edges.
  const q = Math.round(deg / 90);
  const exact = Math.abs(deg - q * 90) < 1e-12;
  const c = exact ? [1, 0, -1, 0][((q % 4) + 4) % 4] : Math.cos(a);
  const s = exact ? [0, 1, 0, -1][((q % 4) + 4) % 4] : Math.sin(a);
  return ([x, y]) => [x * c - y * s + dx, x * s + y * c + dy];
}

/** Crossing-number test (O'Rourke §7.4); points on the boundary may go either way. */
export function pointInRing(p: readonly [number, number], ring: readonly Pt[]): boolean {
  let inside = false;
  const [x, y] = p;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const [xi, yi] = ring[i];
    const [xj, yj] = ring[j];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}

export function distToSegment(p: readonly [number, number], a: Pt, b: Pt): number {
  const ex = b[0] - a[0];
  const ey = b[1] - a[1];
  const L2 = ex * ex + ey * ey;
  const t = L2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * ex + (p[1] - a[1]) * ey) / L2));
  return Math.hypot(p[0] - a[0] - t * ex, p[1] - a[1] - t * ey);
}

/** Smallest distance from p to the ring's edges. */
export function distToRing(p: readonly [number, number], ring: readonly Pt[], closed = true): number {
  let d = Infinity;
  const n = ring.length;
  for (let i = closed ? 0 : 1; i < n; i++) d = Math.min(d, distToSegment(p, ring[(i + n - 1) % n], ring[i]));
  return d;
}

/** True when segments ab and cd share a point (orientation tests, O'Rourke §1.5). */
export function segmentsCross(a: Pt, b: Pt, c: Pt, d: Pt): boolean {
  const o = (p: Pt, q: Pt, r: Pt) => Math.sign((q[0] - p[0]) * (r[1] - p[1]) - (q[1] - p[1]) * (r[0] - p[0]));
  const o1 = o(a, b, c), o2 = o(a, b, d), o3 = o(c, d, a), o4 = o(c, d, b);
  if (o1 !== o2 && o3 !== o4) return true;
  const on = (p: Pt, q: Pt, r: Pt) => Math.min(p[0], q[0]) <= r[0] && r[0] <= Math.max(p[0], q[0]) && Math.min(p[1], q[1]) <= r[1] && r[1] <= Math.max(p[1], q[1]);
  return (o1 === 0 && on(a, b, c)) || (o2 === 0 && on(a, b, d)) || (o3 === 0 && on(c, d, a)) || (o4 === 0 && on(c, d, b));
}

export function boxRing(b: Box): Ring {
  return [[b.minX, b.minY], [b.maxX, b.minY], [b.maxX, b.maxY], [b.minX, b.maxY]];
}

/** A circle as a polygon whose chords stay within `tol` of the arc, counter-clockwise. */
export function circleRing(cx: number, cy: number, r: number, tol = 0.005): Ring {
  const n = Math.max(12, Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - Math.min(tol, r) / r))));
  const out: Ring = [];
  for (let i = 0; i < n; i++) {
    const a = (2 * Math.PI * i) / n;
    out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return out;
}

/**
 * y of a polyline that runs left to right, at x, by linear interpolation between its vertices (the
 * engine samples to a chord tolerance, so this is within that tolerance of the exact curve).
 */
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
