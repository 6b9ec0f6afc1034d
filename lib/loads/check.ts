// The load-path check of a design as it will be built and used: grip, contact stress, track
// deflection, pinch and crush gaps, interference, and the loads an engineer will want, each failing
// check as a caution with its figure, limit and source. Pure: the same code runs in the studio's
// worker, on the server (review page, assembly sheet, job README, cut-plan page) and in `npm run loads`.
import { solve, type SolveResult } from "@/lib/track";
import type { LoadsInput, Use } from "@/lib/validation/loads";
import { deflectionLimit, deflections, longestSpan } from "./beam";
import { bySeverity, DISCLAIMER, type Caution, type Signal } from "./caution";
import { alphaAt, omegaRatio, polarSecondMoment } from "./dynamics";
import { engineerLoads, type EngineerLoad } from "./engineer-loads";
import { judgeGap, type GapFinding } from "./gaps";
import { frictionNeeded, GRIP_MARGIN, muFromTilt } from "./grip";
import { combinedRadius, contactModulus, lineContact, radiusFor } from "./hertz";
import { G, lbfToN } from "./units";

export const DEFAULT_RIDER_KG = 110;
export const DEFAULT_DYNAMIC_FACTOR = 2;
export const DEFAULT_WHEELS = 2;
/** A person leaning their weight on a piece they push or turn: 200 lbf, the point load ASCE 7-16 §4.5.1 puts on guards, taken by analogy (our choice). */
export const HAND_LOAD_N = lbfToN(200);
/** Traction or braking share when none is given: pedalling or braking a ride-on 0.2, pushing or cranking 0.1 (our defaults; the example values of docs/safety.md T7). */
export const DEFAULT_TRACTION: Record<Use, number> = {
  "ride-on": 0.2,
  "push-along": 0.1,
  "hand-turned": 0.1,
  display: 0.1,
};
/** Below this modulus a tread is rubber-like: Hertz (small strain, linear elastic) does not apply (Johnson 1985 §4.1; the threshold is common practice). */
export const SOFT_MODULUS_GPA = 0.2;
/** A rounded corner carries the contact only while the patch is small against it: half-width ≤ a tenth of the radius (Hertz's a ≪ R, Johnson §4.1; the tenth is common practice). */
export const PATCH_SHARE = 0.1;

export interface GripResult {
  needed: number;
  available: number | null;
  /** Where the need peaks: axle x in the spec's units, or the driver's turn (rad) for pairs. */
  at: number;
  /** Traction share used: the given or default H/V plus the wheel's own inertia load. */
  tractionShare: number;
  marginAsked: number;
  /** available ÷ needed (null without an available figure). */
  margin: number | null;
  ok: boolean | null;
}

export interface ContactResult {
  /** Tightest combined radius at the contact, mm (0: a corner is in contact). */
  radiusMm: number;
  halfWidthMm: number;
  pMaxMpa: number | null;
  tauMaxMpa: number | null;
  depthMm: number;
  at: number;
  allowableMpa: number | null;
  /** Polygon wheels: the smallest corner radius (spec units) that brings the contact under the allowable. */
  cornerRadiusNeeded?: number | null;
  hertzApplies: boolean;
  ok: boolean | null;
}

export interface DeflectionResult {
  spanMm: number;
  pointLoadMm: number;
  selfWeightMm: number;
  limitMm: number;
  maxSpanMm: number;
  ok: boolean;
}

export interface DynamicsResult {
  speedMps: number;
  omegaRatio: number;
  /** |α| either side of the steepest place, rad/s² (the step as it passes is twice this). */
  alphaPeak: number;
  inertiaKgM2: number | null;
}

export interface LoadsReport {
  calculationVersion: string;
  use: Use;
  wheelLoadN: number;
  loadBasis: string;
  grip: GripResult;
  contact: ContactResult;
  deflection: DeflectionResult;
  gaps: GapFinding[];
  dynamics: DynamicsResult | null;
  engineerLoads: EngineerLoad[];
  cautions: Caution[];
  disclaimer: string;
}

const fmt = (v: number, d = 2) => (Number.isFinite(v) ? Number(v.toFixed(d)).toString() : "∞");
const trackModes = new Set(["track-for-wheel", "wheel-for-track"]);

/** Signal word by use for a hazard that can hurt (WARNING on a ride-on), or only spoil function. */
function signalFor(use: Use, ride: Signal, touch: Signal, display: Signal): Signal {
  return use === "ride-on" ? ride : use === "display" ? display : touch;
}

function wheelLoad(input: LoadsInput): { newtons: number; basis: string } {
  const l = input.load;
  if (l.wheelLoadN !== undefined) return { newtons: l.wheelLoadN, basis: "wheel load as entered" };
  if (input.use === "ride-on") {
    const m = l.riderMassKg ?? DEFAULT_RIDER_KG;
    const f = l.dynamicFactor ?? DEFAULT_DYNAMIC_FACTOR;
    const n = l.wheels ?? DEFAULT_WHEELS;
    return {
      newtons: (m * G * f) / n,
      basis: `rider ${fmt(m, 1)} kg × g × dynamic factor ${fmt(f)} shared by ${n} wheel${n === 1 ? "" : "s"}`,
    };
  }
  return {
    newtons: HAND_LOAD_N,
    basis: "a person leaning their weight on it: 0.89 kN (200 lbf, by analogy with the ASCE 7-16 §4.5.1 point load)",
  };
}

/** Axle-to-contact distance at axle x (track modes), from the output track polyline; spec units. */
function rhoAt(result: SolveResult, x: number): number {
  const pts = result.track?.points ?? [];
  const P = result.period ?? 0;
  const xx = P > 0 ? ((x % P) + P) % P : x;
  const base = result.mode === "wheel-for-track" ? (result.axleHeight ?? 0) : 0;
  for (let i = 0; i + 1 < pts.length; i++) {
    const [x0, y0] = pts[i];
    const [x1, y1] = pts[i + 1];
    if (xx >= Math.min(x0, x1) && xx <= Math.max(x0, x1)) {
      const y = x1 === x0 ? y0 : y0 + ((xx - x0) / (x1 - x0)) * (y1 - y0);
      return base - y;
    }
  }
  return result.wheel.rMax;
}

function gripOf(
  input: LoadsInput,
  result: SolveResult,
  V: number,
  k: number,
): { grip: GripResult; dynamics: DynamicsResult | null } {
  const fd = result.check.frictionDemand;
  const tilt = Math.atan(fd.max);
  let share = input.traction ?? DEFAULT_TRACTION[input.use];
  let dynamics: DynamicsResult | null = null;
  if (trackModes.has(result.mode) && input.speedMps !== undefined) {
    const v = input.speedMps;
    const rho = (rhoAt(result, fd.at) * k) / 1000;
    const alpha = alphaAt(v, rho, fd.max);
    let inertia: number | null = null;
    if (input.wheel.densityKgM3 !== undefined) {
      const m4 = polarSecondMoment(result.wheel.points.slice(0, -1)) * (k / 1000) ** 4;
      inertia = input.wheel.densityKgM3 * (input.wheel.treadWidthMm / 1000) * m4;
      share += (inertia * alpha) / rho / V;
    }
    dynamics = {
      speedMps: v,
      omegaRatio: omegaRatio(result.wheel.rMin, result.wheel.rMax),
      alphaPeak: alpha,
      inertiaKgM2: inertia,
    };
  }
  const needed = frictionNeeded(tilt, share);
  const available = input.mu ?? (input.tiltDeg !== undefined ? muFromTilt(input.tiltDeg) : null);
  return {
    grip: {
      needed,
      available,
      at: fd.at,
      tractionShare: share,
      marginAsked: GRIP_MARGIN,
      margin: available === null ? null : available / needed,
      ok: available === null ? null : available >= GRIP_MARGIN * needed,
    },
    dynamics,
  };
}

interface ContactInputs {
  V: number;
  length: number;
  eStar: number;
  allowable: number | null;
}

function contactInputs(input: LoadsInput, result: SolveResult, V: number): ContactInputs {
  const w = input.wheel;
  const t = input.track;
  const eStar = contactModulus(
    { modulus: w.modulusGpa * 1000, poisson: w.poisson },
    { modulus: t.modulusGpa * 1000, poisson: t.poisson },
  );
  const length = trackModes.has(result.mode) ? Math.min(w.treadWidthMm, t.widthMm) : w.treadWidthMm;
  const limits = [w.allowableMpa, t.allowableMpa].filter((v): v is number => v !== undefined);
  return { V, length, eStar, allowable: limits.length ? Math.min(...limits) : null };
}

function contactOf(input: LoadsInput, result: SolveResult, ci: ContactInputs, k: number): ContactResult {
  const R = result.check.contactRadius.min * k;
  const at = result.check.contactRadius.at;
  const hertzApplies = input.wheel.modulusGpa >= SOFT_MODULUS_GPA && input.track.modulusGpa >= SOFT_MODULUS_GPA;
  if (R === 0)
    return {
      radiusMm: 0,
      halfWidthMm: 0,
      pMaxMpa: null,
      tauMaxMpa: null,
      depthMm: 0,
      at,
      allowableMpa: ci.allowable,
      hertzApplies,
      ok: false,
    };
  const c = lineContact(ci.V, ci.length, combinedRadius(R, Infinity), ci.eStar);
  let ok: boolean | null = ci.allowable === null || !hertzApplies ? null : c.pMax <= ci.allowable;
  const rounded = roundedCorner(input);
  if (ok !== null && rounded !== null && c.halfWidth > PATCH_SHARE * rounded * k) ok = false;
  return {
    radiusMm: R,
    halfWidthMm: Number.isFinite(c.halfWidth) ? c.halfWidth : 0,
    pMaxMpa: c.pMax,
    tauMaxMpa: c.tauMax,
    depthMm: c.depth,
    at,
    allowableMpa: ci.allowable,
    hertzApplies,
    ok,
  };
}

function roundedCorner(input: LoadsInput): number | null {
  const w = (input.spec as { wheel?: { kind?: string; cornerRadius?: number } }).wheel;
  return w?.kind === "polygon" && (w.cornerRadius ?? 0) > 0 ? w.cornerRadius! : null;
}

/** The design spec with the polygon wheel's corner radius set (null for other wheels). */
export function withCornerRadius(spec: unknown, radius: number): Record<string, unknown> | null {
  const s = spec as { wheel?: { kind?: string } };
  if (s?.wheel?.kind !== "polygon") return null;
  return { ...(spec as Record<string, unknown>), wheel: { ...s.wheel, cornerRadius: radius } };
}

/**
 * The smallest corner radius (spec units, to 0.1 of a unit step) that brings the contact under the
 * allowable, by bisection over re-solved designs; null when no radius up to half the inradius does.
 */
export function cornerRadiusFor(input: LoadsInput, result: SolveResult): number | null {
  if (withCornerRadius(input.spec, 1) === null) return null;
  const size = result.wheel.rMin;
  const passes = (rc: number) => {
    const spec = withCornerRadius(input.spec, rc)!;
    try {
      const r = solve(spec);
      return (
        contactOf(
          { ...input, spec },
          r,
          contactInputs(input, r, wheelLoad(input).newtons),
          result.units === "in" ? 25.4 : 1,
        ).ok === true
      );
    } catch {
      return false;
    }
  };
  let hi = size / 2;
  if (!passes(hi)) return null;
  let lo = 0;
  const step = result.units === "in" ? 0.01 : 0.5;
  while (hi - lo > step) {
    const mid = (lo + hi) / 2;
    if (passes(mid)) hi = mid;
    else lo = mid;
  }
  // The first step on the grid above the last failing radius that passes (a step under it fails).
  let rc = Math.max(step, Math.ceil(lo / step) * step);
  while (rc < hi && !passes(rc)) rc += step;
  return Number(Math.min(rc, Math.ceil(hi / step) * step).toFixed(4));
}

const NIP_SOURCE =
  "ISO 13854:2017 (a closing gap that reaches zero cannot meet any minimum gap); CPSC Public Playground Safety Handbook §5.3.2.7 (rolling parts enclosed); ISO 13857:2019 (reach distances)";

function nipCaution(use: Use, pair: boolean): Caution {
  const guarded = use === "display";
  return {
    check: "nip",
    signal: guarded ? "CAUTION" : "WARNING",
    hazard: pair
      ? "Nip where the two wheels turn against each other."
      : "Pinch point where the wheel meets the track, deepest at every trough.",
    consequence: pair
      ? "It can crush and draw in fingers and hair."
      : "It can crush fingers and toes and catch shoelaces.",
    avoid: guarded
      ? "Keep the guard closed and stop the piece before anyone reaches in."
      : pair
        ? "Enclose the wheels behind a guard or glazing so no one can reach the nip."
        : "Keep hands and feet out with side boards or skirts along the track.",
    figure: "",
    limit: "closes to 0 mm: must be guarded or out of reach",
    source: NIP_SOURCE,
  };
}

export interface CheckOptions {
  /** Search for the corner radius a sharp polygon needs (several re-solves); the helper's re-checks skip it. Default true. */
  cornerSearch?: boolean;
}

/** Checks a design; `solved` skips solving again when the caller has the engine's result for input.spec. */
export function checkLoads(input: LoadsInput, solved?: SolveResult, opts: CheckOptions = {}): LoadsReport {
  const result = solved ?? solve(input.spec);
  const k = result.units === "in" ? 25.4 : 1;
  const unit = result.units;
  const pair = !trackModes.has(result.mode);
  const { newtons: V, basis } = wheelLoad(input);
  const use = input.use;
  const cautions: Caution[] = [nipCaution(use, pair)];

  const { grip, dynamics } = gripOf(input, result, V, k);
  const gripFigure = `μ needed ${fmt(grip.needed)}${grip.tractionShare > 0 ? ` with traction H/V = ${fmt(grip.tractionShare)}` : ""}`;
  const gripSource =
    "friction cone μ = tan(ψ + atan(H/V)) (Meriam and Kraige, Engineering Mechanics: Statics, friction chapter); margin 1.3: common practice";
  if (grip.ok === false)
    cautions.push({
      check: "grip",
      signal: signalFor(use, "WARNING", "CAUTION", "NOTICE"),
      hazard: `The contact needs more grip than the wheel and track give (${fmt(grip.available!)}).`,
      consequence:
        use === "ride-on"
          ? "The wheel may slip out of step with the track, jolt and tip a rider."
          : "The wheel may slip out of step, jump and jam.",
      avoid:
        "Use a higher-grip tread, keep the track clean and dry, lower the drive or braking force, or use a wheel with more sides.",
      figure: gripFigure,
      limit: `available μ at least ${GRIP_MARGIN} × needed = ${fmt(GRIP_MARGIN * grip.needed)}`,
      source: gripSource,
      at: grip.at,
    });
  if (grip.available === null)
    cautions.push({
      check: "inputs",
      signal: "NOTICE",
      hazard: "No friction figure for this wheel and track.",
      consequence: "Grip cannot be judged.",
      avoid:
        "Measure it: tilt a track sample under a loaded tread sample until it slides; μ = tan(slip angle). Enter the angle or μ.",
      figure: gripFigure,
      limit: `μ at least ${fmt(GRIP_MARGIN * grip.needed)}`,
      source: "tilt test (ASTM G115 guide to friction measurement); Blau, Tribology International 34 (2001) 585–591",
      at: grip.at,
    });

  const ci = contactInputs(input, result, V);
  const contact = contactOf(input, result, ci, k);
  const hertzSource =
    "Hertz line contact (K. L. Johnson, Contact Mechanics, 1985, §4.2; R. L. Norton, Machine Design, Example 7-2)";
  if (contact.radiusMm === 0) {
    // A rubber-like tread is outside Hertz: no radius can be worked out, only tested.
    contact.cornerRadiusNeeded =
      opts.cornerSearch === false || !contact.hertzApplies ? undefined : cornerRadiusFor(input, result);
    const avoid = !contact.hertzApplies
      ? "Needs a corner radius: round the wheel's corners; the tread is rubber-like, so test a sample of it on the track under the wheel load."
      : contact.cornerRadiusNeeded != null
        ? `Needs a corner radius: round the wheel's corners to at least ${fmt(contact.cornerRadiusNeeded)} ${unit} and solve again.`
        : ci.allowable !== null
          ? `Needs a corner radius, and no radius up to half the wheel's size is enough at this load: the contact needs a combined radius of at least ${fmt(radiusFor(V, ci.length, ci.eStar, ci.allowable), 0)} mm. Use a wider tread, a harder track surface or a lower load, then round the corners.`
          : "Needs a corner radius: round the wheel's corners and solve again.";
    cautions.push({
      check: "contact",
      signal: signalFor(use, "CAUTION", "NOTICE", "NOTICE"),
      hazard: "The wheel has sharp corners: where a corner meets the track the contact stress has no bound.",
      consequence: "The track dents at every trough and the corners wear, so the wheel loses step and the ride bumps.",
      avoid,
      figure: "contact radius 0 mm",
      limit: ci.allowable !== null ? `peak pressure at most ${fmt(ci.allowable)} MPa` : "no allowable stress entered",
      source: hertzSource,
      at: contact.at,
    });
  } else if (!contact.hertzApplies)
    cautions.push({
      check: "contact",
      signal: "NOTICE",
      hazard: "The tread is rubber-like: the Hertz estimate does not apply to it.",
      consequence: "The contact stress shown may be far off.",
      avoid: "Test a sample of the tread on the track material under the wheel load.",
      figure: `peak pressure ${fmt(contact.pMaxMpa!)} MPa (not valid)`,
      limit: `modulus at least ${SOFT_MODULUS_GPA} GPa for Hertz`,
      source: `${hertzSource}: small strains, linear elastic; the threshold is common practice`,
      at: contact.at,
    });
  else if (contact.ok === false)
    cautions.push({
      check: "contact",
      signal: signalFor(use, "CAUTION", "NOTICE", "NOTICE"),
      hazard:
        contact.allowableMpa !== null && contact.pMaxMpa! > contact.allowableMpa
          ? "The contact stress is above what the softer material takes."
          : "The corner radius is too small for the load: the contact patch runs off the rounding.",
      consequence: "The track or tread dents and wears, so the wheel loses step and the ride bumps.",
      avoid: "Use a larger corner radius, a wider tread, a harder track surface or a lower load.",
      figure: `peak pressure ${fmt(contact.pMaxMpa!)} MPa, half-width ${fmt(contact.halfWidthMm, 3)} mm at radius ${fmt(contact.radiusMm, 1)} mm`,
      limit: `peak pressure at most ${fmt(contact.allowableMpa ?? 0)} MPa; half-width at most ${PATCH_SHARE} × corner radius`,
      source: hertzSource,
      at: contact.at,
    });
  if (ci.allowable === null)
    cautions.push({
      check: "inputs",
      signal: "NOTICE",
      hazard: "No allowable contact stress for the wheel or the track.",
      consequence: "Contact stress cannot be judged.",
      avoid: "Enter the softer material's allowable (for wood, compression perpendicular to the grain).",
      figure: contact.pMaxMpa === null ? "" : `peak pressure ${fmt(contact.pMaxMpa)} MPa`,
      limit: "",
      source: "USDA FPL Wood Handbook (FPL-GTR-282, 2021), ch. 5, compression perpendicular to grain",
    });

  const t = input.track;
  const beam = { width: t.widthMm, depth: t.depthMm, modulus: t.modulusGpa * 1000, density: t.densityKgM3 ?? 0 };
  const hump = !pair && result.depth !== undefined ? result.depth * k : null;
  const d = deflections(beam, t.supportSpanMm, V);
  const limitMm = deflectionLimit(t.supportSpanMm, hump);
  const deflection: DeflectionResult = {
    spanMm: t.supportSpanMm,
    pointLoadMm: d.point,
    selfWeightMm: d.self,
    limitMm,
    maxSpanMm: longestSpan(beam, V, hump),
    ok: d.point + d.self <= limitMm,
  };
  if (!deflection.ok)
    cautions.push({
      check: "deflection",
      signal: signalFor(use, "CAUTION", "NOTICE", "NOTICE"),
      hazard: `The track sags ${fmt(d.point + d.self)} mm between supports ${fmt(t.supportSpanMm, 0)} mm apart under the wheel.`,
      consequence: "The axle bumps, the wheel can lose step, and the track may crack.",
      avoid: `Support it at most ${fmt(Math.floor(deflection.maxSpanMm), 0)} mm apart, or use a deeper or stiffer section.`,
      figure: `${fmt(d.point, 3)} mm (wheel at mid-span) + ${fmt(d.self, 3)} mm (own weight)`,
      limit: `at most ${fmt(limitMm, 3)} mm: L/360${hump !== null ? " and 5 % of the hump height" : ""}`,
      source:
        "PL³/48EI and 5wL⁴/384EI (Gere, Mechanics of Materials, 7th ed., Table G-2); L/360: IBC Table 1604.3; 5 % of the hump: common practice",
    });

  const gaps = Object.entries(input.clearancesMm ?? {}).map(([name, gap]) => judgeGap(name, gap, use));
  for (const g of gaps.filter((x) => !x.ok))
    cautions.push({
      check: "gap",
      name: g.name,
      signal: g.band.startsWith("finger") ? "CAUTION" : signalFor(use, "WARNING", "CAUTION", "CAUTION"),
      hazard: `The ${g.name} gap of ${fmt(g.gap, 1)} mm opens and closes as the piece moves.`,
      consequence: `It can trap and crush a ${g.band.startsWith("finger") ? "finger" : g.band.startsWith("hand") ? "hand" : "foot"}.`,
      avoid: `Make it ${g.limit}.`,
      figure: `${fmt(g.gap, 1)} mm`,
      limit: g.limit,
      source: g.source,
    });

  const pen = result.check.interference;
  if (pen.depth > 0)
    cautions.push({
      check: "interference",
      signal: signalFor(use, "WARNING", "CAUTION", "NOTICE"),
      hazard: `The wheel cuts into the ${pair ? "other wheel" : "track"} by ${fmt(pen.depth * k, 2)} mm away from the contact.`,
      consequence: use === "ride-on" ? "It will jam or jump and can throw a rider." : "It will jam or jump.",
      avoid: "Change the design before cutting: more sides, or a gentler track.",
      figure: `${fmt(pen.depth * k, 2)} mm`,
      limit: "0 mm",
      source:
        "the engine's global collision check (Hall and Wagon, Mathematics Magazine 65 (1992) 283–301: the triangle's road is cut by its vertex)",
      at: pen.when ?? undefined,
    });

  return {
    calculationVersion: result.engineVersion,
    use,
    wheelLoadN: V,
    loadBasis: basis,
    grip,
    contact,
    deflection,
    gaps,
    dynamics,
    engineerLoads: engineerLoads({
      riderMassKg: input.load.riderMassKg ?? DEFAULT_RIDER_KG,
      dynamicFactor: input.load.dynamicFactor ?? DEFAULT_DYNAMIC_FACTOR,
      use,
    }),
    cautions: cautions.sort(bySeverity),
    disclaimer: DISCLAIMER,
  };
}
