// A simple polygon as a few convex pieces: ear-clipping triangulation (earcut, Mapbox's
// implementation), then the Hertel–Mehlhorn merge (S. Hertel & K. Mehlhorn, "Fast triangulation of
// simple polygons", FCT 1983, LNCS 158: 207–218): a diagonal is removed whenever the two pieces it
// separates form a convex piece without it. The result has at most four times as many pieces as the
// fewest possible. Integer Clipper paths in, vertices of the original out (no new points).
import earcut from "earcut";
import type { clipper } from "@/lib/geometry/clipper";

type P = clipper.IntPoint;

/** z of (b − a) × (c − b): > 0 when a → b → c turns left (counter-clockwise). */
function turn(a: P, b: P, c: P): number {
  return (b.x - a.x) * (c.y - b.y) - (b.y - a.y) * (c.x - b.x);
}

/** Whether the piece (indices into pts, counter-clockwise) is convex at every vertex. */
function convexAt(pts: readonly P[], piece: readonly number[], k: number): boolean {
  const n = piece.length;
  return turn(pts[piece[(k + n - 1) % n]], pts[piece[k]], pts[piece[(k + 1) % n]]) >= 0;
}

/**
 * Merges piece b into piece a across their shared edge (i → j in a, j → i in b), or null when the
 * merged piece would not be convex at i or at j.
 */
function merge(pts: readonly P[], a: number[], b: number[], i: number, j: number): number[] | null {
  const ai = a.indexOf(i);
  const bj = b.indexOf(j);
  // a: … i, j …; b: … j, i …. Walk a from j round to i, then b from i (exclusive) round to j (exclusive).
  const out: number[] = [];
  for (let k = 0; k < a.length; k++) out.push(a[(ai + 1 + k) % a.length]);
  for (let k = 1; k < b.length - 1; k++) out.push(b[(bj + 1 + k) % b.length]);
  // out starts at j and reaches i at position a.length − 1.
  const at = (v: number) => out.indexOf(v);
  if (!convexAt(pts, out, at(i)) || !convexAt(pts, out, at(j))) return null;
  return out;
}

/**
 * Convex pieces of a simple counter-clockwise polygon, each counter-clockwise. With `holes` (any
 * orientation), of the region between the polygon and its holes.
 */
export function convexParts(outer: readonly P[], holes: readonly (readonly P[])[] = []): P[][] {
  const on = outer.length;
  if (!holes.length) {
    if (on <= 3) return [outer.slice()];
    if (outer.every((_, k) => turn(outer[(k + on - 1) % on], outer[k], outer[(k + 1) % on]) >= 0))
      return [outer.slice()];
  }
  const path: P[] = [...outer];
  const holeStarts: number[] = [];
  for (const h of holes) {
    holeStarts.push(path.length);
    path.push(...h);
  }
  const n = path.length;
  const flat: number[] = [];
  for (const q of path) flat.push(q.x, q.y);
  const tri = earcut(flat, holeStarts.length ? holeStarts : undefined);
  const pieces: (number[] | null)[] = [];
  for (let t = 0; t < tri.length; t += 3) {
    const [a, b, c] = [tri[t], tri[t + 1], tri[t + 2]];
    pieces.push(turn(path[a], path[b], path[c]) >= 0 ? [a, b, c] : [a, c, b]);
  }
  // Which piece holds each directed edge; a diagonal is an edge held in both directions.
  const owner = new Map<number, number>();
  const key = (i: number, j: number) => i * n + j;
  pieces.forEach((p, k) => p!.forEach((v, m) => owner.set(key(v, p![(m + 1) % p!.length]), k)));
  let merged = true;
  while (merged) {
    merged = false;
    for (let k = 0; k < pieces.length; k++) {
      const a = pieces[k];
      if (!a) continue;
      for (let m = 0; m < a.length; m++) {
        const i = a[m];
        const j = a[(m + 1) % a.length];
        const other = owner.get(key(j, i));
        if (other === undefined || other === k || !pieces[other]) continue;
        const out = merge(path, a, pieces[other]!, i, j);
        if (!out) continue;
        pieces[k] = out;
        pieces[other] = null;
        out.forEach((v, q) => owner.set(key(v, out[(q + 1) % out.length]), k));
        owner.delete(key(i, j));
        owner.delete(key(j, i));
        merged = true;
        break;
      }
    }
  }
  return pieces.filter((p): p is number[] => !!p).map((p) => p.map((v) => path[v]));
}

/** The ring without repeated consecutive vertices (a zero-length edge has no angle). */
function distinct(p: readonly P[]): P[] {
  const out = p.filter((q, k) => {
    const r = p[(k + p.length - 1) % p.length];
    return q.x !== r.x || q.y !== r.y;
  });
  return out.length ? out : p.slice(0, 1);
}

/** Index of the lowest vertex (least y, then least x). */
function lowest(p: readonly P[]): number {
  let k = 0;
  for (let i = 1; i < p.length; i++) if (p[i].y < p[k].y || (p[i].y === p[k].y && p[i].x < p[k].x)) k = i;
  return k;
}

/** Upper half-turn [0°, 180°) is 0, lower [180°, 360°) is 1. */
const half = (e: P) => (e.y < 0 || (e.y === 0 && e.x < 0) ? 1 : 0);

/** > 0 when edge e comes before edge f by angle from the positive x axis, < 0 after, 0 same direction. */
function angleOrder(e: P, f: P): number {
  const he = half(e);
  const hf = half(f);
  if (he !== hf) return hf - he;
  return e.x * f.y - e.y * f.x;
}

/**
 * Minkowski sum of two convex counter-clockwise polygons by merging their edges in order of angle
 * (de Berg, Cheong, van Kreveld & Overmars, Computational Geometry, 3rd ed., §13.3): O(m + n).
 */
export function convexSum(pa: readonly P[], pb: readonly P[]): P[] {
  const a = distinct(pa);
  const b = distinct(pb);
  const i0 = lowest(a);
  const j0 = lowest(b);
  const out: P[] = [];
  let i = 0;
  let j = 0;
  const A = (k: number) => a[(i0 + k) % a.length];
  const B = (k: number) => b[(j0 + k) % b.length];
  while (i < a.length || j < b.length) {
    out.push({ x: A(i).x + B(j).x, y: A(i).y + B(j).y });
    const ea = { x: A(i + 1).x - A(i).x, y: A(i + 1).y - A(i).y };
    const eb = { x: B(j + 1).x - B(j).x, y: B(j + 1).y - B(j).y };
    const order = i >= a.length ? -1 : j >= b.length ? 1 : angleOrder(ea, eb);
    if (order > 0) i++;
    else if (order < 0) j++;
    else {
      i++;
      j++;
    }
  }
  return out;
}
