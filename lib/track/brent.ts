// Brent's root finder: bisection, secant and inverse quadratic interpolation, with the guarantee of
// convergence on a sign-change bracket. R. P. Brent, "Algorithms for Minimization without
// Derivatives", Prentice-Hall 1973, ch. 4 (the procedure "zero").

import { Deadline, NO_DEADLINE } from "./deadline";
import { EngineError } from "./errors";

/** The two ends of the search do not straddle a root: the caller says what that means for the design. */
export class NotBracketedError extends EngineError {
  constructor(message: string) {
    super("no-solution", message);
  }
}

export interface BrentOptions {
  /** Absolute tolerance on the root (default 1e-15 · |root|-scale, never below 4·eps·|x|). */
  xtol?: number;
  maxIter?: number;
  deadline?: Deadline;
}

export interface BrentResult {
  root: number;
  /** f at the root. */
  residual: number;
  iterations: number;
}

const EPS = 2.220446049250313e-16;

export function brent(f: (x: number) => number, a: number, b: number, opts: BrentOptions = {}): BrentResult {
  const deadline = opts.deadline ?? NO_DEADLINE;
  const maxIter = opts.maxIter ?? 200;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return { root: a, residual: 0, iterations: 0 };
  if (fb === 0) return { root: b, residual: 0, iterations: 0 };
  if (Math.sign(fa) === Math.sign(fb) || Number.isNaN(fa) || Number.isNaN(fb))
    throw new NotBracketedError(`The root is not bracketed: f(${a}) = ${fa}, f(${b}) = ${fb}.`);
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 1; iter <= maxIter; iter++) {
    deadline.checkNow();
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + 0.5 * (opts.xtol ?? 1e-15 * Math.max(1, Math.abs(b)));
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return { root: b, residual: fb, iterations: iter };
    if (Math.abs(e) < tol || Math.abs(fa) <= Math.abs(fb)) {
      d = m;
      e = m;
    } else {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s; // secant
        q = 1 - s;
      } else {
        const qq = fa / fc; // inverse quadratic interpolation
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return { root: b, residual: fb, iterations: maxIter };
}

/** Minimum of f on [a, b] by golden-section search (for flat extrema where a root finder is not needed). */
export function goldenMin(f: (x: number) => number, a: number, b: number, iters = 80): { x: number; f: number } {
  const g = 0.3819660112501051;
  let x1 = a + g * (b - a);
  let x2 = b - g * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < iters && b - a > 1e-15 * (Math.abs(a) + Math.abs(b) + 1e-300); i++) {
    if (f1 < f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = a + g * (b - a);
      f1 = f(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = b - g * (b - a);
      f2 = f(x2);
    }
  }
  return f1 < f2 ? { x: x1, f: f1 } : { x: x2, f: f2 };
}
