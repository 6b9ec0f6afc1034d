// Tracks given by the designer (wheel-for-track and twin-wheels modes): one period as smooth pieces,
// each a graph y(x), a parametric arc (x(s), y(s)) with x increasing (the form of Hall & Wagon 1992,
// §1), or a straight segment. The wheel for a track needs θ = ∫ dx / (h − y) over each piece
// (Hall & Wagon 1992); a straight segment gives it in closed form (a log-spiral arc of the wheel).
// The track's own y = 0 is its datum; x runs from 0 to the period.

import { EngineError } from "./errors";
import { compileFormula } from "./formula";
import { extremes } from "./extremes";
import type { TrackSpec } from "./spec";
import { lastAtOrBelow } from "./search";

export interface TrackPiece {
  kind: "graph" | "param" | "segment";
  s0: number;
  s1: number;
  x(s: number): number;
  y(s: number): number;
  /** dx/ds ≥ 0. */
  dx(s: number): number;
  /** x → s on this piece (x(s) is increasing). */
  sOf(x: number): number;
}

export interface Track {
  period: number;
  pieces: TrackPiece[];
  /** y at any x (periodic). */
  yAt(x: number): number;
  yMin: number;
  yMax: number;
  /** x positions in [0, period] where the slope jumps (cusps, polyline vertices, piece ends). */
  breaksX: number[];
}

function graph(f: (x: number) => number, x0: number, x1: number): TrackPiece {
  return { kind: "graph", s0: x0, s1: x1, x: (s) => s, y: f, dx: () => 1, sOf: (x) => x };
}

function segment(x0: number, y0: number, x1: number, y1: number): TrackPiece {
  const m = (y1 - y0) / (x1 - x0);
  return { kind: "segment", s0: x0, s1: x1, x: (s) => s, y: (s) => y0 + m * (s - x0), dx: () => 1, sOf: (x) => x };
}

/** Inverts an increasing x(s) on [s0, s1] by Newton's method inside a bisection bracket. */
function invert(
  x: (s: number) => number,
  dx: (s: number) => number,
  s0: number,
  s1: number,
  target: number,
  guess: number,
): number {
  let a = s0;
  let b = s1;
  let s = Math.min(Math.max(guess, a), b);
  for (let i = 0; i < 100; i++) {
    const g = x(s) - target;
    if (g === 0) return s;
    if (g > 0) b = s;
    else a = s;
    const d = dx(s);
    let next = d > 0 ? s - g / d : 0.5 * (a + b);
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    if (Math.abs(next - s) <= 1e-16 * Math.max(1, Math.abs(s)) || b - a <= 1e-16 * Math.max(1, Math.abs(s)))
      return next;
    s = next;
  }
  return s;
}

function cycloidPiece(R: number): TrackPiece {
  const x = (p: number) => R * (p - Math.sin(p));
  const dx = (p: number) => R * (1 - Math.cos(p));
  return {
    kind: "param",
    s0: 0,
    s1: 2 * Math.PI,
    x,
    y: (p) => -R * (1 - Math.cos(p)),
    dx,
    // Near the cusp x ≈ R p³/6, so start from the cube root.
    sOf: (X) =>
      invert(
        x,
        dx,
        0,
        2 * Math.PI,
        X,
        X < Math.PI * R ? Math.cbrt((6 * X) / R) : 2 * Math.PI - Math.cbrt((6 * (2 * Math.PI * R - X)) / R),
      ),
  };
}

export function makeTrack(pieces: TrackPiece[], period: number, breaksX: number[]): Track {
  const starts = pieces.map((p) => p.x(p.s0));
  const yAt = (X: number): number => {
    let u = X % period;
    if (u < 0) u += period;
    const p = pieces[lastAtOrBelow(starts.length, (i) => starts[i], u)];
    return p.y(p.sOf(u));
  };
  let yMin = Infinity;
  let yMax = -Infinity;
  for (const p of pieces) {
    const e = extremes(p.y, [{ a: p.s0, b: p.s1 }], 48);
    yMin = Math.min(yMin, e.min.value);
    yMax = Math.max(yMax, e.max.value);
  }
  return { period, pieces, yAt, yMin, yMax, breaksX: [...new Set([0, ...breaksX, period])].sort((a, b) => a - b) };
}

export const FUNCTION_CHECK_POINTS = 4096;

export function buildTrack(spec: TrackSpec): Track {
  switch (spec.kind) {
    case "sine": {
      const { amplitude: A, period: P } = spec;
      return makeTrack([graph((x) => A * Math.sin((2 * Math.PI * x) / P), 0, P)], P, []);
    }
    case "catenary": {
      // Inverted catenary arcs of scale c with their crests on y = 0 at x = 0, P, ...; cusps at P/2.
      const { scale: c, period: P } = spec;
      const arc = (x: number) => c * (1 - Math.cosh(x / c));
      return makeTrack([graph(arc, 0, P / 2), graph((x) => arc(x - P), P / 2, P)], P, [P / 2]);
    }
    case "cycloid": {
      // Inverted cycloid arches hanging below y = 0, cusps on y = 0 at x = 0, 2πR, ...
      const R = spec.radius;
      return makeTrack([cycloidPiece(R)], 2 * Math.PI * R, []);
    }
    case "function": {
      const where = "track.y";
      const f = compileFormula(spec.y, "x", where);
      const P = spec.period;
      let span = 0;
      for (let i = 0; i <= FUNCTION_CHECK_POINTS; i++) {
        const x = (P * i) / FUNCTION_CHECK_POINTS;
        const v = f(x);
        if (!Number.isFinite(v))
          throw new EngineError(
            "bad-formula",
            `y is not a finite number at x = ${x.toPrecision(6)} (y = ${v}).`,
            where,
          );
        span = Math.max(span, Math.abs(v));
      }
      if (Math.abs(f(P) - f(0)) > 1e-9 * Math.max(span, P))
        throw new EngineError(
          "bad-formula",
          `The track is not periodic: y(0) = ${f(0).toPrecision(8)} but y(${P}) = ${f(P).toPrecision(8)}.`,
          where,
        );
      return makeTrack([graph(f, 0, P)], P, []);
    }
    case "profile": {
      const pts = spec.points;
      const x0 = pts[0][0];
      for (let i = 1; i < pts.length; i++)
        if (!(pts[i][0] > pts[i - 1][0]))
          throw new EngineError(
            "invalid-track",
            `The profile must run left to right: point ${i} has x = ${pts[i][0]}, not more than the point before.`,
            `track.points[${i}]`,
          );
      const P = pts[pts.length - 1][0] - x0;
      const first = pts[0][1];
      const last = pts[pts.length - 1][1];
      if (Math.abs(last - first) > 1e-6 * P)
        throw new EngineError(
          "invalid-track",
          `One period must end at the height it starts: y = ${first} at the first point but ${last} at the last.`,
          `track.points[${pts.length - 1}]`,
        );
      const pieces: TrackPiece[] = [];
      const breaks: number[] = [];
      for (let i = 0; i + 1 < pts.length; i++) {
        const xa = pts[i][0] - x0;
        const xb = i + 2 === pts.length ? P : pts[i + 1][0] - x0;
        const yb = i + 2 === pts.length ? first : pts[i + 1][1];
        pieces.push(segment(xa, pts[i][1], xb, yb));
        if (i > 0) breaks.push(xa);
      }
      return makeTrack(pieces, P, breaks);
    }
  }
}
