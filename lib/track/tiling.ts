// Fitting whole track periods to a site's run length, with the three usual end treatments: a flat
// run-out for the remainder, ending on a half period, or scaling the design so a whole number of
// periods fits exactly. The rolling relations (x = ∫ r dθ, y = −r; Hall & Wagon 1992) are
// unchanged when every length is multiplied by one factor, so scaling the whole design (wheel,
// track, axle height) by L / (N·P) keeps it exact.

import { EngineError } from "./errors";

export interface TileInput {
  /** Run length available on site, in the design's units. */
  runLength: number;
  /** Track period. */
  period: number;
  /** Wheel size (e.g. rMax), reported scaled for the scale option. */
  wheelSize?: number;
}

export interface TileResult {
  periods: number;
  /** Run length left over after the whole periods. */
  residual: number;
  flatRunOut: { periods: number; runOut: number; eachEnd: number };
  halfPeriod: { periods: number; residual: number; eachEnd: number };
  scaled: { periods: number; scale: number; period: number; wheelSize?: number; residual: 0 };
}

export function tileRun({ runLength: L, period: P, wheelSize }: TileInput): TileResult {
  if (!(L > 0) || !Number.isFinite(L))
    throw new EngineError("invalid-spec", "The run length must be a positive number.", "runLength");
  if (!(P > 0) || !Number.isFinite(P))
    throw new EngineError("invalid-spec", "The period must be a positive number.", "period");
  // A hair of slack so that L = N·P computed in floating point is not read as N − 1 periods.
  const N = Math.floor(L / P + 1e-12);
  const residual = Math.max(0, L - N * P);
  const halves = Math.floor((2 * L) / P + 1e-12);
  const halfResidual = Math.max(0, L - (halves * P) / 2);
  const Ns = Math.max(1, Math.round(L / P));
  const scale = L / (Ns * P);
  return {
    periods: N,
    residual,
    flatRunOut: { periods: N, runOut: residual, eachEnd: residual / 2 },
    halfPeriod: { periods: halves / 2, residual: halfResidual, eachEnd: halfResidual / 2 },
    scaled: {
      periods: Ns,
      scale,
      period: P * scale,
      wheelSize: wheelSize === undefined ? undefined : wheelSize * scale,
      residual: 0,
    },
  };
}
