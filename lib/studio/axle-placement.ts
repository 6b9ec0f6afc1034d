// Placing the axle of an uploaded outline, by dragging it on the canvas or nudging it with the
// keys: which screen point is which outline point, how finely a drag can place it, and whether the
// engine takes the outline about that axle. No React: the canvas handle, the form and the unit
// tests share these.
//
// Frames: an outline wheel is drawn as uploaded (y up) in its start pose, the engine's outline
// being the uploaded points less the axle; turned clockwise by `angleCw` and set with its axle at
// world point `axleAt` (lib/studio/view-math placeOutline).

import { isEngineError } from "@/lib/track";
import { outlineWheel } from "@/lib/track/wheels/outline";
import { rotateCcw, toWorld, type Pt, type View } from "./view-math";

export interface Axle {
  x: number;
  y: number;
}

/**
 * The engine's own refusal of this axle for this outline (not star-shaped about it, outside it,
 * on it), word for word, or undefined when the engine takes it. It runs the very check solve()
 * runs (lib/track/wheels/outline.ts), so the form, the canvas and the solve always agree.
 */
export function axleRefusal(points: ReadonlyArray<readonly [number, number]>, axle: Axle): string | undefined {
  try {
    outlineWheel(points, axle);
    return undefined;
  } catch (e) {
    if (isEngineError(e)) return e.message;
    throw e;
  }
}

/** Where the body is drawn: its axle's world point and its clockwise turn, with the axle it was solved for. */
export interface DrawnBody {
  axleAt: Pt;
  angleCw: number;
  axle: Axle;
}

/** The point of the uploaded outline's own frame that lies under screen point `q`. */
export function outlinePointAt(q: Pt, view: View, body: DrawnBody): Pt {
  const [wx, wy] = toWorld(view, q);
  const [bx, by] = rotateCcw([wx - body.axleAt[0], wy - body.axleAt[1]], body.angleCw);
  return [body.axle.x + bx, body.axle.y + by];
}

/**
 * How finely a drag places the axle at this zoom: the largest power of ten in the spec's units
 * that is at most one screen pixel, so the figures typed into the form carry no digits the
 * pointer could not have meant.
 */
export function dragStep(pixelsPerUnit: number): number {
  return 10 ** Math.floor(Math.log10(1 / pixelsPerUnit));
}

/** One arrow-key nudge: 1 mm or 0.05 in, ten times that with Shift. */
export function nudgeStep(units: "mm" | "in", coarse: boolean): number {
  return (units === "in" ? 0.05 : 1) * (coarse ? 10 : 1);
}

/** v to the nearest multiple of step, without floating-point tails (0.30000000000000004). */
export function snap(v: number, step: number): number {
  return Number((Math.round(v / step) * step).toPrecision(12));
}
