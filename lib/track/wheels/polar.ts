// Wheels given as a polar formula r(theta), theta being the body angle t from the ray that touches
// the track at the start (the convention of Hall & Wagon 1992 and docs/math.md §1.1). The formula goes
// through the locked-down compiler in formula.ts, then is checked on a fine grid to be finite,
// positive and 2π-periodic; the first failing angle is named in the error.

import { EngineError } from "../errors";
import { compileFormula } from "../formula";
import { makeWheel, smoothPiece, TAU, type Wheel } from "./wheel";

export const POLAR_CHECK_POINTS = 4096;

export function polarWheel(source: string): Wheel {
  const where = "wheel.r";
  const f = compileFormula(source, "theta", where);
  let rMax = 0;
  for (let i = 0; i <= POLAR_CHECK_POINTS; i++) {
    const t = (TAU * i) / POLAR_CHECK_POINTS;
    const v = f(t);
    if (!Number.isFinite(v))
      throw new EngineError("bad-formula", `r is not a finite number at theta = ${t.toFixed(4)} (r = ${v}).`, where);
    if (v <= 0)
      throw new EngineError(
        "bad-formula",
        `r must be positive over the whole turn, but r = ${v.toPrecision(6)} at theta = ${t.toFixed(4)}.`,
        where,
      );
    rMax = Math.max(rMax, v);
  }
  const r0 = f(0);
  const r1 = f(TAU);
  if (Math.abs(r1 - r0) > 1e-9 * rMax)
    throw new EngineError(
      "bad-formula",
      `The wheel does not close: r(0) = ${r0.toPrecision(8)} but r(2π) = ${r1.toPrecision(8)}.`,
      where,
    );
  // Evaluate at the wrapped angle so the piece sees t ∈ [0, 2π] only.
  return makeWheel([smoothPiece("smooth", f, 0, TAU)], []);
}
