// Rigid motions of the plane: rotation about the origin, then translation — the one way a nested
// copy is placed (lib/nest lays it out, lib/cut draws it, lib/cut-plan checks it, the cut page
// shows it). A point (x, y) turned by θ counter-clockwise goes to (x cos θ − y sin θ,
// x sin θ + y cos θ) (the rotation matrix, common practice; any linear-algebra text). Quarter
// turns use exact 0/±1, so a part turned 90° keeps its straight edges exactly straight.
import type { Pt } from "./point";
import type { Ring } from "./ring";

/** Where a copy goes: turned `rotation` degrees about its own origin first, then moved by (x, y). */
export interface Pose {
  /** Degrees, counter-clockwise, about the part's own origin, applied first. */
  rotation: number;
  /** Translation applied after the rotation. */
  x: number;
  y: number;
}

/** Angles within this many degrees of a quarter turn count as that quarter turn. */
const QUARTER_TURN_SNAP = 1e-12;

/**
 * cos and sin of a rotation in degrees, exact for quarter turns. An angle outside [0°, 360°) is
 * brought into it first (an angle inside is used as given, to the last bit).
 */
export function cosSin(degrees: number): [number, number] {
  let d = degrees % 360;
  if (d < 0) d += 360;
  const q = Math.round(d / 90);
  if (Math.abs(d - q * 90) < QUARTER_TURN_SNAP) {
    const k = q % 4;
    return [[1, 0, -1, 0][k], [0, 1, 0, -1][k]];
  }
  const r = (d * Math.PI) / 180;
  return [Math.cos(r), Math.sin(r)];
}

/** Rotates about (0, 0) counter-clockwise by `degrees`. */
export function rotateRing(ring: readonly Pt[], degrees: number): Ring {
  const [c, s] = cosSin(degrees);
  return ring.map(([x, y]) => [c * x - s * y, s * x + c * y] as Pt);
}

/** The motion of a pose as a function on points: rotate about (0, 0) by `degrees`, then add (dx, dy). */
export function placer(degrees: number, dx: number, dy: number): (p: readonly [number, number]) => Pt {
  const [c, s] = cosSin(degrees);
  return ([x, y]) => [c * x - s * y + dx, s * x + c * y + dy];
}

/** The absolute outline of a placed copy: rotate about the part's own origin first, then translate. */
export function placeRing(ring: readonly Pt[], rotation: number, x: number, y: number): Ring {
  return ring.map(placer(rotation, x, y));
}

export const translate = (ring: readonly Pt[], dx: number, dy: number): Ring => ring.map(([x, y]) => [x + dx, y + dy]);
