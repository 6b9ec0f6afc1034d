// The wheel's uneven turning on a level axle (docs/safety.md §3.2, derived there): the contact is
// straight below the axle at distance ρ, so at axle speed v the wheel turns at ω = v/ρ and
// α = dω/dt = v²·(dρ/dx)/ρ²… with dρ/dx = ∓tan ψ: at a corner |α| = v²·tan ψ/ρ², and it changes sign
// as the corner passes (a step of twice that). A regular n-gon of inradius r has ρ from r to
// r·sec(π/n), so ω_min/ω_max = cos(π/n) and the corner step is (v/r)² for a square.
// The inertia load: turning the wheel's mass needs a force H = I·α/ρ at the contact, which adds to
// (or, on the other side of the corner, takes from) the traction the contact must carry.

export const omegaRatio = (rhoMin: number, rhoMax: number) => rhoMin / rhoMax;

/** |α| just either side of a place where the contact normal is tilted ψ (tan ψ given), at distance ρ; SI units. */
export const alphaAt = (speed: number, rho: number, tanPsi: number) => (speed * speed * tanPsi) / (rho * rho);

/**
 * Polar second moment ∫∫(x² + y²) dA of a simple polygon about the origin (the axle), by Green's
 * theorem over its edges: Σ (xᵢyᵢ₊₁ − xᵢ₊₁yᵢ)(xᵢ² + xᵢxᵢ₊₁ + xᵢ₊₁² + yᵢ² + yᵢyᵢ₊₁ + yᵢ₊₁²)/12
 * (C. Steger, "On the calculation of arbitrary moments of polygons", TU München FGBV-96-05, 1996).
 */
export function polarSecondMoment(points: ReadonlyArray<readonly [number, number]>): number {
  let sum = 0;
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[(i + 1) % n];
    const cross = x0 * y1 - x1 * y0;
    sum += cross * (x0 * x0 + x0 * x1 + x1 * x1 + y0 * y0 + y0 * y1 + y1 * y1);
  }
  return Math.abs(sum) / 12;
}
