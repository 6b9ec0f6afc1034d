// A cumulative integral F(t) = ∫_{t0}^{t} f and its inverse, for positive f: the tables x(θ) = ∫ r dθ,
// θ(x) = ∫ dx / r, the follower angle and the arc lengths. Built panel by panel with the G7/K15 rule
// (Piessens et al., QUADPACK 1983) and inverted with Newton's method safeguarded by bisection, using
// the exact derivative F' = f (docs/math.md §8.2). Pieces may carry a closed form for F and its inverse
// (a straight wheel edge gives a catenary arc, a straight track edge a log spiral) and then skip
// quadrature altogether.

import { gk15 } from "./quadrature";
import { Deadline, NO_DEADLINE } from "./deadline";
import { EngineError } from "./errors";
import { lastAtOrBelow } from "./search";

export interface CumulativePiece {
  a: number;
  b: number;
  f: (t: number) => number;
  /** Closed form of ∫_a^t f, if there is one. */
  F?: (t: number) => number;
  /** Closed-form inverse of F, if there is one. */
  Finv?: (v: number) => number;
}

interface Panel {
  a: number;
  b: number;
  F0: number; // cumulative value at a
  F1: number; // cumulative value at b
  fa: number; // integrand at a and b, for the Hermite starting guess of the inverse
  fb: number;
  piece: CumulativePiece;
}

export interface CumulativeOptions {
  /** Relative accuracy asked of each panel (default 2e-14, just above the G7/K15 estimate's floor of 50·eps). */
  rel?: number;
  /** Panels at least per piece (default 8); more make the inversion start closer. */
  minPanels?: number;
  /** Most panels in all (default 4000): a noisy integrand cannot make the table grow without end. */
  maxPanels?: number;
  deadline?: Deadline;
}

export class Cumulative {
  private readonly panels: Panel[] = [];
  readonly start: number;
  readonly end: number;
  /** ∫ over the whole range. */
  readonly total: number;

  constructor(pieces: CumulativePiece[], opts: CumulativeOptions = {}) {
    const deadline = opts.deadline ?? NO_DEADLINE;
    const minPanels = opts.minPanels ?? 8;
    const rel = opts.rel ?? 2e-14;
    const maxPanels = opts.maxPanels ?? 4000;
    let acc = 0;
    for (const piece of pieces) {
      if (!(piece.b > piece.a)) continue;
      if (piece.F) {
        const v = piece.F(piece.b);
        this.panels.push({ a: piece.a, b: piece.b, F0: acc, F1: acc + v, fa: NaN, fb: NaN, piece });
        acc += v;
        continue;
      }
      // Start with minPanels equal panels, then bisect each until its own GK estimate is good.
      const stack: Array<[number, number, number]> = [];
      const w = (piece.b - piece.a) / minPanels;
      for (let i = minPanels - 1; i >= 0; i--) {
        const a = piece.a + i * w;
        const b = i === minPanels - 1 ? piece.b : piece.a + (i + 1) * w;
        stack.push([a, b, 0]);
      }
      while (stack.length) {
        deadline.check();
        const [a, b, depth] = stack.pop()!;
        const q = gk15(piece.f, a, b);
        if (!Number.isFinite(q.value))
          throw new EngineError(
            "no-solution",
            `The formula gives a value that is infinite or not a number between ${a.toPrecision(4)} and ${b.toPrecision(4)}, so the shape cannot be worked out there: check the formula in that range.`,
          );
        const room = this.panels.length + stack.length < maxPanels;
        if (
          room &&
          q.error > Math.max(rel * Math.abs(q.value), 1e-300) &&
          depth < 30 &&
          b - a > 1e-13 * (Math.abs(a) + 1)
        ) {
          const m = 0.5 * (a + b);
          stack.push([m, b, depth + 1], [a, m, depth + 1]);
          continue;
        }
        this.panels.push({ a, b, F0: acc, F1: acc + q.value, fa: piece.f(a), fb: piece.f(b), piece });
        acc += q.value;
      }
    }
    if (this.panels.length === 0) throw new EngineError("no-solution", "Empty integration range.");
    this.start = this.panels[0].a;
    this.end = this.panels[this.panels.length - 1].b;
    this.total = acc;
  }

  get panelCount(): number {
    return this.panels.length;
  }

  private panelAt(t: number): Panel {
    const p = this.panels;
    return p[lastAtOrBelow(p.length, (i) => p[i].a, t)];
  }

  /** F(t) for t in [start, end]. */
  value(t: number): number {
    if (t <= this.start) return 0;
    if (t >= this.end) return this.total;
    const p = this.panelAt(t);
    if (p.piece.F) return p.F0 + p.piece.F(t) - (p.a === p.piece.a ? 0 : p.piece.F(p.a));
    if (t === p.a) return p.F0;
    return p.F0 + gk15(p.piece.f, p.a, t).value;
  }

  /** The t with F(t) = v, for v in [0, total]. */
  inverse(v: number): number {
    if (v <= 0) return this.start;
    if (v >= this.total) return this.end;
    const p = this.panels;
    const pan = p[lastAtOrBelow(p.length, (i) => p[i].F0, v)];
    if (pan.piece.Finv) {
      const base = pan.a === pan.piece.a ? 0 : pan.piece.F!(pan.a);
      return pan.piece.Finv(v - pan.F0 + base);
    }
    // Start from the inverse of the cubic Hermite interpolant of F on the panel (F' = f is known at
    // both ends), good to O(w⁴); then Newton on g(t) = ∫_a^t f − (v − F0), g' = f > 0, kept inside
    // the panel by bisection. One or two Newton steps usually reach rounding level.
    const target = v - pan.F0;
    let a = pan.a;
    let b = pan.b;
    const w = b - a;
    const dF = pan.F1 - pan.F0;
    let tau = target / dF;
    if (Number.isFinite(pan.fa) && Number.isFinite(pan.fb)) {
      const m0 = (pan.fa * w) / dF;
      const m1 = (pan.fb * w) / dF;
      for (let i = 0; i < 8; i++) {
        const t2 = tau * tau;
        const t3 = t2 * tau;
        const H = -2 * t3 + 3 * t2 + m0 * (t3 - 2 * t2 + tau) + m1 * (t3 - t2) - target / dF;
        const dH = -6 * t2 + 6 * tau + m0 * (3 * t2 - 4 * tau + 1) + m1 * (3 * t2 - 2 * tau);
        if (!(dH > 0)) break;
        const next = Math.min(1, Math.max(0, tau - H / dH));
        if (Math.abs(next - tau) < 1e-15) {
          tau = next;
          break;
        }
        tau = next;
      }
    }
    let t = a + w * tau;
    for (let i = 0; i < 60; i++) {
      const g = gk15(pan.piece.f, pan.a, t).value - target;
      const step = g / pan.piece.f(t);
      // Newton converges quadratically: after a step this small the error left is at rounding level.
      if (Math.abs(step) <= 1e-8 * w) return Math.min(pan.b, Math.max(pan.a, t - step));
      if (g > 0) b = t;
      else a = t;
      let next = t - step;
      if (!(next > a && next < b)) next = 0.5 * (a + b);
      t = next;
    }
    return t;
  }
}
