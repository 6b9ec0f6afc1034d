// Binary search over sorted piece starts: which piece (wheel sector, track piece, quadrature panel)
// holds a given parameter value.

/** The largest i in [0, n) with key(i) ≤ v, for keys in increasing order; 0 when v is below them all. */
export function lastAtOrBelow(n: number, key: (i: number) => number, v: number): number {
  let lo = 0;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (key(mid) <= v) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}
