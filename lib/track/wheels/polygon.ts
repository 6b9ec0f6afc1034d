// Regular n-gon wheels, optionally with rounded corners. Each side is a straight edge, which rolls
// out an arc of the inverted catenary y = −A cosh(x/A) in closed form (L. Hall and S. Wagon,
// "Roads and Wheels", Math. Mag. 65(5), 1992; J. C. Maxwell, "On the Theory of Rolling Curves",
// 1849, for r = a sec θ). A rounded corner is the circle of radius ρ tangent to both sides (the
// polygon with inradius A − ρ grown by ρ), measured from the axle by a ray–circle intersection.
// Start pose: the middle of a side touches the track, so t = 0 is a side's normal.

import { EngineError } from "../errors";
import { linePiece, makeWheel, smoothPiece, TAU, wrapPieces, type Wheel, type WheelPiece } from "./wheel";

export interface PolygonInput {
  sides: number;
  inradius?: number;
  circumradius?: number;
  side?: number;
  cornerRadius?: number;
}

export function polygonInradius(p: PolygonInput): number {
  const half = Math.PI / p.sides;
  if (p.inradius !== undefined) return p.inradius;
  if (p.circumradius !== undefined) return p.circumradius * Math.cos(half);
  return p.side! / (2 * Math.tan(half));
}

/** r along the body ray t for the fillet circle with centre at distance dC along the ray tc. */
function arcPiece(dC: number, tc: number, rho: number, a: number, b: number): WheelPiece {
  const f = (t: number) => {
    const cu = dC * Math.cos(t - tc);
    return cu + Math.sqrt(rho * rho - dC * dC + cu * cu);
  };
  const piece = smoothPiece("arc", f, a, b);
  piece.sub = (a2, b2) => arcPiece(dC, tc, rho, a2, b2);
  return piece;
}

export function polygonWheel(p: PolygonInput): Wheel {
  const n = p.sides;
  const A = polygonInradius(p);
  const rho = p.cornerRadius ?? 0;
  if (rho >= A)
    throw new EngineError(
      "invalid-wheel",
      `The corner radius (${rho}) must be smaller than the inradius (${A}).`,
      "wheel.cornerRadius",
    );
  const half = Math.PI / n;
  const pieces: WheelPiece[] = [];
  const corners: number[] = [];
  // Half-width, in body angle, of the straight part of each side.
  const beta = rho > 0 ? Math.atan((1 - rho / A) * Math.tan(half)) : half;
  const dC = (A - rho) / Math.cos(half);
  for (let j = 0; j < n; j++) {
    const tn = (TAU * j) / n;
    pieces.push(linePiece(A, tn, tn - beta, tn + beta));
    if (rho > 0) pieces.push(arcPiece(dC, tn + half, rho, tn + beta, tn + TAU / n - beta));
    else corners.push(tn + half);
  }
  return makeWheel(wrapPieces(pieces), corners, n);
}
