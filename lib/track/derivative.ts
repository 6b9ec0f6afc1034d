// Finite-difference derivatives for the check figures (slope, friction demand, curvature) and the
// independent rolling simulation. Central 4th-order stencils away from corners, 4th-order one-sided
// stencils when a corner (a break) is within reach, so a stencil never straddles a kink.
// Step sizes follow the usual balance of truncation and rounding, h ≈ ε^{1/5} for the 4th-order
// first derivative and h ≈ ε^{1/6} for the second (common practice; cf. docs/math.md §8.3).

export type Side = -1 | 0 | 1;

/** f'(t), using only points on `side` of t (−1 left, +1 right, 0 both). `scale` sets the step. */
export function d1(f: (t: number) => number, t: number, scale: number, side: Side = 0): number {
  const h = 1e-3 * scale;
  if (side === 0) {
    return (f(t - 2 * h) - 8 * f(t - h) + 8 * f(t + h) - f(t + 2 * h)) / (12 * h);
  }
  const s = side;
  const g = 5e-4 * scale;
  // Fourth-order one-sided five-point formula, error ≈ g⁴·f⁽⁵⁾/5.
  return (
    (s * (-25 * f(t) + 48 * f(t + s * g) - 36 * f(t + 2 * s * g) + 16 * f(t + 3 * s * g) - 3 * f(t + 4 * s * g))) /
    (12 * g)
  );
}

/** f''(t), same conventions. */
export function d2(f: (t: number) => number, t: number, scale: number, side: Side = 0): number {
  if (side === 0) {
    const h = 5e-3 * scale;
    return (-f(t - 2 * h) + 16 * f(t - h) - 30 * f(t) + 16 * f(t + h) - f(t + 2 * h)) / (12 * h * h);
  }
  const s = side;
  const g = 4e-3 * scale;
  // Fourth-order one-sided six-point formula.
  return (
    (45 * f(t) -
      154 * f(t + s * g) +
      214 * f(t + 2 * s * g) -
      156 * f(t + 3 * s * g) +
      61 * f(t + 4 * s * g) -
      10 * f(t + 5 * s * g)) /
    (12 * g * g)
  );
}

/**
 * Which stencil to use at t inside the piece [lo, hi] so it does not cross the piece's ends.
 * `reach` is the widest offset a central stencil uses.
 */
export function sideWithin(t: number, lo: number, hi: number, reach: number, prefer: Side = 0): Side {
  if (prefer !== 0) return prefer;
  if (t - lo < reach && hi - t < reach) return 0; // tiny piece: nothing better to do
  if (t - lo < reach) return 1;
  if (hi - t < reach) return -1;
  return 0;
}
