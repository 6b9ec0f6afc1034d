// Plain geometry for the studio's view: turning and placing outlines, reading a polyline along a
// ray or at an x, tiling the track, choosing grid rules, and the series the check plots draw.
// No React, no Konva: the canvas, the plots and the unit tests share these.
//
// Frames: the spec's units with y up (the engine's frame). Angles in radians.

export type Pt = [number, number];

/** Turns p clockwise by a about the origin (y up). */
export function rotateCw(p: Pt, a: number): Pt {
  const c = Math.cos(a);
  const s = Math.sin(a);
  return [p[0] * c + p[1] * s, -p[0] * s + p[1] * c];
}

/** Turns p counter-clockwise by a about the origin (y up). */
export function rotateCcw(p: Pt, a: number): Pt {
  return rotateCw(p, -a);
}

/** An outline turned clockwise by `angleCw` about its axle (the origin), then moved to (x, y). */
export function placeOutline(points: readonly Pt[], angleCw: number, x: number, y: number): Pt[] {
  return points.map((p) => {
    const [qx, qy] = rotateCw(p, angleCw);
    return [qx + x, qy + y];
  });
}

/**
 * How far from the origin a ray in direction `dir` (need not be unit) leaves the closed polyline:
 * the farthest crossing, so an outline that is not star-shaped still answers with its outer edge.
 * NaN when the ray misses (an axle outside the outline).
 */
export function rayReach(points: readonly Pt[], dir: Pt): number {
  const len = Math.hypot(dir[0], dir[1]);
  const dx = dir[0] / len;
  const dy = dir[1] / len;
  let best = NaN;
  for (let i = 0; i + 1 < points.length; i++) {
    const [ax, ay] = points[i];
    const [bx, by] = points[i + 1];
    const ex = bx - ax;
    const ey = by - ay;
    // Solve a + s·e = t·d for s ∈ [0, 1], t ≥ 0 (Cramer's rule on the 2×2 system).
    const den = ex * dy - ey * dx;
    if (den === 0) continue;
    const s = (ay * dx - ax * dy) / den;
    // A little slack so a ray through a vertex is not lost between its two edges.
    if (s < -1e-9 || s > 1 + 1e-9) continue;
    const t = (ex * ay - ey * ax) / den;
    if (t >= 0 && !(t <= best)) best = t;
  }
  return best;
}

/** Index i with xs[i] ≤ x < xs[i+1] (clamped to the table), by bisection. */
export function bracket(xs: ArrayLike<number>, x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  if (hi < 1 || x <= xs[0]) return 0;
  if (x >= xs[hi]) return hi - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Linear interpolation in a table sorted by xs (held at the ends). */
export function interpolate(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number): number {
  if (xs.length === 1) return ys[0];
  const i = bracket(xs, x);
  const x0 = xs[i];
  const x1 = xs[i + 1];
  if (x1 === x0) return ys[i];
  const f = Math.min(1, Math.max(0, (x - x0) / (x1 - x0)));
  return ys[i] + f * (ys[i + 1] - ys[i]);
}

/**
 * Cubic Hermite interpolation in a table sorted by xs, with the slope `ds` known at each row
 * (held at the ends). Its error shrinks with the fourth power of the row spacing, against the
 * square for straight lines between rows.
 */
export function hermite(xs: ArrayLike<number>, ys: ArrayLike<number>, ds: ArrayLike<number>, x: number): number {
  if (xs.length === 1) return ys[0];
  const i = bracket(xs, x);
  const h = xs[i + 1] - xs[i];
  if (h <= 0) return ys[i];
  const s = Math.min(1, Math.max(0, (x - xs[i]) / h));
  const s2 = s * s;
  const s3 = s2 * s;
  return (
    (2 * s3 - 3 * s2 + 1) * ys[i] +
    (s3 - 2 * s2 + s) * h * ds[i] +
    (-2 * s3 + 3 * s2) * ys[i + 1] +
    (s3 - s2) * h * ds[i + 1]
  );
}

/** One track period as a lookup: y at any x, the period repeated both ways. */
export interface TrackLookup {
  x0: number;
  period: number;
  xs: Float64Array;
  ys: Float64Array;
}

export function trackLookup(points: readonly Pt[], period?: number): TrackLookup {
  const xs = Float64Array.from(points, (p) => p[0]);
  const ys = Float64Array.from(points, (p) => p[1]);
  const x0 = xs[0];
  return { x0, period: period ?? xs[xs.length - 1] - x0, xs, ys };
}

export function trackYAt(t: TrackLookup, x: number): number {
  const k = Math.floor((x - t.x0) / t.period);
  return interpolate(t.xs, t.ys, x - k * t.period);
}

/** `copies` periods of the track laid end to end from its first point (shared ends kept once). */
export function tileTrack(points: readonly Pt[], period: number, copies: number): Pt[] {
  const out: Pt[] = [];
  for (let k = 0; k < copies; k++) {
    for (let i = k === 0 ? 0 : 1; i < points.length; i++) out.push([points[i][0] + k * period, points[i][1]]);
  }
  return out;
}

export interface Bounds {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

export function boundsOf(points: readonly Pt[]): Bounds {
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const [x, y] of points) {
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  return { minX, maxX, minY, maxY };
}

export function unionBounds(...all: Bounds[]): Bounds {
  return {
    minX: Math.min(...all.map((b) => b.minX)),
    maxX: Math.max(...all.map((b) => b.maxX)),
    minY: Math.min(...all.map((b) => b.minY)),
    maxY: Math.max(...all.map((b) => b.maxY)),
  };
}

/** A disc of radius r about (x, y), as bounds. */
export function discBounds(x: number, y: number, r: number): Bounds {
  return { minX: x - r, maxX: x + r, minY: y - r, maxY: y + r };
}

// ---------------------------------------------------------------------------------------------
// The view transform: screen = (ox + s·x, oy − s·y), s in pixels per unit.

export interface View {
  scale: number;
  ox: number;
  oy: number;
}

export const toScreen = (v: View, p: Pt): Pt => [v.ox + v.scale * p[0], v.oy - v.scale * p[1]];
export const toWorld = (v: View, q: Pt): Pt => [(q[0] - v.ox) / v.scale, (v.oy - q[1]) / v.scale];

/** The view that shows `b` centred in a w × h box with `margin` pixels kept free on each side. */
export function fitView(b: Bounds, w: number, h: number, margin = 32): View {
  const bw = Math.max(b.maxX - b.minX, 1e-9);
  const bh = Math.max(b.maxY - b.minY, 1e-9);
  const scale = Math.max(1e-6, Math.min((w - 2 * margin) / bw, (h - 2 * margin) / bh));
  const cx = (b.minX + b.maxX) / 2;
  const cy = (b.minY + b.maxY) / 2;
  return { scale, ox: w / 2 - scale * cx, oy: h / 2 + scale * cy };
}

/** Zooms by `factor` keeping the world point under screen point `at` where it is. */
export function zoomAbout(v: View, factor: number, at: Pt): View {
  const scale = v.scale * factor;
  return { scale, ox: at[0] - (at[0] - v.ox) * factor, oy: at[1] - (at[1] - v.oy) * factor };
}

/** Moves the view so world point p sits at screen point q. */
export function centreOn(v: View, p: Pt, q: Pt): View {
  return { scale: v.scale, ox: q[0] - v.scale * p[0], oy: q[1] + v.scale * p[1] };
}

// ---------------------------------------------------------------------------------------------
// Grid rules: decades of the unit (1 mm, 10 mm, 100 mm …; 0.1 in, 1 in …).

export interface GridRules {
  /** Finest rule shown (units), at least `minPx` pixels apart. */
  fine: number;
  /** Every tenth fine rule, drawn darker. */
  major: number;
  /** Rules that carry a number, far enough apart for their labels. */
  label: number;
}

export function gridRules(scale: number, units: "mm" | "in", minPx = 6, labelPx = 56): GridRules {
  const base = units === "in" ? 0.1 : 1;
  let fine = base;
  while (fine * scale < minPx) fine *= 10;
  const major = fine * 10;
  let label = major;
  while (label * scale < labelPx) label *= 10;
  if (major * scale >= labelPx * 10) label = fine; // zoomed far in: number every fine rule
  return { fine, major, label };
}

/** Multiples of `step` covering [lo, hi]. */
export function ticks(lo: number, hi: number, step: number, max = 2000): number[] {
  const out: number[] = [];
  const first = Math.ceil(lo / step);
  const last = Math.floor(hi / step);
  if (last - first > max) return out;
  for (let k = first; k <= last; k++) out.push(k * step);
  return out;
}

/** A figure for a label: few digits, no floating-point tails. */
export function fmt(v: number, digits = 4): string {
  if (!Number.isFinite(v)) return "—";
  if (v === 0) return "0";
  const a = Math.abs(v);
  if (a >= 1e5 || a < 1e-3) return v.toExponential(2);
  return Number(v.toPrecision(digits)).toString();
}

// ---------------------------------------------------------------------------------------------
// Plot series. Each is read off the engine's own output polylines, segment by segment.

export interface Series {
  x: number[];
  y: number[];
}

/**
 * Friction demand along a track: with the axle on a level line and the contact straight below it,
 * the contact normal leans from the vertical by the track's slope angle, so the contact needs a
 * friction coefficient tan φ = |dy/dx| (which equals |r′|/r of the wheel there; Hall & Wagon 1992).
 * One value per segment, at its middle.
 */
export function trackFrictionSeries(points: readonly Pt[]): Series {
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const dx = points[i + 1][0] - points[i][0];
    if (dx <= 0) continue;
    x.push((points[i][0] + points[i + 1][0]) / 2);
    y.push(Math.abs((points[i + 1][1] - points[i][1]) / dx));
  }
  return { x, y };
}

/** The body angle t of a driver point (its ray is (sin t, −cos t) in the start pose), in [0, 2π). */
export function bodyAngle(p: Pt): number {
  const t = Math.atan2(p[0], -p[1]);
  return t < 0 ? t + 2 * Math.PI : t;
}

/**
 * |r′|/r of a wheel outline against its body angle over [0, sector): per segment, the tangent's
 * radial part over its circumferential part at the segment's middle. For a pitch curve turning on
 * a fixed axle this is the friction the contact needs (the normal leans by that angle from the line
 * of centres; Litvin et al. 2009 give the pressure angle the same way).
 */
export function outlineFrictionSeries(points: readonly Pt[], sector: number): Series {
  const rows: Array<[number, number]> = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const [ax, ay] = points[i];
    const [bx, by] = points[i + 1];
    const mx = (ax + bx) / 2;
    const my = (ay + by) / 2;
    const r = Math.hypot(mx, my);
    if (r === 0) continue;
    const ex = bx - ax;
    const ey = by - ay;
    const radial = (ex * mx + ey * my) / r;
    // Increasing t turns the ray counter-clockwise, so the circumferential direction is (−my, mx)/r.
    const around = (-ex * my + ey * mx) / r;
    if (around === 0) continue;
    const t = bodyAngle([mx, my]);
    if (t >= sector) continue;
    rows.push([t, Math.abs(radial / around)]);
  }
  rows.sort((p, q) => p[0] - q[0]);
  return { x: rows.map((r) => r[0]), y: rows.map((r) => r[1]) };
}

/** ω_partner / ω_driver: the slope of the follower table between its rows. */
export function speedRatioSeries(follower: ReadonlyArray<{ driver: number; follower: number }>): Series {
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i + 1 < follower.length; i++) {
    const d = follower[i + 1].driver - follower[i].driver;
    if (d <= 0) continue;
    x.push((follower[i].driver + follower[i + 1].driver) / 2);
    y.push((follower[i + 1].follower - follower[i].follower) / d);
  }
  return { x, y };
}

/**
 * Signed curvature at each inner vertex, from the circle through it and its two neighbours
 * (Menger curvature 4·area / product of the sides); positive where the polyline turns left
 * (counter-clockwise). `along` picks the abscissa the plot uses for vertex i.
 */
export function curvatureSeries(points: readonly Pt[], along: (p: Pt) => number): Series {
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 1; i + 1 < points.length; i++) {
    const [ax, ay] = points[i - 1];
    const [bx, by] = points[i];
    const [cx, cy] = points[i + 1];
    const cross = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
    const prod = Math.hypot(bx - ax, by - ay) * Math.hypot(cx - bx, cy - by) * Math.hypot(cx - ax, cy - ay);
    if (prod === 0) continue;
    x.push(along(points[i]));
    y.push((2 * cross) / prod);
  }
  return { x, y };
}

/** A value below which all but the largest `share` of |values| lie: a plot range that a single corner spike cannot flatten. */
export function robustMax(values: readonly number[], share = 0.02): number {
  if (!values.length) return 0;
  const a = values.map(Math.abs).sort((p, q) => p - q);
  return a[Math.min(a.length - 1, Math.floor((1 - share) * (a.length - 1)))];
}

/** ω_lower / ω_upper of twin wheels against axle x: the slope of one turn table over the other's. */
export function twinRatioSeries(motion: ReadonlyArray<{ x: number; angle: number; lowerAngle?: number }>): Series {
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i + 1 < motion.length; i++) {
    const d = motion[i + 1].angle - motion[i].angle;
    const l0 = motion[i].lowerAngle;
    const l1 = motion[i + 1].lowerAngle;
    if (d <= 0 || l0 === undefined || l1 === undefined) continue;
    x.push((motion[i].x + motion[i + 1].x) / 2);
    y.push((l1 - l0) / d);
  }
  return { x, y };
}

/** About `count` round tick values (1, 2 or 5 × 10ⁿ apart) covering [lo, hi]. */
export function niceTicks(lo: number, hi: number, count = 4): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  // The round step whose count of intervals comes closest to the one asked for.
  const span = hi - lo;
  const step = [0.5, 1, 2, 5, 10]
    .map((m) => m * mag)
    .reduce((best, s) => (Math.abs(span / s - count) < Math.abs(span / best - count) ? s : best));
  // Rounded so labels do not read 0.30000000000000004.
  return ticks(lo - 1e-9 * step, hi + 1e-9 * step, step).map((v) => Number(v.toPrecision(12)));
}
