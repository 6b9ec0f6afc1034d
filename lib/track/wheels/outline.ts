// Wheels given as a closed polyline (an uploaded SVG path, DXF polyline or CSV points) with the axle
// placed by the user. The outline must be star-shaped about the axle: seen from the axle, every edge
// must sweep forward (the signed sweep of each edge is positive once the outline runs
// counter-clockwise) and the sweeps must add up to one turn (winding number 1, so the axle is
// inside). Each edge is then a straight piece, rolled out in closed form as a catenary arc
// (Hall & Wagon 1992). Coordinates are the start pose: y up, the ray straight down touches first.

import { EngineError } from "../errors";
import { linePiece, makeWheel, TAU, wrapAngle, type Wheel, type WheelPiece } from "./wheel";

const fmt = (v: number) => Number(v.toPrecision(6));

export function outlineWheel(points: ReadonlyArray<readonly [number, number]>, axle: { x: number; y: number }): Wheel {
  let q = points.map(([x, y]) => [x - axle.x, y - axle.y] as [number, number]);
  // Drop repeated points (including a closing copy of the first point).
  const size = Math.max(...q.map(([x, y]) => Math.hypot(x, y)));
  const same = (p: [number, number], r: [number, number]) => Math.hypot(p[0] - r[0], p[1] - r[1]) <= 1e-12 * size;
  q = q.filter((p, i) => !same(p, q[(i + 1) % q.length]));
  if (q.length < 3)
    throw new EngineError("invalid-wheel", "The outline needs at least three distinct points.", "wheel.points");
  const n = q.length;
  const angle = (p: [number, number]) => Math.atan2(p[1], p[0]);
  const sweeps: number[] = [];
  let total = 0;
  for (let i = 0; i < n; i++) {
    const p = q[i];
    const r = q[(i + 1) % n];
    if (Math.hypot(p[0], p[1]) <= 1e-12 * size)
      throw new EngineError(
        "invalid-wheel",
        `The axle lies on the outline, at point ${i} (${fmt(points[i][0])}, ${fmt(points[i][1])}).`,
        `wheel.points[${i}]`,
      );
    const cross = p[0] * r[1] - p[1] * r[0];
    const dist = Math.abs(cross) / Math.hypot(r[0] - p[0], r[1] - p[1]);
    let s = angle(r) - angle(p);
    if (s > Math.PI) s -= TAU;
    if (s <= -Math.PI) s += TAU;
    if (dist <= 1e-12 * size && p[0] * r[0] + p[1] * r[1] < 0)
      throw new EngineError(
        "invalid-wheel",
        `The outline passes through the axle between points ${i} and ${(i + 1) % n}.`,
        `wheel.points[${i}]`,
      );
    sweeps.push(s);
    total += s;
  }
  if (Math.abs(total) < Math.PI)
    throw new EngineError(
      "invalid-wheel",
      `The axle (${fmt(axle.x)}, ${fmt(axle.y)}) is outside the outline.`,
      "wheel.axle",
    );
  if (Math.abs(Math.abs(total) - TAU) > 1e-6)
    throw new EngineError(
      "invalid-wheel",
      `The outline winds ${fmt(Math.abs(total) / TAU)} times around the axle; it must go round exactly once.`,
      "wheel.points",
    );
  const orient = total > 0 ? 1 : -1;
  for (let i = 0; i < n; i++) {
    if (orient * sweeps[i] <= 0) {
      const [x, y] = points[i];
      const deg = ((wrapAngle(angle(q[i]) + Math.PI / 2) * 180) / Math.PI).toFixed(1);
      throw new EngineError(
        "invalid-wheel",
        `The outline is not star-shaped about the axle: near point ${i} (${fmt(x)}, ${fmt(y)}) a ray from the axle ` +
          `(${deg}° from straight down) crosses it more than once. Move the axle or simplify the outline.`,
        `wheel.points[${i}]`,
      );
    }
  }
  if (orient < 0) q = q.reverse();
  // Body angle t of a point: angle from straight down, counter-clockwise.
  const tOf = (p: [number, number]) => wrapAngle(angle(p) + Math.PI / 2);
  const pieces: WheelPiece[] = [];
  const corners: number[] = [];
  for (let i = 0; i < n; i++) {
    const p = q[i];
    const r = q[(i + 1) % n];
    const ex = r[0] - p[0];
    const ey = r[1] - p[1];
    const L = Math.hypot(ex, ey);
    // Outward normal of a counter-clockwise edge is (ey, −ex)/L; its foot is at distance d.
    const nx = ey / L;
    const ny = -ex / L;
    const d = p[0] * nx + p[1] * ny;
    const tn = tOf([nx, ny]);
    const ta = tOf(p);
    let tb = tOf(r);
    if (tb <= ta) tb += TAU;
    // Keep tn within a quarter turn of the edge so r = d / cos(t − tn) is evaluated on the right branch.
    let tnAdj = tn;
    while (tnAdj < ta - Math.PI) tnAdj += TAU;
    while (tnAdj > ta + Math.PI) tnAdj -= TAU;
    pieces.push(linePiece(d, tnAdj, ta, tb));
    corners.push(ta);
  }
  // Drop corners where consecutive edges are collinear (no tangent jump).
  const kinks = corners.filter((_, i) => {
    const a = q[(i - 1 + n) % n];
    const b = q[i];
    const c = q[(i + 1) % n];
    const cr = (b[0] - a[0]) * (c[1] - b[1]) - (b[1] - a[1]) * (c[0] - b[0]);
    return Math.abs(cr) > 1e-12 * size * size;
  });
  const wrapped: WheelPiece[] = [];
  for (const p of pieces) {
    if (p.b > TAU) wrapped.push(p.sub(p.a, TAU), p.sub(0, p.b - TAU));
    else wrapped.push(p);
  }
  return makeWheel(
    wrapped.filter((p) => p.b > p.a).sort((a, b) => a.a - b.a),
    kinks,
  );
}
