// Lightening holes in a wheel: `count` equal circles on one pitch circle about the axle, as large as
// they can be while leaving at least `rim` of material to the outline, to the bore and between
// neighbours. The outline is star-shaped about the axle, so every outline point q has |q| ≥ ρ_in
// (the smallest distance from the axle to the outline); a hole of radius a centred at distance c
// then keeps |q − centre| − a ≥ ρ_in − c − a from the outline (triangle inequality). With the bore
// radius b: c − a ≥ b + rim, c + a ≤ ρ_in − rim, and neighbours 2c·sin(π/count) − 2a ≥ rim.
import { circleRing, orient, type Ring } from "@/lib/geometry/ring";
import { distToRing } from "@/lib/geometry/segment";
import type { CutSettings } from "./settings";

export interface Lightening {
  holes: Ring[];
  centres: Array<[number, number]>;
  diameter: number;
  pitchRadius: number;
}

/** Holes for a wheel outline (axle at the origin), or the reason there is no room. */
export function lighteningHoles(outline: Ring, s: CutSettings, minDiameter: number): Lightening | { reason: string } {
  const l = s.lightening!;
  const rin = distToRing([0, 0], outline);
  const bore = s.boreDiameter / 2;
  const inner = bore + l.rim;
  const outer = rin - l.rim;
  if (outer - inner < minDiameter)
    return {
      reason: `the ring between bore and outline (${(outer - inner).toFixed(1)} mm after the rim) is narrower than ${minDiameter.toFixed(1)} mm`,
    };
  const c = (inner + outer) / 2;
  const sinStep = Math.sin(Math.PI / l.count);
  const a = Math.min((outer - inner) / 2, (2 * c * sinStep - l.rim) / 2);
  if (2 * a < minDiameter)
    return {
      reason: `${l.count} holes with a ${l.rim} mm rim between them would be under ${minDiameter.toFixed(1)} mm across`,
    };
  const holes: Ring[] = [];
  const centres: Array<[number, number]> = [];
  for (let i = 0; i < l.count; i++) {
    // Half a step off the start ray, so a hole never sits on the contact line of the start pose.
    const t = ((i + 0.5) * 2 * Math.PI) / l.count - Math.PI / 2;
    const x = c * Math.cos(t);
    const y = c * Math.sin(t);
    centres.push([x, y]);
    holes.push(orient(circleRing(x, y, a), false));
  }
  return { holes, centres, diameter: 2 * a, pitchRadius: c };
}
