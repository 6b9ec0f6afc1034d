// What the canvas lays out for a result, in the spec's units (y up): the tiled track, the frame
// to fit, the nominal axle lines. Pure, so it is computed once per result.

import type { SolvedGeometry } from "@/lib/track";
import { RUN_PERIODS, axleLineY, cycleOf, isPairResult } from "./motion";
import { boundsOf, discBounds, tileTrack, unionBounds, type Bounds, type Pt } from "./view-math";

export interface Scene {
  pair: boolean;
  /** The track over RUN_PERIODS periods (track modes). */
  track: Pt[];
  /** Nominal axle lines: y of the wheel's, and of the lower twin's. */
  axleY: number;
  lowerAxleY?: number;
  runStart: number;
  runEnd: number;
  period?: number;
  bounds: Bounds;
}

export function sceneOf(r: SolvedGeometry): Scene {
  if (isPairResult(r)) {
    const a = r.centreDistance ?? 0;
    const bounds = unionBounds(discBounds(0, 0, r.wheel.rMax), discBounds(0, -a, r.partner?.rMax ?? 0));
    return { pair: true, track: [], axleY: 0, lowerAxleY: -a, runStart: 0, runEnd: 0, bounds };
  }
  const c = cycleOf(r);
  const period = c.kind === "track" ? c.period : 0;
  const track = r.track ? tileTrack(r.track.points, period, RUN_PERIODS) : [];
  const axleY = axleLineY(r);
  const runStart = c.start;
  const runEnd = c.start + c.length;
  const parts = [discBounds(runStart, axleY, r.wheel.rMax), discBounds(runEnd, axleY, r.wheel.rMax)];
  if (track.length) parts.push(boundsOf(track));
  const lowerAxleY = r.mode === "twin-wheels" ? r.lowerAxleHeight : undefined;
  if (lowerAxleY !== undefined && r.partner)
    parts.push(discBounds(runStart, lowerAxleY, r.partner.rMax), discBounds(runEnd, lowerAxleY, r.partner.rMax));
  return { pair: false, track, axleY, lowerAxleY, runStart, runEnd, period, bounds: unionBounds(...parts) };
}
