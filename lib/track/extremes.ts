// Extreme values of a piecewise-smooth function: a grid over each smooth piece, then golden-section
// refinement (Kiefer 1953) around the best grid point. Extremes at piece ends (polygon corners) are
// taken exactly, since the ends are grid points.

import { goldenMin } from "./brent";

export interface Extreme {
  value: number;
  at: number;
}

export function extremes(
  f: (t: number) => number,
  pieces: ReadonlyArray<{ a: number; b: number }>,
  perPiece = 24,
): { min: Extreme; max: Extreme } {
  let min: Extreme = { value: Infinity, at: NaN };
  let max: Extreme = { value: -Infinity, at: NaN };
  for (const p of pieces) {
    const w = (p.b - p.a) / perPiece;
    let iMin = 0;
    let iMax = 0;
    let vMin = Infinity;
    let vMax = -Infinity;
    const vals: number[] = [];
    for (let i = 0; i <= perPiece; i++) {
      const v = f(i === perPiece ? p.b : p.a + i * w);
      vals.push(v);
      if (v < vMin) [vMin, iMin] = [v, i];
      if (v > vMax) [vMax, iMax] = [v, i];
    }
    const refine = (i: number, sign: 1 | -1): Extreme => {
      const lo = p.a + Math.max(0, i - 1) * w;
      const hi = i + 1 >= perPiece ? p.b : p.a + (i + 1) * w;
      const g = goldenMin((t) => sign * f(t), lo, hi);
      const atGrid = i === perPiece ? p.b : p.a + i * w;
      return g.f < sign * vals[i] ? { value: sign * g.f, at: g.x } : { value: vals[i], at: atGrid };
    };
    const cMin = refine(iMin, 1);
    const cMax = refine(iMax, -1);
    if (cMin.value < min.value) min = cMin;
    if (cMax.value > max.value) max = cMax;
  }
  return { min, max };
}
