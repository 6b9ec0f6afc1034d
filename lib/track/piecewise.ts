// Derivatives of a piecewise-smooth function that never reach across a break (a corner or cusp):
// the finite-difference stencils of derivative.ts, with the step scaled to the piece so short
// pieces (outline edges) are handled too.

import { d1, d2, sideWithin, type Side } from "./derivative";

export interface Piecewise {
  f: (t: number) => number;
  /** Sorted knots including both ends of the range. */
  knots: number[];
  /** f' at t; `side` picks the piece when t sits on a knot (−1 left, +1 right). */
  d1(t: number, side?: Side): number;
  d2(t: number, side?: Side): number;
  /** The piece [lo, hi] containing t. */
  piece(t: number, side?: Side): [number, number];
}

export function piecewise(
  f: (t: number) => number,
  lo: number,
  hi: number,
  breaks: readonly number[],
  scaleCap: number,
): Piecewise {
  const knots = [lo, ...breaks.filter((b) => b > lo && b < hi).sort((a, b) => a - b), hi];
  const piece = (t: number, side: Side = 0): [number, number] => {
    let i = 0;
    let j = knots.length - 1;
    while (j - i > 1) {
      const m = (i + j) >> 1;
      if (knots[m] < t || (knots[m] === t && side >= 0)) i = m;
      else j = m;
    }
    return [knots[i], knots[j]];
  };
  const stencil = (t: number, side: Side, reachFactor: number): { scale: number; side: Side } => {
    const [a, b] = piece(t, side);
    const scale = Math.min(scaleCap, b - a);
    if (t <= a) return { scale, side: 1 };
    if (t >= b) return { scale, side: -1 };
    // Close to a piece end, shrink a central stencil to fit rather than go one-sided, down to a
    // floor where rounding would dominate.
    const room = Math.min(t - a, b - t) / reachFactor;
    if (room < scale) {
      if (room >= 1e-4 * scale) return { scale: room, side: 0 };
      return { scale, side: t - a < b - t ? 1 : -1 };
    }
    return { scale, side: sideWithin(t, a, b, reachFactor * scale) };
  };
  return {
    f,
    knots,
    piece,
    d1: (t, side = 0) => {
      const s = stencil(t, side, 2.5e-3);
      return d1(f, t, s.scale, s.side);
    },
    d2: (t, side = 0) => {
      const s = stencil(t, side, 1.2e-2);
      return d2(f, t, s.scale, s.side);
    },
  };
}
