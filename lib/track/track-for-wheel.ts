// The track for a given wheel: x(t) = ∫₀ᵗ r dt, y = −r(t), with the axle on the line y = 0 and the
// contact straight below it (L. Hall and S. Wagon, "Roads and Wheels", Math. Mag. 65(5), 1992,
// pp. 283–301). One track period is one symmetric sector of the wheel, t ∈ [0, 2π/n]. Straight
// wheel edges use the closed form (a catenary arc); curved pieces use adaptive Gauss–Kronrod.

import { Cumulative } from "./cumulative";
import type { Deadline } from "./deadline";
import type { Wheel } from "./wheels";
import { TAU } from "./wheels";

export interface TrackForWheel {
  /** Body angle of one period, 2π/n. */
  T: number;
  period: number;
  depth: number;
  /** x(t) on [0, T]. */
  x: Cumulative;
  /** Body angles in (0, T) where pieces meet (corners and seams). */
  breaks: number[];
  /** Track height at axle position X (periodic): y = −r(t(X)). */
  yAt(X: number): number;
  /** Body angle touching at axle position X ∈ [0, period] (the wheel's turn angle). */
  angleAt(X: number): number;
}

export function solveTrackForWheel(wheel: Wheel, deadline: Deadline): TrackForWheel {
  const T = TAU / wheel.symmetry;
  const pieces = wheel.pieces.filter((p) => p.a < T).map((p) => (p.b > T ? p.sub(p.a, T) : p));
  const x = new Cumulative(pieces, { deadline });
  const period = x.total;
  const breaks = pieces.map((p) => p.a).filter((a) => a > 0);
  const angleAt = (X: number) => x.inverse(X);
  const yAt = (X: number) => {
    let u = X % period;
    if (u < 0) u += period;
    return -wheel.r(x.inverse(u));
  };
  return { T, period, depth: wheel.rMax - wheel.rMin, x, breaks, yAt, angleAt };
}
