// The studio's motion, read only from the engine's own result (lib/track conventions):
// - track modes: `motion` holds the wheel's clockwise turn against axle x over one period; we
//   interpolate between its rows and add a whole period's turn (the last row's angle) per period;
// - partner wheel: `follower` holds the partner's counter-clockwise turn against the driver's
//   clockwise turn over one driver sector (2π / wheel.symmetry), extended sector by sector;
// - twin wheels: the upper wheel turns by `angle` (clockwise), the lower by `lowerAngle`
//   (counter-clockwise), both axles over the same x.
//
// Between rows we interpolate with cubic Hermite, the slope at each row given by the rolling law
// itself: dθ/dx = 1/r with r the axle's height over the track there (Hall & Wagon 1992), and
// dφ/dθ = r₁/(a − r₁) for a pair (Litvin et al. 2009). A straight line between rows a few mm apart
// turns the wheel up to ~1e-3 rad wrong, which lifts or sinks a steep contact by ~0.07 mm.
//
// Position: a number in [0, 1) — the fraction of one animation cycle. A cycle is RUN_PERIODS
// periods of axle travel in the track modes (every whole period looks the same, so the loop is
// seamless) and one full driver turn for a pair. `alongAt` turns a position into axle x or driver
// angle; `positionAt` goes back.

import type { SolvedGeometry, SolveResult } from "@/lib/track";
import { hermite, rayReach, trackLookup, trackYAt, type Pt, type TrackLookup } from "./view-math";

/** How many track periods the studio lays out and rolls over. */
export const RUN_PERIODS = 3;

const TAU = 2 * Math.PI;

export type Cycle =
  | { kind: "track"; start: number; length: number; period: number }
  | { kind: "pair"; start: 0; length: number; sector: number };

export function isPairResult(r: SolvedGeometry): boolean {
  return r.mode === "partner-wheel";
}

/** The nominal axle line: y = 0 for track-for-wheel (the track below it), else axleHeight above the datum. */
export function axleLineY(r: SolvedGeometry): number {
  return r.mode === "track-for-wheel" ? 0 : (r.axleHeight ?? 0);
}

/** The body direction that points straight down after a clockwise turn by a (the ray (sin a, −cos a)). */
const downInBody = (a: number): Pt => [Math.sin(a), -Math.cos(a)];
/** The body direction that points straight up after a counter-clockwise turn by a (the ray (sin a, cos a)). */
const upInBody = (a: number): Pt => [Math.sin(a), Math.cos(a)];

interface Tables {
  xs: Float64Array;
  angle: Float64Array;
  /** dθ/dx at each row. */
  dAngle: Float64Array;
  lower?: Float64Array;
  dLower?: Float64Array;
  turn: number;
  lowerTurn: number;
  track?: TrackLookup;
  fd?: Float64Array;
  ff?: Float64Array;
  /** dφ/dθ at each follower row. */
  dff?: Float64Array;
  sectorTurn: number;
}

// Results are immutable JSON; build the lookup tables once per result.
const cache = new WeakMap<SolvedGeometry, Tables>();

function tables(r: SolvedGeometry): Tables {
  const hit = cache.get(r);
  if (hit) return hit;
  const m = r.motion ?? [];
  const f = r.follower ?? [];
  const track = r.track ? trackLookup(r.track.points, r.period) : undefined;
  const yAt = (x: number) => (track ? trackYAt(track, x) : 0);
  const h = axleLineY(r);
  const h2 = r.lowerAxleHeight ?? 0;
  const a = r.centreDistance ?? 0;
  const hasLower = m.length > 0 && m[0].lowerAngle !== undefined;
  const t: Tables = {
    xs: Float64Array.from(m, (row) => row.x),
    angle: Float64Array.from(m, (row) => row.angle),
    dAngle: Float64Array.from(m, (row) => 1 / (h - yAt(row.x))),
    lower: hasLower ? Float64Array.from(m, (row) => row.lowerAngle ?? 0) : undefined,
    dLower: hasLower ? Float64Array.from(m, (row) => 1 / (yAt(row.x) - h2)) : undefined,
    turn: m.length ? m[m.length - 1].angle - m[0].angle : 0,
    lowerTurn: m.length ? (m[m.length - 1].lowerAngle ?? 0) - (m[0].lowerAngle ?? 0) : 0,
    track,
    fd: f.length ? Float64Array.from(f, (row) => row.driver) : undefined,
    ff: f.length ? Float64Array.from(f, (row) => row.follower) : undefined,
    dff: f.length
      ? Float64Array.from(f, (row) => {
          const r1 = rayReach(r.wheel.points, downInBody(row.driver));
          return r1 / (a - r1);
        })
      : undefined,
    sectorTurn: f.length ? f[f.length - 1].follower - f[0].follower : 0,
  };
  cache.set(r, t);
  return t;
}

function periodOf(r: SolvedGeometry): number {
  if (r.period) return r.period;
  const m = r.motion ?? [];
  return m.length > 1 ? m[m.length - 1].x - m[0].x : 1;
}

export function cycleOf(r: SolvedGeometry): Cycle {
  if (isPairResult(r)) return { kind: "pair", start: 0, length: TAU, sector: TAU / Math.max(1, r.wheel.symmetry) };
  const period = periodOf(r);
  const start = r.motion?.[0]?.x ?? r.track?.points[0]?.[0] ?? 0;
  return { kind: "track", start, length: RUN_PERIODS * period, period };
}

const wrap01 = (p: number) => p - Math.floor(p);

/** Axle x (track modes) or driver angle (pairs) at a cycle position. */
export function alongAt(r: SolvedGeometry, position: number): number {
  const c = cycleOf(r);
  return c.start + wrap01(position) * c.length;
}

/** The cycle position of an axle x (track modes) or driver angle (pairs), wrapped to [0, 1). */
export function positionAt(r: SolvedGeometry, along: number): number {
  const c = cycleOf(r);
  return wrap01((along - c.start) / c.length);
}

/** A periodic table extended by whole periods: value(x) = k·turn + table(x − kP). */
function extended(
  xs: Float64Array,
  ys: Float64Array,
  ds: Float64Array,
  period: number,
  turn: number,
  x: number,
): number {
  const k = Math.floor((x - xs[0]) / period);
  return k * turn + hermite(xs, ys, ds, x - k * period);
}

/** The wheel's clockwise turn with the axle at x (track modes). */
export function wheelAngleAt(r: SolvedGeometry, x: number): number {
  const t = tables(r);
  if (t.xs.length < 2) return 0;
  return extended(t.xs, t.angle, t.dAngle, periodOf(r), t.turn, x);
}

/** Twin wheels: the lower wheel's counter-clockwise turn with the axles at x. */
export function lowerAngleAt(r: SolvedGeometry, x: number): number {
  const t = tables(r);
  if (!t.lower || !t.dLower || t.xs.length < 2) return 0;
  return extended(t.xs, t.lower, t.dLower, periodOf(r), t.lowerTurn, x);
}

/** Partner wheel: the partner's counter-clockwise turn when the driver has turned θ clockwise. */
export function followerAt(r: SolvedGeometry, driver: number): number {
  const t = tables(r);
  if (!t.fd || !t.ff || !t.dff || t.fd.length < 2) return 0;
  return extended(t.fd, t.ff, t.dff, TAU / Math.max(1, r.wheel.symmetry), t.sectorTurn, driver);
}

/** Axle x at which the wheel has turned `angle` clockwise: the motion table read backwards (the turn only grows). */
export function xAtWheelAngle(r: SolvedGeometry, angle: number): number {
  const t = tables(r);
  if (t.xs.length < 2 || t.turn <= 0) return t.xs[0] ?? 0;
  const P = periodOf(r);
  const k = Math.floor((angle - t.angle[0]) / t.turn);
  // Read backwards the slope is dx/dθ = r.
  return (
    k * P +
    hermite(
      t.angle,
      t.xs,
      t.dAngle.map((d) => 1 / d),
      angle - k * t.turn,
    )
  );
}

/** Track height at x, the period repeated (track modes). */
export function trackYAtX(r: SolvedGeometry, x: number): number {
  const t = tables(r).track;
  return t ? trackYAt(t, x) : 0;
}

export interface BodyPose {
  /** Axle position. */
  x: number;
  y: number;
  /** Turn from the start pose, in the body's own sense. */
  angle: number;
  sense: "cw" | "ccw";
}

export interface Pose {
  /** Axle x (track modes) or driver angle (pairs). */
  along: number;
  wheel: BodyPose;
  /** Partner wheel, or the lower twin. */
  partner?: BodyPose;
  /** Where the wheel touches the track (straight below its axle) or the partner (on the line of centres). */
  contact: Pt;
  /** Twin wheels: where the lower wheel touches the track (straight above its axle). */
  lowerContact?: Pt;
}

/** Everything the canvas draws at one cycle position, from the engine's tables alone. */
export function poseAt(r: SolvedGeometry, position: number): Pose {
  const along = alongAt(r, position);
  if (isPairResult(r)) {
    const a = r.centreDistance ?? 0;
    const rho = rayReach(r.wheel.points, downInBody(along));
    return {
      along,
      wheel: { x: 0, y: 0, angle: along, sense: "cw" },
      partner: { x: 0, y: -a, angle: followerAt(r, along), sense: "ccw" },
      contact: [0, -rho],
    };
  }
  const x = along;
  const pose: Pose = {
    along,
    wheel: { x, y: axleLineY(r), angle: wheelAngleAt(r, x), sense: "cw" },
    contact: [x, trackYAtX(r, x)],
  };
  if (r.mode === "twin-wheels" && r.partner) {
    pose.partner = { x, y: r.lowerAxleHeight ?? 0, angle: lowerAngleAt(r, x), sense: "ccw" };
    pose.lowerContact = pose.contact;
  }
  return pose;
}

/** How far the wheel reaches from its axle toward its contact in this pose (straight down, or along the line of centres). */
export function reachToContact(r: SolvedGeometry, pose: Pose): number {
  return rayReach(r.wheel.points, downInBody(pose.wheel.angle));
}

/** How far the partner / lower twin reaches from its axle straight up toward the contact. */
export function partnerReachToContact(r: SolvedGeometry, pose: Pose): number {
  if (!r.partner || !pose.partner) return NaN;
  return rayReach(r.partner.points, upInBody(pose.partner.angle));
}

/**
 * Where the axles would have to be for the drawn outlines, turned as the engine says, to touch at
 * the contact: the wheel's point under its axle set on the track (or, for a pair, the partner's
 * axle at r₁ + r₂ below the driver's). Tracing these heights shows whether the axle stays level
 * without trusting the axle height the engine reports.
 */
export function restingAxles(r: SolvedGeometry, pose: Pose): { wheel: number; partner?: number } {
  if (isPairResult(r)) return { wheel: 0, partner: -(reachToContact(r, pose) + partnerReachToContact(r, pose)) };
  const y = pose.contact[1];
  const out: { wheel: number; partner?: number } = { wheel: y + reachToContact(r, pose) };
  if (pose.partner) out.partner = y - partnerReachToContact(r, pose);
  return out;
}

export interface TraceRow {
  along: number;
  x: number;
  wheel: number;
  partner?: number;
}

/** The resting axle heights at `samples` + 1 even steps over one cycle (the axle path the canvas traces). */
export function axleTrace(r: SolvedGeometry, samples = 360): TraceRow[] {
  const out: TraceRow[] = [];
  for (let i = 0; i <= samples; i++) {
    // The last row is the cycle's end, not its wrapped start.
    const pose = poseAt(r, i === samples ? 0 : i / samples);
    const along = i === samples ? alongAt(r, 0) + cycleOf(r).length : pose.along;
    const rest = restingAxles(r, pose);
    out.push({ along, x: isPairResult(r) ? 0 : along, wheel: rest.wheel, partner: rest.partner });
  }
  return out;
}

export interface Location {
  position: number;
  /** The spot to mark, in the canvas frame. */
  point: Pt;
}

/** Where the deepest cut-in happens, as a cycle position and a point on the canvas (null if it never cuts in). */
export function interferenceLocation(r: SolveResult): Location | null {
  const i = r.check.interference;
  if (!(i.depth > 0) || !i.at || i.when === null) return null;
  if (isPairResult(r)) return { position: positionAt(r, i.when), point: i.at };
  if (r.mode === "twin-wheels") {
    // The engine checks twins as a pair: `when` is the upper wheel's turn, `at` is relative to its axle.
    const x = xAtWheelAngle(r, i.when);
    return { position: positionAt(r, x), point: [x + i.at[0], axleLineY(r) + i.at[1]] };
  }
  return { position: positionAt(r, i.when), point: i.at };
}

/** Where the contact needs the most friction: a cycle position and the contact point there. */
export function frictionLocation(r: SolveResult): Location {
  return contactLocation(r, r.check.frictionDemand.at);
}

/** The contact at a place given as the engine's figures give it (axle x, or the driver's turn for pairs). */
export function contactLocation(r: SolvedGeometry, along: number): Location {
  const position = positionAt(r, along);
  return { position, point: poseAt(r, position).contact };
}
