// Hertz line contact of two cylinders (a cylinder on a flat when one radius is infinite), in the form
// of K. L. Johnson, "Contact Mechanics", Cambridge University Press 1985, §4.2: with load per unit
// length P′ = F/L, 1/R = 1/R₁ + 1/R₂ (convex positive, concave negative) and
// 1/E* = (1 − ν₁²)/E₁ + (1 − ν₂²)/E₂, the half-width is a = √(4P′R/(πE*)) and the peak pressure
// p₀ = 2P′/(πa) = √(P′E*/(πR)). The largest shear below the surface, τ₁₃ = 0.304 p₀ at depth 0.786 a,
// is the figure R. L. Norton, "Machine Design", 4th ed., Example 7-2 uses (ν ≈ 0.28–0.3).
// Hertz assumes elastic, frictionless, non-conforming contact with a patch small against R: not a
// soft rubber tread, not an edge-loaded narrow wheel.

export interface Elastic {
  /** Young's modulus, MPa (N/mm²). */
  modulus: number;
  poisson: number;
}

export interface LineContact {
  /** Combined radius, mm (Infinity for two flats). */
  radius: number;
  halfWidth: number;
  pMax: number;
  tauMax: number;
  depth: number;
}

export const TAU_SHARE = 0.304;
export const TAU_DEPTH = 0.786;

/** E*, MPa. */
export function contactModulus(a: Elastic, b: Elastic): number {
  return 1 / ((1 - a.poisson ** 2) / a.modulus + (1 - b.poisson ** 2) / b.modulus);
}

/** 1/R₁ + 1/R₂ as one radius; Infinity when the two curvatures cancel (conforming: no Hertz peak). */
export function combinedRadius(r1: number, r2: number): number {
  const k = (Number.isFinite(r1) ? 1 / r1 : 0) + (Number.isFinite(r2) ? 1 / r2 : 0);
  return k > 0 ? 1 / k : Infinity;
}

/** Line contact of force F (N) over length L (mm) at combined radius R (mm), E* in MPa: lengths in mm, stresses in MPa. */
export function lineContact(force: number, length: number, radius: number, eStar: number): LineContact {
  const p = force / length;
  if (!Number.isFinite(radius)) return { radius, halfWidth: Infinity, pMax: 0, tauMax: 0, depth: 0 };
  const a = Math.sqrt((4 * p * radius) / (Math.PI * eStar));
  const p0 = (2 * p) / (Math.PI * a);
  return { radius, halfWidth: a, pMax: p0, tauMax: TAU_SHARE * p0, depth: TAU_DEPTH * a };
}

/** The smallest combined radius at which the peak pressure stays at or under `allowable` (MPa): R = P′·E* ÷ (π·p²). */
export function radiusFor(force: number, length: number, eStar: number, allowable: number): number {
  return ((force / length) * eStar) / (Math.PI * allowable * allowable);
}
