// Support holes along the base band: evenly spaced at no more than the support spacing, the first
// and last a short distance in from the ends of the run, and kept clear of every joint (a support
// that falls on a key or under a splice plate moves to the nearer edge of the joint's zone). The
// span between supports is what the track's deflection check (docs/safety.md §2.4, a beam between
// supports) reads.
import { keyShape } from "./joints/key";
import { spliceGeometry } from "./joints/dowel";
import type { CutSettings } from "./settings";
import type { CutWarning } from "./types";
import { fmtLen } from "./units";

/** The stretch of run around a cut at s where no support hole may go. */
export function jointZone(s: number, settings: CutSettings): [number, number] {
  const d = settings.supportHoleDiameter;
  const wall = Math.max(10, settings.machine.kerf);
  if (settings.joint.kind === "key") return [s - wall - d / 2, s + keyShape(settings.joint).reach + wall + d / 2];
  const half = spliceGeometry(settings).half;
  return [s - half - wall - d / 2, s + half + wall + d / 2];
}

export function supportStations(
  L: number,
  cuts: number[],
  settings: CutSettings,
): { xs: number[]; warnings: CutWarning[] } {
  const d = settings.supportHoleDiameter;
  const e = Math.min(L / 4, Math.max(3 * d, 50));
  const span = L - 2 * e;
  const n = Math.max(2, Math.ceil(span / settings.supportSpacing - 1e-9) + 1);
  const zones = cuts.map((c) => jointZone(c, settings));
  const warnings: CutWarning[] = [];
  const xs: number[] = [];
  for (let i = 0; i < n; i++) {
    let x = e + (span * i) / (n - 1);
    const z = zones.find(([a, b]) => x > a && x < b);
    if (z) {
      const to = x - z[0] <= z[1] - x && z[0] >= e ? z[0] : z[1] <= L - e ? z[1] : z[0];
      warnings.push({
        code: "support-moved",
        message: `A support hole at x = ${fmtLen(x)} fell on a joint and moved to x = ${fmtLen(to)}.`,
        at: [to],
      });
      x = to;
    }
    if (!xs.some((q) => Math.abs(q - x) < 2 * d)) xs.push(x);
  }
  // Every segment holds at least one support of its own.
  const bounds = [0, ...cuts, L];
  for (let i = 1; i < bounds.length; i++) {
    const [a, b] = [bounds[i - 1], bounds[i]];
    if (xs.some((x) => x > a && x < b)) continue;
    const free = [(a + b) / 2, a + (b - a) / 3, a + (2 * (b - a)) / 3].find(
      (x) => !zones.some(([za, zb]) => x > za && x < zb),
    );
    if (free !== undefined) xs.push(free);
  }
  xs.sort((p, q) => p - q);
  return { xs, warnings };
}
