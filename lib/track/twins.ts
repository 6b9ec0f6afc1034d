// Twin wheels from a track: the track is a virtual rack between two axles; the upper wheel has
// r₁ = h₁ − y and the lower r₂ = y − h₂, and with dx = r₁dθ₁ = r₂dθ₂ and r₁ + r₂ = h₁ − h₂ they
// form a pair on fixed axles that rolls without the rack (docs/math.md §6.1; the pair relations are
// Maxwell's, 1849). If the track is point-symmetric (invariant under a half turn about a point of
// its mid-line) the two wheels are congruent — identical pitch curves in the sense of S.-H. Tong and
// D. C. H. Yang, ASME J. Mech. Design 120(2), 1998. Each axle height is solved for closure on its
// own, so the pair rolls and closes even when the track is not symmetric; the symmetry error says
// how far from identical the two wheels are.

import { goldenMin } from "./brent";
import type { Deadline } from "./deadline";
import { integrate } from "./quadrature";
import type { Track } from "./tracks";

export interface SymmetryReport {
  /** Largest |y(x₀ + u) + y(x₀ − u) − 2·y_mid| at the best centre x₀ (0 for a point-symmetric track). */
  error: number;
  centre: number;
  midline: number;
}

export function pointSymmetry(track: Track, deadline: Deadline): SymmetryReport {
  const P = track.period;
  let area = 0;
  for (const p of track.pieces)
    area += integrate((s) => p.y(s) * p.dx(s), p.s0, p.s1, [], { rel: 1e-13, deadline }).value;
  const mid = area / P;
  const U = 96;
  const D = (x0: number) => {
    let m = 0;
    for (let i = 1; i <= U; i++) {
      const u = (0.5 * P * i) / U;
      m = Math.max(m, Math.abs(track.yAt(x0 + u) + track.yAt(x0 - u) - 2 * mid));
    }
    return m;
  };
  const N = 192;
  let best = 0;
  let bestD = Infinity;
  for (let j = 0; j < N; j++) {
    deadline.check();
    const d = D((P * j) / N);
    if (d < bestD) [best, bestD] = [(P * j) / N, d];
  }
  const g = goldenMin(D, best - P / N, best + P / N, 50);
  const centre = g.f < bestD ? g.x : best;
  return { error: Math.min(g.f, bestD), centre: ((centre % P) + P) % P, midline: mid };
}
