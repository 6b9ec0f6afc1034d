// The bench's baseline: a plain, general-purpose numeric script for the same outputs as the engine,
// the way one would write it with a quadrature and a root finder at hand (SciPy's quad + brentq
// idiom) and nothing else. Recursive adaptive Gauss–Kronrod G7/K15 with QUADPACK's error estimate
// (R. Piessens et al., QUADPACK 1983, the rule without the global list), Brent's zero
// (R. P. Brent 1973, ch. 4) on the documented brackets (docs/math.md §1.8, §5.3), golden-section
// search for maxima (J. Kiefer 1953), and recursive midpoint subdivision of the output curves to
// the chord tolerance. No cumulative tables, no closed forms, no reuse between calls: a quantity
// at a parameter u is ∫₀ᵘ by quadrature each time it is asked for. It shares with lib/track only
// the general tools (one K15 rule, Brent's zero, golden section: lib/track/brent.ts, quadrature.ts),
// the wheel's and track's own shape functions (the inputs) and, for the rolling check, the output
// curves it is given; none of the engine's tables, closed forms or reuse.

import { brent, goldenMin } from "../lib/track/brent";
import { gk15 } from "../lib/track/quadrature";
import type { Pt } from "../lib/track/sampling";

type Fn = (x: number) => number;

/** Counts integrand evaluations, so the bench can say how much work each side did. */
export const work = { evals: 0 };

/** The K15 value of one interval and QUADPACK's estimate of its error (the qk15 rule). */
function kronrod(f: Fn, a: number, b: number): [number, number] {
  const r = gk15(f, a, b);
  work.evals += 15;
  return [r.value, r.error];
}

/** Most subintervals per integral, as SciPy's quad has `limit` (a noisy integrand would split for ever). */
const LIMIT = 2000;

function adapt(f: Fn, a: number, b: number, tol: number, depth: number, left: { n: number }): number {
  const [k, err] = kronrod(f, a, b);
  // Below 50·eps of the piece the difference is rounding (QUADPACK's floor), not error.
  if (err <= Math.max(tol, 1.1e-14 * Math.abs(k)) || depth >= 50 || --left.n <= 0) return k;
  const m = 0.5 * (a + b);
  return adapt(f, a, m, tol / 2, depth + 1, left) + adapt(f, m, b, tol / 2, depth + 1, left);
}

/** ∫ f over [a, b] to about `rel` of the integral (an absolute goal from a first estimate), split at `breaks`. */
export function quad(f: Fn, a: number, b: number, rel = 1e-13, breaks: readonly number[] = []): number {
  if (a === b) return 0;
  if (b < a) return -quad(f, b, a, rel, breaks);
  const cuts = [a, ...breaks.filter((x) => x > a && x < b), b];
  let rough = 0;
  for (let i = 0; i + 1 < cuts.length; i++) rough += Math.abs(kronrod(f, cuts[i], cuts[i + 1])[0]);
  const tol = Math.max(rel * rough, 1e-300);
  let sum = 0;
  const left = { n: LIMIT };
  for (let i = 0; i + 1 < cuts.length; i++) sum += adapt(f, cuts[i], cuts[i + 1], tol / (cuts.length - 1), 0, left);
  return sum;
}

/** Brent's zero of f on [a, b], f(a) and f(b) of opposite signs (R. P. Brent 1973, ch. 4: lib/track/brent.ts). */
export const brentq = (f: Fn, a: number, b: number, xtol: number): number => brent(f, a, b, { xtol }).root;

/** Largest value of f on [a, b] by golden-section search (J. Kiefer 1953: lib/track/brent.ts). */
export function goldenMax(f: Fn, a: number, b: number, iters: number): { x: number; f: number } {
  const m = goldenMin((x) => -f(x), a, b, iters);
  return { x: m.x, f: -m.f };
}

/** How far the point (x, y), seen from the axle, sits inside a body r(t) turned by `angle` (negative: outside). */
function depthInBody(r: Fn, x: number, y: number, angle: number): number {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const bx = x * c - y * s;
  const by = x * s + y * c;
  return r(Math.atan2(by, bx) + Math.PI / 2) - Math.hypot(bx, by);
}

function chordDist(p: Pt, a: Pt, b: Pt): number {
  const ex = b[0] - a[0];
  const ey = b[1] - a[1];
  const L2 = ex * ex + ey * ey;
  const s = L2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * ex + (p[1] - a[1]) * ey) / L2));
  return Math.hypot(p[0] - a[0] - s * ex, p[1] - a[1] - s * ey);
}

/** A polyline of c on [u0, u1] within `tol` of the curve: halve each segment while its midpoint or quarter points stray. */
export function samplePlain(c: (u: number) => Pt, u0: number, u1: number, breaks: readonly number[], tol: number) {
  const knots = [u0, ...breaks.filter((b) => b > u0 && b < u1), u1];
  const u: number[] = [u0];
  const pts: Pt[] = [c(u0)];
  const split = (a: number, pa: Pt, b: number, pb: Pt, depth: number) => {
    const m = 0.5 * (a + b);
    const pm = c(m);
    const far =
      chordDist(pm, pa, pb) > tol ||
      chordDist(c(0.5 * (a + m)), pa, pb) > tol ||
      chordDist(c(0.5 * (m + b)), pa, pb) > tol;
    if (far && depth < 40) {
      split(a, pa, m, pm, depth + 1);
      split(m, pm, b, pb, depth + 1);
    } else {
      u.push(b);
      pts.push(pb);
    }
  };
  for (let k = 0; k + 1 < knots.length; k++)
    for (let i = 0; i < 4; i++) {
      const a = knots[k] + ((knots[k + 1] - knots[k]) * i) / 4;
      const b = i === 3 ? knots[k + 1] : knots[k] + ((knots[k + 1] - knots[k]) * (i + 1)) / 4;
      split(a, c(a), b, c(b), 0);
    }
  return { u, pts };
}

const TAU = 2 * Math.PI;
const ray = (t: number): Pt => [Math.sin(t), -Math.cos(t)];

/** Track for a wheel r(t) (Hall & Wagon 1992): x(u) = ∫₀ᵘ r, y = −r, sampled, and the wheel outline. */
export function plainTrackForWheel(r: Fn, n: number, corners: readonly number[], tol: number) {
  const T = TAU / n;
  const inT = corners.filter((c) => c > 0 && c < T);
  const period = quad(r, 0, T, 1e-13, inT);
  const track = samplePlain((u) => [quad(r, 0, u, 1e-13, inT), -r(u)], 0, T, inT, tol);
  const wheel = samplePlain(
    (t) => {
      const [x, y] = ray(t);
      return [r(t) * x, r(t) * y];
    },
    0,
    TAU,
    corners,
    tol,
  );
  return { period, track, wheel };
}

/** Axle height closing a wheel above the graph y(x) of period P with k periods per turn (docs/math.md §1.5, §1.8). */
export function plainAxleHeight(y: Fn, P: number, k: number, yMin: number, yMax: number): number {
  const F = (h: number) => quad((x) => 1 / (h - y(x)), 0, P) - TAU / k;
  const c = (k * P) / TAU;
  const scale = Math.max(P, yMax - yMin);
  const lo = Math.max(yMax + 1e-12 * scale, c + yMin);
  return brentq(F, lo, Math.max(c + yMax, lo + 1e-12 * scale), 1e-15 * scale);
}

/** The wheel for the graph track y(x), k periods per turn: h, then θ(x) = ∫₀ˣ dx/(h − y), sampled. */
export function plainWheelForTrack(y: Fn, P: number, k: number, yMin: number, yMax: number, tol: number) {
  const h = plainAxleHeight(y, P, k, yMin, yMax);
  const f = (x: number) => 1 / (h - y(x));
  const closure = quad(f, 0, P);
  const wheel = samplePlain(
    (x) => {
      const th = quad(f, 0, x);
      const rr = h - y(x);
      return [rr * Math.sin(th), -rr * Math.cos(th)];
    },
    0,
    P,
    [],
    tol,
  );
  const track = samplePlain((x) => [x, y(x)], 0, P, [], tol);
  return { h, closure, wheel, track };
}

/** Centre distance of the m-lobed partner of an n-fold driver r(t) (docs/math.md §5.3), then θ₂(t) sampled. */
export function plainPartner(
  r: Fn,
  n: number,
  m: number,
  corners: readonly number[],
  rMin: number,
  rMax: number,
  tol: number,
) {
  const T1 = TAU / n;
  const inT = corners.filter((c) => c > 0 && c < T1);
  const q = n / m;
  const F = (a: number) => quad((t) => r(t) / (a - r(t)), 0, T1, 1e-13, inT) - TAU / m;
  const lo = Math.max(rMax * (1 + 1e-12), (rMin * (1 + q)) / q);
  const a = brentq(F, lo, Math.max((rMax * (1 + q)) / q, lo * (1 + 1e-12)), 1e-15 * rMax);
  const g = (t: number) => r(t) / (a - r(t));
  const closure = quad(g, 0, T1, 1e-13, inT);
  const partner = samplePlain(
    (t) => {
      const th = quad(g, 0, t, 1e-13, inT);
      const rr = a - r(t);
      return [rr * Math.sin(th), rr * Math.cos(th)];
    },
    0,
    T1,
    inT,
    tol,
  );
  const wheel = samplePlain((t) => [r(t) * Math.sin(t), -r(t) * Math.cos(t)], 0, TAU, corners, tol);
  return { a, closure, partner, wheel };
}

/** A curve c(v), v ∈ [0, V], smooth between `breaks`: the rolling check's input. */
export interface PlainCurve {
  x: Fn;
  y: Fn;
  V: number;
  breaks: number[];
}

/** Central difference of f at v, one-sided within `h` of the piece ends lo, hi (4th order both). */
function deriv(f: Fn, v: number, lo: number, hi: number, h: number): number {
  if (v - lo >= 2 * h && hi - v >= 2 * h) return (f(v - 2 * h) - 8 * f(v - h) + 8 * f(v + h) - f(v + 2 * h)) / (12 * h);
  const s = v - lo < hi - v ? 1 : -1;
  const g = 0.5 * h;
  return (
    (s * (-25 * f(v) + 48 * f(v + s * g) - 36 * f(v + 2 * s * g) + 16 * f(v + 3 * s * g) - 3 * f(v + 4 * s * g))) /
    (12 * g)
  );
}

function pieceOf(c: PlainCurve, v: number, side: number): [number, number] {
  const knots = [0, ...c.breaks, c.V];
  for (let i = 0; i + 1 < knots.length; i++)
    if ((v > knots[i] || (v === knots[i] && side >= 0)) && (v < knots[i + 1] || (v === knots[i + 1] && side < 0)))
      return [knots[i], knots[i + 1]];
  return [knots[knots.length - 2], knots[knots.length - 1]];
}

function tangentOf(c: PlainCurve, v: number, side: number): [number, number] {
  const [lo, hi] = pieceOf(c, v, side);
  const h = 1e-3 * Math.min(c.V, hi - lo);
  return [deriv(c.x, v, lo, hi, h), deriv(c.y, v, lo, hi, h)];
}

const arcLength = (c: PlainCurve, v: number) =>
  quad(
    (w) => Math.hypot(...tangentOf(c, w, 0)),
    0,
    v,
    1e-11,
    c.breaks.filter((b) => b < v),
  );

/** The v where the rolled-off arc length of c is s: Brent on s(v) − s, each s(v) its own quadrature. */
const arcInverse = (c: PlainCurve, s: number, total: number) =>
  s <= 0 ? 0 : s >= total ? c.V : brentq((v) => arcLength(c, v) - s, 0, c.V, 1e-13 * c.V);

export interface PlainRoll {
  axleDeviation: number;
  closureError: number;
  depth: number;
}

const wrapPi = (a: number) => a - TAU * Math.round(a / TAU);

/**
 * The roll of a wheel curve on a track curve below the axle line y = H, by the definition only
 * (equal arc lengths, shared tangent), at 97 poses; then the deepest cut of the track into the
 * wheel (radial test against wheelR) or of the wheel into the track (vertical test against trackY)
 * over a 48-per-piece grid, refined by golden section.
 */
export function plainTrackRoll(inp: {
  wheel: PlainCurve;
  track: PlainCurve;
  T: number;
  H: number;
  probe:
    | { kind: "track"; wheelR: Fn }
    | { kind: "wheel"; curve: (v: number) => Pt; V: number; breaks: number[]; trackY: Fn };
}): PlainRoll {
  const { wheel, track, H } = inp;
  const Wtot = arcLength(wheel, wheel.V);
  const U = track.V;
  const P = track.x(U) - track.x(0);
  const angle = ([dx, dy]: [number, number]) => Math.atan2(dy, dx);
  const poseAt = (u: number, side: number) => {
    const v = arcInverse(wheel, arcLength(track, u), Wtot);
    const alpha = angle(tangentOf(wheel, v, side)) - angle(tangentOf(track, u, side));
    const px = wheel.x(v);
    const py = wheel.y(v);
    const c = Math.cos(alpha);
    const s = Math.sin(alpha);
    return { u, alpha, ax: track.x(u) - (px * c + py * s), ay: track.y(u) - (-px * s + py * c) };
  };
  const poses = [];
  let dev = 0;
  for (let i = 0; i <= 96; i++) {
    const u = (U * i) / 96;
    if (i > 0 && i < 96 && track.breaks.some((b) => Math.abs(b - u) < 1e-12 * U)) continue;
    const side = i === 0 ? 1 : i === 96 ? -1 : 0;
    // A curve whose speed vanishes at an end (a cusp) has no tangent there: pose a hair inside.
    const speed = Math.hypot(...tangentOf(track, u, side));
    const uu = side !== 0 && speed < 1e-6 * (P / U) ? u + side * 1e-4 * U : u;
    const p = poseAt(uu, side);
    poses.push(p);
    dev = Math.max(dev, Math.abs(p.ay - H));
  }
  const closureError = Math.abs(wrapPi(poses[poses.length - 1].alpha - inp.T));
  const probe = inp.probe;
  let reach = 0;
  for (let i = 0; i <= 256; i++)
    reach = Math.max(reach, Math.hypot(wheel.x((wheel.V * i) / 256), wheel.y((wheel.V * i) / 256)));
  reach *= 1.0000001;
  type P2 = (typeof poses)[number];
  const depthAt = (pose: P2, v: number): number => {
    if (probe.kind === "wheel") {
      const [bx, by] = probe.curve(v);
      const c = Math.cos(pose.alpha);
      const s = Math.sin(pose.alpha);
      const wx = pose.ax + bx * c + by * s;
      return probe.trackY(wx) - (pose.ay - bx * s + by * c);
    }
    // Every copy of the track period within reach of the wheel.
    let best = -Infinity;
    const tx = track.x(v);
    const ty = track.y(v);
    for (let k = Math.floor((pose.ax - reach) / P) - 1; k <= Math.floor((pose.ax + reach) / P) + 1; k++) {
      const dx = tx + k * P - pose.ax;
      const dy = ty - pose.ay;
      if (Math.abs(dx) > reach || Math.abs(dy) > reach) continue;
      best = Math.max(best, depthInBody(probe.wheelR, dx, dy, pose.alpha));
    }
    return best;
  };
  const grid = probe.kind === "track" ? gridOf(U, track.breaks) : gridOf(probe.V, probe.breaks);
  return { axleDeviation: dev, closureError, depth: deepestPlain(poses, (u) => poseAt(u, 0), grid, depthAt) };
}

function gridOf(V: number, breaks: readonly number[]): number[] {
  const knots = [0, ...breaks, V];
  const out: number[] = [];
  for (let i = 0; i + 1 < knots.length; i++)
    for (let j = 0; j < 48; j++) out.push(knots[i] + ((knots[i + 1] - knots[i]) * j) / 48);
  out.push(V);
  return out;
}

/** Grid over poses and probe points, then golden section in the probe and in the pose around the best. */
function deepestPlain<T extends { u: number }>(
  poses: T[],
  poseOf: (u: number) => T,
  grid: number[],
  depth: (pose: T, v: number) => number,
): number {
  const overProbe = (pose: T) => {
    let best = -Infinity;
    let j = 0;
    grid.forEach((v, i) => {
      const d = depth(pose, v);
      if (d > best) [best, j] = [d, i];
    });
    const g = goldenMax((v) => depth(pose, v), grid[Math.max(0, j - 1)], grid[Math.min(grid.length - 1, j + 1)], 40);
    return Math.max(best, g.f);
  };
  let bi = 0;
  let bd = -Infinity;
  poses.forEach((p, i) => {
    const d = overProbe(p);
    if (d > bd) [bd, bi] = [d, i];
  });
  const lo = poses[Math.max(0, bi - 1)].u;
  const hi = poses[Math.min(poses.length - 1, bi + 1)].u;
  const g = goldenMax((u) => overProbe(poseOf(u)), lo, hi, 30);
  return Math.max(0, bd, g.f);
}

/**
 * The roll of a driver curve on a partner curve, axles fixed at (0, 0) and (0, −a): equal arc
 * lengths and a shared tangent fix both turns; the change of the centre distance is the deviation.
 */
export function plainPairRoll(inp: {
  driver: PlainCurve;
  partner: PlainCurve;
  driverR: Fn;
  T1: number;
  T2: number;
  a: number;
}): PlainRoll {
  const { driver, partner, a, T2 } = inp;
  const Qtot = arcLength(partner, partner.V);
  const V = driver.V;
  const angle = ([dx, dy]: [number, number]) => Math.atan2(dy, dx);
  const poseAt = (v: number, side: number) => {
    const w = arcInverse(partner, arcLength(driver, v), Qtot);
    const beta = angle(tangentOf(driver, v, side)) - angle(tangentOf(partner, w, side));
    const [p1x, p1y, p2x, p2y] = [driver.x(v), driver.y(v), partner.x(w), partner.y(w)];
    const gap = (a1: number): [number, number] => {
      const [c1, n1, c2, n2] = [Math.cos(a1), Math.sin(a1), Math.cos(beta - a1), Math.sin(beta - a1)];
      return [p1x * c1 + p1y * n1 - (p2x * c2 - p2y * n2), -p1x * n1 + p1y * c1 - (-a + p2x * n2 + p2y * c2)];
    };
    // The horizontal gap vanishes at the driver's turn: bracket it around the polar angle of p1.
    const a0 = Math.atan2(p1x, -p1y);
    let lo = a0 - 0.5;
    let hi = a0 + 0.5;
    while (Math.sign(gap(lo)[0]) === Math.sign(gap(hi)[0]) && hi - lo < 4) [lo, hi] = [lo - 0.5, hi + 0.5];
    const a1 = brentq((t) => gap(t)[0], lo, hi, 1e-15);
    return { u: v, a1, a2: beta - a1, dev: Math.abs(gap(a1)[1]) };
  };
  const poses = [];
  let dev = 0;
  for (let i = 0; i <= 96; i++) {
    const v = (V * i) / 96;
    if (i > 0 && i < 96 && driver.breaks.some((b) => Math.abs(b - v) < 1e-12 * V)) continue;
    const p = poseAt(v, i === 0 ? 1 : i === 96 ? -1 : 0);
    poses.push(p);
    dev = Math.max(dev, p.dev);
  }
  const end = poses[poses.length - 1];
  const closureError = Math.max(Math.abs(wrapPi(end.a1 - inp.T1)), Math.abs(wrapPi(end.a2 - inp.T2)));
  let reach = 0;
  for (let i = 0; i < 720; i++) reach = Math.max(reach, inp.driverR((TAU * i) / 720));
  reach *= 1.0000001;
  const lobes = Math.max(1, Math.round(TAU / T2));
  type P2 = (typeof poses)[number];
  const depthAt = (pose: P2, v: number): number => {
    let best = -Infinity;
    const qx = partner.x(v);
    const qy = partner.y(v);
    for (let l = 0; l < lobes; l++) {
      const a2 = pose.a2 - l * T2;
      const wx = qx * Math.cos(a2) - qy * Math.sin(a2);
      const wy = -a + qx * Math.sin(a2) + qy * Math.cos(a2);
      if (Math.abs(wx) > reach || Math.abs(wy) > reach) continue;
      best = Math.max(best, depthInBody(inp.driverR, wx, wy, pose.a1));
    }
    return best;
  };
  return {
    axleDeviation: dev,
    closureError,
    depth: deepestPlain(poses, (v) => poseAt(v, 0), gridOf(partner.V, partner.breaks), depthAt),
  };
}
