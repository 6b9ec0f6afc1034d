// Figures a fabricator reads off a design: the friction demand |r′|/r (the tangent of the angle
// between the contact normal and the axle ray, i.e. the track slope; the contact slips unless the
// friction coefficient is at least this), and the smallest radii of curvature of wheel and track.
// Curvatures use κ_w = (r² + 2r′² − r r″)/(r² + r′²)^{3/2} for a polar curve and the rolling
// identity κ_w − κ_r = 1/√(r² + r′²) between a wheel and its road (docs/math.md §1.7, derived there and
// checked numerically), or κ₁ + κ₂ = (a/r₂)/√(r₁² + r₁′²) for a pair on fixed axles (docs/math.md §5.5).
// Corners and cusps have radius 0.
// The contact's own combined radius, 1/(κ₁ + κ₂) with each body convex towards the other positive
// (the radius Hertz contact is computed at; K. L. Johnson, "Contact Mechanics", 1985, §4.2), follows
// from the same identities: on a road with the axle level it is √(r² + r′²) = r·sec ψ (r the
// axle-to-contact distance, ψ the tilt of the contact normal; for a graph track r·√(1 + y′²)), and for
// a pair on fixed axles (a − r₁)·√(r₁² + r₁′²)/a. A corner or cusp gives 0.

import { extremes, type Extreme } from "./extremes";
import type { Piecewise } from "./piecewise";

export interface Figures {
  friction: Extreme;
  /** Smallest combined radius of the contact along the roll, and where (0 at a corner or cusp). */
  contact: Extreme;
  /** Smallest radius of curvature of each body (0 at a corner). */
  radiusA: number;
  radiusB: number;
}

function pieces(pw: Piecewise) {
  const out: Array<{ a: number; b: number }> = [];
  for (let i = 0; i + 1 < pw.knots.length; i++) out.push({ a: pw.knots[i], b: pw.knots[i + 1] });
  return out;
}

/** Inside a piece, with one-sided stencils at its ends. */
function at<T>(pw: Piecewise, piece: { a: number; b: number }, fn: (t: number, side: -1 | 0 | 1) => T) {
  return (t: number) => fn(t, t <= piece.a ? 1 : t >= piece.b ? -1 : 0);
}

function minRadius(pw: Piecewise, kappa: (t: number, side: -1 | 0 | 1) => number): number {
  let best = 0;
  for (const p of pieces(pw)) {
    const e = extremes(
      at(pw, p, (t, s) => Math.abs(kappa(t, s))),
      [p],
      24,
    );
    best = Math.max(best, e.max.value);
  }
  return best === 0 ? Infinity : 1 / best;
}

function minOver(pw: Piecewise, g: (t: number, side: -1 | 0 | 1) => number): Extreme {
  let best: Extreme = { value: Infinity, at: NaN };
  for (const p of pieces(pw)) {
    const e = extremes(at(pw, p, g), [p], 24);
    if (e.min.value < best.value) best = e.min;
  }
  return best;
}

const slopesDiffer = (l: number, r: number) => Math.abs(l - r) > 1e-7 * (1 + Math.abs(r));

/** The first inner knot where the one-sided slopes differ (a corner or cusp), or null. */
function innerKink(pw: Piecewise, slope: (t: number, side: -1 | 1) => number): number | null {
  for (let i = 1; i + 1 < pw.knots.length; i++) {
    const k = pw.knots[i];
    if (slopesDiffer(slope(k, -1), slope(k, 1))) return k;
  }
  return null;
}

/** Where the one-sided slopes differ first: an inner knot, or the period's ends when they do not meet. */
export function kinkAt(pw: Piecewise, slope: (t: number, side: -1 | 1) => number): number | null {
  const inner = innerKink(pw, slope);
  if (inner !== null) return inner;
  const lo = pw.knots[0];
  const hi = pw.knots[pw.knots.length - 1];
  return slopesDiffer(slope(hi, -1), slope(lo, 1)) ? lo : null;
}

/** The contact figure of a body with a corner: radius 0 at the corner, else the smooth minimum. */
function contactOf(pw: Piecewise, hasCorners: boolean, radius: (t: number, side: -1 | 0 | 1) => number): Extreme {
  if (hasCorners) return { value: 0, at: kinkAt(pw, (t, s) => pw.d1(t, s)) ?? pw.knots[0] };
  return minOver(pw, radius);
}

function maxOver(pw: Piecewise, g: (t: number, side: -1 | 0 | 1) => number): Extreme {
  let best: Extreme = { value: -Infinity, at: NaN };
  for (const p of pieces(pw)) {
    const e = extremes(at(pw, p, g), [p], 24);
    if (e.max.value > best.value) best = e.max;
  }
  return best;
}

/** The friction demand |r′|/r of a polar curve, at its largest. */
const polarFriction = (w: Piecewise) => maxOver(w, (t, s) => Math.abs(w.d1(t, s)) / w.f(t));

/** Curvature of a polar curve, κ = (r² + 2r′² − r r″)/(r² + r′²)^{3/2}, convex positive. */
const polarCurvature = (w: Piecewise) => (t: number, s: -1 | 0 | 1) => {
  const r = w.f(t);
  const d = w.d1(t, s);
  const dd = w.d2(t, s);
  return (r * r + 2 * d * d - r * dd) / Math.pow(r * r + d * d, 1.5);
};

/** A polar wheel r(t) over one sector and the road it rolls on (track-for-wheel). */
export function wheelAndRoadFigures(w: Piecewise, hasCorners: boolean): Figures {
  const friction = polarFriction(w);
  const kw = polarCurvature(w);
  const kr = (t: number, s: -1 | 0 | 1) => {
    const r = w.f(t);
    const d = w.d1(t, s);
    return kw(t, s) - 1 / Math.sqrt(r * r + d * d);
  };
  const contact = contactOf(w, hasCorners, (t, s) => Math.hypot(w.f(t), w.d1(t, s)));
  return { friction, contact, radiusA: hasCorners ? 0 : minRadius(w, kw), radiusB: hasCorners ? 0 : minRadius(w, kr) };
}

/**
 * A track graph y(x) over one period and the wheel above (sgn = 1, r = h − y) or below
 * (sgn = −1, r = y − h) it. radiusA is the track's, radiusB the wheel's.
 */
export function trackAndWheelFigures(g: Piecewise, h: number, sgn: 1 | -1, hasKinks: boolean): Figures {
  const friction = maxOver(g, (x, s) => Math.abs(g.d1(x, s)));
  const kt = (x: number, s: -1 | 0 | 1) => {
    const d = g.d1(x, s);
    return g.d2(x, s) / Math.pow(1 + d * d, 1.5);
  };
  const kw = (x: number, s: -1 | 0 | 1) => {
    const d = g.d1(x, s);
    const r = sgn * (h - g.f(x));
    // Seen from the wheel's side the track bends the other way when the wheel is below it.
    return sgn * kt(x, s) + 1 / (r * Math.sqrt(1 + d * d));
  };
  const contact = contactOf(g, hasKinks, (x, s) => sgn * (h - g.f(x)) * Math.hypot(1, g.d1(x, s)));
  return { friction, contact, radiusA: hasKinks ? 0 : minRadius(g, kt), radiusB: hasKinks ? 0 : minRadius(g, kw) };
}

/**
 * Two wheels made from one track graph, above it at h₁ and below it at h₂, rolling on each other
 * (twin wheels): the contact is on the track line, r₁ = h₁ − y and r₂ = y − h₂ from the axles, and
 * the combined radius is r₁r₂/(r₁ + r₂)·√(1 + y′²).
 */
export function twinContact(g: Piecewise, h1: number, h2: number, hasKinks: boolean): Extreme {
  return contactOf(g, hasKinks, (x, s) => {
    const r1 = h1 - g.f(x);
    const r2 = g.f(x) - h2;
    return ((r1 * r2) / (r1 + r2)) * Math.hypot(1, g.d1(x, s));
  });
}

/** A driver r₁(t) over one sector and its partner at centre distance a. */
export function pairFigures(w: Piecewise, a: number, hasCorners: boolean): Figures {
  const friction = polarFriction(w);
  const k1 = polarCurvature(w);
  const k2 = (t: number, s: -1 | 0 | 1) => {
    const r = w.f(t);
    const d = w.d1(t, s);
    return a / (a - r) / Math.sqrt(r * r + d * d) - k1(t, s);
  };
  const contact = contactOf(w, hasCorners, (t, s) => ((a - w.f(t)) * Math.hypot(w.f(t), w.d1(t, s))) / a);
  return { friction, contact, radiusA: hasCorners ? 0 : minRadius(w, k1), radiusB: hasCorners ? 0 : minRadius(w, k2) };
}

/** True if the one-sided slopes differ at any inner knot (a corner or cusp). */
export function hasKinks(pw: Piecewise, slope: (t: number, side: -1 | 1) => number): boolean {
  return innerKink(pw, slope) !== null;
}
