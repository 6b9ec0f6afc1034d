// Rings (closed polygons, the first point not repeated) in plain floating point: the signed area by
// the shoelace formula (Gauss's area formula; common practice, in any surveying handbook),
// orientation, perimeter, clean-up of repeated points, point-in-ring by the crossing number
// (J. O'Rourke, "Computational Geometry in C", 2nd ed., Cambridge UP 1998, §7.4) and a circle as
// a polygon of chords within a tolerance. Shared by the part builder (lib/cut), the nester
// (lib/nest) and the server's check of a nest (lib/cut-plan). Offsets and booleans go through
// Clipper (clipper.ts).
import { distance, type Pt } from "./point";

/** A closed ring, first point not repeated. Outer rings counter-clockwise, holes clockwise. */
export type Ring = Pt[];

/** Shoelace formula: positive for a counter-clockwise ring. */
export function signedArea(ring: readonly Pt[]): number {
  let s = 0;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) s += ring[j][0] * ring[i][1] - ring[i][0] * ring[j][1];
  return s / 2;
}

export function ringArea(ring: readonly Pt[]): number {
  return Math.abs(signedArea(ring));
}

/** Area of an outline less its holes. */
export function regionArea(region: { outer: readonly Pt[]; holes: readonly (readonly Pt[])[] }): number {
  return ringArea(region.outer) - region.holes.reduce((a, h) => a + ringArea(h), 0);
}

export function perimeter(ring: readonly Pt[], closed = true): number {
  let s = 0;
  for (let i = 1; i < ring.length; i++) s += distance(ring[i], ring[i - 1]);
  if (closed && ring.length > 1) s += distance(ring[0], ring[ring.length - 1]);
  return s;
}

/** The ring turning the asked way: a copy, reversed if it turns the other way. */
export function orient(ring: readonly Pt[], ccw: boolean): Ring {
  const a = signedArea(ring);
  return a > 0 === ccw ? ring.slice() : ring.slice().reverse();
}

/** Drops a repeated closing point (exactly equal ones only) and makes the ring counter-clockwise. */
export function normaliseRing(ring: readonly Pt[]): Ring {
  const out = ring.map(([x, y]) => [x, y] as Pt);
  while (out.length > 1) {
    const [a, b] = [out[0], out[out.length - 1]];
    if (a[0] !== b[0] || a[1] !== b[1]) break;
    out.pop();
  }
  if (signedArea(out) < 0) out.reverse();
  return out;
}

/**
 * Drops the repeated closing point and any vertex closer than `eps` to the one before, so no
 * zero-length edge reaches a cut file.
 */
export function cleanRing(ring: readonly Pt[], eps = 1e-4): Ring {
  const out: Ring = [];
  for (const p of ring) {
    const q = out[out.length - 1];
    if (!q || distance(p, q) > eps) out.push([p[0], p[1]]);
  }
  while (out.length > 1 && distance(out[0], out[out.length - 1]) <= eps) out.pop();
  return out;
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

/**
 * A circle as a polygon whose chords stay within `tol` of the arc, counter-clockwise: a chord of
 * half-angle α sags r(1 − cos α) below its arc, so α = acos(1 − tol/r) and n = ⌈π/α⌉.
 */
export function circleRing(cx: number, cy: number, r: number, tol = 0.005): Ring {
  const n = Math.max(12, Math.ceil(Math.PI / Math.acos(Math.max(-1, 1 - Math.min(tol, r) / r))));
  const out: Ring = [];
  for (let i = 0; i < n; i++) {
    const a = (2 * Math.PI * i) / n;
    out.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  }
  return out;
}
