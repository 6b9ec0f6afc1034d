// Builds the engine's wheel (a piecewise polar function about the axle) from a wheel spec.

import type { WheelSpec } from "../spec";
import { circleWheel, ellipseWheel } from "./conic";
import { outlineWheel } from "./outline";
import { polarWheel } from "./polar";
import { polygonWheel } from "./polygon";
import type { Wheel } from "./wheel";

export type { Wheel } from "./wheel";
export { ray, TAU } from "./wheel";

export function buildWheel(spec: WheelSpec): Wheel {
  switch (spec.kind) {
    case "polygon":
      return polygonWheel(spec);
    case "ellipse":
      return ellipseWheel(spec.semiMajor, spec.semiMinor, spec.axle);
    case "circle":
      return circleWheel(spec.radius, spec.axleOffset);
    case "polar":
      return polarWheel(spec.r);
    case "outline":
      return outlineWheel(spec.points, spec.axle);
  }
}
