// The track (or its board) as a simply supported beam between two supports: a point load at
// mid-span deflects it PL³/(48EI), its own weight 5wL⁴/(384EI) (J. M. Gere, "Mechanics of
// Materials", 7th ed., Table G-2; the standard beam tables). A rolling wheel is a moving point load,
// so the wheel at mid-span is the case to check. The limit is the smaller of L/360 (IBC Table
// 1604.3, live load on floor members) and a share of the hump height, so the sag does not bump the
// axle (5 %: a suggestion, docs/safety.md §2.4, not a code value).

export interface Beam {
  /** Width (across the run) and depth (in the direction of the load) of the section, mm. */
  width: number;
  depth: number;
  /** Young's modulus, MPa. */
  modulus: number;
  /** Density, kg/m³ (0: leave out the self weight). */
  density: number;
}

export const SPAN_RATIO = 360;
export const HUMP_SHARE = 0.05;

/** Second moment of area of the rectangle about its neutral axis, mm⁴: bh³/12. */
export const secondMoment = (b: Beam) => (b.width * b.depth ** 3) / 12;

/** The section's own weight per length, N/mm. */
export const selfWeight = (b: Beam) => (b.density * 9.80665 * b.width * b.depth) / 1e9;

export function deflections(b: Beam, span: number, pointLoad: number): { point: number; self: number } {
  const EI = b.modulus * secondMoment(b);
  return { point: (pointLoad * span ** 3) / (48 * EI), self: (5 * selfWeight(b) * span ** 4) / (384 * EI) };
}

export function deflectionLimit(span: number, hump: number | null): number {
  return Math.min(span / SPAN_RATIO, hump !== null && hump > 0 ? HUMP_SHARE * hump : Infinity);
}

/** The longest span whose deflection (point at mid-span plus self weight) stays within its limit, by bisection; mm. */
export function longestSpan(b: Beam, pointLoad: number, hump: number | null, upTo = 20000): number {
  const ok = (L: number) => {
    const d = deflections(b, L, pointLoad);
    return d.point + d.self <= deflectionLimit(L, hump);
  };
  if (ok(upTo)) return upTo;
  let lo = 0;
  let hi = upTo;
  while (hi - lo > 0.1) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return lo;
}
