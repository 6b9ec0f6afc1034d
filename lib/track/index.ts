// Axlewright's rolling engine: exact tracks, wheels, partners and twins, with an independent
// rolling check. Pure TypeScript: no React, no Next, no database, no Node-only imports, so the
// studio (a Web Worker), the route handlers and the tests all run this same code.
//
// Conventions (all lengths in the spec's units, angles in radians):
// - The wheel rolls to the right, turning clockwise. A wheel is a polar function r(t) about its
//   axle, t being the body angle measured from the ray that touches the track at the start (x = 0),
//   counter-clockwise in the body; in the start pose the body ray t points along (sin t, −cos t).
//   Output wheel outlines are in that start pose with the axle at the origin.
// - Track for a wheel: the axle line is y = 0 and the track lies below it (y = −r < 0); one period
//   runs from x = 0 (the start contact) to x = period.
// - Wheel for a track, twin wheels: the track's own y = 0 is its datum and `axleHeight` is the axle
//   line above it, so r = axleHeight − y(x) > 0. The sine track y = A sin(2πx/P) closes with k
//   periods per turn at h = √((kP/2π)² + A²), since ∫₀ᴾ dx/(h − A sin(2πx/P)) = P/√(h² − A²).
// - Start poses: a polygon touches with the middle of a side; an ellipse stands with its major axis
//   vertical ("focus" is the lower focus, so the near vertex touches; {x, y} is relative to the
//   centre); an offset circle has its centre straight above the axle; a polar formula's theta is t;
//   an outline is taken as drawn (y up).
// - Pairs (partner-wheel, twin-wheels): the driver's axle is at the origin and the partner's
//   straight below at (0, −centreDistance); the partner turns counter-clockwise and its body ray τ
//   points along (sin τ, cos τ) in the start pose, so τ = 0 touches the driver's t = 0.
//   `lobes` is how many times the partner's pattern repeats in one partner turn; the partner meets
//   one pattern per driver sector (2π/n for an n-fold driver, reported as wheel.symmetry).
// - Twin wheels: the upper wheel is `wheel` (axle at axleHeight), the lower is `partner` (axle at
//   lowerAxleHeight); both close with periodsPerTurn periods per turn.

export {
  designSpecSchema,
  MODE_NAMES,
  parseSpec,
  canonicalJson,
  specHash,
  type DesignSpec,
  type DesignSpecInput,
} from "./spec";
export { solve, solveInStages, ENGINE_VERSION, type SolveOptions, type SolveStages } from "./solve";
export { EngineError, isEngineError, type EngineErrorCode } from "./errors";
export { tileRun, type TileInput, type TileResult } from "./tiling";
export type { SolveResult, SolvedGeometry, CheckResult, Check, Outline, SolveOption, Warning, Pt } from "./types";
