// The whole run's rolling surface from one solved period, with the engine's tiling (tileRun,
// lib/track/tiling.ts) and the chosen end treatment:
// - flat: N whole periods and a flat run-out at crest level at each end for the remainder;
// - half: the run ends half way through a period (N + ½ periods), the small remainder flat at the ends;
// - scale: the whole design (track, wheel, axle height) × L/(N·P), so N periods fit exactly. The
//   rolling relations x = ∫ r dθ, y = −r (Hall & Wagon 1992, "Roads and Wheels", Math. Magazine
//   65(5):283–301) are homogeneous of degree 1 in length, so the scaled pair still rolls exactly.
// The run starts at a crest of the profile (its highest point in a period), so a flat run-out meets
// the profile without a step and the default cut stations (crests) fall on whole periods.
import { tileRun, type Pt, type SolveResult, type TileResult } from "@/lib/track";
import { CutError } from "./errors";
import { yAt } from "@/lib/geometry/polyline";
import type { CutSettings } from "./settings";
import type { CutWarning } from "./types";
import { fmtLen, mmPerUnit, toMm } from "./units";

export interface RunInfo {
  endTreatment: CutSettings["endTreatment"];
  /** The run as built, mm. */
  runLength: number;
  /** The period as built (after any scaling), mm. */
  period: number;
  /** The design's own period, mm. */
  designPeriod: number;
  /** Periods of profile in the run (a half for "half" with an odd count of half periods). */
  periods: number;
  /** Run length not covered by profile periods (flat run-out in all), mm. */
  residual: number;
  /** Flat run-out at each end, mm. */
  eachEnd: number;
  /** How much longer the run would need to be for one more whole period, mm (0 when scaled). */
  extraForNextPeriod: number;
  /** 1 unless the design is scaled. */
  scale: number;
  /** The wheel's largest radius before and after scaling, and the change, mm. */
  wheelSize: { before: number; after: number; change: number };
  /** y of the run's crests (the flats are at this level), and of its lowest point, mm. */
  crestLevel: number;
  minY: number;
  /** x in the design's period where the run starts (its first crest), mm in the design's scale. */
  phase: number;
  /** The rolling surface from x = 0 to x = runLength, left to right, mm; y as the engine's profile. */
  profile: Pt[];
  /** Run x of every crest and every trough of the periodic part. */
  crests: number[];
  troughs: number[];
  /** The engine's tiling of the run, in mm. */
  tile: TileResult;
}

/** True for the modes that have a track to cut. Partner and twin wheels roll on each other. */
export function hasTrack(result: Pick<SolveResult, "mode">): boolean {
  return result.mode === "track-for-wheel" || result.mode === "wheel-for-track";
}

/** One period of the track as the engine gives it, in mm, x from 0 to P. */
function periodProfile(result: SolveResult): Pt[] {
  const k = mmPerUnit(result.units);
  const pts = toMm(result.track?.points ?? [], k);
  if (pts.length < 2 || !(result.period! > 0))
    throw new CutError("no-wheel", "The solve result has no track profile to cut.");
  const x0 = pts[0][0];
  return pts.map(([x, y]) => [x - x0, y]);
}

/** Index of the crest (highest point; the first of equal ones) in one period. */
function crestIndex(pp: Pt[]): number {
  let best = 0;
  const span = Math.max(...pp.map((p) => Math.abs(p[1]))) || 1;
  for (let i = 1; i < pp.length - 1; i++) if (pp[i][1] > pp[best][1] + 1e-12 * span) best = i;
  return best;
}

/** The period re-started at its crest: x from 0 to P, first and last points at crest level. */
function fromCrest(pp: Pt[], ic: number, P: number): Pt[] {
  if (ic === 0) return pp.map(([x, y]) => [x, y]);
  const phase = pp[ic][0];
  const a = pp.slice(ic).map(([x, y]): Pt => [x - phase, y]);
  const b = pp.slice(1, ic + 1).map(([x, y]): Pt => [x + P - phase, y]);
  return [...a, ...b];
}

function troughOffsets(period: Pt[]): number[] {
  let lo = Infinity;
  for (const p of period) lo = Math.min(lo, p[1]);
  const span = Math.max(...period.map((p) => Math.abs(p[1]))) || 1;
  const out: number[] = [];
  for (const p of period)
    if (p[1] <= lo + 1e-9 * span && !out.some((x) => Math.abs(x - p[0]) < 1e-9 * span)) out.push(p[0]);
  return out;
}

/**
 * Builds the run for a track mode. Throws CutError "run-too-short" (field runLength) when the run
 * is shorter than one period.
 */
export function buildRun(result: SolveResult, settings: CutSettings): { run: RunInfo; warnings: CutWarning[] } {
  const k = mmPerUnit(result.units);
  const L = settings.runLength;
  const designPeriod = result.period! * k;
  if (L < designPeriod * (1 - 1e-12))
    throw new CutError(
      "run-too-short",
      `The run length (${fmtLen(L)}) is shorter than one period of the track (${fmtLen(designPeriod)}). Make the run at least one period long, or choose a smaller wheel.`,
      "runLength",
    );
  const rMax = result.wheel.rMax * k;
  const tile = tileRun({ runLength: L, period: designPeriod, wheelSize: rMax });
  const pp = periodProfile(result);
  const ic = crestIndex(pp);
  const phase = pp[ic][0];
  let period = fromCrest(pp, ic, designPeriod);
  let P = designPeriod;
  let scale = 1;
  let whole: number;
  let half = false;
  let eachEnd: number;
  const warnings: CutWarning[] = [];
  switch (settings.endTreatment) {
    case "flat":
      whole = tile.flatRunOut.periods;
      eachEnd = tile.flatRunOut.eachEnd;
      break;
    case "half": {
      const halves = Math.round(tile.halfPeriod.periods * 2);
      whole = Math.floor(halves / 2);
      half = halves % 2 === 1;
      eachEnd = tile.halfPeriod.eachEnd;
      break;
    }
    case "scale":
      scale = tile.scaled.scale;
      whole = tile.scaled.periods;
      eachEnd = 0;
      P = tile.scaled.period;
      period = period.map(([x, y]) => [x * scale, y * scale]);
      warnings.push({
        code: "scaled",
        message: `The whole design is scaled by ${scale.toFixed(5)} so that ${whole} periods fill the ${fmtLen(L)} run: the wheel's largest radius changes from ${fmtLen(rMax)} to ${fmtLen(rMax * scale)} (${scale >= 1 ? "+" : ""}${fmtLen(rMax * (scale - 1))}).`,
      });
      break;
  }
  const crestLevel = period[0][1];
  const flat = eachEnd > 1e-6;
  const profile: Pt[] = [];
  const push = (p: Pt) => {
    const q = profile[profile.length - 1];
    if (!q || p[0] > q[0] + 1e-9) profile.push(p);
  };
  if (flat) push([0, crestLevel]);
  const X0 = eachEnd;
  for (let j = 0; j < whole; j++) for (const [x, y] of period) push([X0 + j * P + x, y]);
  if (half) {
    const xs = X0 + whole * P;
    for (const [x, y] of period) if (x < P / 2) push([xs + x, y]);
    push([xs + P / 2, yAt(period, P / 2)]);
  }
  const endLevel = profile[profile.length - 1][1];
  if (flat) push([L, endLevel]);
  // Floating-point sums can leave the last x a hair off L: pin it.
  profile[profile.length - 1] = [L, profile[profile.length - 1][1]];

  const periods = whole + (half ? 0.5 : 0);
  const troughAt = troughOffsets(period);
  const crests: number[] = [];
  const troughs: number[] = [];
  for (let j = 0; j <= whole; j++) crests.push(X0 + j * P);
  for (let j = 0; j < Math.ceil(periods); j++)
    for (const t of troughAt) if (j * P + t <= periods * P + 1e-9) troughs.push(X0 + j * P + t);
  const minY = Math.min(...profile.map((p) => p[1]));
  const residual = settings.endTreatment === "scale" ? 0 : 2 * eachEnd;
  return {
    run: {
      endTreatment: settings.endTreatment,
      runLength: L,
      period: P,
      designPeriod,
      periods,
      residual,
      eachEnd,
      extraForNextPeriod: settings.endTreatment === "scale" ? 0 : P - tile.residual,
      scale,
      wheelSize: { before: rMax, after: rMax * scale, change: rMax * (scale - 1) },
      crestLevel,
      minY,
      phase,
      profile,
      crests,
      troughs,
      tile,
    },
    warnings,
  };
}
