// Adaptive Gauss–Kronrod quadrature, the G7/K15 pair with QUADPACK's error estimate and global
// bisection of the worst interval (QAG): R. Piessens, E. de Doncker-Kapenga, C. W. Überhuber,
// D. K. Kahaner, "QUADPACK", Springer 1983. Nodes and weights are QUADPACK's qk15 tables.
// Integrands with corners must be split at the corners by the caller (`breaks`): the rule is exact
// for smooth pieces only, and that is how the engine stays exact across polygon corners.

import { Deadline, NO_DEADLINE } from "./deadline";

const XGK = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851, 0.864864423359769072789712788640926,
  0.741531185599394439863864773280788, 0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0.0,
];
const WGK = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204, 0.104790010322250183839876322541518,
  0.140653259715525918745189590510238, 0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
// Gauss weights for the nodes XGK[1], XGK[3], XGK[5], XGK[7].
const WG = [
  0.129484966168869693270611432679082, 0.27970539148927666790146777142378, 0.381830050505118944950369775488975,
  0.417959183673469387755102040816327,
];
const EPS = 2.220446049250313e-16;

export interface QuadResult {
  value: number;
  error: number;
  /** Number of integrand evaluations. */
  evals: number;
}

/**
 * One 15-point Kronrod estimate with QUADPACK's error estimate (qk15). Written out with local
 * variables, no arrays: integrands here call quadrature themselves (inverse tables inside arc
 * lengths), so shared scratch space would be overwritten, and allocating would feed the collector.
 */
export function gk15(f: (x: number) => number, a: number, b: number): QuadResult {
  const c = 0.5 * (a + b);
  const h = 0.5 * (b - a);
  const fc = f(c);
  const d0 = h * XGK[0],
    d1 = h * XGK[1],
    d2 = h * XGK[2],
    d3 = h * XGK[3];
  const d4 = h * XGK[4],
    d5 = h * XGK[5],
    d6 = h * XGK[6];
  const l0 = f(c - d0),
    r0 = f(c + d0);
  const l1 = f(c - d1),
    r1 = f(c + d1);
  const l2 = f(c - d2),
    r2 = f(c + d2);
  const l3 = f(c - d3),
    r3 = f(c + d3);
  const l4 = f(c - d4),
    r4 = f(c + d4);
  const l5 = f(c - d5),
    r5 = f(c + d5);
  const l6 = f(c - d6),
    r6 = f(c + d6);
  const resk =
    WGK[0] * (l0 + r0) +
    WGK[1] * (l1 + r1) +
    WGK[2] * (l2 + r2) +
    WGK[3] * (l3 + r3) +
    WGK[4] * (l4 + r4) +
    WGK[5] * (l5 + r5) +
    WGK[6] * (l6 + r6) +
    WGK[7] * fc;
  const resg = WG[0] * (l1 + r1) + WG[1] * (l3 + r3) + WG[2] * (l5 + r5) + WG[3] * fc;
  const A = Math.abs;
  let resabs =
    WGK[0] * (A(l0) + A(r0)) +
    WGK[1] * (A(l1) + A(r1)) +
    WGK[2] * (A(l2) + A(r2)) +
    WGK[3] * (A(l3) + A(r3)) +
    WGK[4] * (A(l4) + A(r4)) +
    WGK[5] * (A(l5) + A(r5)) +
    WGK[6] * (A(l6) + A(r6)) +
    WGK[7] * A(fc);
  const m = resk * 0.5;
  let resasc =
    WGK[0] * (A(l0 - m) + A(r0 - m)) +
    WGK[1] * (A(l1 - m) + A(r1 - m)) +
    WGK[2] * (A(l2 - m) + A(r2 - m)) +
    WGK[3] * (A(l3 - m) + A(r3 - m)) +
    WGK[4] * (A(l4 - m) + A(r4 - m)) +
    WGK[5] * (A(l5 - m) + A(r5 - m)) +
    WGK[6] * (A(l6 - m) + A(r6 - m)) +
    WGK[7] * A(fc - m);
  const ah = A(h);
  resasc *= ah;
  resabs *= ah;
  let err = A((resk - resg) * h);
  if (resasc !== 0 && err !== 0) err = resasc * Math.min(1, Math.pow((200 * err) / resasc, 1.5));
  if (resabs > Number.MIN_VALUE / (50 * EPS)) err = Math.max(50 * EPS * resabs, err);
  return { value: resk * h, error: err, evals: 15 };
}

export interface QuadOptions {
  /** Absolute error goal (default 0). */
  abs?: number;
  /** Relative error goal (default 1e-13, close to QUADPACK's floor of 50·eps). */
  rel?: number;
  /** Most intervals kept before giving up and returning the best estimate (default 2000). */
  maxIntervals?: number;
  deadline?: Deadline;
}

interface Interval {
  a: number;
  b: number;
  value: number;
  error: number;
}

/**
 * ∫ f over [a, b], split first at `breaks` (points inside (a, b) where f or a derivative jumps),
 * then refined by bisecting the interval with the largest error estimate (QAG).
 */
export function integrate(
  f: (x: number) => number,
  a: number,
  b: number,
  breaks: readonly number[] = [],
  opts: QuadOptions = {},
): QuadResult {
  const absTol = opts.abs ?? 0;
  const relTol = opts.rel ?? 1e-13;
  const maxIntervals = opts.maxIntervals ?? 2000;
  const deadline = opts.deadline ?? NO_DEADLINE;
  if (a === b) return { value: 0, error: 0, evals: 0 };
  const sign = b < a ? -1 : 1;
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const cuts = [lo, ...breaks.filter((x) => x > lo && x < hi).sort((p, q) => p - q), hi];
  const list: Interval[] = [];
  let evals = 0;
  for (let i = 0; i + 1 < cuts.length; i++) {
    if (cuts[i + 1] <= cuts[i]) continue;
    const r = gk15(f, cuts[i], cuts[i + 1]);
    evals += r.evals;
    list.push({ a: cuts[i], b: cuts[i + 1], value: r.value, error: r.error });
  }
  let value = 0;
  let error = 0;
  for (const iv of list) {
    value += iv.value;
    error += iv.error;
  }
  while (error > Math.max(absTol, relTol * Math.abs(value)) && list.length < maxIntervals) {
    deadline.check();
    let worst = 0;
    for (let i = 1; i < list.length; i++) if (list[i].error > list[worst].error) worst = i;
    const iv = list[worst];
    const m = 0.5 * (iv.a + iv.b);
    if (m <= iv.a || m >= iv.b) break; // the interval cannot be split further in doubles
    const left = gk15(f, iv.a, m);
    const right = gk15(f, m, iv.b);
    evals += 30;
    list[worst] = { a: iv.a, b: m, value: left.value, error: left.error };
    list.push({ a: m, b: iv.b, value: right.value, error: right.error });
    // Sum again instead of updating, so rounding in the running totals cannot build up.
    value = 0;
    error = 0;
    for (const it of list) {
      value += it.value;
      error += it.error;
    }
  }
  if (!Number.isFinite(value)) error = Infinity;
  return { value: sign * value, error, evals };
}
