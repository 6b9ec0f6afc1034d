// Ellipse and circle wheels with the axle at any inner point, measured by the exact ray–conic
// intersection (a quadratic in the distance along the ray). With the axle at a focus this is the
// focal polar form r = a(1 − e²)/(1 + e cos t), whose road is the exact cosine
// y = −a + a·e·cos(x/b) (Hall & Wagon 1992; docs/math.md §3).
// Start pose: the major axis is vertical; "focus" is the lower focus, so the near vertex touches the
// track at x = 0; an axle {x, y} is given relative to the ellipse's centre in that pose.

import { EngineError } from "../errors";
import { makeWheel, smoothPiece, TAU, type Wheel } from "./wheel";

/** r(t) for the ellipse x²/b² + y²/a² = 1 (major axis vertical) seen from the inner point (px, py). */
function ellipseRay(a: number, b: number, px: number, py: number): (t: number) => number {
  const ia = 1 / (a * a);
  const ib = 1 / (b * b);
  const C = px * px * ib + py * py * ia - 1; // < 0 inside
  return (t) => {
    const dx = Math.sin(t);
    const dy = -Math.cos(t);
    const A = dx * dx * ib + dy * dy * ia;
    const B = 2 * (px * dx * ib + py * dy * ia);
    // Positive root of A s² + B s + C = 0, in the form that avoids cancellation.
    const disc = Math.sqrt(B * B - 4 * A * C);
    return B > 0 ? (-2 * C) / (B + disc) : (-B + disc) / (2 * A);
  };
}

export function ellipseWheel(a: number, b: number, axle: "focus" | "centre" | { x: number; y: number }): Wheel {
  const c = Math.sqrt(Math.max(0, a * a - b * b));
  const [px, py] = axle === "focus" ? [0, -c] : axle === "centre" ? [0, 0] : [axle.x, axle.y];
  if ((px * px) / (b * b) + (py * py) / (a * a) >= 1)
    throw new EngineError("invalid-wheel", `The axle (${px}, ${py}) is not inside the ellipse.`, "wheel.axle");
  const f = ellipseRay(a, b, px, py);
  // The symmetry is known: 2 about the centre (unless a circle), 1 otherwise.
  const sym = px === 0 && py === 0 && a !== b ? 2 : 1;
  return makeWheel([smoothPiece("smooth", f, 0, TAU)], [], sym);
}

/** Circle of radius R whose centre sits `offset` above the axle in the start pose. */
export function circleWheel(R: number, offset: number): Wheel {
  if (offset >= R)
    throw new EngineError(
      "invalid-wheel",
      `The axle offset (${offset}) must be smaller than the radius (${R}).`,
      "wheel.axleOffset",
    );
  return ellipseWheel(R, R, { x: 0, y: offset });
}
