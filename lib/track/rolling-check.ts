// The rolling check: an independent simulation of the roll, not the design formulas read back.
// It takes the two output shapes as curves and uses only the definition of rolling without slip:
// the rolled-off arc lengths of the two curves are equal and the curves are tangent at the contact
// (J. C. Maxwell, "On the Theory of Rolling Curves", 1849). Arc lengths come from their own
// quadratures of |c′| (derivatives by finite differences of the output curves), and each pose is
// found by matching arc length and tangent, never from x = ∫r dθ or r₁dθ₁ = r₂dθ₂. Interference is
// the radial test of docs/math.md §7.4 (a point at distance ρ and body angle u is inside a star-shaped
// wheel iff ρ < r(u)), or a vertical test against a track graph, over the whole outline and the
// whole motion.

import { goldenMin } from "./brent";
import { Cumulative } from "./cumulative";
import type { Deadline } from "./deadline";
import { piecewise, type Piecewise } from "./piecewise";
import type { Pt } from "./sampling";
import { TAU } from "./wheels";

export interface Interference {
  /** How far the deepest point of one body lies inside the other (0 if it never cuts in). */
  depth: number;
  /** That point, in track coordinates (track modes) or the driver's axle frame (pairs). */
  at: Pt | null;
  /** Axle x (track modes) or driver turn angle (pairs) when it happens. */
  when: number | null;
}

export interface RollCheck {
  axleDeviation: number;
  slip: number;
  closureError: number;
  interference: Interference;
}

/** Counts as cutting in above this fraction of the wheel size (rounding noise at a tangent contact is ~1e-15). */
export const INTERFERENCE_FLOOR = 1e-9;

const wrapPi = (a: number) => a - TAU * Math.round(a / TAU);

/** A plane curve c(v), v ∈ [0, V], smooth between `breaks`. */
export interface Curve {
  x: (v: number) => number;
  y: (v: number) => number;
  V: number;
  breaks: number[];
}

interface Geometry {
  cx: Piecewise;
  cy: Piecewise;
  arc: Cumulative;
  /** Tangent direction angle at v (one-sided on a break). */
  tangent(v: number, side: -1 | 0 | 1): number;
}

function geometry(c: Curve, deadline: Deadline): Geometry {
  const scale = c.V;
  const cx = piecewise(c.x, 0, c.V, c.breaks, scale);
  const cy = piecewise(c.y, 0, c.V, c.breaks, scale);
  const pieces = [];
  for (let i = 0; i + 1 < cx.knots.length; i++) {
    const a = cx.knots[i];
    const b = cx.knots[i + 1];
    pieces.push({
      a,
      b,
      f: (v: number) => {
        const side = v <= a ? 1 : v >= b ? -1 : 0;
        return Math.hypot(cx.d1(v, side), cy.d1(v, side));
      },
    });
  }
  const arc = new Cumulative(pieces, { deadline, rel: 1e-11, maxPanels: 600 });
  return { cx, cy, arc, tangent: (v, side) => Math.atan2(cy.d1(v, side), cx.d1(v, side)) };
}

/**
 * The parameter to pose at for grid point u: the ends of a curve whose speed vanishes there (a
 * cycloid's cusp) have no tangent, so those poses are taken a hair inside, where the turn still
 * differs from the end's by far less than rounding (the turn rate vanishes there too).
 */
function poseParam(g: Geometry, u: number, U: number, side: -1 | 0 | 1): number {
  if (side === 0) return u;
  const speed = Math.hypot(g.cx.d1(u, side), g.cy.d1(u, side));
  const typical = g.arc.total / U;
  return speed > 1e-6 * typical ? u : u + side * 1e-4 * U;
}

/** Grid of a parameter, `per` points per smooth piece, ends included once. */
function paramGrid(V: number, breaks: readonly number[], per: number): number[] {
  const knots = [0, ...breaks.filter((b) => b > 0 && b < V).sort((a, b) => a - b), V];
  const out: number[] = [];
  for (let i = 0; i + 1 < knots.length; i++)
    for (let j = 0; j < per; j++) out.push(knots[i] + ((knots[i + 1] - knots[i]) * j) / per);
  out.push(V);
  return out;
}

/**
 * Largest depth(pose(p), v) over a pose grid and a probe grid, refined by golden-section search
 * around the best grid cell, in the probe parameter and then in the pose parameter.
 */
function deepest<PoseT>(
  poseGrid: number[],
  poses: PoseT[],
  poseOf: (p: number) => PoseT,
  probeGrid: number[],
  depth: (pose: PoseT, v: number, copy: number) => number,
  copies: (pose: PoseT) => number[],
  deadline: Deadline,
): { depth: number; v: number; copy: number; pose: PoseT } {
  // The deepest point often sits at a wheel corner, a sharp peak that a grid can straddle: so the
  // three best local maxima of the grid are each refined before poses are compared.
  const refineProbe = (pose: PoseT, iters = 60) => {
    const cands: Array<{ d: number; j: number; copy: number }> = [];
    for (const copy of copies(pose)) {
      const d = probeGrid.map((v) => depth(pose, v, copy));
      for (let j = 0; j < d.length; j++)
        if (d[j] > -Infinity && (j === 0 || d[j] >= d[j - 1]) && (j === d.length - 1 || d[j] >= d[j + 1]))
          cands.push({ d: d[j], j, copy });
    }
    cands.sort((x, y) => y.d - x.d);
    let best = { d: -Infinity, v: probeGrid[0], copy: 0 };
    for (const c of cands.slice(0, 3)) {
      const lo = probeGrid[Math.max(0, c.j - 1)];
      const hi = probeGrid[Math.min(probeGrid.length - 1, c.j + 1)];
      const g = goldenMin((v) => -depth(pose, v, c.copy), lo, hi, iters);
      const r = -g.f > c.d ? { d: -g.f, v: g.x, copy: c.copy } : { d: c.d, v: probeGrid[c.j], copy: c.copy };
      if (r.d > best.d) best = r;
    }
    return best;
  };
  let best = { d: -Infinity, i: 0 };
  for (let i = 0; i < poses.length; i++) {
    deadline.check();
    const b = refineProbe(poses[i], 24);
    if (b.d > best.d) best = { d: b.d, i };
  }
  const lo = poseGrid[Math.max(0, best.i - 1)];
  const hi = poseGrid[Math.min(poseGrid.length - 1, best.i + 1)];
  const g = goldenMin((p) => -refineProbe(poseOf(p), 40).d, lo, hi, 40);
  const first = refineProbe(poses[best.i]);
  if (first.d >= -g.f) return { depth: first.d, v: first.v, copy: first.copy, pose: poses[best.i] };
  const pose = poseOf(g.x);
  const r = refineProbe(pose);
  return { depth: r.d, v: r.v, copy: r.copy, pose };
}

// ---------------------------------------------------------------------------------------------
// A wheel rolling on a track below a horizontal axle line.

export interface TrackRollInput {
  /** The wheel's outline over one period of rolling, in its start pose with the axle at the origin. */
  wheel: Curve;
  /** Turn of the wheel per period (2π/n). */
  T: number;
  /** One track period, X increasing. The design claims wheel point v touches track point v. */
  track: Curve;
  /** Where the design puts the axle line. */
  H: number;
  size: number;
  /**
   * Interference probe: "track" tests track points against the wheel's polar function wheelR (radial
   * test); "wheel" tests body points curve(v), v ∈ [0, V] over the whole turn, against trackY (vertical test).
   */
  probe:
    | { kind: "track"; wheelR: (t: number) => number }
    | { kind: "wheel"; curve: (v: number) => Pt; V: number; breaks: number[]; trackY: (x: number) => number };
  poses?: number;
  deadline: Deadline;
}

interface Pose {
  u: number; // track parameter of the contact
  ax: number;
  ay: number;
  alpha: number; // clockwise turn
}

export function checkTrackRoll(inp: TrackRollInput): RollCheck {
  const { T, H, deadline } = inp;
  const W = geometry(inp.wheel, deadline);
  const K = geometry(inp.track, deadline);
  const U = inp.track.V;
  const P = inp.track.x(U) - inp.track.x(0);
  deadline.checkNow();

  const poseAt = (u: number, side: -1 | 0 | 1, s = K.arc.value(u)): Pose => {
    const v = W.arc.inverse(Math.min(s, W.arc.total));
    const alpha = W.tangent(v, side) - K.tangent(u, side);
    const px = inp.wheel.x(v);
    const py = inp.wheel.y(v);
    const c = Math.cos(alpha);
    const sn = Math.sin(alpha);
    // Axle = contact − Rot(−α)·(body point).
    return { u, ax: inp.track.x(u) - (px * c + py * sn), ay: inp.track.y(u) - (-px * sn + py * c), alpha };
  };

  const n = inp.poses ?? 96;
  const poses: Pose[] = [];
  let axleDeviation = 0;
  let slip = Math.abs(W.arc.total - K.arc.total);
  for (let i = 0; i <= n; i++) {
    deadline.check();
    const u = (U * i) / n;
    const s = K.arc.value(u);
    if (i > 0 && i < n) slip = Math.max(slip, Math.abs(W.arc.value(u * (inp.wheel.V / U)) - s));
    // Poses exactly on a cusp are skipped (the wheel pivots on its corner there; the tangent is not defined).
    if (i > 0 && i < n && K.cx.knots.some((k) => Math.abs(k - u) < 1e-12 * U)) continue;
    const side = i === 0 ? 1 : i === n ? -1 : 0;
    const uu = poseParam(K, u, U, side);
    const pose = poseAt(uu, side, uu === u ? s : K.arc.value(uu));
    poses.push(pose);
    axleDeviation = Math.max(axleDeviation, Math.abs(pose.ay - H));
  }
  const closureError = Math.abs(wrapPi(poses[poses.length - 1].alpha - T));

  let maxR = inp.size;
  for (let i = 0; i <= 256; i++)
    maxR = Math.max(maxR, Math.hypot(inp.wheel.x((inp.wheel.V * i) / 256), inp.wheel.y((inp.wheel.V * i) / 256)));
  maxR *= 1.0000001;
  const probe = inp.probe;
  // Probe points do not depend on the pose: compute each once.
  const cache = new Map<number, Pt>();
  const probePoint = (v: number): Pt => {
    let p = cache.get(v);
    if (!p) {
      p = probe.kind === "track" ? [inp.track.x(v), inp.track.y(v)] : probe.curve(v);
      cache.set(v, p);
    }
    return p;
  };
  const world = (pose: Pose, v: number, copy: number): Pt => {
    const [bx, by] = probePoint(v);
    if (probe.kind === "track") return [bx + copy * P, by];
    const c = Math.cos(pose.alpha);
    const s = Math.sin(pose.alpha);
    return [pose.ax + bx * c + by * s, pose.ay - bx * s + by * c];
  };
  const depth = (pose: Pose, v: number, copy: number): number => {
    const [px, py] = world(pose, v, copy);
    if (probe.kind === "wheel") return probe.trackY(px) - py;
    const dx = px - pose.ax;
    const dy = py - pose.ay;
    if (Math.abs(dx) > maxR || Math.abs(dy) > maxR) return -Infinity;
    const c = Math.cos(pose.alpha);
    const s = Math.sin(pose.alpha);
    // Into the body frame, Rot(+α); inside iff ρ < r(u).
    const bx = dx * c - dy * s;
    const by = dx * s + dy * c;
    return probe.wheelR(Math.atan2(by, bx) + Math.PI / 2) - Math.hypot(bx, by);
  };
  const copies = (pose: Pose): number[] => {
    if (probe.kind === "wheel") return [0];
    const out: number[] = [];
    for (let k = Math.floor((pose.ax - maxR) / P) - 1; k <= Math.floor((pose.ax + maxR) / P) + 1; k++) out.push(k);
    return out;
  };
  const probeGrid = probe.kind === "track" ? paramGrid(U, inp.track.breaks, 48) : paramGrid(probe.V, probe.breaks, 48);
  const deep = deepest(
    poses.map((q) => q.u),
    poses,
    (u) => poseAt(u, 0),
    probeGrid,
    depth,
    copies,
    deadline,
  );
  const interference: Interference =
    deep.depth > INTERFERENCE_FLOOR * inp.size
      ? { depth: deep.depth, at: world(deep.pose, deep.v, deep.copy), when: deep.pose.ax }
      : { depth: 0, at: null, when: null };
  return { axleDeviation, slip, closureError, interference };
}

// ---------------------------------------------------------------------------------------------
// Two wheels on fixed axles, the driver's at the origin and the partner's at (0, −a).

export interface PairRollInput {
  /** Driver outline over one sector (turn T1), start pose, axle at the origin. */
  driver: Curve;
  T1: number;
  /** Driver polar function, for the radial test. */
  driverR: (t: number) => number;
  /** Partner outline over one lobe (turn T2), start pose, its axle at the origin. The design claims driver point v touches partner point v. */
  partner: Curve;
  T2: number;
  a: number;
  size: number;
  poses?: number;
  deadline: Deadline;
}

interface PairPose {
  v: number;
  a1: number; // driver turn, clockwise
  a2: number; // partner turn, counter-clockwise
  dev: number;
}

export function checkPairRoll(inp: PairRollInput): RollCheck {
  const { T1, T2, a, deadline } = inp;
  const D = geometry(inp.driver, deadline);
  const Q = geometry(inp.partner, deadline);
  const V = inp.driver.V;
  deadline.checkNow();

  const poseAt = (v: number, side: -1 | 0 | 1, s = D.arc.value(v)): PairPose => {
    const w = Q.arc.inverse(Math.min(s, Q.arc.total));
    // Tangents aligned: φ₁ − α₁ = φ₂ + α₂.
    const beta = D.tangent(v, side) - Q.tangent(w, side);
    const p1x = inp.driver.x(v);
    const p1y = inp.driver.y(v);
    const p2x = inp.partner.x(w);
    const p2y = inp.partner.y(w);
    // Contact points Q1 = Rot(−α1)·p1 and Q2 = (0, −a) + Rot(α2)·p2 must coincide.
    const gap = (a1: number): [number, number] => {
      const c1 = Math.cos(a1);
      const n1 = Math.sin(a1);
      const c2 = Math.cos(beta - a1);
      const n2 = Math.sin(beta - a1);
      return [p1x * c1 + p1y * n1 - (p2x * c2 - p2y * n2), -p1x * n1 + p1y * c1 - (-a + p2x * n2 + p2y * c2)];
    };
    // The horizontal gap fixes α1 (Newton; its slope is about −(r1 + r2)); the vertical gap left is the error.
    let a1 = Math.atan2(p1x, -p1y);
    for (let i = 0; i < 40; i++) {
      const h = 1e-7;
      const g = gap(a1)[0];
      const step = g / ((gap(a1 + h)[0] - gap(a1 - h)[0]) / (2 * h));
      a1 -= step;
      if (Math.abs(step) < 1e-15) break;
    }
    return { v, a1, a2: beta - a1, dev: Math.abs(gap(a1)[1]) };
  };

  const n = inp.poses ?? 96;
  const poses: PairPose[] = [];
  let axleDeviation = 0;
  let slip = Math.abs(D.arc.total - Q.arc.total);
  for (let i = 0; i <= n; i++) {
    deadline.check();
    const v = (V * i) / n;
    const s = D.arc.value(v);
    if (i > 0 && i < n) slip = Math.max(slip, Math.abs(Q.arc.value(v * (inp.partner.V / V)) - s));
    if (i > 0 && i < n && D.cx.knots.some((k) => Math.abs(k - v) < 1e-12 * V)) continue;
    const side = i === 0 ? 1 : i === n ? -1 : 0;
    const vv = poseParam(D, v, V, side);
    const p = poseAt(vv, side, vv === v ? s : D.arc.value(vv));
    poses.push(p);
    axleDeviation = Math.max(axleDeviation, p.dev);
  }
  const end = poses[poses.length - 1];
  const closureError = Math.max(Math.abs(wrapPi(end.a1 - T1)), Math.abs(wrapPi(end.a2 - T2)));

  let maxR1 = 0;
  for (let i = 0; i < 720; i++) maxR1 = Math.max(maxR1, inp.driverR((TAU * i) / 720));
  const reach = maxR1 * 1.0000001;
  const cache = new Map<number, Pt>();
  const world = (pose: PairPose, v: number, lobe: number): Pt => {
    let q = cache.get(v);
    if (!q) {
      q = [inp.partner.x(v), inp.partner.y(v)];
      cache.set(v, q);
    }
    const a2 = pose.a2 - lobe * T2; // a later lobe of the partner is this one turned back by T2
    const c2 = Math.cos(a2);
    const n2 = Math.sin(a2);
    return [q[0] * c2 - q[1] * n2, -a + q[0] * n2 + q[1] * c2];
  };
  const depth = (pose: PairPose, v: number, lobe: number): number => {
    const [wx, wy] = world(pose, v, lobe);
    if (Math.abs(wx) > reach || Math.abs(wy) > reach) return -Infinity;
    // Into the driver's body frame, Rot(+α1); inside iff ρ < r₁(u).
    const c1 = Math.cos(pose.a1);
    const n1 = Math.sin(pose.a1);
    const bx = wx * c1 - wy * n1;
    const by = wx * n1 + wy * c1;
    return inp.driverR(Math.atan2(by, bx) + Math.PI / 2) - Math.hypot(bx, by);
  };
  // Every lobe of the partner is tested at every pose of a driver sector; the sectors are alike.
  const lobes = Array.from({ length: Math.max(1, Math.round(TAU / T2)) }, (_, j) => j);
  const probeGrid = paramGrid(inp.partner.V, inp.partner.breaks, 48);
  const deep = deepest(
    poses.map((q) => q.v),
    poses,
    (v) => poseAt(v, 0),
    probeGrid,
    depth,
    () => lobes,
    deadline,
  );
  const interference: Interference =
    deep.depth > INTERFERENCE_FLOOR * inp.size
      ? { depth: deep.depth, at: world(deep.pose, deep.v, deep.copy), when: deep.pose.a1 }
      : { depth: 0, at: null, when: null };
  return { axleDeviation, slip, closureError, interference };
}
