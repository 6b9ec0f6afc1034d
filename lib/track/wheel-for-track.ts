// The wheel for a given track: r = h − y(x), θ(x) = ∫₀ˣ dx / (h − y) (for a parametric track,
// θ = ∫ x′(s) / (h − y(s)) ds), L. Hall and S. Wagon, "Roads and Wheels", Math. Mag. 65(5), 1992.
// The axle height h is the root of the closure condition ∫_period dx / (h − y) = 2π / k, found by
// Brent's method (Brent 1973) on the bracket h ∈ [kP/2π + y_min, kP/2π + y_max] ∩ (y_max, ∞)
// (docs/math.md §1.5, §1.8). A straight track segment is integrated in closed form (it gives a log-spiral
// arc of the wheel). The same code serves the lower wheel of a twin pair (sgn = −1: r = y − h).

import { brent, NotBracketedError } from "./brent";
import { Cumulative, type CumulativePiece } from "./cumulative";
import type { Deadline } from "./deadline";
import { EngineError } from "./errors";
import { integrate } from "./quadrature";
import type { Track, TrackPiece } from "./tracks";
import { TAU } from "./wheels";

/** +1: the wheel above the track (r = h − y); −1: the wheel below it (r = y − h). */
export type Side = 1 | -1;

function thetaPiece(p: TrackPiece, h: number, sgn: Side): CumulativePiece {
  if (p.kind === "segment") {
    const y0 = p.y(p.s0);
    const m = (p.y(p.s1) - y0) / (p.s1 - p.s0);
    const r0 = sgn * (h - y0);
    const k = sgn * m; // r = r0 − k·u
    const q = k / r0;
    return {
      a: p.s0,
      b: p.s1,
      f: (s) => 1 / (r0 - k * (s - p.s0)),
      F: (s) => (k === 0 ? (s - p.s0) / r0 : -Math.log1p(-q * (s - p.s0)) / k),
      Finv: (v) => p.s0 + (k === 0 ? v * r0 : -Math.expm1(-k * v) / q),
    };
  }
  return { a: p.s0, b: p.s1, f: (s) => p.dx(s) / (sgn * (h - p.y(s))) };
}

/** ∫ over one period of dx / r for axle height h. */
export function closureAngle(track: Track, h: number, sgn: Side, deadline: Deadline): number {
  let sum = 0;
  for (const p of track.pieces) {
    const c = thetaPiece(p, h, sgn);
    sum += c.F ? c.F(c.b) : integrate(c.f, c.a, c.b, [], { rel: 1e-13, deadline }).value;
  }
  return sum;
}

/** The axle height closing the wheel with k periods per turn. */
export function solveAxleHeight(track: Track, k: number, sgn: Side, deadline: Deadline): number {
  const P = track.period;
  const scale = Math.max(P, track.yMax - track.yMin);
  const target = TAU / k;
  const c = (k * P) / TAU;
  const F = (h: number) => closureAngle(track, h, sgn, deadline) - target;
  let lo: number;
  let hi: number;
  if (sgn === 1) {
    const touch = track.yMax + 1e-12 * scale;
    lo = Math.max(touch, c + track.yMin);
    hi = Math.max(c + track.yMax, lo + 1e-12 * scale);
  } else {
    const touch = track.yMin - 1e-12 * scale;
    hi = Math.min(touch, track.yMax - c);
    lo = Math.min(track.yMin - c, hi - 1e-12 * scale);
  }
  const near = sgn === 1 ? lo : hi; // the end nearest the track
  const far = sgn === 1 ? hi : lo;
  const fNear = F(near);
  if (!(fNear > 0)) {
    throw new EngineError(
      "no-solution",
      `No axle height closes the wheel with ${k} period${k === 1 ? "" : "s"} per turn: the wheel would need r = 0 at the ` +
        `track's ${sgn === 1 ? "highest" : "lowest"} point. Choose more periods per turn.`,
      "periodsPerTurn",
    );
  }
  let fFar = F(far);
  let farX = far;
  // The analytic bracket always holds; widen once in case rounding put the far end on the root's wrong side.
  if (fFar > 0) {
    farX = far + sgn * scale;
    fFar = F(farX);
  }
  try {
    return brent(F, Math.min(near, farX), Math.max(near, farX), { xtol: 1e-15 * scale, deadline }).root;
  } catch (e) {
    if (!(e instanceof NotBracketedError)) throw e;
    throw new EngineError(
      "no-solution",
      `No axle height gives a wheel that closes with ${k} period${k === 1 ? "" : "s"} per turn for this track: try fewer periods per turn or a gentler track.`,
      "periodsPerTurn",
    );
  }
}

export interface WheelFromTrack {
  h: number;
  sgn: Side;
  k: number;
  /** Body angle per period (2π/k when closed). */
  T: number;
  /** Angle actually turned over one period (equals T up to the closure residual). */
  theta: number;
  /** Wheel angle touching the track at x ∈ [0, P] (the turn angle when the axle is at x). */
  thetaAt(x: number): number;
  /** Track x touching at wheel angle t ∈ [0, T] (the inverse of thetaAt). */
  xAt(t: number): number;
  /** Wheel radius at body angle t (any t; the wheel repeats every T). */
  r(t: number): number;
  /** Body angles in (0, T) where the wheel has corners or piece joins (track cusps and vertices). */
  breaks: number[];
  /** Body point at track parameter s of piece i (start pose, axle at the origin). */
  point(i: number, s: number): [number, number];
  /** Body angle at track parameter s of piece i. */
  thetaOf(i: number, s: number): number;
}

export function wheelFromTrack(track: Track, h: number, k: number, sgn: Side, deadline: Deadline): WheelFromTrack {
  const cums = track.pieces.map((p) => new Cumulative([thetaPiece(p, h, sgn)], { deadline }));
  const offsets: number[] = [];
  let acc = 0;
  for (const c of cums) {
    offsets.push(acc);
    acc += c.total;
  }
  const theta = acc;
  const T = TAU / k;
  const xStarts = track.pieces.map((p) => p.x(p.s0));
  const pieceAtX = (x: number) => {
    let i = 0;
    while (i + 1 < xStarts.length && xStarts[i + 1] <= x) i++;
    return i;
  };
  const thetaOf = (i: number, s: number) => offsets[i] + cums[i].value(s);
  const thetaAt = (x: number) => {
    const i = pieceAtX(x);
    return thetaOf(i, track.pieces[i].sOf(x));
  };
  const r = (t: number): number => {
    let u = t % T;
    if (u < 0) u += T;
    // The pattern spans [0, theta]; theta = T up to the closure residual, so scale the angle across.
    const v = (u * theta) / T;
    let i = 0;
    while (i + 1 < offsets.length && offsets[i + 1] <= v) i++;
    const s = cums[i].inverse(v - offsets[i]);
    return sgn * (h - track.pieces[i].y(s));
  };
  const locate = (t: number): [number, number] => {
    const v = Math.min(Math.max(t, 0), T) * (theta / T);
    let i = 0;
    while (i + 1 < offsets.length && offsets[i + 1] <= v) i++;
    return [i, cums[i].inverse(v - offsets[i])];
  };
  const xAt = (t: number) => {
    const [i, s] = locate(t);
    return track.pieces[i].x(s);
  };
  const point = (i: number, s: number): [number, number] => {
    const th = thetaOf(i, s);
    const rr = sgn * (h - track.pieces[i].y(s));
    // Above the track the contact ray points down (sin, −cos); below it, up (sin, cos).
    return [rr * Math.sin(th), -sgn * rr * Math.cos(th)];
  };
  return { h, sgn, k, T, theta, thetaAt, xAt, r, breaks: offsets.slice(1), point, thetaOf };
}
