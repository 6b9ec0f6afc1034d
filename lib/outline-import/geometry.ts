// Plane geometry for the importer: 2-D affine maps in SVG's matrix(a b c d e f) order (SVG 1.1
// §7.4: x' = a·x + c·y + e, y' = b·x + d·y + f), the shoelace area and area centroid of a polygon,
// a sort-and-sweep test for a polygon that crosses itself, and the star-shape test the engine
// applies to an outline about its axle (lib/track/wheels/outline.ts).

import type { Pt } from "./common";

export type Affine = readonly [number, number, number, number, number, number];

export const IDENTITY: Affine = [1, 0, 0, 1, 0, 0];

/** m1 · m2: apply m2 first, then m1. */
export function multiply(m1: Affine, m2: Affine): Affine {
  const [a1, b1, c1, d1, e1, f1] = m1;
  const [a2, b2, c2, d2, e2, f2] = m2;
  return [
    a1 * a2 + c1 * b2,
    b1 * a2 + d1 * b2,
    a1 * c2 + c1 * d2,
    b1 * c2 + d1 * d2,
    a1 * e2 + c1 * f2 + e1,
    b1 * e2 + d1 * f2 + f1,
  ];
}

export function apply(m: Affine, x: number, y: number): Pt {
  return [m[0] * x + m[2] * y + m[4], m[1] * x + m[3] * y + m[5]];
}

/** Largest singular value of the linear part: the most the map stretches any length. */
export function maxStretch(m: Affine): number {
  const [a, b, c, d] = m;
  const s = a * a + b * b + c * c + d * d;
  const det = a * d - b * c;
  return Math.sqrt((s + Math.sqrt(Math.max(0, s * s - 4 * det * det))) / 2);
}

/** Signed area by the shoelace formula (positive when counter-clockwise in a y-up frame). */
export function signedArea(p: ReadonlyArray<Pt>): number {
  const n = p.length;
  if (n < 3) return 0;
  const [ox, oy] = p[0];
  let s = 0;
  for (let i = 1; i + 1 < n; i++) s += (p[i][0] - ox) * (p[i + 1][1] - oy) - (p[i + 1][0] - ox) * (p[i][1] - oy);
  return s / 2;
}

/** Area centroid of a simple polygon; the mean of the vertices when the area is zero. */
export function centroid(p: ReadonlyArray<Pt>): { x: number; y: number } {
  const n = p.length;
  if (n === 0) return { x: 0, y: 0 };
  const [ox, oy] = p[0];
  let a = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < n; i++) {
    const x0 = p[i][0] - ox;
    const y0 = p[i][1] - oy;
    const x1 = p[(i + 1) % n][0] - ox;
    const y1 = p[(i + 1) % n][1] - oy;
    const cr = x0 * y1 - x1 * y0;
    a += cr;
    cx += (x0 + x1) * cr;
    cy += (y0 + y1) * cr;
  }
  if (a === 0 || !Number.isFinite(a)) {
    let sx = 0;
    let sy = 0;
    for (const [x, y] of p) {
      sx += x;
      sy += y;
    }
    return { x: sx / n, y: sy / n };
  }
  return { x: ox + cx / (3 * a), y: oy + cy / (3 * a) };
}

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
  width: number;
  height: number;
}

export function boundsOf(p: ReadonlyArray<Pt>): Bounds {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of p) {
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  return { minX, minY, maxX, maxY, width: maxX - minX, height: maxY - minY };
}

export function dist(a: Pt, b: Pt): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}

const orient = (a: Pt, b: Pt, c: Pt) => (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);

function onSegment(a: Pt, b: Pt, c: Pt): boolean {
  return (
    Math.min(a[0], b[0]) <= c[0] &&
    c[0] <= Math.max(a[0], b[0]) &&
    Math.min(a[1], b[1]) <= c[1] &&
    c[1] <= Math.max(a[1], b[1])
  );
}

/** Where segments ab and cd meet (touching counts), or null. */
function meet(a: Pt, b: Pt, c: Pt, d: Pt): Pt | null {
  const d1 = orient(c, d, a);
  const d2 = orient(c, d, b);
  const d3 = orient(a, b, c);
  const d4 = orient(a, b, d);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
    const t = d1 / (d1 - d2);
    return [a[0] + t * (b[0] - a[0]), a[1] + t * (b[1] - a[1])];
  }
  if (d1 === 0 && onSegment(c, d, a)) return a;
  if (d2 === 0 && onSegment(c, d, b)) return b;
  if (d3 === 0 && onSegment(a, b, c)) return c;
  if (d4 === 0 && onSegment(a, b, d)) return d;
  return null;
}

/**
 * First place where a closed polygon (no repeated closing point, no repeated neighbours) meets
 * itself other than at shared corners: edges i (points i → i+1) and j, or null when it is simple.
 * Sort-and-sweep on x: edges are sorted by their left end and only pairs whose x ranges overlap are
 * tested, so ordinary outlines cost about n log n; the worst case is n²/2 box tests, bounded by the
 * point limit.
 */
export function selfIntersection(p: ReadonlyArray<Pt>): { i: number; j: number; at: Pt } | null {
  const n = p.length;
  if (n < 3) return null;
  // Neighbouring edges that fold back onto each other (a spike) also count.
  for (let i = 0; i < n; i++) {
    const a = p[(i - 1 + n) % n];
    const b = p[i];
    const c = p[(i + 1) % n];
    if (orient(a, b, c) === 0 && (b[0] - a[0]) * (c[0] - b[0]) + (b[1] - a[1]) * (c[1] - b[1]) < 0)
      return { i: (i - 1 + n) % n, j: i, at: b };
  }
  // Sweep along the axis where edges overlap less (a zigzag across x is cheap to sweep along y).
  let spanX = 0;
  let spanY = 0;
  for (let i = 0; i < n; i++) {
    spanX += Math.abs(p[(i + 1) % n][0] - p[i][0]);
    spanY += Math.abs(p[(i + 1) % n][1] - p[i][1]);
  }
  const b = boundsOf(p);
  if (spanX / (b.width || 1) > spanY / (b.height || 1)) {
    const hit = sweep(p.map(([x, y]) => [y, x] as Pt));
    return hit && { ...hit, at: [hit.at[1], hit.at[0]] };
  }
  return sweep(p);
}

function sweep(p: ReadonlyArray<Pt>): { i: number; j: number; at: Pt } | null {
  const n = p.length;
  const order = Array.from({ length: n }, (_, i) => i);
  const minX = (i: number) => Math.min(p[i][0], p[(i + 1) % n][0]);
  const maxX = (i: number) => Math.max(p[i][0], p[(i + 1) % n][0]);
  const lo = order.map(minX);
  const hi = order.map(maxX);
  order.sort((u, v) => lo[u] - lo[v]);
  for (let s = 0; s < n; s++) {
    const i = order[s];
    const a = p[i];
    const b = p[(i + 1) % n];
    const yLo = Math.min(a[1], b[1]);
    const yHi = Math.max(a[1], b[1]);
    for (let t = s + 1; t < n && lo[order[t]] <= hi[i]; t++) {
      const j = order[t];
      if (j === (i + 1) % n || i === (j + 1) % n) continue;
      const c = p[j];
      const d = p[(j + 1) % n];
      if (Math.max(c[1], d[1]) < yLo || Math.min(c[1], d[1]) > yHi) continue;
      const at = meet(a, b, c, d);
      if (at) return { i: Math.min(i, j), j: Math.max(i, j), at };
    }
  }
  return null;
}

const TAU = 2 * Math.PI;

/** Angle of direction (dx, dy) measured counter-clockwise from straight down, in [0, 2π). */
export function angleFromDown(dx: number, dy: number): number {
  const t = Math.atan2(dy, dx) + Math.PI / 2;
  return ((t % TAU) + TAU) % TAU;
}

export type StarResult = { ok: true } | { ok: false; at: { x: number; y: number }; angle: number };

/**
 * The engine's test (lib/track/wheels/outline.ts): seen from the axle, every edge must sweep the
 * same way and the sweeps must add up to exactly one turn, which is the same as every ray from the
 * axle crossing the outline exactly once. On failure, `at` is the point where it first goes wrong
 * and `angle` the direction of the ray from the axle through it, in radians counter-clockwise from
 * straight down (the engine's body-angle convention; its messages quote it in degrees).
 */
export function starShapedAbout(
  points: ReadonlyArray<readonly [number, number]>,
  axle: { x: number; y: number },
): StarResult {
  let q = points.map(([x, y]) => [x - axle.x, y - axle.y] as Pt);
  let size = 0;
  for (const [x, y] of q) size = Math.max(size, Math.hypot(x, y));
  const same = (u: Pt, v: Pt) => Math.hypot(u[0] - v[0], u[1] - v[1]) <= 1e-12 * size;
  q = q.filter((u, i) => !same(u, q[(i + 1) % q.length]));
  const back = (u: Pt) => ({ x: u[0] + axle.x, y: u[1] + axle.y });
  const bad = (u: Pt) => ({ ok: false as const, at: back(u), angle: angleFromDown(u[0], u[1]) });
  const n = q.length;
  if (n < 3 || !Number.isFinite(size)) return { ok: false, at: { x: axle.x, y: axle.y }, angle: 0 };
  const orientation = signedArea(q) >= 0 ? 1 : -1;
  let total = 0;
  for (let i = 0; i < n; i++) {
    const u = q[i];
    const v = q[(i + 1) % n];
    if (Math.hypot(u[0], u[1]) <= 1e-12 * size) return { ok: false, at: back(u), angle: 0 };
    const cross = u[0] * v[1] - u[1] * v[0];
    let s = Math.atan2(v[1], v[0]) - Math.atan2(u[1], u[0]);
    if (s > Math.PI) s -= TAU;
    if (s <= -Math.PI) s += TAU;
    const d = Math.abs(cross) / Math.hypot(v[0] - u[0], v[1] - u[1]);
    if (d <= 1e-12 * size && u[0] * v[0] + u[1] * v[1] < 0) {
      // The edge passes through the axle itself.
      const t = (u[0] * (u[0] - v[0]) + u[1] * (u[1] - v[1])) / ((v[0] - u[0]) ** 2 + (v[1] - u[1]) ** 2);
      return {
        ok: false,
        at: back([u[0] + t * (v[0] - u[0]), u[1] + t * (v[1] - u[1])]),
        angle: angleFromDown(v[0] - u[0], v[1] - u[1]),
      };
    }
    if (orientation * s <= 0) return bad(u);
    total += s;
    if (Math.abs(total) > TAU + 1e-6) return bad(v);
  }
  if (Math.abs(Math.abs(total) - TAU) > 1e-6) {
    // The axle is outside: the ray towards the first point meets the outline there and again beyond.
    return bad(q[0]);
  }
  return { ok: true };
}
