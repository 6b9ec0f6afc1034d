// solve(spec): validates the spec, runs the mode's construction, samples the outputs to the chord
// tolerance, runs the independent rolling check and turns its figures into plain warnings.

import { Deadline } from "./deadline";
import { EngineError } from "./errors";
import { hasKinks, pairFigures, trackAndWheelFigures, twinContact, wheelAndRoadFigures, type Figures } from "./figures";
import { partnerFor, solveCentreDistance } from "./partner";
import { piecewise } from "./piecewise";
import {
  checkPairRoll,
  checkTrackRoll,
  type Curve,
  type PairRollInput,
  type RollCheck,
  type TrackRollInput,
} from "./rolling-check";
import { MAX_OUTPUT_POINTS, sampleCurve, type Pt } from "./sampling";
import { parseSpec, specHash, type DesignSpec } from "./spec";
import { solveTrackForWheel } from "./track-for-wheel";
import { buildTrack, type Track } from "./tracks";
import { pointSymmetry } from "./twins";
import type { Check, CheckResult, SolvedGeometry, SolveOption, SolveResult, Warning } from "./types";
import { solveAxleHeight, wheelFromTrack, type Side } from "./wheel-for-track";
import { buildWheel, ray, TAU, type Wheel } from "./wheels";

export const ENGINE_VERSION = "1.0.0";

/** How many choices `options` lists. */
export const OPTION_COUNT = 6;
/** Friction coefficient above which the contact is flagged (typical dry pairs lie near or below it). */
export const FRICTION_LIMIT = 0.6;
/** A bend tighter than this fraction of the wheel size is flagged. */
export const SHARP_FRACTION = 0.02;

interface Ctx {
  spec: DesignSpec;
  tol: number;
  deadline: Deadline;
  budget: { left: number };
}

type Base = Pick<SolveResult, "engineVersion" | "specHash" | "mode" | "units">;

/**
 * A mode's work in three parts: the geometry (everything that is drawn and cut), the other closure
 * choices (periods per turn or lobes, each a solve of its own), and the independent rolling check.
 * The last two run later and only when asked for; they reuse the geometry's construction.
 */
interface Stages {
  geometry: SolvedGeometry;
  options?(deadline: Deadline): SolveOption[];
  check(deadline: Deadline): CheckResult;
  /** What the check's roll is given: the output curves (for the engine bench's baseline). */
  rollInput(deadline: Deadline): RollInput;
}

export type RollInput = { kind: "track"; input: TrackRollInput } | { kind: "pair"; input: PairRollInput };

const fmt = (v: number) => Number(v.toPrecision(4)).toString();

/** Rotates body points by δ (counter-clockwise). */
const rot = (p: Pt, d: number): Pt => [
  p[0] * Math.cos(d) - p[1] * Math.sin(d),
  p[0] * Math.sin(d) + p[1] * Math.cos(d),
];

/** A closed outline from one pattern repeated `copies` times, each turned by `step` radians. */
function replicate(pattern: Pt[], copies: number, step: number): Pt[] {
  const out: Pt[] = [];
  const body = pattern.slice(0, -1);
  for (let j = 0; j < copies; j++) for (const p of body) out.push(j === 0 ? p : rot(p, j * step));
  out.push(out[0]);
  return out;
}

function concat(parts: Pt[][]): Pt[] {
  const out: Pt[] = [];
  for (const part of parts) out.push(...(out.length ? part.slice(1) : part));
  return out;
}

function wheelOutline(wheel: Wheel, ctx: Ctx): Pt[] {
  const breaks = wheel.pieces.map((p) => p.a).filter((a) => a > 0);
  return sampleCurve(
    (t) => {
      const r = wheel.r(t);
      const [x, y] = ray(t);
      return [r * x, r * y];
    },
    0,
    TAU,
    breaks,
    ctx.tol,
    { deadline: ctx.deadline, budget: ctx.budget },
  ).pts;
}

function warnings(
  check: Check,
  fig: Figures,
  size: number,
  units: string,
  hasCorners: boolean,
  isPair: boolean,
): Warning[] {
  const out: Warning[] = [];
  const i = check.interference;
  if (i.depth > 0) {
    const where =
      i.when === null
        ? ""
        : isPair
          ? ` when the driver has turned ${fmt(i.when)} rad`
          : ` with the axle at x = ${fmt(i.when)} ${units}`;
    out.push({
      code: "interference",
      message: `The ${isPair ? "wheels overlap" : "wheel cuts into the track"} by up to ${fmt(i.depth)} ${units}${where}, away from the contact point. It cannot roll as designed.`,
    });
  }
  if (check.frictionDemand.max > FRICTION_LIMIT) {
    out.push({
      code: "friction",
      message: `The contact needs a friction coefficient of ${fmt(check.frictionDemand.max)} at its steepest point, above ${FRICTION_LIMIT}: many material pairs will slip there. It depends on the materials; see the cautions.`,
    });
  }
  if (hasCorners) {
    out.push({
      code: "sharp-corner",
      message: isPair
        ? "The wheels have sharp corners (curvature radius 0). Round them for parts people will touch."
        : "The wheel has sharp corners and the track sharp cusps (curvature radius 0). Round them for parts people will touch.",
    });
  } else {
    const r = Math.min(fig.radiusA, fig.radiusB);
    if (r < SHARP_FRACTION * size)
      out.push({
        code: "sharp-curvature",
        message: `A very tight bend: the smallest radius of curvature is ${fmt(r)} ${units}, under ${SHARP_FRACTION * 100}% of the wheel size.`,
      });
  }
  return out;
}

function trackForWheelMode(ctx: Ctx, base: Base): Stages {
  const { deadline, tol } = ctx;
  const wheel = buildWheel(ctx.spec.wheel!);
  const tfw = solveTrackForWheel(wheel, deadline);
  const { T, period } = tfw;
  const trackS = sampleCurve((t) => [tfw.x.value(t), -wheel.r(t)], 0, T, tfw.breaks, tol, {
    deadline,
    budget: ctx.budget,
  });
  const wheelPts = wheelOutline(wheel, ctx);
  const geometry: SolvedGeometry = {
    ...base,
    period,
    depth: tfw.depth,
    wheel: { points: wheelPts, rMin: wheel.rMin, rMax: wheel.rMax, symmetry: wheel.symmetry },
    track: { points: trackS.pts },
    motion: trackS.u.map((t, i) => ({ x: trackS.pts[i][0], angle: t })),
  };
  const rollInput = (deadline: Deadline): TrackRollInput => ({
    wheel: polarCurve(wheel.r, T, tfw.breaks),
    T,
    // The track as the engine outputs it, parametrised by the wheel angle t.
    track: { x: (t) => tfw.x.value(t), y: (t) => -wheel.r(t), V: T, breaks: tfw.breaks },
    H: 0,
    size: wheel.rMax,
    probe: { kind: "track", wheelR: wheel.r },
    deadline,
  });
  const check = (deadline: Deadline): CheckResult => {
    deadline.checkNow();
    const roll = checkTrackRoll(rollInput(deadline));
    const hasCorners = wheel.corners.length > 0;
    const fig = wheelAndRoadFigures(piecewise(wheel.r, 0, T, tfw.breaks, 1), hasCorners);
    const c = makeCheck(
      roll,
      { max: fig.friction.value, at: tfw.x.value(fig.friction.at) },
      { wheel: fig.radiusA, track: fig.radiusB },
      {
        min: fig.contact.value,
        at: tfw.x.value(fig.contact.at),
      },
    );
    return { check: c, warnings: warnings(c, fig, wheel.rMax, ctx.spec.units, hasCorners, false) };
  };
  return { geometry, check, rollInput: (d) => ({ kind: "track", input: rollInput(d) }) };
}

function makeCheck(
  roll: RollCheck,
  frictionDemand: Check["frictionDemand"],
  minCurvatureRadius: Check["minCurvatureRadius"],
  contactRadius: Check["contactRadius"],
): Check {
  return { ...roll, frictionDemand, minCurvatureRadius, contactRadius };
}

function trackSamples(track: Track, ctx: Ctx) {
  return track.pieces.map((p) =>
    sampleCurve((s) => [p.x(s), p.y(s)], p.s0, p.s1, [], ctx.tol, { deadline: ctx.deadline, budget: ctx.budget }),
  );
}

/** One parameter v over the track's pieces laid end to end (x for graphs, φ for the cycloid). */
function trackParam(track: Track): { V: number; breaks: number[]; at(v: number): [number, number] } {
  const starts: number[] = [];
  let V = 0;
  for (const p of track.pieces) {
    starts.push(V);
    V += p.s1 - p.s0;
  }
  const at = (v: number): [number, number] => {
    let i = 0;
    while (i + 1 < starts.length && starts[i + 1] <= v) i++;
    const p = track.pieces[i];
    return [i, Math.min(p.s1, p.s0 + (v - starts[i]))];
  };
  return { V, breaks: starts.slice(1), at };
}

function curveOf(c: (v: number) => Pt, V: number, breaks: number[]): Curve {
  // x and y are asked for one after the other at the same v: keep the last point.
  let lastV = NaN;
  let last: Pt = [NaN, NaN];
  const at = (v: number) => {
    if (v !== lastV) {
      last = c(v);
      lastV = v;
    }
    return last;
  };
  return { x: (v) => at(v)[0], y: (v) => at(v)[1], V, breaks };
}

function polarCurve(r: (t: number) => number, T: number, breaks: number[]): Curve {
  return { x: (t) => r(t) * Math.sin(t), y: (t) => -r(t) * Math.cos(t), V: T, breaks };
}

function heightOptions(track: Track, sgn: Side, deadline: Deadline): Map<number, number> {
  const out = new Map<number, number>();
  for (let k = 1; k <= OPTION_COUNT; k++) {
    try {
      out.set(k, solveAxleHeight(track, k, sgn, deadline));
    } catch (e) {
      if (!(e instanceof EngineError) || e.code !== "no-solution") throw e;
    }
  }
  return out;
}

function trackKinks(track: Track): boolean {
  const g = piecewise(track.yAt, 0, track.period, track.breaksX, track.period);
  return hasKinks(g, (x, s) => g.d1(x, s));
}

function wheelForTrackMode(ctx: Ctx, base: Base): Stages {
  const { deadline, tol } = ctx;
  const track = buildTrack(ctx.spec.track!);
  const k = ctx.spec.periodsPerTurn!;
  const P = track.period;
  const h = solveAxleHeight(track, k, 1, deadline);
  const wf = wheelFromTrack(track, h, k, 1, deadline);
  const trackS = trackSamples(track, ctx);
  const pattern = concat(
    track.pieces.map(
      (p, i) => sampleCurve((s) => wf.point(i, s), p.s0, p.s1, [], tol, { deadline, budget: ctx.budget }).pts,
    ),
  );
  const wheelPts = replicate(pattern, k, TAU / k);
  const rMax = h - track.yMin;
  const geometry: SolvedGeometry = {
    ...base,
    period: P,
    depth: track.yMax - track.yMin,
    axleHeight: h,
    wheel: { points: wheelPts, rMin: h - track.yMax, rMax, symmetry: k },
    track: { points: concat(trackS.map((s) => s.pts)) },
    motion: concat(trackS.map((s, i) => s.u.map((u): Pt => [track.pieces[i].x(u), wf.thetaOf(i, u)]))).map(
      ([x, angle]) => ({ x, angle }),
    ),
  };
  const options = (deadline: Deadline): SolveOption[] =>
    [...heightOptions(track, 1, deadline)].map(([kk, hh]) => ({
      periodsPerTurn: kk,
      axleHeight: hh,
      rMax: hh - track.yMin,
    }));
  const rollInput = (deadline: Deadline): TrackRollInput => {
    const tp = trackParam(track);
    // The whole wheel outline as one curve for the interference probe: v runs over k patterns.
    const wheelCurve = (v: number): Pt => {
      const j = Math.min(k - 1, Math.floor(v / tp.V));
      return rot(wf.point(...tp.at(v - j * tp.V)), (j * TAU) / k);
    };
    const wheelBreaks: number[] = [];
    for (let j = 0; j < k; j++) for (const b of [0, ...tp.breaks]) wheelBreaks.push(j * tp.V + b);
    return {
      wheel: curveOf((v) => wf.point(...tp.at(v)), tp.V, tp.breaks),
      T: TAU / k,
      track: curveOf(
        (v) => {
          const [i, s] = tp.at(v);
          return [track.pieces[i].x(s), track.pieces[i].y(s)];
        },
        tp.V,
        tp.breaks,
      ),
      H: h,
      size: h - track.yMin,
      probe: {
        kind: "wheel",
        curve: wheelCurve,
        V: k * tp.V,
        breaks: wheelBreaks.filter((b) => b > 0),
        trackY: track.yAt,
      },
      deadline,
    };
  };
  const check = (deadline: Deadline): CheckResult => {
    const inner = track.breaksX.filter((x) => x > 0 && x < P);
    const roll = checkTrackRoll(rollInput(deadline));
    const kinks = trackKinks(track);
    const fig = trackAndWheelFigures(piecewise(track.yAt, 0, P, inner, P), h, 1, kinks);
    const c = makeCheck(
      roll,
      { max: fig.friction.value, at: fig.friction.at },
      { wheel: fig.radiusB, track: fig.radiusA },
      { min: fig.contact.value, at: fig.contact.at },
    );
    return { check: c, warnings: warnings(c, fig, rMax, ctx.spec.units, kinks, false) };
  };
  return { geometry, options, check, rollInput: (d) => ({ kind: "track", input: rollInput(d) }) };
}

function partnerMode(ctx: Ctx, base: Base): Stages {
  const { deadline, tol } = ctx;
  const wheel = buildWheel(ctx.spec.wheel!);
  const m = ctx.spec.lobes!;
  const a = solveCentreDistance(wheel, m, deadline);
  const pt = partnerFor(wheel, m, a, deadline);
  const { T1, T2 } = pt;
  const breaks = wheel.pieces.map((p) => p.a).filter((x) => x > 0 && x < T1);
  const partS = sampleCurve(pt.point, 0, T1, breaks, tol, { deadline, budget: ctx.budget });
  // The partner's body ray is (sin τ, cos τ), so a later lobe is the pattern turned clockwise.
  const partnerPts = replicate(partS.pts, m, -T2);
  const geometry: SolvedGeometry = {
    ...base,
    centreDistance: a,
    wheel: { points: wheelOutline(wheel, ctx), rMin: wheel.rMin, rMax: wheel.rMax, symmetry: wheel.symmetry },
    partner: { points: partnerPts, rMin: a - wheel.rMax, rMax: a - wheel.rMin, symmetry: m },
    follower: partS.u.map((t) => ({ driver: t, follower: pt.follower.value(t) })),
  };
  const options = (deadline: Deadline): SolveOption[] => {
    const out: SolveOption[] = [];
    for (let mm = 1; mm <= OPTION_COUNT; mm++) {
      const am = mm === m ? a : solveCentreDistance(wheel, mm, deadline);
      out.push({ lobes: mm, centreDistance: am, rMax: am - wheel.rMin });
    }
    return out;
  };
  const rollInput = (deadline: Deadline): PairRollInput => ({
    driver: polarCurve(wheel.r, T1, breaks),
    T1,
    driverR: wheel.r,
    partner: curveOf(pt.point, T1, breaks),
    T2,
    a,
    size: a,
    deadline,
  });
  const check = (deadline: Deadline): CheckResult => {
    const roll = checkPairRoll(rollInput(deadline));
    const hasCorners = wheel.corners.length > 0;
    const fig = pairFigures(piecewise(wheel.r, 0, T1, breaks, 1), a, hasCorners);
    const c: Check = {
      ...makeCheck(
        roll,
        { max: fig.friction.value, at: fig.friction.at },
        { wheel: fig.radiusA, partner: fig.radiusB },
        { min: fig.contact.value, at: fig.contact.at },
      ),
      speedRatio: { min: wheel.rMin / (a - wheel.rMin), max: wheel.rMax / (a - wheel.rMax) },
    };
    return { check: c, warnings: warnings(c, fig, a - wheel.rMin, ctx.spec.units, hasCorners, true) };
  };
  return { geometry, options, check, rollInput: (d) => ({ kind: "pair", input: rollInput(d) }) };
}

function twinMode(ctx: Ctx, base: Base): Stages {
  const { deadline, tol } = ctx;
  const track = buildTrack(ctx.spec.track!);
  const k = ctx.spec.periodsPerTurn!;
  const P = track.period;
  const T = TAU / k;
  const h1 = solveAxleHeight(track, k, 1, deadline);
  const h2 = solveAxleHeight(track, k, -1, deadline);
  const top = wheelFromTrack(track, h1, k, 1, deadline);
  const bottom = wheelFromTrack(track, h2, k, -1, deadline);
  const a = h1 - h2;
  const trackS = trackSamples(track, ctx);
  const patternOf = (w: typeof top) =>
    concat(
      track.pieces.map(
        (p, i) => sampleCurve((s) => w.point(i, s), p.s0, p.s1, [], tol, { deadline, budget: ctx.budget }).pts,
      ),
    );
  const rMax = h1 - track.yMin;
  const geometry: SolvedGeometry = {
    ...base,
    period: P,
    depth: track.yMax - track.yMin,
    axleHeight: h1,
    lowerAxleHeight: h2,
    centreDistance: a,
    wheel: { points: replicate(patternOf(top), k, T), rMin: h1 - track.yMax, rMax, symmetry: k },
    partner: { points: replicate(patternOf(bottom), k, -T), rMin: track.yMin - h2, rMax: track.yMax - h2, symmetry: k },
    track: { points: concat(trackS.map((s) => s.pts)) },
    motion: concat(trackS.map((s, i) => s.u.map((u): Pt => [i, u]))).map(([i, u]) => ({
      x: track.pieces[i].x(u),
      angle: top.thetaOf(i, u),
      lowerAngle: bottom.thetaOf(i, u),
    })),
  };
  const options = (deadline: Deadline): SolveOption[] => {
    const up = heightOptions(track, 1, deadline);
    const down = heightOptions(track, -1, deadline);
    const out: SolveOption[] = [];
    for (const [kk, hh] of up) {
      const lo = down.get(kk);
      if (lo !== undefined)
        out.push({ periodsPerTurn: kk, centreDistance: hh - lo, axleHeight: hh, rMax: hh - track.yMin });
    }
    return out;
  };
  const rollInput = (deadline: Deadline): PairRollInput => {
    const tp = trackParam(track);
    return {
      driver: curveOf((v) => top.point(...tp.at(v)), tp.V, tp.breaks),
      T1: T,
      driverR: top.r,
      partner: curveOf((v) => bottom.point(...tp.at(v)), tp.V, tp.breaks),
      T2: T,
      a,
      size: a,
      deadline,
    };
  };
  const check = (deadline: Deadline): CheckResult => {
    const sym = pointSymmetry(track, deadline);
    const roll = checkPairRoll(rollInput(deadline));
    const inner = track.breaksX.filter((x) => x > 0 && x < P);
    const kinks = trackKinks(track);
    const g = piecewise(track.yAt, 0, P, inner, P);
    const figTop = trackAndWheelFigures(g, h1, 1, kinks);
    const figBottom = trackAndWheelFigures(g, h2, -1, kinks);
    const contact = twinContact(g, h1, h2, kinks);
    const c: Check = {
      ...makeCheck(
        roll,
        { max: figTop.friction.value, at: figTop.friction.at },
        { wheel: figTop.radiusB, partner: figBottom.radiusB, track: figTop.radiusA },
        { min: contact.value, at: contact.at },
      ),
      speedRatio: { min: (h1 - track.yMax) / (track.yMax - h2), max: (h1 - track.yMin) / (track.yMin - h2) },
      symmetryError: sym.error,
    };
    const warn = warnings(
      c,
      {
        friction: figTop.friction,
        contact,
        radiusA: figTop.radiusA,
        radiusB: Math.min(figTop.radiusB, figBottom.radiusB),
      },
      rMax,
      ctx.spec.units,
      kinks,
      true,
    );
    if (sym.error > 1e-9 * rMax)
      warn.push({
        code: "not-point-symmetric",
        message: `The track is not point-symmetric: turned upside down about x = ${fmt(sym.centre)} it is off by up to ${fmt(sym.error)} ${ctx.spec.units}, so the two wheels are not identical (each still closes and they roll on each other).`,
      });
    return { check: c, warnings: warn };
  };
  return { geometry, options, check, rollInput: (d) => ({ kind: "pair", input: rollInput(d) }) };
}

export interface SolveOptions {
  /** Stop with EngineError "timeout" once this many milliseconds have passed. */
  deadlineMs?: number;
  /** false: return the geometry alone, without the rolling check and its warnings. Default true. */
  check?: boolean;
}

function stagesOf(input: unknown, deadline: Deadline): Stages {
  const spec = parseSpec(input);
  const ctx: Ctx = { spec, tol: spec.tolerance, deadline, budget: { left: MAX_OUTPUT_POINTS } };
  const base: Base = { engineVersion: ENGINE_VERSION, specHash: specHash(spec), mode: spec.mode, units: spec.units };
  switch (spec.mode) {
    case "track-for-wheel":
      return trackForWheelMode(ctx, base);
    case "wheel-for-track":
      return wheelForTrackMode(ctx, base);
    case "partner-wheel":
      return partnerMode(ctx, base);
    case "twin-wheels":
      return twinMode(ctx, base);
  }
}

/**
 * Solves a design spec. Throws EngineError for bad input ("invalid-spec", "bad-formula",
 * "invalid-wheel", "invalid-track"), for designs with no solution ("no-solution"), for too fine a
 * tolerance ("too-fine") and when `deadlineMs` passes ("timeout"). With `check: false` the
 * rolling check is skipped and the result carries neither `check` nor `warnings`.
 */
export function solve(input: unknown, opts: SolveOptions & { check: false }): SolvedGeometry;
export function solve(input: unknown, opts?: SolveOptions & { check?: true }): SolveResult;
export function solve(input: unknown, opts: SolveOptions = {}): SolvedGeometry | SolveResult {
  // One time limit for every stage.
  const deadline = new Deadline(opts.deadlineMs);
  const stages = stagesOf(input, deadline);
  const geometry: SolvedGeometry = stages.options
    ? { ...stages.geometry, options: stages.options(deadline) }
    : stages.geometry;
  if (opts.check === false) return geometry;
  return { ...geometry, ...stages.check(deadline) };
}

/** The rolling check's input for a spec, the output curves as the check stage receives them (for the engine bench). */
export function rollInputOf(input: unknown): RollInput {
  const deadline = new Deadline();
  return stagesOf(input, deadline).rollInput(deadline);
}

export interface SolveStages {
  /** What is drawn: solve(spec, { check: false }) without `options`. */
  geometry: SolvedGeometry;
  /** The closure choices solve() lists as `options` (undefined for modes without them). */
  options(opts?: { deadlineMs?: number }): SolveOption[] | undefined;
  /** The rolling check and its warnings, as solve() returns them. */
  check(opts?: { deadlineMs?: number }): CheckResult;
}

/**
 * The same solve in stages, for a caller that shows the drawing first (the studio's worker): the
 * geometry at once, then the options and the check when asked for, each with its own time limit.
 * Later stages reuse the geometry's construction instead of solving again; together the three
 * make exactly what solve(spec) returns.
 */
export function solveInStages(input: unknown, opts: { deadlineMs?: number } = {}): SolveStages {
  const stages = stagesOf(input, new Deadline(opts.deadlineMs));
  return {
    geometry: stages.geometry,
    options: (o = {}) => stages.options?.(new Deadline(o.deadlineMs)),
    check: (o = {}) => stages.check(new Deadline(o.deadlineMs)),
  };
}
