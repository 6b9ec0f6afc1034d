// The friction the contact needs. Statics of the friction cone: with the contact normal tilted ψ
// from the load line and a force (H, V) on the wheel, the contact needs
// μ = |H cos ψ + V sin ψ| / (V cos ψ − H sin ψ), which with traction or braking H = hV on the worse
// side is tan(ψ + atan h) (J. L. Meriam and L. G. Kraige, "Engineering Mechanics: Statics", the
// friction chapter). The largest tilt along the roll comes from the engine's rolling check: its
// friction demand is max tan ψ (lib/track/figures.ts), and a regular n-gon on its road has ψ = π/n.

/** μ needed at tilt ψ (rad) with a traction or braking share h = H/V: Infinity when the contact would lift. */
export function frictionNeeded(tilt: number, traction: number): number {
  const angle = Math.abs(tilt) + Math.atan(Math.abs(traction));
  return angle >= Math.PI / 2 ? Infinity : Math.tan(angle);
}

/** The general form, for one sign of H: |H cos φ + V sin φ| / (V cos φ − H sin φ), or Infinity when the normal force is not positive. */
export function frictionNeededSigned(slope: number, H: number, V: number): number {
  const N = V * Math.cos(slope) - H * Math.sin(slope);
  if (!(N > 0)) return Infinity;
  return Math.abs(H * Math.cos(slope) + V * Math.sin(slope)) / N;
}

/** A measured tilt (slip) angle, degrees, as a friction coefficient: μ = tan θ (the tilt test). */
export const muFromTilt = (deg: number) => Math.tan((deg * Math.PI) / 180);

/** Margin asked of the available friction over the needed (a suggestion of 1.3, docs/safety.md §2.2; no code value exists). */
export const GRIP_MARGIN = 1.3;
