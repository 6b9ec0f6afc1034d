// Reading the run's data for drawing: the track's top at any x (straight between the profile's
// points, as the parts are cut), the part outline over one stretch, and heights above the datum.
import type { Pt } from "@/lib/track";
import type { SheetRun } from "../sheet";

/** y of the track's top at run x, straight between profile points (held flat past either end). */
export function topAt(profile: readonly Pt[], x: number): number {
  if (profile.length === 0) return 0;
  if (x <= profile[0][0]) return profile[0][1];
  for (let i = 1; i < profile.length; i++) {
    const [xa, ya] = profile[i - 1];
    const [xb, yb] = profile[i];
    if (x <= xb) return xb === xa ? yb : ya + ((yb - ya) * (x - xa)) / (xb - xa);
  }
  return profile[profile.length - 1][1];
}

/** The track part's outline between x0 and x1: the profile on top, the bottom edge at baseY. */
export function partOutline(run: SheetRun, x0: number, x1: number): Pt[] {
  const inside = run.profile.filter(([x]) => x > x0 && x < x1);
  return [[x0, run.baseY], [x0, topAt(run.profile, x0)], ...inside, [x1, topAt(run.profile, x1)], [x1, run.baseY]];
}

/** The highest top and the lowest top of the whole run, as heights above the datum. */
export function topRange(run: SheetRun): { highest: number; lowest: number } {
  const ys = run.profile.map(([, y]) => y - run.datumY);
  return ys.length ? { highest: Math.max(...ys), lowest: Math.min(...ys) } : { highest: 0, lowest: 0 };
}
