// The partner wheel: two pitch curves turning about fixed centres a apart, rolling without slip,
// satisfy r₁ + r₂ = a and r₁ dθ₁ = r₂ dθ₂ with opposite senses (J. C. Maxwell, "On the Theory of
// Rolling Curves", 1849; F. L. Litvin et al., "Noncircular Gears: Design and Generation",
// Cambridge UP 2009). So θ₂ = ∫ r₁ / (a − r₁) dθ₁, and the partner closes with m lobes when one
// sector of the driver (2π/n) turns it by 2π/m. F(a) = ∫ r₁/(a − r₁) − 2π/m decreases strictly on
// (r_max, ∞); with q = n/m the root lies in [max(r_max, r_min(1+q)/q), r_max(1+q)/q] (docs/math.md §5.3),
// where Brent's method (1973) finds it.
// Placement: driver axle at the origin, partner axle straight below at (0, −a); the partner's body
// ray τ points along (sin τ, cos τ) in the start pose, so τ = 0 touches the driver's ray t = 0.

import { brent, NotBracketedError } from "./brent";
import { Cumulative } from "./cumulative";
import type { Deadline } from "./deadline";
import { EngineError } from "./errors";
import { integrate } from "./quadrature";
import type { Wheel } from "./wheels";
import { TAU } from "./wheels";

function sectorPieces(wheel: Wheel, T: number) {
  return wheel.pieces.filter((p) => p.a < T).map((p) => (p.b > T ? p.sub(p.a, T) : p));
}

export function closureIntegral(wheel: Wheel, a: number, deadline: Deadline): number {
  const T = TAU / wheel.symmetry;
  let sum = 0;
  for (const p of sectorPieces(wheel, T)) {
    const f = p.f;
    sum += integrate((t) => f(t) / (a - f(t)), p.a, p.b, [], { rel: 1e-13, deadline }).value;
  }
  return sum;
}

export function solveCentreDistance(wheel: Wheel, lobes: number, deadline: Deadline): number {
  const n = wheel.symmetry;
  const q = n / lobes;
  const target = TAU / lobes;
  const { rMin, rMax } = wheel;
  const F = (a: number) => closureIntegral(wheel, a, deadline) - target;
  let lo = Math.max(rMax * (1 + 1e-12), (rMin * (1 + q)) / q);
  let hi = Math.max((rMax * (1 + q)) / q, lo * (1 + 1e-12));
  if (!(F(lo) > 0)) {
    lo = rMax * (1 + 1e-14);
    if (!(F(lo) > 0))
      throw new EngineError("no-solution", `No centre distance closes a partner with ${lobes} lobe(s).`, "lobes");
  }
  if (F(hi) > 0) hi *= 2;
  try {
    return brent(F, lo, hi, { xtol: 1e-15 * rMax, deadline }).root;
  } catch (e) {
    if (!(e instanceof NotBracketedError)) throw e;
    throw new EngineError(
      "no-solution",
      `No centre distance gives a partner with ${lobes} lobe${lobes === 1 ? "" : "s"} that closes: try another number of lobes.`,
      "lobes",
    );
  }
}

export interface Partner {
  a: number;
  lobes: number;
  /** Driver sector angle 2π/n and partner lobe angle 2π/m. */
  T1: number;
  T2: number;
  /** Partner turn θ₂ for driver turn t ∈ [0, T1]. */
  follower: Cumulative;
  /** Partner radius at its body angle τ (any τ; repeats every T2). */
  r(tau: number): number;
  /** Partner body angles in (0, T2) at the driver's corners. */
  breaks: number[];
  /** Partner body point for driver angle t ∈ [0, T1] (start pose, partner axle at the origin). */
  point(t: number): [number, number];
}

export function partnerFor(wheel: Wheel, lobes: number, a: number, deadline: Deadline): Partner {
  const T1 = TAU / wheel.symmetry;
  const T2 = TAU / lobes;
  const pieces = sectorPieces(wheel, T1).map((p) => ({ a: p.a, b: p.b, f: (t: number) => p.f(t) / (a - p.f(t)) }));
  const follower = new Cumulative(pieces, { deadline });
  const total = follower.total;
  const r = (tau: number): number => {
    let u = tau % T2;
    if (u < 0) u += T2;
    return a - wheel.r(follower.inverse((u * total) / T2));
  };
  const point = (t: number): [number, number] => {
    const th = follower.value(t);
    const rr = a - wheel.r(t);
    return [rr * Math.sin(th), rr * Math.cos(th)];
  };
  const breaks = pieces
    .map((p) => p.a)
    .filter((x) => x > 0)
    .map((t) => follower.value(t));
  return { a, lobes, T1, T2, follower, r, breaks, point };
}
