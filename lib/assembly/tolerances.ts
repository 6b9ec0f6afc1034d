// The installation tolerances of a run as built: for every joint, how far it may sit off its
// station, and for every support, how far it may sit low, before the axle bumps by more than the
// limit — worked out by the engine (lib/track/installation.ts) rolling the wheel, turned as the
// rolling law turns it, over the track as built with that one change.
import { runScene, wheelTurnAt, type RunLayout, type RunChoice } from "@/lib/review/run-scene";
import {
  densified,
  jointTolerance,
  polylineHeight,
  supportTolerance,
  type RollingBody,
} from "@/lib/track/installation";
import type { SolvedGeometry } from "@/lib/track";

/** Default bump limit, mm: a bump a rider feels as a knock (common practice for a smooth ride, not a standard). */
export const DEFAULT_BUMP_LIMIT_MM = 1;
/** Outline points no further apart than this, mm: a flat face rests on the track between its corners. */
const OUTLINE_SPACING_MM = 0.5;

export interface RunTolerances {
  joints: Array<{ station: number; tolerance: number; plus: number; minus: number }>;
  supports: Array<{ station: number; tolerance: number }>;
}

export function installationBody(result: SolvedGeometry, scene: RunLayout): RollingBody {
  return { outline: densified(scene.wheel, OUTLINE_SPACING_MM), turnAt: (x) => wheelTurnAt(result, scene, x) };
}

// The same plan asks for the same figures every time its sheet is opened or printed: remember the
// last few (in memory only; they follow from the frozen revision and the plan, so they never go stale).
const remembered = new Map<string, RunTolerances>();
const REMEMBER = 32;

export function runTolerances(
  result: SolvedGeometry,
  run: RunChoice,
  stations: { joints: number[]; supports: number[] },
  limit = DEFAULT_BUMP_LIMIT_MM,
): RunTolerances {
  const key = JSON.stringify([
    result.specHash,
    run.runLength,
    run.endTreatment,
    stations.joints,
    stations.supports,
    limit,
  ]);
  const hit = remembered.get(key);
  if (hit) return hit;
  const worked = workOut(result, run, stations, limit);
  remembered.set(key, worked);
  if (remembered.size > REMEMBER) remembered.delete(remembered.keys().next().value!);
  return worked;
}

function workOut(
  result: SolvedGeometry,
  run: RunChoice,
  stations: { joints: number[]; supports: number[] },
  limit: number,
): RunTolerances {
  const scene = runScene(result, run);
  if (scene.kind !== "run") return { joints: [], supports: [] };
  const body = installationBody(result, scene);
  const track = polylineHeight(scene.profile);
  const reach = scene.dims.wheelAcross / 2;
  const joints = stations.joints.map((station) => ({
    station,
    ...jointTolerance(body, track, station, { limit, reach }),
  }));
  const s = [...stations.supports].sort((a, b) => a - b);
  const supports = s.map((at, i) => ({
    station: at,
    tolerance: supportTolerance(
      body,
      track,
      { at, left: i > 0 ? s[i - 1] : 0, right: i < s.length - 1 ? s[i + 1] : scene.runLength },
      { limit, reach },
    ),
  }));
  return { joints, supports };
}
