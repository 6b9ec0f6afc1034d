// Flattening of Bézier curves and elliptical arcs into chords no farther than a tolerance from the
// curve, and the SVG endpoint-to-centre conversion of an elliptical arc.
//
// Segment counts come from the linear-interpolation error bound: a curve P(t) sampled at steps h
// and joined by chords stays within h²/8 · max|P''| of them (the classic bound for piecewise-linear
// interpolation, applied to the component along the error). So each curve gets the fewest equal
// parameter steps that meet the tolerance, worked out from its own control points or radii before
// any point is made (no recursion, a known count, charged to the file's point budget):
//   cubic      max|P''| ≤ 6·max(|P0 − 2P1 + P2|, |P1 − 2P2 + P3|)  →  n = ⌈√(3·D / (4·tol))⌉
//   quadratic  P'' = 2(P0 − 2P1 + P2)                            →  n = ⌈√(D / (4·tol))⌉
//   ellipse    |P''| ≤ σ·max(rx, ry) (σ = the map's largest stretch) →  n = ⌈|Δθ| · √(σ·r / (8·tol))⌉
// Curves are flattened after the full transform (Bézier curves are affine-invariant; an arc is
// sampled in its own frame and mapped), so the tolerance holds in output units. Arcs also get at
// least one step per 45° so a coarse tolerance never turns a circle into a triangle.
//
// Endpoint-to-centre conversion: SVG 1.1, Appendix F.6.5 "Conversion from endpoint to center
// parameterization" (steps 1–4), with the out-of-range radii correction of F.6.6 (radii made
// positive; scaled up by √Λ when Λ = x1'²/rx² + y1'²/ry² > 1) and F.6.2 (equal endpoints: the arc is
// omitted; a zero radius: a straight line).

import { PointBudget, type Pt } from "./common";
import { apply, maxStretch, type Affine } from "./geometry";

const MAX_ARC_STEP = Math.PI / 4;

function steps(raw: number, min: number, budget: PointBudget, where: () => string): number {
  const n = Math.max(min, Math.ceil(raw));
  budget.take(n, where);
  return n;
}

/** Points after p0 (p3 last) of a cubic with already-transformed control points. */
export function flattenCubic(
  p0: Pt,
  p1: Pt,
  p2: Pt,
  p3: Pt,
  tol: number,
  budget: PointBudget,
  where: () => string,
): Pt[] {
  const d1 = Math.hypot(p0[0] - 2 * p1[0] + p2[0], p0[1] - 2 * p1[1] + p2[1]);
  const d2 = Math.hypot(p1[0] - 2 * p2[0] + p3[0], p1[1] - 2 * p2[1] + p3[1]);
  const n = steps(Math.sqrt((3 * Math.max(d1, d2)) / (4 * tol)), 1, budget, where);
  const out: Pt[] = [];
  for (let k = 1; k < n; k++) {
    const t = k / n;
    const u = 1 - t;
    const a = u * u * u;
    const b = 3 * u * u * t;
    const c = 3 * u * t * t;
    const d = t * t * t;
    out.push([a * p0[0] + b * p1[0] + c * p2[0] + d * p3[0], a * p0[1] + b * p1[1] + c * p2[1] + d * p3[1]]);
  }
  out.push(p3);
  return out;
}

/** Points after p0 (p2 last) of a quadratic with already-transformed control points. */
export function flattenQuad(p0: Pt, p1: Pt, p2: Pt, tol: number, budget: PointBudget, where: () => string): Pt[] {
  const d = Math.hypot(p0[0] - 2 * p1[0] + p2[0], p0[1] - 2 * p1[1] + p2[1]);
  const n = steps(Math.sqrt(d / (4 * tol)), 1, budget, where);
  const out: Pt[] = [];
  for (let k = 1; k < n; k++) {
    const t = k / n;
    const u = 1 - t;
    out.push([u * u * p0[0] + 2 * u * t * p1[0] + t * t * p2[0], u * u * p0[1] + 2 * u * t * p1[1] + t * t * p2[1]]);
  }
  out.push(p2);
  return out;
}

/** An elliptical arc in centre form (SVG 1.1 F.6.4): angles in radians. */
export interface CentreArc {
  cx: number;
  cy: number;
  rx: number;
  ry: number;
  phi: number;
  theta1: number;
  dtheta: number;
}

export type EndpointArc = { kind: "omit" } | { kind: "line" } | { kind: "arc"; arc: CentreArc };

function vecAngle(ux: number, uy: number, vx: number, vy: number): number {
  return Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
}

/** SVG 1.1 F.6.5 with the F.6.6 corrections. phiDeg is the x-axis rotation in degrees. */
export function endpointToCentre(
  x1: number,
  y1: number,
  rxIn: number,
  ryIn: number,
  phiDeg: number,
  largeArc: boolean,
  sweep: boolean,
  x2: number,
  y2: number,
): EndpointArc {
  if (x1 === x2 && y1 === y2) return { kind: "omit" };
  let rx = Math.abs(rxIn);
  let ry = Math.abs(ryIn);
  if (rx === 0 || ry === 0) return { kind: "line" };
  const phi = ((phiDeg % 360) * Math.PI) / 180;
  const cos = Math.cos(phi);
  const sin = Math.sin(phi);
  // Step 1: (x1', y1').
  const dx = (x1 - x2) / 2;
  const dy = (y1 - y2) / 2;
  const x1p = cos * dx + sin * dy;
  const y1p = -sin * dx + cos * dy;
  // F.6.6: scale the radii up when no ellipse of these radii reaches both ends.
  const lambda = (x1p * x1p) / (rx * rx) + (y1p * y1p) / (ry * ry);
  if (lambda > 1) {
    const s = Math.sqrt(lambda);
    rx *= s;
    ry *= s;
  }
  // Step 2: (cx', cy').
  const rx2 = rx * rx;
  const ry2 = ry * ry;
  const num = rx2 * ry2 - rx2 * y1p * y1p - ry2 * x1p * x1p;
  const den = rx2 * y1p * y1p + ry2 * x1p * x1p;
  const coef = (largeArc !== sweep ? 1 : -1) * Math.sqrt(Math.max(0, num / den));
  const cxp = (coef * rx * y1p) / ry;
  const cyp = (-coef * ry * x1p) / rx;
  // Step 3: (cx, cy).
  const cx = cos * cxp - sin * cyp + (x1 + x2) / 2;
  const cy = sin * cxp + cos * cyp + (y1 + y2) / 2;
  // Step 4: θ1 and Δθ.
  const ux = (x1p - cxp) / rx;
  const uy = (y1p - cyp) / ry;
  const vx = (-x1p - cxp) / rx;
  const vy = (-y1p - cyp) / ry;
  const theta1 = vecAngle(1, 0, ux, uy);
  let dtheta = vecAngle(ux, uy, vx, vy);
  if (!sweep && dtheta > 0) dtheta -= 2 * Math.PI;
  else if (sweep && dtheta < 0) dtheta += 2 * Math.PI;
  return { kind: "arc", arc: { cx, cy, rx, ry, phi, theta1, dtheta } };
}

/** The point of a centre-form arc at angle θ, in the arc's own (untransformed) frame. */
export function arcPoint(a: CentreArc, theta: number): Pt {
  const c = Math.cos(a.phi);
  const s = Math.sin(a.phi);
  const ex = a.rx * Math.cos(theta);
  const ey = a.ry * Math.sin(theta);
  return [a.cx + c * ex - s * ey, a.cy + s * ex + c * ey];
}

/** Points after the start (the end last) of a centre-form arc mapped by m. */
export function flattenArc(a: CentreArc, m: Affine, tol: number, budget: PointBudget, where: () => string): Pt[] {
  const r = maxStretch(m) * Math.max(a.rx, a.ry);
  const span = Math.abs(a.dtheta);
  const n = steps(span * Math.sqrt(r / (8 * tol)), Math.max(1, Math.ceil(span / MAX_ARC_STEP - 1e-9)), budget, where);
  const out: Pt[] = [];
  for (let k = 1; k <= n; k++) {
    const [x, y] = arcPoint(a, a.theta1 + (a.dtheta * k) / n);
    out.push(apply(m, x, y));
  }
  return out;
}
