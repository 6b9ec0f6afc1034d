// Installation tolerances: how far a joint may sit off its station, or a support sit low, before
// the axle bumps by more than a limit. The wheel keeps the turn the rolling law gives it on the
// track as designed (x = ∫ r dθ, L. Hall and S. Wagon, "Roads and Wheels", Mathematics Magazine
// 65(5), 1992, pp. 283–301); over the track as built it rides at the lowest axle height at which no
// point of its outline is below the track — the envelope the rolling check's interference test
// measures against (rolling-check.ts). The bump is that height less the height on the track as
// designed, largest over the roll past the change. The tolerance is the largest change whose bump
// stays within the limit, found by bisection on a bracket (the bump grows with the change).
//
// Everything here is in one length unit (the caller's, e.g. mm) and one frame: x along the run, y up.
import type { Pt } from "./types";

export interface RollingBody {
  /**
   * The wheel's outline about its axle, at its start pose, with points no further apart than the
   * finest detail that matters (see `densified`): a flat face touches the track between its corners.
   */
  outline: readonly Pt[];
  /** The wheel's clockwise turn (rad) with its axle at run x, on the track as designed. */
  turnAt: (x: number) => number;
}

/** The closed outline with points added along each edge so none are more than `spacing` apart. */
export function densified(outline: readonly Pt[], spacing: number): Pt[] {
  const out: Pt[] = [];
  for (let i = 0; i < outline.length; i++) {
    const a = outline[i];
    const b = outline[(i + 1) % outline.length];
    const n = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / spacing));
    for (let k = 0; k < n; k++) out.push([a[0] + ((b[0] - a[0]) * k) / n, a[1] + ((b[1] - a[1]) * k) / n]);
  }
  return out;
}

/** A track as built: its height at x, or −Infinity where there is no track (a gap). */
export type TrackHeight = (x: number) => number;

/** Height on a polyline, x ascending; −Infinity outside it. */
export function polylineHeight(profile: readonly Pt[]): TrackHeight {
  const xs = profile.map((p) => p[0]);
  return (x: number) => {
    if (!(x >= xs[0] && x <= xs[xs.length - 1])) return -Infinity;
    let lo = 0;
    let hi = xs.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (xs[mid] <= x) lo = mid;
      else hi = mid;
    }
    const [a, b] = [profile[lo], profile[hi]];
    return b[0] === a[0] ? Math.max(a[1], b[1]) : a[1] + ((x - a[0]) / (b[0] - a[0])) * (b[1] - a[1]);
  };
}

/**
 * The axle height at which the turned outline just clears the track: h(x) = max over outline
 * points q (turned clockwise by θ) of track(x + qx) − qy. Only points below the axle can touch.
 */
export function restingHeight(body: RollingBody, track: TrackHeight, x: number): number {
  const t = body.turnAt(x);
  const c = Math.cos(t);
  const s = Math.sin(t);
  let h = -Infinity;
  for (const [px, py] of body.outline) {
    // Clockwise turn: (x, y) → (x cos t + y sin t, −x sin t + y cos t).
    const qx = px * c + py * s;
    const qy = -px * s + py * c;
    if (qy > 0) continue;
    const v = track(x + qx) - qy;
    if (v > h) h = v;
  }
  return h;
}

export interface Bump {
  /** Largest |change of axle height| over the span, and where (axle x). */
  bump: number;
  at: number;
}

/**
 * The axle's stations over a span, its resting heights there on the track as designed, and at each
 * station the turned outline points that can touch a track no higher than the designed one's top
 * within reach (`top`) and no more than `margin` off the designed height. A point q matters only
 * when top − qy ≥ h − margin; dropping the rest changes no answer to "is the bump within margin?".
 */
export interface Sweep {
  xs: number[];
  designed: number[];
  /** Per station: the candidate points, turned, as [qx0, qy0, qx1, qy1, …]. */
  points: Float64Array[];
}

export function sweep(
  body: RollingBody,
  designed: TrackHeight,
  span: { from: number; to: number; step: number },
  o: { top: (x: number) => number; margin: number },
): Sweep {
  const n = Math.max(1, Math.ceil((span.to - span.from) / span.step));
  const xs = Array.from({ length: n + 1 }, (_, i) => span.from + ((span.to - span.from) * i) / n);
  const designedHeights = xs.map((x) => restingHeight(body, designed, x));
  const points = xs.map((x, i) => {
    const t = body.turnAt(x);
    const c = Math.cos(t);
    const sn = Math.sin(t);
    const bound = o.top(x) - designedHeights[i] + o.margin;
    const kept: number[] = [];
    for (const [px, py] of body.outline) {
      const qy = -px * sn + py * c;
      if (qy <= bound && qy <= 0) kept.push(px * c + py * sn, qy);
    }
    return Float64Array.from(kept);
  });
  return { xs, designed: designedHeights, points };
}

function heightFrom(points: Float64Array, track: TrackHeight, x: number): number {
  let h = -Infinity;
  for (let j = 0; j < points.length; j += 2) {
    const v = track(x + points[j]) - points[j + 1];
    if (v > h) h = v;
  }
  return h;
}

/**
 * The largest change of axle height on the track as built against the sweep's track as designed;
 * with `refine`, looked at again between the stations either side of the worst, so a sharp peak
 * between two stations is not missed.
 */
export function bumpOver(built: TrackHeight, s: Sweep, refine?: { body: RollingBody; designed: TrackHeight }): Bump {
  let worst: Bump = { bump: 0, at: s.xs[0] };
  let worstIndex = 0;
  s.xs.forEach((x, i) => {
    const d = Math.abs(heightFrom(s.points[i], built, x) - s.designed[i]);
    if (d > worst.bump) {
      worst = { bump: d, at: x };
      worstIndex = i;
    }
  });
  if (refine && s.xs.length > 1) {
    const a = s.xs[Math.max(0, worstIndex - 1)];
    const b = s.xs[Math.min(s.xs.length - 1, worstIndex + 1)];
    for (let k = 1; k < 16; k++) {
      const x = a + ((b - a) * k) / 16;
      const d = Math.abs(restingHeight(refine.body, built, x) - restingHeight(refine.body, refine.designed, x));
      if (d > worst.bump) worst = { bump: d, at: x };
    }
  }
  return worst;
}

/** The largest change of axle height between two tracks, the axle swept over [from, to] in `step`s (every outline point kept). */
export function axleBump(
  body: RollingBody,
  designed: TrackHeight,
  built: TrackHeight,
  span: { from: number; to: number; step: number },
): Bump {
  return bumpOver(built, sweep(body, designed, span, { top: () => Infinity, margin: Infinity }), { body, designed });
}

/** The highest the track reaches within `reach` of x (sampled at `step`), plus `extra`: the bound sweep() prunes with. */
function topWithin(track: TrackHeight, reach: number, step: number, extra = 0): (x: number) => number {
  return (x: number) => {
    let top = -Infinity;
    for (let u = x - reach - extra; u <= x + reach + extra; u += step) top = Math.max(top, track(u));
    return top + step;
  };
}

/**
 * The track with everything from `station` on moved `shift` along the run: a gap of `shift` at the
 * joint when positive; when negative the later part starts at the station, moved back.
 */
export function shiftedFrom(track: TrackHeight, station: number, shift: number): TrackHeight {
  return (x: number) => (x < station ? track(x) : x < station + shift ? -Infinity : track(x - shift));
}

/**
 * The track with one support `drop` low: lowered by drop at the support, tapering straight to
 * nothing at the neighbouring supports (or the run's ends) — the track bending between the supports
 * that still hold it.
 */
export function loweredAt(track: TrackHeight, support: number, drop: number, left: number, right: number): TrackHeight {
  return (x: number) => {
    if (x <= left || x >= right) return track(x);
    const w = x < support ? (x - left) / (support - left) : (right - x) / (right - support);
    return track(x) - drop * w;
  };
}

export interface ToleranceOptions {
  /** Bump allowed, same unit as the track. */
  limit: number;
  /** How far the wheel reaches from its axle (its largest radius): sets the span swept. */
  reach: number;
  /** Sweep step along the run. Default: reach / 300. */
  step?: number;
  /** Largest change looked at; a tolerance at this cap means "at least this much". */
  cap?: number;
  /** Bisection stops when the bracket is this narrow. Default: limit / 50. */
  precision?: number;
}

/** The largest change c in [0, cap] with bump(c) ≤ limit, by bisection on a bracket. */
function largestWithin(bumpOf: (c: number) => number, limit: number, cap: number, precision: number): number {
  if (bumpOf(cap) <= limit) return cap;
  let lo = 0;
  let hi = cap;
  // Narrow a first bracket by halving, so a large cap does not miss a small tolerance.
  while (hi > precision && bumpOf(hi / 2) > limit) hi /= 2;
  lo = hi / 2;
  if (bumpOf(lo) > limit) lo = 0;
  while (hi - lo > precision) {
    const mid = (lo + hi) / 2;
    if (bumpOf(mid) <= limit) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Tolerances are stated rounded down to this (the same unit), so a stated figure never overstates what the sweep found. */
export const TOLERANCE_STEP = 0.05;
const roundDown = (v: number) => Math.floor(v / TOLERANCE_STEP + 1e-9) * TOLERANCE_STEP;

/** ± how far a joint at `station` may sit off it, both ways, before the axle bumps by more than the limit. */
export function jointTolerance(
  body: RollingBody,
  designed: TrackHeight,
  station: number,
  o: ToleranceOptions,
): { tolerance: number; plus: number; minus: number } {
  const step = o.step ?? o.reach / 300;
  const cap = o.cap ?? o.reach / 4;
  const precision = o.precision ?? o.limit / 50;
  // One sweep for every shift tried: far enough past the joint for the largest.
  const s = sweep(
    body,
    designed,
    { from: station - o.reach, to: station + o.reach + cap, step },
    { top: topWithin(designed, o.reach, step, cap), margin: 2 * o.limit },
  );
  const bumpFor = (shift: number) => bumpOver(shiftedFrom(designed, station, shift), s, { body, designed }).bump;
  const plus = roundDown(largestWithin((c) => bumpFor(c), o.limit, cap, precision));
  const minus = roundDown(largestWithin((c) => bumpFor(-c), o.limit, cap, precision));
  return { tolerance: Math.min(plus, minus), plus, minus };
}

/** How far a support may sit low before the axle bumps by more than the limit. */
export function supportTolerance(
  body: RollingBody,
  designed: TrackHeight,
  support: { at: number; left: number; right: number },
  o: ToleranceOptions,
): number {
  const step = o.step ?? o.reach / 300;
  const cap = o.cap ?? o.reach / 4;
  const precision = o.precision ?? o.limit / 50;
  // The track sinks most at the support itself, so the axle does too: sweep the wheel's reach about it.
  const s = sweep(
    body,
    designed,
    { from: Math.max(support.left, support.at - o.reach), to: Math.min(support.right, support.at + o.reach), step },
    { top: topWithin(designed, o.reach, step), margin: 2 * o.limit },
  );
  return roundDown(
    largestWithin(
      (drop) =>
        bumpOver(loweredAt(designed, support.at, drop, support.left, support.right), s, { body, designed }).bump,
      o.limit,
      cap,
      precision,
    ),
  );
}
