// The axle's path so far, from the outlines' own resting heights (lib/studio/motion), as the canvas
// draws it. A pair's axles are both fixed, so nothing is traced for it; `pairRest` still gives where
// the drawn outlines, touching, would put the partner's axle over the turn so far (for the probe).
import { cycleOf, type Pose, type TraceRow } from "@/lib/studio/motion";
import type { Pt } from "@/lib/studio/view-math";
import type { SolvedGeometry } from "@/lib/track";

export function tracesSoFar(
  result: SolvedGeometry,
  isPair: boolean,
  trace: TraceRow[],
  pose: Pose,
  resting: { wheel: number; partner?: number },
  position: number,
) {
  const c = cycleOf(result);
  const travelled = position * c.length;
  const shown = isPair ? [] : trace.filter((t) => t.along - c.start <= travelled);
  const upper: Pt[] = shown.map((t) => [t.x, t.wheel]);
  const lower: Pt[] = shown.filter((t) => t.partner !== undefined).map((t) => [t.x, t.partner!]);
  if (!isPair) {
    upper.push([pose.wheel.x, resting.wheel]);
    if (resting.partner !== undefined) lower.push([pose.wheel.x, resting.partner]);
  }
  const pairRest = isPair
    ? trace.filter((t) => t.along <= travelled && t.partner !== undefined).map((t) => t.partner!)
    : [];
  if (isPair && resting.partner !== undefined) pairRest.push(resting.partner);
  return { upper, lower, pairRest };
}
