// The wheel as the engine sees it: a polar function r(t) > 0 about the axle, split into smooth
// pieces at its corners, with t the body angle measured from the ray that touches the track at the
// start (x = 0). The body ray t points along (sin t, −cos t) in the start pose, so t = 0 points
// straight down and t grows as the wheel turns clockwise and rolls to the right (L. Hall and
// S. Wagon, "Roads and Wheels", Math. Mag. 65(5), 1992: the wheel is a curve star-shaped about the
// axle, rolling on a road below a horizontal axle line).

import type { CumulativePiece } from "../cumulative";
import { extremes } from "../extremes";
import { lastAtOrBelow } from "../search";

export const TAU = 2 * Math.PI;

export type PieceKind = "line" | "arc" | "smooth";

export interface WheelPiece extends CumulativePiece {
  kind: PieceKind;
  /** The same curve over another range (the formulas are 2π-periodic). */
  sub(a: number, b: number): WheelPiece;
}

export interface Wheel {
  /** Contiguous smooth pieces covering t ∈ [0, 2π]. */
  pieces: WheelPiece[];
  /** The wheel repeats itself every 2π / symmetry. */
  symmetry: number;
  /** r at any body angle (2π-periodic). */
  r(t: number): number;
  /** Angles in [0, 2π) where the outline has a corner (tangent jump). */
  corners: number[];
  rMin: number;
  rMax: number;
}

/** Unit vector of the body ray t in the start pose. */
export function ray(t: number): [number, number] {
  return [Math.sin(t), -Math.cos(t)];
}

export function wrapAngle(t: number): number {
  const m = t % TAU;
  return m < 0 ? m + TAU : m;
}

/**
 * A straight edge at distance d from the axle whose foot of perpendicular is the body ray tn:
 * r = d / cos(t − tn), and ∫ r dt = d·asinh(tan(t − tn)) in closed form (the inverse
 * Gudermannian; the edge rolls out a catenary, J. C. Maxwell 1849 and Hall & Wagon 1992).
 */
export function linePiece(d: number, tn0: number, a: number, b: number): WheelPiece {
  // Use the copy of the normal angle nearest the piece, so the inverse lands inside [a, b].
  const mid = 0.5 * (a + b);
  const tn = tn0 + TAU * Math.round((mid - tn0) / TAU);
  const G = (t: number) => Math.asinh(Math.tan(t - tn));
  const Ga = G(a);
  return {
    kind: "line",
    a,
    b,
    f: (t) => d / Math.cos(t - tn),
    F: (t) => d * (G(t) - Ga),
    Finv: (v) => tn + Math.atan(Math.sinh(v / d + Ga)),
    sub: (a2, b2) => linePiece(d, tn, a2, b2),
  };
}

/** A smooth piece integrated by quadrature. */
export function smoothPiece(kind: PieceKind, f: (t: number) => number, a: number, b: number): WheelPiece {
  return { kind, a, b, f, sub: (a2, b2) => smoothPiece(kind, f, a2, b2) };
}

/** Pieces whose ranges may start below 0 are cut at 0 and moved up by 2π (the r formulas are 2π-periodic). */
export function wrapPieces(pieces: WheelPiece[]): WheelPiece[] {
  const make = (p: WheelPiece, a: number, b: number) => p.sub(a, b);
  const out: WheelPiece[] = [];
  for (const p of pieces) {
    if (p.a < 0 && p.b > 0) {
      out.push(make(p, 0, p.b), make(p, p.a + TAU, TAU));
    } else if (p.b <= 0) {
      out.push(make(p, p.a + TAU, p.b + TAU));
    } else if (p.a < TAU && p.b > TAU) {
      out.push(make(p, p.a, TAU), make(p, 0, p.b - TAU));
    } else if (p.a >= TAU) {
      out.push(make(p, p.a - TAU, p.b - TAU));
    } else out.push(p);
  }
  return out.filter((p) => p.b > p.a).sort((p, q) => p.a - q.a);
}

/** Smallest rotational symmetry the samples show: r(t + 2π/n) = r(t) to 1e-10 relative. */
export function detectSymmetry(r: (t: number) => number, rMax: number): number {
  const probes: number[] = [];
  for (let i = 0; i < 61; i++) probes.push(((i * 0.6180339887498949) % 1) * TAU);
  for (let n = 24; n >= 2; n--) {
    let ok = true;
    for (const t of probes) {
      if (Math.abs(r(t + TAU / n) - r(t)) > 1e-10 * rMax) {
        ok = false;
        break;
      }
    }
    if (ok) return n;
  }
  return 1;
}

export function makeWheel(pieces: WheelPiece[], corners: number[], symmetry?: number): Wheel {
  const starts = pieces.map((p) => p.a);
  const r = (t: number): number => {
    const u = wrapAngle(t);
    return pieces[lastAtOrBelow(starts.length, (i) => starts[i], u)].f(u);
  };
  const ex = extremes(r, pieces);
  return {
    pieces,
    r,
    corners: corners.map(wrapAngle).sort((a, b) => a - b),
    rMin: ex.min.value,
    rMax: ex.max.value,
    // A circle about its centre repeats at every angle; call it 1-fold so that a track period is a
    // turn and `lobes` counts partner turns per driver turn.
    symmetry: ex.max.value - ex.min.value <= 1e-12 * ex.max.value ? 1 : (symmetry ?? detectSymmetry(r, ex.max.value)),
  };
}
