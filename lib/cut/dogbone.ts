// Dogbone relief for a concave corner that a round cutter cannot reach: a circle of the cutter's
// diameter, its centre moved from the corner along the bisector of the open (empty) side by one
// cutter radius, so that the circle's edge passes through the corner (docs/fabrication.md §4.2: "a circle of
// tool diameter at each inner corner, offset by half the diameter at 45°"; for a corner of any
// angle the bisector takes the place of 45°). The mating part's sharp convex corner then seats fully.
// Done on the ring itself, so no boolean is needed: the corner vertex is replaced by the circle's
// arc that passes through it, between the two points where the circle crosses the corner's edges.
import type { Pt } from "@/lib/geometry/point";
import type { Ring } from "@/lib/geometry/ring";

/** Cross product of (b − a) × (c − b): negative at a right turn. */
export function turn(a: Pt, b: Pt, c: Pt): number {
  return (b[0] - a[0]) * (c[1] - b[1]) - (b[1] - a[1]) * (c[0] - b[0]);
}

/** Indices in [from, to] of a counter-clockwise ring's reflex (concave) vertices. */
export function reflexVertices(ring: Ring, from = 0, to = ring.length - 1): number[] {
  const n = ring.length;
  const out: number[] = [];
  for (let i = Math.max(0, from); i <= Math.min(to, n - 1); i++)
    if (turn(ring[(i + n - 1) % n], ring[i], ring[(i + 1) % n]) < 0) out.push(i);
  return out;
}

/**
 * The arc that replaces vertex i of a counter-clockwise ring (a reflex corner) with a dogbone of
 * radius r, sampled so that its chords stay within `tol` of the circle. Returns null when an edge
 * is too short to hold the circle's crossing point.
 */
export function dogboneArc(ring: Ring, i: number, r: number, tol = 0.005): Pt[] | null {
  const n = ring.length;
  const V = ring[i];
  const P = ring[(i + n - 1) % n];
  const N = ring[(i + 1) % n];
  const l1 = Math.hypot(P[0] - V[0], P[1] - V[1]);
  const l2 = Math.hypot(N[0] - V[0], N[1] - V[1]);
  const u1: Pt = [(P[0] - V[0]) / l1, (P[1] - V[1]) / l1];
  const u2: Pt = [(N[0] - V[0]) / l2, (N[1] - V[1]) / l2];
  // At a reflex vertex the angle between the edges on the empty side is under 180°, so u1 + u2 points into it.
  const bl = Math.hypot(u1[0] + u2[0], u1[1] + u2[1]);
  if (bl < 1e-12) return null;
  const b: Pt = [(u1[0] + u2[0]) / bl, (u1[1] + u2[1]) / bl];
  const C: Pt = [V[0] + r * b[0], V[1] + r * b[1]];
  // |V + t·u − C| = r with |V − C| = r gives t = 2r (u·b).
  const t1 = 2 * r * (u1[0] * b[0] + u1[1] * b[1]);
  const t2 = 2 * r * (u2[0] * b[0] + u2[1] * b[1]);
  if (t1 > l1 + 1e-9 || t2 > l2 + 1e-9) return null;
  const P1: Pt = [V[0] + t1 * u1[0], V[1] + t1 * u1[1]];
  const P2: Pt = [V[0] + t2 * u2[0], V[1] + t2 * u2[1]];
  const TAU = 2 * Math.PI;
  const ang = (p: Pt) => Math.atan2(p[1] - C[1], p[0] - C[0]);
  const a1 = ang(P1);
  const a2 = ang(P2);
  const av = Math.atan2(-b[1], -b[0]);
  const mod = (x: number) => ((x % TAU) + TAU) % TAU;
  const ccw = mod(a2 - a1);
  // The arc to keep is the one through V: it bites into the material beside the corner.
  const through = mod(av - a1) < ccw;
  const span = through ? ccw : TAU - ccw;
  const dir = through ? 1 : -1;
  const step = 2 * Math.acos(Math.max(-1, 1 - Math.min(tol, r) / r));
  const m = Math.max(4, Math.ceil(span / step));
  const out: Pt[] = [P1];
  for (let j = 1; j < m; j++) {
    const a = a1 + (dir * span * j) / m;
    out.push([C[0] + r * Math.cos(a), C[1] + r * Math.sin(a)]);
  }
  out.push(P2);
  return out;
}

/** The ring with a dogbone at each of the given reflex vertices; the indices that could not take one are returned. */
export function addDogbones(ring: Ring, indices: number[], r: number, tol = 0.005): { ring: Ring; skipped: number[] } {
  const arcs = new Map<number, Pt[]>();
  const skipped: number[] = [];
  for (const i of indices) {
    const arc = dogboneArc(ring, i, r, tol);
    if (arc) arcs.set(i, arc);
    else skipped.push(i);
  }
  const out: Ring = [];
  ring.forEach((p, i) => {
    const arc = arcs.get(i);
    if (arc) out.push(...arc);
    else out.push(p);
  });
  return { ring: out, skipped };
}
