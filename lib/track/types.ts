// The result of solve(): plain JSON, in the spec's units. Only the fields that apply to the mode
// are present. Field names may grow; these keep their meaning.

import type { Pt } from "./sampling";
import type { Interference } from "./rolling-check";

export type { Pt };

export interface Outline {
  /** Closed polyline (first point repeated at the end), axle at the origin, start pose. */
  points: Pt[];
  rMin: number;
  rMax: number;
  /** The outline repeats every 1/symmetry of a turn. */
  symmetry: number;
}

export interface SolveOption {
  periodsPerTurn?: number;
  lobes?: number;
  axleHeight?: number;
  centreDistance?: number;
  rMax: number;
}

export interface Warning {
  code: "interference" | "friction" | "sharp-corner" | "sharp-curvature" | "not-point-symmetric";
  message: string;
}

export interface Check {
  /** Largest departure of the axle from its line (track modes) or of the centre distance (pairs) in the simulated roll. */
  axleDeviation: number;
  /** Largest difference of rolled-off arc lengths between the two bodies along the design's own motion. */
  slip: number;
  /** Turn left over (radians) when one period / one lobe has rolled: 0 for a wheel that closes. */
  closureError: number;
  interference: Interference;
  /** The friction coefficient the contact needs, max |r′|/r, and where (axle x, or driver angle for pairs). */
  frictionDemand: { max: number; at: number };
  /** Partner / twin: ω_partner / ω_driver. */
  speedRatio?: { min: number; max: number };
  minCurvatureRadius: { wheel: number; track?: number; partner?: number };
  /**
   * The tightest combined radius of the contact itself along the roll, 1/(κ₁ + κ₂) with each body
   * convex towards the other positive (0 where a corner or cusp is in contact), and where (as frictionDemand.at).
   */
  contactRadius: { min: number; at: number };
  /** Twin wheels: how far the track is from point-symmetric (units). */
  symmetryError?: number;
}

/** What solve() returns without the rolling check (`check: false`): everything that is drawn and cut. */
export interface SolvedGeometry {
  engineVersion: string;
  specHash: string;
  mode: "track-for-wheel" | "wheel-for-track" | "partner-wheel" | "twin-wheels";
  units: "mm" | "in";
  period?: number;
  depth?: number;
  axleHeight?: number;
  /** Twin wheels: the lower axle's height above the track datum (negative: below it). */
  lowerAxleHeight?: number;
  centreDistance?: number;
  wheel: Outline;
  partner?: Outline;
  track?: { points: Pt[] };
  options?: SolveOption[];
  /** Track modes: wheel turn angle (clockwise, radians) against axle x over one period; exact at each row, interpolate between. */
  motion?: Array<{ x: number; angle: number; lowerAngle?: number }>;
  /** Pairs: partner turn (counter-clockwise) against driver turn (clockwise) over one driver sector. */
  follower?: Array<{ driver: number; follower: number }>;
}

/** The rolling check of a solved geometry and the plain warnings drawn from it. */
export interface CheckResult {
  check: Check;
  warnings: Warning[];
}

export type SolveResult = SolvedGeometry & CheckResult;
